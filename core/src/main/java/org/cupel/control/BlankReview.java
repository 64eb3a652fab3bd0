package org.cupel.control;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.LimitComparison;
import org.cupel.assay.MissingReason;
import org.cupel.assay.Numbers;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.project.Project;

/**
 * Judges every blank against its threshold ({@link BlankVerdict}), pairs it with the sample run before it
 * (carry-over) and summarises per analyte ({@link CarryOver}).
 */
public final class BlankReview {
    private BlankReview() {
    }

    /** Every blank of every analyte of the project, with the settings of config section {@code blanks}. */
    public static BlankReport review(Project project) {
        return review(project, BatchSequence.of(project.samples()));
    }

    /** As {@link #review(Project)}, with the batch sequence of the project's table already built. */
    public static BlankReport review(Project project, BatchSequence seq) {
        BlankSettings settings = project.config().section("blanks", BlankSettings.class, BlankSettings.DEFAULTS);
        int[] blanks = seq.inRunOrder(project.samples().rowsWithRole(QcRole.BLANK));
        List<BlankObservation> all = new ArrayList<>();
        for (AnalyteColumn col : project.analytes().values()) {
            all.addAll(observations(project.samples(), seq, col, blanks));
        }
        return review(all, settings);
    }

    /**
     * The blanks of one analyte in batch and run order, each with the sample before it. The detection
     * limit is the one reported with the blank; when the lab gave none, the smallest limit reported for
     * the same analyte and method elsewhere in the project.
     */
    public static List<BlankObservation> observations(SampleTable table, BatchSequence seq, AnalyteColumn col) {
        return observations(table, seq, col, seq.inRunOrder(table.rowsWithRole(QcRole.BLANK)));
    }

    private static List<BlankObservation> observations(SampleTable table, BatchSequence seq, AnalyteColumn col,
                                                       int[] blanksInRunOrder) {
        Map<String, Double> methodLimit = null;
        String unit = col.analyte().unit().symbol();
        String analyte = col.analyte().name();
        List<BlankObservation> out = new ArrayList<>(blanksInRunOrder.length);
        for (int row : blanksInRunOrder) {
            int prev = seq.preceding(row);
            double dl = col.limit(row);
            if (!(dl > 0) || col.qualifier(row) == org.cupel.assay.Qualifier.ABOVE_UPPER_LIMIT) {
                // Only blanks without a usable limit of their own need the scan of the whole column.
                methodLimit = methodLimit == null ? methodLimits(col) : methodLimit;
                dl = methodLimit.getOrDefault(col.method(row), Double.NaN);
            }
            out.add(new BlankObservation(row, table.id(row), seq.batch(seq.batchOf(row)).id(), table.position(row),
                    analyte, unit, col.value(row), dl, prev < 0 ? "" : table.id(prev),
                    prev < 0 ? AssayValue.missing(MissingReason.NONE) : col.value(prev)));
        }
        return out;
    }

    /** Judges the observations (any mix of analytes); missing blank results are counted, not judged. */
    public static BlankReport review(List<BlankObservation> observations, BlankSettings settings) {
        Map<String, List<BlankResult>> byAnalyte = new LinkedHashMap<>();
        Map<String, Integer> missing = new HashMap<>();
        Map<String, String> units = new HashMap<>();
        List<BlankResult> results = new ArrayList<>(observations.size());
        List<BlankResult> current = null;
        String currentAnalyte = null;
        java.util.Optional<BlankThreshold> threshold = null;
        String thresholdAnalyte = null;
        double thresholdLimit = Double.NaN;
        for (BlankObservation o : observations) {
            if (!o.analyte().equals(currentAnalyte)) {
                // Observations come analyte by analyte: look the analyte up once per run of it.
                currentAnalyte = o.analyte();
                current = byAnalyte.computeIfAbsent(currentAnalyte, k -> new ArrayList<>());
            }
            units.put(o.analyte(), o.unit());
            if (o.value().isMissing()) {
                missing.merge(o.analyte(), 1, Integer::sum);
                continue;
            }
            if (threshold == null || !o.analyte().equals(thresholdAnalyte)
                    || Double.compare(o.detectionLimit(), thresholdLimit) != 0) {
                // The threshold depends only on the analyte and its limit, which change rarely from row to row.
                thresholdAnalyte = o.analyte();
                thresholdLimit = o.detectionLimit();
                threshold = settings.thresholdFor(thresholdAnalyte, thresholdLimit);
            }
            BlankResult r = judge(o, settings, threshold.orElse(null));
            results.add(r);
            current.add(r);
        }
        List<BlankSummary> summaries = new ArrayList<>();
        for (Map.Entry<String, List<BlankResult>> e : byAnalyte.entrySet()) {
            summaries.add(summary(e.getKey(), units.get(e.getKey()), e.getValue(),
                    missing.getOrDefault(e.getKey(), 0)));
        }
        return new BlankReport(results, summaries, settings);
    }

    static BlankResult judge(BlankObservation o, BlankSettings settings) {
        return judge(o, settings, settings.thresholdFor(o.analyte(), o.detectionLimit()).orElse(null));
    }

    /** @param t the thresholds for the observation's analyte and limit, null when none can be set */
    private static BlankResult judge(BlankObservation o, BlankSettings settings, BlankThreshold t) {
        BlankVerdict v = BlankVerdict.judge(o.value(), t, o.unit());
        AssayValue prev = o.precedingGrade();
        double ratio = Double.NaN;
        String ratioNote = "";
        if (prev.isMissing()) {
            ratioNote = o.precedingId().isEmpty() ? "first sample in the batch" : "preceding sample has no result";
        } else if (!o.value().isDetected()) {
            ratioNote = "blank not a detected value";
        } else if (!prev.isDetected() || !(prev.value() > 0)) {
            ratioNote = "preceding grade not a positive detected value";
        } else {
            ratio = o.value().value() / prev.value();
        }
        boolean carry = v.verdict() == Verdict.FAIL && t != null && !prev.isMissing()
                && prev.qualifier() != org.cupel.assay.Qualifier.BELOW_DETECTION
                && LimitComparison.atLeast(prev.value(), settings.highGradeMultiple() * t.fail());
        ControlOutcome outcome = ControlOutcome.described(o.row(), o.analyte(), v.verdict(), v.rule(),
                () -> reason(o, v, carry), v.verdict() == Verdict.FAIL);
        return new BlankResult(o, t, v, ratio, ratioNote, carry, outcome);
    }

    /** "B12 Au: 0.3 g/t is above the failure threshold 0.025 g/t; follows S11 at 9.1 g/t (probable carry-over)". */
    private static String reason(BlankObservation o, BlankVerdict v, boolean carry) {
        AssayValue prev = o.precedingGrade();
        String reason = o.sampleId() + " " + o.analyte() + ": " + v.explanation();
        if (!prev.isMissing() && v.verdict() != Verdict.PASS) {
            reason += "; follows " + o.precedingId() + " at " + prev.display() + " " + o.unit();
        }
        if (carry) {
            reason += " (probable carry-over)";
        }
        return reason;
    }

    private static BlankSummary summary(String analyte, String unit, List<BlankResult> rs, int missing) {
        int[] counts = new int[Verdict.values().length];
        int carry = 0;
        for (BlankResult r : rs) {
            counts[r.verdict().verdict().ordinal()]++;
            carry += r.carryOver() ? 1 : 0;
        }
        return new BlankSummary(analyte, unit, rs.size(), counts[Verdict.PASS.ordinal()],
                counts[Verdict.WARN.ordinal()], counts[Verdict.FAIL.ordinal()],
                counts[Verdict.CANNOT_JUDGE.ordinal()], missing, carry, CarryOver.relation(analyte, rs));
    }

    private static Map<String, Double> methodLimits(AnalyteColumn col) {
        Map<String, Double> out = new HashMap<>();
        for (int row = 0; row < col.size(); row++) {
            double l = col.limit(row);
            if (l > 0 && col.qualifier(row) != org.cupel.assay.Qualifier.ABOVE_UPPER_LIMIT) {
                out.merge(col.method(row), l, Math::min);
            }
        }
        return out;
    }

    /** "0.21 g/t (42×DL)", for tables. */
    public static String describe(BlankResult r) {
        BlankObservation o = r.observation();
        String s = o.value().display() + " " + o.unit();
        if (o.detectionLimit() > 0 && o.value().isDetected()) {
            s += " (" + Numbers.significant(o.value().value() / o.detectionLimit(), 3) + "×DL)";
        }
        return s;
    }
}
