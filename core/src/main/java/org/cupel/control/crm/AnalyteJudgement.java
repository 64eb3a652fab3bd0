package org.cupel.control.crm;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
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
    private static final List<String> SWAP = List.of(CrmReview.SWAP_RULE);
    private static final CrmRule[] RULES = CrmRule.values();

    private final List<CrmSeries> series;
    private final CrmSettings settings;
    private final Map<CrmRule, RuleAction> actions;
    /** Per series: z of every result. */
    private final double[][] z;
    /** Per series: swap label of every result, empty when none. */
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
        List<List<CrmResult>> results = new ArrayList<>();
        for (int s = 0; s < series.size(); s++) {
            SeriesReview r = j.review(s);
            out.add(r);
            results.add(r.results());
        }
        return new Judged(out, j.labDrift(results));
    }

    private void scoreAndFindSwaps(CrmCatalog catalog) {
        for (int s = 0; s < series.size(); s++) {
            CrmSeries cs = series.get(s);
            CertifiedLimits lim = CertifiedLimits.of(cs.certificate());
            List<CrmCertificate> others = catalog.forAnalyte(cs.analyte().name()).stream()
                    .map(c -> c.unit() == cs.certificate().unit() ? c : c.in(cs.certificate().unit())).toList();
            int n = cs.points().size();
            double[] zs = new double[n];
            String[] sw = new String[n];
            int[] keep = new int[n];
            int kept = 0;
            for (int i = 0; i < n; i++) {
                CrmPoint p = cs.points().get(i);
                zs[i] = lim.z(p.value().value());
                Optional<String> m = LimitComparison.beyond(zs[i], 3)
                        ? SwapCheck.match(p.value(), cs.certificate(), others, settings.swapWithinSd(),
                        settings.blankLevelMultiple())
                        : Optional.empty();
                sw[i] = m.orElse("");
                if (m.isEmpty()) {
                    keep[kept++] = i;
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
        CrmPoint a = series.get(s).points().get(i);
        CrmPoint b = series.get(t).points().get(j);
        if (a.batchOrder() != b.batchOrder()) {
            return a.batchOrder() < b.batchOrder();
        }
        if (a.position() != b.position()) {
            return a.position() < b.position();
        }
        return a.row() < b.row();
    }

    private void applyRulesWithinSeries() {
        for (int s = 0; s < series.size(); s++) {
            int[] idx = judged[s];
            double[] zj = new double[idx.length];
            int[] batch = new int[idx.length];
            for (int k = 0; k < idx.length; k++) {
                zj[k] = z[s][idx[k]];
                batch[k] = series.get(s).points().get(idx[k]).batchOrder();
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
            batch[k] = series.get(mergedSeries[k]).points().get(mergedIndex[k]).batchOrder();
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
            ids.add(series.get(sk).points().get(involvedPoints[k]).sampleId());
        }
        CrmPoint p = series.get(s).points().get(signal);
        findings.get(s).add(new Found(signal, new RuleFinding(rule.id(), rule.description(),
                rule.source().citation(), actions.get(rule), series.get(s).crm(), series.get(s).analyte().name(),
                p.sampleId(), p.batchId(), ids)));
    }

    private SeriesReview review(int s) {
        CrmSeries cs = series.get(s);
        CertifiedLimits lim = CertifiedLimits.of(cs.certificate());
        ResultWording wording = ResultWording.of(cs, settings);
        int n = cs.points().size();
        List<CrmResult> results = new ArrayList<>(n);
        List<CrmResult> judgedResults = new ArrayList<>(judged[s].length);
        double[] values = new double[judged[s].length];
        double sum = 0;
        int count = 0;
        for (int i = 0; i < n; i++) {
            CrmPoint p = cs.points().get(i);
            double zi = z[s][i];
            String swap = swaps[s][i];
            CrmResult r;
            if (!swap.isEmpty()) {
                r = new CrmResult(p, zi, ZBand.of(zi), count == 0 ? Double.NaN : sum / count, Verdict.WARN, SWAP,
                        false, swap, wording);
            } else {
                values[count] = p.value().value();
                sum += p.value().value();
                count++;
                r = judgedResult(p, zi, sum / count, hits[s][i], wording);
                judgedResults.add(r);
            }
            results.add(r);
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
        return new SeriesReview(cs.analyte(), cs.certificate(), lim, pl, results, bias,
                DriftAnalysis.of(judgedResults, judgedOutlier, settings), found.stream().map(Found::finding).toList());
    }

    /**
     * The verdict from the rules the result completes, listed in the order they were found: the
     * within-series rules in {@link CrmRule} order, then R₄s.
     */
    private CrmResult judgedResult(CrmPoint p, double zi, double runningMean, int ruleBits, ResultWording wording) {
        if (ruleBits == 0) {
            return new CrmResult(p, zi, ZBand.of(zi), runningMean, Verdict.PASS, NO_RULE, false, "", wording);
        }
        Verdict v = Verdict.PASS;
        boolean reassay = false;
        List<String> ids = new ArrayList<>();
        for (CrmRule r : RULES) {
            if (r != CrmRule.W_R_4S && (ruleBits & 1 << r.ordinal()) != 0) {
                ids.add(r.id());
                v = v.worst(actions.get(r).verdict());
                reassay |= actions.get(r) == RuleAction.FAIL;
            }
        }
        if ((ruleBits & 1 << CrmRule.W_R_4S.ordinal()) != 0) {
            ids.add(CrmRule.W_R_4S.id());
            v = v.worst(actions.get(CrmRule.W_R_4S).verdict());
            reassay |= actions.get(CrmRule.W_R_4S) == RuleAction.FAIL;
        }
        return new CrmResult(p, zi, ZBand.of(zi), runningMean, v, ids, reassay, "", wording);
    }

    /**
     * Drift of every judged result of the analyte, all CRMs together, in time order, leaving out the results that
     * are isolated outliers in their own CRM's series.
     */
    private SeriesDrift labDrift(List<List<CrmResult>> results) {
        List<CrmResult> all = new ArrayList<>(mergedSeries.length);
        boolean[] isolated = new boolean[mergedSeries.length];
        for (int k = 0; k < mergedSeries.length; k++) {
            all.add(results.get(mergedSeries[k]).get(mergedIndex[k]));
            isolated[k] = outlier[mergedSeries[k]][mergedIndex[k]];
        }
        return DriftAnalysis.of(all, isolated, settings);
    }
}
