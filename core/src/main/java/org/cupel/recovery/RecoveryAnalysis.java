package org.cupel.recovery;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Runs the whole recovery analysis on testwork: smelt recoveries, condition means, comparisons, balances. */
public final class RecoveryAnalysis {
    private RecoveryAnalysis() {
    }

    public static RecoveryResult run(Testwork testwork, RecoverySettings settings) {
        RecoveryDefinition definition = settings.recoveryDefinition();
        List<HeadGrade> heads = new ArrayList<>();
        Map<String, HeadGrade> headByKey = new LinkedHashMap<>();
        for (Smelt s : testwork.smelts()) {
            for (String analyte : testwork.analytes()) {
                headByKey.computeIfAbsent(s.feed() + "\u0000" + analyte, k -> {
                    HeadGrade h = HeadGrade.of(s.feed(), analyte, testwork.heads(s.feed(), analyte), settings);
                    heads.add(h);
                    return h;
                });
            }
        }
        List<SmeltRecovery> smelts = new ArrayList<>();
        List<ConditionRecovery> conditions = new ArrayList<>();
        List<ConditionRecovery> atZero = new ArrayList<>();
        List<PairComparison> comparisons = new ArrayList<>();
        List<SmeltBalance> balances = new ArrayList<>();
        List<Deportment> deportment = new ArrayList<>();
        List<Deportment> smeltDeportment = new ArrayList<>();
        for (String analyte : testwork.analytes()) {
            Map<String, List<SmeltRecovery>> limit = new LinkedHashMap<>();
            Map<String, List<SmeltRecovery>> zero = new LinkedHashMap<>();
            for (Smelt s : testwork.smelts()) {
                HeadGrade h = headByKey.get(s.feed() + "\u0000" + analyte);
                SmeltRecovery r = SmeltRecovery.compute(s, analyte, h, CensoredAs.LIMIT, settings.balanceTolerance());
                limit.computeIfAbsent(s.condition(), k -> new ArrayList<>()).add(r);
                zero.computeIfAbsent(s.condition(), k -> new ArrayList<>())
                        .add(SmeltRecovery.compute(s, analyte, h, CensoredAs.ZERO, settings.balanceTolerance()));
                smelts.add(r);
                balances.add(SmeltBalance.of(r, settings));
                if (r.usable()) {
                    smeltDeportment.add(Deportment.ofSmelt(r));
                }
            }
            List<ConditionRecovery> c = new ArrayList<>();
            List<ConditionRecovery> cz = new ArrayList<>();
            for (String condition : limit.keySet()) {
                c.add(ConditionStatistics.summarise(condition, analyte, limit.get(condition), definition,
                        CensoredAs.LIMIT, settings));
                cz.add(ConditionStatistics.summarise(condition, analyte, zero.get(condition), definition,
                        CensoredAs.ZERO, settings));
                deportment.add(Deportment.ofCondition(condition, analyte, limit.get(condition)));
            }
            conditions.addAll(c);
            atZero.addAll(cz);
            comparisons.addAll(Comparisons.compare(analyte, c, cz, settings));
        }
        boolean anyCensored = smelts.stream().anyMatch(SmeltRecovery::lossCensored);
        return new RecoveryResult(settings, testwork.analytes(), heads, smelts, conditions, atZero, comparisons,
                balances, deportment, smeltDeportment, anyCensored, notes(settings, anyCensored, conditions),
                testwork.issues());
    }

    /**
     * Why no condition has a bootstrap interval, with the real smelt counts: n smelts give C(2n − 1, n) distinct
     * resamples (Efron &amp; Tibshirani 1993, §6.4; the count of multisets of size n from n items), far too few
     * for percentile limits with the handful of replicates testwork has.
     */
    public static String bootstrapNote(List<ConditionRecovery> conditions) {
        java.util.TreeSet<Integer> ns = new java.util.TreeSet<>();
        conditions.stream().filter(c -> c.n() > 0).forEach(c -> ns.add(c.n()));
        if (ns.isEmpty()) {
            return "No bootstrap intervals: no condition has a usable smelt.";
        }
        List<String> smelts = new ArrayList<>();
        List<String> resamples = new ArrayList<>();
        for (int n : ns) {
            smelts.add(Integer.toString(n));
            resamples.add(Long.toString(org.apache.commons.math3.util.CombinatoricsUtils.binomialCoefficient(
                    2 * n - 1, n)));
        }
        return "No bootstrap intervals: with " + or(smelts) + " smelts per condition there are only " + or(resamples)
                + " distinct resamples, too few for percentile limits (Efron & Tibshirani 1993); the t, GUM and "
                + "Fieller intervals are given instead.";
    }

    private static String or(List<String> xs) {
        return xs.size() == 1 ? xs.get(0) : String.join(", ", xs.subList(0, xs.size() - 1)) + " or "
                + xs.get(xs.size() - 1);
    }

    private static List<String> notes(RecoverySettings settings, boolean anyCensored,
                                      List<ConditionRecovery> conditions) {
        List<String> notes = new ArrayList<>();
        notes.add("Condition means and comparisons use the recovery " + settings.recoveryDefinition().label() + ".");
        notes.add(bootstrapNote(conditions));
        notes.add("Intervals of means at or above " + settings.nearComplete() + "% are computed on the log of the "
                + "loss, so they cannot pass 100%.");
        if (anyCensored) {
            notes.add("Some loss assays are below detection: they are counted at their detection limit, and each "
                    + "comparison also states its verdict with them counted as zero.");
        }
        return notes;
    }
}
