package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * The radix sort of pairs gives the same arrays as the merge sort it replaces from {@link PairGroups#RADIX_FROM}
 * pairs on (the reference here: {@link PairGroups#mergeSort}, a comparison sort by {@link Double#compare} of the
 * first value, then the second), on inputs with many ties of the first value (rounded assays), ties of both,
 * signed zeros, negative values and infinities. Comparison of the arrays is bitwise (signed zeros told apart): a sort only moves values.
 */
class RadixPairSortProperties {

    /** The two arrays to sort together; printed by name when a try fails. */
    record Input(double[] first, double[] second) {
        @Override
        public String toString() {
            return "first=" + Arrays.toString(first) + ", second=" + Arrays.toString(second);
        }
    }

    private static double draw(Random r, int decimals) {
        switch (r.nextInt(8)) {
            case 0: return 0.0;
            case 1: return -0.0;
            case 2: return r.nextBoolean() ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
            case 3: return -Math.round(r.nextDouble() * 1000) / Math.pow(10, decimals);
            default: return Math.round(r.nextDouble() * Math.pow(10, r.nextInt(6))) / Math.pow(10, decimals);
        }
    }

    private static Gen<Input> inputs(int minSize, int maxSize) {
        return r -> {
            int n = minSize + r.nextInt(maxSize - minSize + 1);
            int decimals = r.nextInt(4);
            double[] a = new double[n];
            double[] b = new double[n];
            for (int i = 0; i < n; i++) {
                a[i] = draw(r, decimals);
                b[i] = r.nextInt(4) == 0 ? a[i] : draw(r, decimals);
            }
            return new Input(a, b);
        };
    }

    @Test
    void radixSortGivesTheMergeSortsArrays() {
        Gen<Input> edge = r -> new Input(new double[] {0.0, -0.0, 0.0, -0.0, Double.NaN, 1.0},
                new double[] {-0.0, 0.0, 0.0, -0.0, 2.0, Double.NaN});
        SeededTries.forAll(60, List.of(edge, inputs(0, 1), inputs(1, 2)), inputs(0, 9000), in -> {
            double[] m1 = in.first().clone();
            double[] d1 = in.second().clone();
            double[] m2 = in.first().clone();
            double[] d2 = in.second().clone();
            RadixPairSort.sort(m1, d1);
            PairGroups.mergeSort(m2, d2);
            assertArrayEquals(m2, m1);
            assertArrayEquals(d2, d1);
        });
    }
}
