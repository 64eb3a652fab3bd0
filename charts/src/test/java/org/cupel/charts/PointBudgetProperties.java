package org.cupel.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/** What a thinned chart may and may not leave out. */
class PointBudgetProperties {

    @Property
    void neverMoreThanTheBudgetAndEveryFlaggedPointWhileTheyFit(@ForAll @IntRange(min = 0, max = 30_000) int n,
            @ForAll @IntRange(min = 2, max = 5000) int budget, @ForAll @IntRange(min = 0, max = 1000) int perMille,
            @ForAll long seed) {
        boolean[] flagged = flags(n, perMille, seed);
        int[] drawn = PointBudget.thinned(flagged, budget);
        assertTrue(drawn.length <= budget, drawn.length + " > " + budget);
        assertEquals(Math.min(n, budget), drawn.length, "the budget is used up when there are enough points");
        for (int i = 1; i < drawn.length; i++) {
            assertTrue(drawn[i - 1] < drawn[i], "ascending, no repeats");
        }
        int flags = PointBudget.count(flagged);
        int flagsDrawn = PointBudget.flaggedAmong(flagged, drawn);
        int others = n - flags;
        int othersDrawn = drawn.length - flagsDrawn;
        if (flags + Math.min(others, budget / 2) <= budget) {
            assertEquals(flags, flagsDrawn, "every flagged point while they leave the others half the budget");
        } else {
            assertEquals(budget - othersDrawn, flagsDrawn, "flagged points thinned into the rest of the budget");
        }
        assertTrue(othersDrawn >= Math.min(others, budget / 2), "the others always get half the budget");
        if (n > 0 && flags < budget - 1 && flags < n) {
            int firstOther = indexOf(flagged, false, true);
            int lastOther = indexOf(flagged, false, false);
            assertTrue(Arrays.binarySearch(drawn, firstOther) >= 0 && Arrays.binarySearch(drawn, lastOther) >= 0,
                    "the first and last unflagged points (the extremes in sorted order) are drawn");
        }
    }

    @Property
    void theSameInputGivesTheSameSelection(@ForAll @IntRange(min = 0, max = 20_000) int n,
            @ForAll @IntRange(min = 0, max = 200) int perMille, @ForAll long seed) {
        boolean[] flagged = flags(n, perMille, seed);
        assertArrayEquals(PointBudget.thinned(flagged, PointBudget.DEFAULT),
                PointBudget.thinned(flagged.clone(), PointBudget.DEFAULT));
    }

    /** Sorted by (x, y) before thinning, the drawn points do not depend on the order the points came in. */
    @Property
    void aPermutationOfThePointsDrawsTheSamePoints(@ForAll @IntRange(min = 0, max = 12_000) int n,
            @ForAll long seed) {
        Random r = new Random(seed);
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            // Coarse values, so that ties in x (and in x and y) occur.
            x[i] = r.nextInt(500) / 10.0;
            y[i] = r.nextInt(50);
        }
        List<Integer> perm = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            perm.add(i);
        }
        Collections.shuffle(perm, r);
        double[] px = new double[n];
        double[] py = new double[n];
        for (int i = 0; i < n; i++) {
            px[i] = x[perm.get(i)];
            py[i] = y[perm.get(i)];
        }
        assertEquals(drawnPoints(x, y), drawnPoints(px, py));
    }

    @Property
    void orderSortsByXThenY(@ForAll @IntRange(min = 0, max = 3000) int n, @ForAll long seed) {
        Random r = new Random(seed);
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = r.nextInt(40);
            y[i] = r.nextGaussian();
        }
        int[] order = PointBudget.orderByXThenY(x, y);
        assertEquals(n, Arrays.stream(order).distinct().count(), "a permutation");
        for (int i = 1; i < n; i++) {
            int c = Double.compare(x[order[i - 1]], x[order[i]]);
            assertTrue(c < 0 || c == 0 && y[order[i - 1]] <= y[order[i]]);
        }
    }

    /** The drawn (x, y, flagged) values in sorted order; flagged = y above 45, a function of the point. */
    private static List<String> drawnPoints(double[] x, double[] y) {
        int[] order = PointBudget.orderByXThenY(x, y);
        boolean[] flagged = new boolean[order.length];
        for (int i = 0; i < order.length; i++) {
            flagged[i] = y[order[i]] > 45;
        }
        List<String> out = new ArrayList<>();
        for (int k : PointBudget.thinned(flagged, 1000)) {
            out.add(x[order[k]] + "," + y[order[k]]);
        }
        return out;
    }

    private static boolean[] flags(int n, int perMille, long seed) {
        Random r = new Random(seed);
        boolean[] f = new boolean[n];
        for (int i = 0; i < n; i++) {
            f[i] = r.nextInt(1000) < perMille;
        }
        return f;
    }

    private static int indexOf(boolean[] a, boolean v, boolean first) {
        int found = -1;
        for (int i = 0; i < a.length; i++) {
            if (a[i] == v) {
                found = i;
                if (first) {
                    return i;
                }
            }
        }
        return found;
    }
}
