package org.cupel.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/** What a thinned chart may and may not leave out. */
class PointBudgetProperties {

    /** n points, a point budget, the share of flagged points in thousandths and a seed that flags them. */
    record Flags(int n, int budget, int perMille, long seed) {
    }

    @Test
    void neverMoreThanTheBudgetAndEveryFlaggedPointWhileTheyFit() {
        Gen<Integer> n = Gen.ints(0, 30_000);
        Gen<Integer> budget = Gen.ints(2, 5000);
        Gen<Integer> perMille = Gen.ints(0, 1000);
        // No points, one, and the most; the smallest and largest budgets; no flags and all flagged.
        List<Gen<Flags>> edges = new ArrayList<>();
        for (int size : new int[] {0, 1, 30_000}) {
            for (int b : new int[] {2, 5000}) {
                for (int f : new int[] {0, 1000}) {
                    edges.add(r -> new Flags(size, b, f, r.nextLong()));
                }
            }
        }
        SeededTries.forAll(1000, edges, r -> new Flags(n.next(r), budget.next(r), perMille.next(r), r.nextLong()),
                in -> neverMoreThanTheBudgetAndEveryFlaggedPointWhileTheyFit(in.n(), in.budget(), in.perMille(),
                        in.seed()));
    }

    private static void neverMoreThanTheBudgetAndEveryFlaggedPointWhileTheyFit(int n, int budget, int perMille,
                                                                               long seed) {
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

    @Test
    void theSameInputGivesTheSameSelection() {
        Gen<Integer> n = Gen.ints(0, 20_000);
        Gen<Integer> perMille = Gen.ints(0, 200);
        List<Gen<Flags>> edges = List.of(r -> new Flags(0, PointBudget.DEFAULT, 0, r.nextLong()),
                r -> new Flags(20_000, PointBudget.DEFAULT, 0, r.nextLong()),
                r -> new Flags(20_000, PointBudget.DEFAULT, 200, r.nextLong()));
        SeededTries.forAll(1000, edges, r -> new Flags(n.next(r), PointBudget.DEFAULT, perMille.next(r), r.nextLong()),
                in -> {
                    boolean[] flagged = flags(in.n(), in.perMille(), in.seed());
                    assertArrayEquals(PointBudget.thinned(flagged, PointBudget.DEFAULT),
                            PointBudget.thinned(flagged.clone(), PointBudget.DEFAULT));
                });
    }

    /** How many points and a seed for their values. */
    record Points(int n, long seed) {
    }

    private static Gen<Points> points(int max) {
        Gen<Integer> n = Gen.ints(0, max);
        return r -> new Points(n.next(r), r.nextLong());
    }

    /** No point, one point, and the most points. */
    private static List<Gen<Points>> pointEdges(int max) {
        return List.of(r -> new Points(0, r.nextLong()), r -> new Points(1, r.nextLong()),
                r -> new Points(max, r.nextLong()));
    }

    /** Sorted by (x, y) before thinning, the drawn points do not depend on the order the points came in. */
    @Test
    void aPermutationOfThePointsDrawsTheSamePoints() {
        SeededTries.forAll(1000, pointEdges(12_000), points(12_000), in -> {
            int n = in.n();
            Random r = new Random(in.seed());
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
        });
    }

    @Test
    void orderSortsByXThenY() {
        SeededTries.forAll(1000, pointEdges(3000), points(3000), in -> {
            int n = in.n();
            Random r = new Random(in.seed());
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
        });
    }

    /**
     * The order is exactly that of a stable comparison sort by x, then y ({@link Arrays#sort(Object[],
     * java.util.Comparator)} of boxed indices, stable by its Javadoc), the merge sort this order was before:
     * with ties in x and in both, signed zeros, NaNs and infinities, on up to 20,000 points (runs of equal x
     * far longer than the sort's insertion runs).
     */
    @Test
    void orderIsThatOfAStableSortByXThenY() {
        double[] odd = {0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 1.5, -1.5};
        SeededTries.forAll(300, pointEdges(20_000), points(20_000), in -> {
            int n = in.n();
            Random r = new Random(in.seed());
            int distinct = 1 + r.nextInt(200);
            double[] x = new double[n];
            double[] y = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = r.nextInt(10) == 0 ? odd[r.nextInt(odd.length)] : r.nextInt(distinct) / 4.0;
                y[i] = r.nextInt(10) == 0 ? odd[r.nextInt(odd.length)] : r.nextInt(3) == 0 ? x[i] : r.nextGaussian();
            }
            Integer[] boxed = new Integer[n];
            for (int i = 0; i < n; i++) {
                boxed[i] = i;
            }
            Arrays.sort(boxed, (p, q) -> {
                int c = Double.compare(x[p], x[q]);
                return c != 0 ? c : Double.compare(y[p], y[q]);
            });
            assertArrayEquals(Arrays.stream(boxed).mapToInt(Integer::intValue).toArray(),
                    PointBudget.orderByXThenY(x, y));
        });
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
