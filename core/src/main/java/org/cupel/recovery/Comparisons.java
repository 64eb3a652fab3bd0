package org.cupel.recovery;

import java.util.ArrayList;
import java.util.List;

/**
 * Every pair of conditions for one analyte: Welch test and CI (Welch 1947; Satterthwaite 1946), Holm (1979)
 * adjustment over the pairs, Games–Howell (1976) family-wise p and CI, Schuirmann's (1987) TOST within the
 * margin, and the verdict: {@link ComparisonVerdict#EQUIVALENT} when the TOST p &lt; α, else
 * {@link ComparisonVerdict#DIFFERENT} when the Holm-adjusted p &lt; α, else
 * {@link ComparisonVerdict#CANNOT_TELL}, for which the replicates needed are planned by
 * {@link PowerPlanning} from the pooled replicate SD √((s₁² + s₂²)/2).
 */
final class Comparisons {
    private Comparisons() {
    }

    static List<PairComparison> compare(String analyte, List<ConditionRecovery> atLimit, List<ConditionRecovery> atZero,
                                        RecoverySettings settings) {
        List<WelchTest.Result> welch = new ArrayList<>();
        List<WelchTest.Result> welchZero = new ArrayList<>();
        List<int[]> pairs = new ArrayList<>();
        for (int i = 0; i < atLimit.size(); i++) {
            for (int j = i + 1; j < atLimit.size(); j++) {
                pairs.add(new int[] {i, j});
                welch.add(WelchTest.test(atLimit.get(i).replicates(), atLimit.get(j).replicates(),
                        settings.confidence()));
                welchZero.add(WelchTest.test(atZero.get(i).replicates(), atZero.get(j).replicates(),
                        settings.confidence()));
            }
        }
        double[] holm = Holm.adjust(welch.stream().mapToDouble(WelchTest.Result::p).toArray());
        double[] holmZero = Holm.adjust(welchZero.stream().mapToDouble(WelchTest.Result::p).toArray());
        List<PairComparison> out = new ArrayList<>();
        for (int k = 0; k < pairs.size(); k++) {
            ConditionRecovery a = atLimit.get(pairs.get(k)[0]);
            ConditionRecovery b = atLimit.get(pairs.get(k)[1]);
            Tost tost = Tost.test(welch.get(k), settings.equivalenceMargin());
            ComparisonVerdict verdict = verdict(tost, holm[k], settings.alpha());
            ComparisonVerdict zero = verdict(Tost.test(welchZero.get(k), settings.equivalenceMargin()), holmZero[k],
                    settings.alpha());
            double pooledSd = Math.sqrt((a.sd() * a.sd() + b.sd() * b.sd()) / 2);
            PowerPlanning.Plan plan = PowerPlanning.replicatesNeeded(settings.powerDifference(), pooledSd,
                    settings.alpha(), settings.power());
            out.add(new PairComparison(analyte, a.condition(), b.condition(), welch.get(k), holm[k],
                    GamesHowell.of(welch.get(k), atLimit.size()), tost, verdict, zero, plan));
        }
        return out;
    }

    static ComparisonVerdict verdict(Tost tost, double holmP, double alpha) {
        if (tost.equivalent(alpha)) {
            return ComparisonVerdict.EQUIVALENT;
        }
        return holmP < alpha ? ComparisonVerdict.DIFFERENT : ComparisonVerdict.CANNOT_TELL;
    }
}
