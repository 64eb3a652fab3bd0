package org.cupel.control.crm;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.cupel.assay.Numbers;
import org.cupel.control.Verdict;
import org.cupel.project.CrmCatalog;
import org.cupel.project.CrmCertificate;

/** Steps (1) to (4) of {@link CrmReview} for the CRM series of one analyte. */
final class AnalyteJudgement {
    private final List<CrmSeries> series;
    private final CrmSettings settings;
    private final Map<CrmRule, RuleAction> actions;
    /** Per series: z of every result. */
    private final List<double[]> z = new ArrayList<>();
    /** Per series: swap label of every result, empty when none. */
    private final List<String[]> swaps = new ArrayList<>();
    /** Per series: indices of the judged (non-swap) results. */
    private final List<int[]> judged = new ArrayList<>();
    /** Per series and result: the rules whose pattern the result completes. */
    private final List<List<List<CrmRule>>> hits = new ArrayList<>();
    private final List<List<RuleFinding>> findings = new ArrayList<>();

    private AnalyteJudgement(List<CrmSeries> series, CrmSettings settings) {
        this.series = series;
        this.settings = settings;
        this.actions = settings.actions();
    }

    static List<SeriesReview> judge(List<CrmSeries> series, CrmCatalog catalog, CrmSettings settings) {
        AnalyteJudgement j = new AnalyteJudgement(series, settings);
        j.scoreAndFindSwaps(catalog);
        j.applyRulesWithinSeries();
        j.applyRangeRuleWithinBatches();
        List<SeriesReview> out = new ArrayList<>();
        for (int s = 0; s < series.size(); s++) {
            out.add(j.review(s));
        }
        return out;
    }

    private void scoreAndFindSwaps(CrmCatalog catalog) {
        for (CrmSeries s : series) {
            CertifiedLimits lim = CertifiedLimits.of(s.certificate());
            List<CrmCertificate> others = catalog.forAnalyte(s.analyte().name()).stream()
                    .map(c -> c.unit() == s.certificate().unit() ? c : c.in(s.certificate().unit())).toList();
            int n = s.points().size();
            double[] zs = new double[n];
            String[] sw = new String[n];
            List<Integer> keep = new ArrayList<>();
            List<List<CrmRule>> h = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                CrmPoint p = s.points().get(i);
                zs[i] = lim.z(p.value().value());
                Optional<String> m = Math.abs(zs[i]) > 3
                        ? SwapCheck.match(p.value(), s.certificate(), others, settings.swapWithinSd(),
                        settings.blankLevelMultiple())
                        : Optional.empty();
                sw[i] = m.orElse("");
                if (m.isEmpty()) {
                    keep.add(i);
                }
                h.add(new ArrayList<>());
            }
            z.add(zs);
            swaps.add(sw);
            judged.add(keep.stream().mapToInt(Integer::intValue).toArray());
            hits.add(h);
            findings.add(new ArrayList<>());
        }
    }

    private void applyRulesWithinSeries() {
        for (int s = 0; s < series.size(); s++) {
            int[] idx = judged.get(s);
            double[] zj = new double[idx.length];
            int[] batch = new int[idx.length];
            for (int k = 0; k < idx.length; k++) {
                zj[k] = z.get(s)[idx[k]];
                batch[k] = series.get(s).points().get(idx[k]).batchOrder();
            }
            for (CrmRule rule : CrmRule.values()) {
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
        List<int[]> all = new ArrayList<>();
        for (int s = 0; s < series.size(); s++) {
            for (int i : judged.get(s)) {
                all.add(new int[] {s, i});
            }
        }
        all.sort(Comparator.comparingInt((int[] a) -> point(a).batchOrder())
                .thenComparingInt(a -> point(a).position()).thenComparingInt(a -> point(a).row()));
        double[] zs = new double[all.size()];
        int[] batch = new int[all.size()];
        for (int k = 0; k < zs.length; k++) {
            zs[k] = z.get(all.get(k)[0])[all.get(k)[1]];
            batch[k] = point(all.get(k)).batchOrder();
        }
        for (RuleViolation v : RunRules.evaluate(CrmRule.W_R_4S, zs, batch)) {
            int[] sig = all.get(v.signal());
            int[] seriesOf = v.involved().stream().mapToInt(k -> all.get(k)[0]).toArray();
            int[] pointOf = v.involved().stream().mapToInt(k -> all.get(k)[1]).toArray();
            record(CrmRule.W_R_4S, sig[0], sig[1], seriesOf, pointOf);
        }
    }

    private CrmPoint point(int[] seriesAndIndex) {
        return series.get(seriesAndIndex[0]).points().get(seriesAndIndex[1]);
    }

    private void record(CrmRule rule, int s, int signal, int[] involvedSeries, int[] involvedPoints) {
        hits.get(s).get(signal).add(rule);
        List<String> ids = new ArrayList<>();
        for (int k = 0; k < involvedPoints.length; k++) {
            int sk = involvedSeries.length == 1 ? involvedSeries[0] : involvedSeries[k];
            ids.add(series.get(sk).points().get(involvedPoints[k]).sampleId());
        }
        CrmPoint p = series.get(s).points().get(signal);
        findings.get(s).add(new RuleFinding(rule.id(), rule.description(), rule.source().citation(),
                actions.get(rule), series.get(s).crm(), series.get(s).analyte().name(), p.sampleId(), p.batchId(),
                ids));
    }

    private SeriesReview review(int s) {
        CrmSeries cs = series.get(s);
        CertifiedLimits lim = CertifiedLimits.of(cs.certificate());
        List<CrmResult> results = new ArrayList<>();
        List<CrmResult> judgedResults = new ArrayList<>();
        double sum = 0;
        int count = 0;
        for (int i = 0; i < cs.points().size(); i++) {
            CrmPoint p = cs.points().get(i);
            double zi = z.get(s)[i];
            String swap = swaps.get(s)[i];
            CrmResult r;
            if (!swap.isEmpty()) {
                r = new CrmResult(p, zi, ZBand.of(zi), count == 0 ? Double.NaN : sum / count, Verdict.WARN,
                        List.of(CrmReview.SWAP_RULE), swapReason(cs, p, zi, swap), false, swap);
            } else {
                sum += p.value().value();
                count++;
                r = judgedResult(cs, p, zi, sum / count, hits.get(s).get(i));
                judgedResults.add(r);
            }
            results.add(r);
        }
        double[] values = judgedResults.stream().mapToDouble(r -> r.point().value().value()).toArray();
        BiasEstimate bias = BiasEstimate.of(values, lim.certified(), settings.confidence());
        ProjectLimits pl = ProjectLimits.of(values, settings.projectLimitsMinN());
        Map<String, Integer> order = new java.util.HashMap<>();
        for (int i = 0; i < cs.points().size(); i++) {
            order.put(cs.points().get(i).sampleId(), i);
        }
        List<RuleFinding> f = new ArrayList<>(findings.get(s));
        f.sort(Comparator.comparingInt(x -> order.getOrDefault(x.sampleId(), Integer.MAX_VALUE)));
        return new SeriesReview(cs.analyte(), cs.certificate(), lim, pl, results, bias,
                DriftAnalysis.of(judgedResults, settings), f);
    }

    private CrmResult judgedResult(CrmSeries cs, CrmPoint p, double zi, double runningMean, List<CrmRule> rules) {
        Verdict v = Verdict.PASS;
        boolean reassay = false;
        EnumMap<CrmRule, Boolean> seen = new EnumMap<>(CrmRule.class);
        List<String> ids = new ArrayList<>();
        for (CrmRule r : rules) {
            if (seen.put(r, true) == null) {
                ids.add(r.id());
                v = v.worst(actions.get(r).verdict());
                reassay |= actions.get(r) == RuleAction.FAIL;
            }
        }
        String reason = describe(cs, p, zi) + (ids.isEmpty() ? "" : " (" + String.join(", ", ids) + ")");
        return new CrmResult(p, zi, ZBand.of(zi), runningMean, v, ids.isEmpty() ? List.of("no rule violated") : ids,
                reason, reassay, "");
    }

    private static String describe(CrmSeries cs, CrmPoint p, double zi) {
        // Concatenation rather than String.format: this runs once per CRM result.
        return p.sampleId() + ' ' + cs.crm() + ' ' + cs.analyte().name() + ' ' + p.value().display() + ' '
                + cs.analyte().unit().symbol() + " is " + Numbers.significant(Math.abs(zi), 2) + " SD "
                + (zi >= 0 ? "above" : "below") + " certified " + Numbers.significant(cs.certificate().certifiedValue(), 4);
    }

    private String swapReason(CrmSeries cs, CrmPoint p, double zi, String swap) {
        String match = swap.equals(SwapCheck.BLANK) ? "is at blank level (≤ " + Numbers.compact(
                settings.blankLevelMultiple()) + "× its detection limit)"
                : "lies within " + Numbers.compact(settings.swapWithinSd()) + " SD of CRM " + swap;
        return describe(cs, p, zi) + " but " + match + ": probable swap or mislabel, not a lab failure; check the "
                + "insertion record";
    }
}
