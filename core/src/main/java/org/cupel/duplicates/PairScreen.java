package org.cupel.duplicates;

import java.util.Arrays;
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
final class PairScreen {
    private static final ExclusionReason[] REASONS = ExclusionReason.values();
    /** Sets from this size on are judged in two halves ({@link #decide(List, DuplicateSettings, SideTask.Starter)}). */
    static final int SPLIT_FROM = 1 << 16;

    private PairScreen() {
    }

    public static ScreenedPairs screen(List<DuplicatePair> pairs, DuplicateSettings settings) {
        return decide(pairs, settings).all();
    }

    /**
     * Judges every pair of a set once; the set's screened pairs and those of any subset (a batch) are then
     * assembled from the decisions without reading the pairs' values again.
     */
    public static Decisions decide(List<DuplicatePair> list, DuplicateSettings settings) {
        return decide(list, settings, SideTask::inPlace);
    }

    /**
     * As {@link #decide(List, DuplicateSettings)}, the second half of a large set judged by a side task
     * ({@code side}): each pair's decision depends on that pair alone and is written to its own index, so the
     * halves give the same decisions on any thread.
     */
    static Decisions decide(List<DuplicatePair> list, DuplicateSettings settings, SideTask.Starter side) {
        PairList pairs = PairList.of(list);
        int n = pairs.size();
        Decisions d = new Decisions(pairs, n);
        if (n < SPLIT_FROM) {
            judge(d, pairs, settings, 0, n);
            return d;
        }
        int half = n / 2;
        SideTask<Boolean> upper = side.start(() -> {
            judge(d, pairs, settings, half, n);
            return true;
        });
        judge(d, pairs, settings, 0, half);
        upper.join();
        return d;
    }

    /** Sets the decisions of pairs {@code from} (inclusive) to {@code to} (exclusive). */
    private static void judge(Decisions d, PairList pairs, DuplicateSettings settings, int from, int to) {
        for (int i = from; i < to; i++) {
            AssayValue original = pairs.original(i);
            AssayValue duplicate = pairs.duplicate(i);
            ExclusionReason hard = unusable(original, duplicate);
            if (hard != null) {
                d.absReason[i] = (byte) hard.ordinal();
                d.relReason[i] = (byte) hard.ordinal();
                continue;
            }
            boolean censored = original.qualifier() == Qualifier.BELOW_DETECTION
                    || duplicate.qualifier() == Qualifier.BELOW_DETECTION;
            if (censored) {
                d.absReason[i] = (byte) ExclusionReason.BELOW_DETECTION.ordinal();
                if (!settings.censoredAtHalfLimit()) {
                    d.relReason[i] = (byte) ExclusionReason.BELOW_DETECTION.ordinal();
                    continue;
                }
            }
            // A pair used in absolute measures has no censored member, so its values there are these too.
            double a = ratioValue(original);
            double b = ratioValue(duplicate);
            d.a[i] = a;
            d.b[i] = b;
            double limit = pairLimit(original, duplicate);
            if (Double.isNaN(limit)) {
                d.flags[i] |= Decisions.LIMIT_UNKNOWN;
            } else if (PairMeasures.mean(a, b) < settings.limitMultipleOfDetection() * limit) {
                d.relReason[i] = (byte) ExclusionReason.BELOW_LIMIT_MULTIPLE.ordinal();
                continue;
            }
            if (censored) {
                d.flags[i] |= Decisions.SUBSTITUTED;
            }
        }
    }

    /**
     * Each pair's screening, index-aligned with the pair list: the reason it is left out of absolute and of
     * relative measures ({@link #USED} when used) and the values it enters them with.
     */
    public static final class Decisions {
        private static final byte USED = -1;
        private static final byte LIMIT_UNKNOWN = 1;
        private static final byte SUBSTITUTED = 2;
        private final PairList pairs;
        private final byte[] absReason;
        private final byte[] relReason;
        private final byte[] flags;
        /** The values a used pair enters its measures with (a below-detection member at half its limit). */
        private final double[] a;
        private final double[] b;

        private Decisions(PairList pairs, int n) {
            this.pairs = pairs;
            absReason = new byte[n];
            relReason = new byte[n];
            Arrays.fill(absReason, USED);
            Arrays.fill(relReason, USED);
            flags = new byte[n];
            a = new double[n];
            b = new double[n];
        }

        /** The screened pairs of the whole set. */
        public ScreenedPairs all() {
            int[] every = new int[pairs.size()];
            for (int i = 0; i < every.length; i++) {
                every[i] = i;
            }
            return of(pairs, every);
        }

        /**
         * The screened pairs of the subset {@code indices} (ascending indices into the set's pairs); rows of
         * the result index the subset's pairs in that order.
         */
        public ScreenedPairs of(int[] indices) {
            return of(pairs.select(indices), indices);
        }

        private ScreenedPairs of(List<DuplicatePair> subset, int[] indices) {
            int n = indices.length;
            int na = 0;
            int nr = 0;
            int both = 0;
            for (int i : indices) {
                na += absReason[i] == USED ? 1 : 0;
                nr += relReason[i] == USED ? 1 : 0;
                both += absReason[i] == USED && relReason[i] == USED ? 1 : 0;
            }
            // Usually every pair of absolute measures is also one of relative measures (no limit known, or all
            // above the multiple): then both are the same pairs with the same values, held once.
            boolean same = na == both && nr == both;
            int[] absRows = new int[na];
            int[] relRows = same ? absRows : new int[nr];
            double[] a1 = new double[na];
            double[] b1 = new double[na];
            double[] a2 = same ? a1 : new double[nr];
            double[] b2 = same ? b1 : new double[nr];
            na = 0;
            nr = 0;
            int limitUnknown = 0;
            int substituted = 0;
            int[] exAbs = new int[REASONS.length];
            int[] exRel = new int[REASONS.length];
            for (int k = 0; k < n; k++) {
                int i = indices[k];
                if (absReason[i] == USED) {
                    absRows[na] = k;
                    a1[na] = a[i];
                    b1[na] = b[i];
                    na++;
                } else {
                    exAbs[absReason[i]]++;
                }
                if (relReason[i] != USED) {
                    exRel[relReason[i]]++;
                    continue;
                }
                if ((flags[i] & LIMIT_UNKNOWN) != 0) {
                    limitUnknown++;
                }
                if ((flags[i] & SUBSTITUTED) != 0) {
                    substituted++;
                }
                relRows[nr] = k;
                a2[nr] = a[i];
                b2[nr] = b[i];
                nr++;
            }
            ScreenedPairs.Members absolute = new ScreenedPairs.Members(absRows, a1, b1, true);
            ScreenedPairs.Members relative = same ? absolute : new ScreenedPairs.Members(relRows, a2, b2, true);
            return new ScreenedPairs(subset, absolute, relative, counts(exAbs), counts(exRel), limitUnknown,
                    substituted);
        }
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
