package org.cupel.control.crm;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.IntUnaryOperator;
import org.cupel.assay.LimitComparison;
import org.cupel.control.Verdict;
import org.cupel.project.CrmCatalog;
import org.cupel.project.CrmCertificate;

/**
 * Steps (1) to (4) of {@link CrmReview} for the CRM series of one analyte, and the lab-wide drift over
 * them. Works on primitive arrays per series; the rules a result completes are kept as a bit set over
 * {@link CrmRule} ordinals, and no sentence is written here ({@link ResultWording} does, on demand).
 */
final class AnalyteJudgement {
    /** The rules of a judged result that violated none. */
    static final List<String> NO_RULE = List.of("no rule violated");
    private static final CrmRule[] RULES = CrmRule.values();

    private final List<CrmSeries> series;
    private final CrmSettings settings;
    private final Map<CrmRule, RuleAction> actions;
    /**
     * Per series, read from its points once: the value, batch rank, position, row and batch date of every
     * result (the merge and the rules read them many times; the table's columns are a cache miss a read).
     */
    private final double[][] number;
    private final int[][] batchOrder;
    private final int[][] position;
    private final int[][] row;
    private final LocalDate[][] date;
    /** Per series: z of every result. */
    private final double[][] z;
    /** Per series: swap label of every result, empty when none; {@code null} for a series without a swap. */
    private final String[][] swaps;
    /** Per series: indices of the judged (non-swap) results. */
    private final int[][] judged;
    /** Per series and result: bit {@code 1 << ordinal} for each rule whose pattern the result completes. */
    private final int[][] hits;
    /** Per series and result: whether it is an isolated outlier, left out of drift ({@link IsolatedOutliers}). */
    private final boolean[][] outlier;
    /** Per series: findings with the index of their signalling result, in the order found. */
    private final List<List<Found>> findings = new ArrayList<>();
    /** Every judged result of the analyte in time order (batch date, position, row): series and index. */
    private int[] mergedSeries;
    private int[] mergedIndex;

    private record Found(int signal, RuleFinding finding) {
    }

    /** What {@link #judge} gives: the reviews per series and the drift over all of them. */
    record Judged(List<SeriesReview> series, SeriesDrift labDrift) {
    }

    private AnalyteJudgement(List<CrmSeries> series, CrmSettings settings) {
        this.series = series;
        this.settings = settings;
        this.actions = settings.actions();
        int n = series.size();
        this.number = new double[n][];
        this.batchOrder = new int[n][];
        this.position = new int[n][];
        this.row = new int[n][];
        this.date = new LocalDate[n][];
        this.z = new double[n][];
        this.swaps = new String[n][];
        this.judged = new int[n][];
        this.hits = new int[n][];
        this.outlier = new boolean[n][];
    }

    static Judged judge(List<CrmSeries> series, CrmCatalog catalog, CrmSettings settings) {
        AnalyteJudgement j = new AnalyteJudgement(series, settings);
        j.scoreAndFindSwaps(catalog);
        j.mergeJudgedInTimeOrder();
        j.applyRulesWithinSeries();
        j.applyRangeRuleWithinBatches();
        List<SeriesReview> out = new ArrayList<>();
        for (int s = 0; s < series.size(); s++) {
            out.add(j.review(s));
        }
        return new Judged(out, j.labDrift());
    }

    private void scoreAndFindSwaps(CrmCatalog catalog) {
        for (int s = 0; s < series.size(); s++) {
            CrmSeries cs = series.get(s);
            CertifiedLimits lim = CertifiedLimits.of(cs.certificate());
            List<CrmCertificate> others = catalog.forAnalyte(cs.analyte().name()).stream()
                    .map(c -> c.unit() == cs.certificate().unit() ? c : c.in(cs.certificate().unit())).toList();
            PointList points = cs.pointList();
            int n = points.size();
            double[] zs = new double[n];
            String[] sw = null;
            int[] keep = new int[n];
            int kept = 0;
            readPoints(s, points);
            for (int i = 0; i < n; i++) {
                zs[i] = lim.z(number[s][i]);
                Optional<String> m = LimitComparison.beyond(zs[i], 3)
                        ? SwapCheck.match(points.value(i), cs.certificate(), others, settings.swapWithinSd(),
                        settings.blankLevelMultiple())
                        : Optional.empty();
                if (m.isPresent()) {
                    sw = sw == null ? new String[n] : sw;
                    sw[i] = m.get();
                } else {
                    keep[kept++] = i;
                }
            }
            if (sw != null) {
                for (int i = 0; i < n; i++) {
                    sw[i] = sw[i] == null ? "" : sw[i];
                }
            }
            z[s] = zs;
            swaps[s] = sw;
            judged[s] = Arrays.copyOf(keep, kept);
            hits[s] = new int[n];
            outlier[s] = isolatedOutliers(zs, judged[s]);
            findings.add(new ArrayList<>());
        }
    }

    private void readPoints(int s, PointList points) {
        int n = points.size();
        number[s] = new double[n];
        batchOrder[s] = new int[n];
        position[s] = new int[n];
        row[s] = new int[n];
        date[s] = new LocalDate[n];
        for (int i = 0; i < n; i++) {
            number[s][i] = points.number(i);
            batchOrder[s][i] = points.batchOrder(i);
            position[s][i] = points.position(i);
            row[s][i] = points.row(i);
            date[s][i] = points.date(i);
        }
    }

    /** Isolated outliers among the judged results of one series, as flags over all its results. */
    private static boolean[] isolatedOutliers(double[] zs, int[] judgedIndex) {
        double[] zj = new double[judgedIndex.length];
        for (int k = 0; k < zj.length; k++) {
            zj[k] = zs[judgedIndex[k]];
        }
        boolean[] flags = IsolatedOutliers.of(zj);
        boolean[] out = new boolean[zs.length];
        for (int k = 0; k < zj.length; k++) {
            out[judgedIndex[k]] = flags[k];
        }
        return out;
    }

    /**
     * Merges the judged results of every series, each already in time order, by (batch order, position,
     * row): the order R₄s reads batches in and the lab-wide drift runs in.
     */
    private void mergeJudgedInTimeOrder() {
        int total = 0;
        for (int[] j : judged) {
            total += j.length;
        }
        mergedSeries = new int[total];
        mergedIndex = new int[total];
        int[] head = new int[series.size()];
        for (int k = 0; k < total; k++) {
            int best = -1;
            for (int s = 0; s < series.size(); s++) {
                if (head[s] < judged[s].length && (best < 0 || before(s, judged[s][head[s]], best,
                        judged[best][head[best]]))) {
                    best = s;
                }
            }
            mergedSeries[k] = best;
            mergedIndex[k] = judged[best][head[best]++];
        }
    }

    private boolean before(int s, int i, int t, int j) {
        if (batchOrder[s][i] != batchOrder[t][j]) {
            return batchOrder[s][i] < batchOrder[t][j];
        }
        if (position[s][i] != position[t][j]) {
            return position[s][i] < position[t][j];
        }
        return row[s][i] < row[t][j];
    }

    private PointList points(int s) {
        return series.get(s).pointList();
    }

    private void applyRulesWithinSeries() {
        for (int s = 0; s < series.size(); s++) {
            int[] idx = judged[s];
            double[] zj = new double[idx.length];
            int[] batch = new int[idx.length];
            for (int k = 0; k < idx.length; k++) {
                zj[k] = z[s][idx[k]];
                batch[k] = batchOrder[s][idx[k]];
            }
            for (CrmRule rule : RULES) {
                if (rule == CrmRule.W_R_4S || actions.get(rule) == RuleAction.OFF) {
                    continue;
                }
                for (RuleViolation v : RunRules.evaluate(rule, zj, batch)) {
                    int[] ref = new int[v.involved().size()];
                    for (int k = 0; k < ref.length; k++) {
                        ref[k] = idx[v.involved().get(k)];
                    }
                    record(rule, s, idx[v.signal()], new int[] {s}, ref);
                }
            }
        }
    }

    /** R₄s looks across every CRM of the analyte in the same batch. */
    private void applyRangeRuleWithinBatches() {
        if (actions.get(CrmRule.W_R_4S) == RuleAction.OFF) {
            return;
        }
        double[] zs = new double[mergedSeries.length];
        int[] batch = new int[mergedSeries.length];
        for (int k = 0; k < zs.length; k++) {
            zs[k] = z[mergedSeries[k]][mergedIndex[k]];
            batch[k] = batchOrder[mergedSeries[k]][mergedIndex[k]];
        }
        for (RuleViolation v : RunRules.evaluate(CrmRule.W_R_4S, zs, batch)) {
            int[] seriesOf = v.involved().stream().mapToInt(k -> mergedSeries[k]).toArray();
            int[] pointOf = v.involved().stream().mapToInt(k -> mergedIndex[k]).toArray();
            record(CrmRule.W_R_4S, mergedSeries[v.signal()], mergedIndex[v.signal()], seriesOf, pointOf);
        }
    }

    private void record(CrmRule rule, int s, int signal, int[] involvedSeries, int[] involvedPoints) {
        hits[s][signal] |= 1 << rule.ordinal();
        List<String> ids = new ArrayList<>();
        for (int k = 0; k < involvedPoints.length; k++) {
            int sk = involvedSeries.length == 1 ? involvedSeries[0] : involvedSeries[k];
            ids.add(points(sk).sampleId(involvedPoints[k]));
        }
        PointList p = points(s);
        findings.get(s).add(new Found(signal, new RuleFinding(rule.id(), rule.description(),
                rule.source().citation(), actions.get(rule), series.get(s).crm(), series.get(s).analyte().name(),
                p.sampleId(signal), p.batchId(signal), ids)));
    }

    /**
     * The review of series {@code s}: its results as columns ({@link CrmResults#judged}), with the verdict and
     * re-assay flag of each from the rules it completes.
     */
    private SeriesReview review(int s) {
        CrmSeries cs = series.get(s);
        PointList points = cs.pointList();
        CertifiedLimits lim = CertifiedLimits.of(cs.certificate());
        int n = points.size();
        double[] runningMean = new double[n];
        byte[] codes = new byte[n];
        double[] values = new double[judged[s].length];
        double sum = 0;
        int count = 0;
        for (int i = 0; i < n; i++) {
            if (swaps[s] != null && !swaps[s][i].isEmpty()) {
                runningMean[i] = count == 0 ? Double.NaN : sum / count;
                codes[i] = CrmResults.code(Verdict.WARN, false);
            } else {
                values[count] = number[s][i];
                sum += values[count];
                count++;
                runningMean[i] = sum / count;
                codes[i] = code(hits[s][i]);
            }
        }
        BiasEstimate bias = BiasEstimate.of(values, lim.certified(), settings.confidence());
        ProjectLimits pl = ProjectLimits.of(values, settings.projectLimitsMinN());
        // Findings in series order of their signal (stable: the order found breaks ties).
        List<Found> found = new ArrayList<>(findings.get(s));
        found.sort((a, b) -> Integer.compare(a.signal(), b.signal()));
        boolean[] judgedOutlier = new boolean[judged[s].length];
        for (int k = 0; k < judgedOutlier.length; k++) {
            judgedOutlier[k] = outlier[s][judged[s][k]];
        }
        CrmResults results = CrmResults.judged(points, z[s], runningMean, hits[s], codes, swaps[s],
                ResultWording.of(cs, settings));
        int[] mine = judged[s];
        return new SeriesReview(cs.analyte(), cs.certificate(), lim, pl, results, bias,
                DriftAnalysis.of(picked(k -> s, k -> mine[k], mine.length), judgedOutlier, settings),
                found.stream().map(Found::finding).toList());
    }

    /**
     * The verdict and re-assay flag ({@link CrmResults#code}) of a judged result that completed the rules
     * {@code ruleBits}.
     */
    private byte code(int ruleBits) {
        Verdict v = Verdict.PASS;
        boolean reassay = false;
        for (CrmRule r : RULES) {
            if ((ruleBits & 1 << r.ordinal()) != 0) {
                v = v.worst(actions.get(r).verdict());
                reassay |= actions.get(r) == RuleAction.FAIL;
            }
        }
        return CrmResults.code(v, reassay);
    }

    /** The judged results of series {@code seriesOf(k)}, index {@code indexOf(k)}, for {@code k < n}, for the drift. */
    private DriftAnalysis.Results picked(IntUnaryOperator seriesOf,
                                         IntUnaryOperator indexOf, int n) {
        return new DriftAnalysis.Results() {
            @Override
            public int size() {
                return n;
            }

            @Override
            public double z(int k) {
                return z[seriesOf.applyAsInt(k)][indexOf.applyAsInt(k)];
            }

            @Override
            public LocalDate date(int k) {
                return date[seriesOf.applyAsInt(k)][indexOf.applyAsInt(k)];
            }

            @Override
            public String sampleId(int k) {
                return points(seriesOf.applyAsInt(k)).sampleId(indexOf.applyAsInt(k));
            }

            @Override
            public String batchId(int k) {
                return points(seriesOf.applyAsInt(k)).batchId(indexOf.applyAsInt(k));
            }
        };
    }

    /**
     * Drift of every judged result of the analyte, all CRMs together, in time order, leaving out the results that
     * are isolated outliers in their own CRM's series.
     */
    private SeriesDrift labDrift() {
        boolean[] isolated = new boolean[mergedSeries.length];
        for (int k = 0; k < mergedSeries.length; k++) {
            isolated[k] = outlier[mergedSeries[k]][mergedIndex[k]];
        }
        return DriftAnalysis.of(picked(k -> mergedSeries[k], k -> mergedIndex[k], mergedSeries.length), isolated,
                settings);
    }
}
