package org.cupel.control.crm;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.cupel.control.ControlOutcome;
import org.cupel.control.ControlOutcomes;
import org.cupel.control.Verdict;
import org.cupel.project.CrmCatalog;
import org.cupel.project.Project;

/**
 * The CRM control review of a project: per CRM and analyte, z-scores, rule outcomes, bias and drift;
 * per analyte, lab-wide drift and bias against grade; and the results that cannot be judged.
 *
 * <p>Order of work for each analyte: (1) z of every result against its certificate; (2) a result beyond
 * ±3 SD that matches another CRM or blank level ({@link SwapCheck}) is a probable swap: outcome WARN,
 * rule "probable swap", no re-assay, because the value says a different material was put in the slot,
 * not that the lab measured this CRM badly, so the routine samples around it are not in doubt; but the
 * slot gave no control, hence a warning that asks for the insertion record to be checked. Swaps are left
 * out of every later step. (3) Run rules ({@link CrmRule}, actions from {@link CrmSettings}) on the judged
 * results; the result completing a pattern takes the rule's action; FAIL results trigger re-assay.
 * (4) Bias, project limits and drift from the judged results.
 *
 * @param settings settings in force
 * @param series one review per CRM and analyte
 * @param analytes lab-wide findings per analyte
 * @param exceptions results listed instead of judged (censored, unknown code, not received)
 */
public record CrmReview(CrmSettings settings, List<SeriesReview> series, List<AnalyteReview> analytes,
                        List<CrmException> exceptions) {
    /** Rule label of a probable swap. */
    public static final String SWAP_RULE = "probable swap";

    public CrmReview {
        series = List.copyOf(series);
        analytes = List.copyOf(analytes);
        exceptions = List.copyOf(exceptions);
    }

    /** Reviews a project with the settings of its config section {@code crm}. */
    public static CrmReview of(Project project) {
        CrmSettings s = project.config().section("crm", CrmSettings.class, CrmSettings.DEFAULTS);
        return of(CrmData.of(project), project.catalog(), s);
    }

    public static CrmReview of(CrmData data, CrmCatalog catalog, CrmSettings settings) {
        Map<String, List<CrmSeries>> byAnalyte = new LinkedHashMap<>();
        for (CrmSeries s : data.series()) {
            byAnalyte.computeIfAbsent(s.analyte().name(), k -> new ArrayList<>()).add(s);
        }
        List<SeriesReview> reviews = new ArrayList<>();
        List<AnalyteReview> analytes = new ArrayList<>();
        for (Map.Entry<String, List<CrmSeries>> e : byAnalyte.entrySet()) {
            AnalyteJudgement.Judged judged = AnalyteJudgement.judge(e.getValue(), catalog, settings);
            reviews.addAll(judged.series());
            analytes.add(new AnalyteReview(e.getKey(), judged.labDrift(),
                    biasVsGrade(e.getKey(), judged.series(), settings)));
        }
        return new CrmReview(settings, reviews, analytes, data.exceptions());
    }

    /**
     * Every judged CRM result and every exception, in the common form batch verdicts consume: read from the
     * series' results by index, an outcome made when read.
     */
    public List<ControlOutcome> outcomes() {
        return new Outcomes(series, exceptions);
    }

    /** The outcomes of every series' results, series after series, then of the exceptions. */
    private static final class Outcomes extends ControlOutcomes {
        private final List<SeriesReview> series;
        private final List<CrmException> exceptions;
        /** Series {@code s} holds outcomes {@code start[s] .. start[s + 1]}; the exceptions follow. */
        private final int[] start;

        Outcomes(List<SeriesReview> series, List<CrmException> exceptions) {
            this.series = series;
            this.exceptions = exceptions;
            this.start = new int[series.size() + 1];
            for (int s = 0; s < series.size(); s++) {
                start[s + 1] = start[s] + series.get(s).n();
            }
        }

        /** The series of outcome {@code i}, or {@code series.size()} for an exception. */
        private int seriesOf(int i) {
            Objects.checkIndex(i, size());
            int s = Arrays.binarySearch(start, i);
            if (s < 0) {
                return -s - 2;
            }
            while (s < series.size() && start[s + 1] == i) {
                s++; // a series without results starts where the next begins
            }
            return s;
        }

        private CrmResults results(int s) {
            return series.get(s).resultList();
        }

        @Override
        public int size() {
            return start[series.size()] + exceptions.size();
        }

        @Override
        public int row(int i) {
            int s = seriesOf(i);
            return s < series.size() ? results(s).row(i - start[s]) : exceptions.get(i - start[s]).row();
        }

        @Override
        public String analyte(int i) {
            int s = seriesOf(i);
            return s < series.size() ? series.get(s).analyte().name() : exceptions.get(i - start[s]).analyte();
        }

        @Override
        public Verdict verdict(int i) {
            int s = seriesOf(i);
            return s < series.size() ? results(s).verdict(i - start[s]) : Verdict.CANNOT_JUDGE;
        }

        @Override
        public String rule(int i) {
            int s = seriesOf(i);
            return s < series.size() ? results(s).rule(i - start[s]) : exceptions.get(i - start[s]).rule();
        }

        @Override
        public String reason(int i) {
            int s = seriesOf(i);
            return s < series.size() ? results(s).get(i - start[s]).reason() : exceptions.get(i - start[s]).problem();
        }

        @Override
        public boolean triggersReassay(int i) {
            int s = seriesOf(i);
            return s < series.size() && results(s).triggersReassay(i - start[s]);
        }
    }

    public Optional<SeriesReview> series(String crm, String analyte) {
        return series.stream().filter(s -> s.crm().equals(crm) && s.analyte().name().equals(analyte)).findFirst();
    }

    public long failures() {
        return series.stream().mapToLong(SeriesReview::failures).sum();
    }

    public long warnings() {
        return series.stream().mapToLong(SeriesReview::warnings).sum();
    }

    public long swaps() {
        return series.stream().mapToLong(SeriesReview::swaps).sum();
    }

    private static BiasVsGrade biasVsGrade(String analyte, List<SeriesReview> forAnalyte, CrmSettings settings) {
        List<SeriesReview> usable = forAnalyte.stream().filter(s -> Double.isFinite(s.bias().meanBiasPct())).toList();
        double[] x = new double[usable.size()];
        double[] y = new double[usable.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = usable.get(i).limits().certified();
            y[i] = usable.get(i).bias().meanBiasPct();
        }
        return new BiasVsGrade(analyte, LinearFit.of(x, y, settings.confidence()));
    }
}
