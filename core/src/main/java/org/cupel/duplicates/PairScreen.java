package org.cupel.duplicates;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Qualifier;

/**
 * Applies the censoring rules: a pair with a member that is missing, above the upper limit, zero or
 * negative is not used at all; a pair with a below-detection member is not used (or, with
 * {@link DuplicateSettings#censoredAtHalfLimit()}, enters relative measures at half the limit); and a pair
 * whose mean is below {@link DuplicateSettings#limitMultipleOfDetection()} times its detection limit is left
 * out of relative measures, because near the limit relative differences are dominated by the constant part
 * of the error (common practice; see Stanley and Lawie 2008 on precision near detection).
 */
public final class PairScreen {
    private static final ExclusionReason[] REASONS = ExclusionReason.values();

    private PairScreen() {
    }

    public static ScreenedPairs screen(List<DuplicatePair> pairs, DuplicateSettings settings) {
        int n = pairs.size();
        int[] absRows = new int[n];
        int[] relRows = new int[n];
        double[] absA = new double[n];
        double[] absB = new double[n];
        double[] relA = new double[n];
        double[] relB = new double[n];
        int na = 0;
        int nr = 0;
        int limitUnknown = 0;
        int substituted = 0;
        int[] exAbs = new int[REASONS.length];
        int[] exRel = new int[REASONS.length];
        for (int i = 0; i < n; i++) {
            DuplicatePair p = pairs.get(i);
            ExclusionReason hard = unusable(p.original(), p.duplicate());
            if (hard != null) {
                exAbs[hard.ordinal()]++;
                exRel[hard.ordinal()]++;
                continue;
            }
            boolean censored = p.original().qualifier() == Qualifier.BELOW_DETECTION
                    || p.duplicate().qualifier() == Qualifier.BELOW_DETECTION;
            if (censored) {
                exAbs[ExclusionReason.BELOW_DETECTION.ordinal()]++;
                if (!settings.censoredAtHalfLimit()) {
                    exRel[ExclusionReason.BELOW_DETECTION.ordinal()]++;
                    continue;
                }
            } else {
                absRows[na] = i;
                absA[na] = p.original().value();
                absB[na] = p.duplicate().value();
                na++;
            }
            double a = ratioValue(p.original());
            double b = ratioValue(p.duplicate());
            double limit = pairLimit(p.original(), p.duplicate());
            if (Double.isNaN(limit)) {
                limitUnknown++;
            } else if (PairMeasures.mean(a, b) < settings.limitMultipleOfDetection() * limit) {
                exRel[ExclusionReason.BELOW_LIMIT_MULTIPLE.ordinal()]++;
                continue;
            }
            if (censored) {
                substituted++;
            }
            relRows[nr] = i;
            relA[nr] = a;
            relB[nr] = b;
            nr++;
        }
        return new ScreenedPairs(pairs,
                new ScreenedPairs.Members(java.util.Arrays.copyOf(absRows, na), java.util.Arrays.copyOf(absA, na),
                        java.util.Arrays.copyOf(absB, na)),
                new ScreenedPairs.Members(java.util.Arrays.copyOf(relRows, nr), java.util.Arrays.copyOf(relA, nr),
                        java.util.Arrays.copyOf(relB, nr)),
                counts(exAbs), counts(exRel), limitUnknown, substituted);
    }

    /** The reasons with a non-zero count (counted in an array: a map update per pair dominated screening). */
    private static Map<ExclusionReason, Integer> counts(int[] byOrdinal) {
        Map<ExclusionReason, Integer> out = new EnumMap<>(ExclusionReason.class);
        for (ExclusionReason r : REASONS) {
            if (byOrdinal[r.ordinal()] > 0) {
                out.put(r, byOrdinal[r.ordinal()]);
            }
        }
        return out;
    }

    private static ExclusionReason unusable(AssayValue a, AssayValue b) {
        if (a.isMissing() || b.isMissing()) {
            return ExclusionReason.MISSING_VALUE;
        }
        if (a.qualifier() == Qualifier.ABOVE_UPPER_LIMIT || b.qualifier() == Qualifier.ABOVE_UPPER_LIMIT) {
            return ExclusionReason.ABOVE_UPPER_LIMIT;
        }
        if (!(a.value() > 0) || !(b.value() > 0)) {
            return ExclusionReason.NOT_POSITIVE;
        }
        return null;
    }

    private static double ratioValue(AssayValue v) {
        return v.qualifier() == Qualifier.BELOW_DETECTION ? v.value() / 2.0 : v.value();
    }

    /** The larger known detection limit of the two members, NaN when neither states one. */
    private static double pairLimit(AssayValue a, AssayValue b) {
        double la = a.limit();
        double lb = b.limit();
        if (Double.isNaN(la)) {
            return lb;
        }
        return Double.isNaN(lb) ? la : Math.max(la, lb);
    }
}
