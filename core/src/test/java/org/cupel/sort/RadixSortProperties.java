package org.cupel.sort;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import java.util.stream.IntStream;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * The radix sort against comparison sorts of the JDK (the reference): {@link Arrays#sort(Object[], Comparator)}
 * of boxed indices, a stable merge sort (its Javadoc: "This sort is guaranteed to be stable"), and a boxed sort
 * by {@link Long#compareUnsigned}; on inputs with many ties (rounded assays), ties of both values, signed zeros,
 * NaNs, infinities and negative values.
 */
class RadixSortProperties {

    /** Two parallel arrays; printed by name when a try fails. */
    record Input(double[] first, double[] second) {
        @Override
        public String toString() {
            return "first=" + Arrays.toString(first) + ", second=" + Arrays.toString(second);
        }
    }

    private static double draw(Random r, int decimals) {
        switch (r.nextInt(9)) {
            case 0: return 0.0;
            case 1: return -0.0;
            case 2: return r.nextBoolean() ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
            case 3: return -Math.round(r.nextDouble() * 1000) / Math.pow(10, decimals);
            // A NaN of another bit pattern than Double.NaN: Double.compare holds every NaN equal.
            case 4: return r.nextBoolean() ? Double.NaN : Double.longBitsToDouble(0x7ff0000000000001L + r.nextInt(99));
            default: return Math.round(r.nextDouble() * Math.pow(10, r.nextInt(6))) / Math.pow(10, decimals);
        }
    }

    /**
     * From {@code minSize} to {@code maxSize} points; the first values sometimes from few distinct values, so that
     * runs of ties longer than the insertion sort's are common.
     */
    private static Gen<Input> inputs(int minSize, int maxSize) {
        return r -> {
            int n = minSize + r.nextInt(maxSize - minSize + 1);
            int decimals = r.nextInt(4);
            boolean fewDistinct = r.nextBoolean();
            double[] a = new double[n];
            double[] b = new double[n];
            for (int i = 0; i < n; i++) {
                a[i] = fewDistinct ? r.nextInt(5) - 2 : draw(r, decimals);
                b[i] = r.nextInt(4) == 0 ? a[i] : draw(r, decimals);
            }
            return new Input(a, b);
        };
    }

    private static final List<Gen<Input>> EDGES = List.of(
            r -> new Input(new double[] {0.0, -0.0, 0.0, -0.0, Double.NaN, 1.0, Double.NaN},
                    new double[] {-0.0, 0.0, 0.0, -0.0, 2.0, Double.NaN, 2.0}),
            r -> new Input(new double[0], new double[0]),
            r -> new Input(new double[] {Double.NaN}, new double[] {-0.0}),
            // One run of 100 equal first values (longer than the insertion sort's) with ties in the second.
            r -> new Input(new double[100], IntStream.range(0, 100).mapToDouble(i -> (i * 7) % 10 - 5).toArray()),
            // Runs long enough to be ordered by radix (5,000 and 4,096 equal first values), the second values drawn.
            r -> new Input(new double[5000], inputs(5000, 5000).next(r).second()),
            r -> {
                Input in = inputs(4096 + 300, 4096 + 300).next(r);
                Arrays.fill(in.first(), 0, 4096, -0.0);
                return in;
            });

    @Test
    void orderIsThePermutationOfAStableComparisonSort() {
        SeededTries.forAll(200, EDGES, inputs(0, 6000), in -> {
            double[] x = in.first();
            double[] y = in.second();
            Integer[] boxed = IntStream.range(0, x.length).boxed().toArray(Integer[]::new);
            Arrays.sort(boxed, Comparator.<Integer>comparingDouble(i -> x[i]).thenComparingDouble(i -> y[i]));
            assertArrayEquals(Arrays.stream(boxed).mapToInt(Integer::intValue).toArray(), RadixSort.order(x, y));
        });
    }

    /**
     * Equal keys keep their payloads' order: the payload is each key's index (as an int, then as a double),
     * checked against a stable sort.
     */
    @Test
    void sortingKeysWithAPayloadIsStable() {
        SeededTries.forAll(200, EDGES, inputs(0, 6000), in -> {
            long[] keys = Arrays.stream(in.first()).mapToLong(v -> RadixSort.sortable(v) >>> 40).toArray();
            Integer[] boxed = IntStream.range(0, keys.length).boxed().toArray(Integer[]::new);
            Arrays.sort(boxed, (i, j) -> Long.compareUnsigned(keys[i], keys[j]));
            int[] payload = IntStream.range(0, keys.length).toArray();
            long[] sorted = keys.clone();
            RadixSort.sortUnsigned(sorted, payload);
            assertArrayEquals(Arrays.stream(boxed).mapToInt(Integer::intValue).toArray(), payload);
            assertArrayEquals(Arrays.stream(boxed).mapToLong(i -> keys[i]).toArray(), sorted);
            // The same with values as the payload: each key's index as a double.
            double[] values = IntStream.range(0, keys.length).asDoubleStream().toArray();
            long[] sortedToo = keys.clone();
            RadixSort.sortUnsigned(sortedToo, values);
            assertArrayEquals(Arrays.stream(boxed).mapToDouble(Integer::doubleValue).toArray(), values);
            assertArrayEquals(sorted, sortedToo);
        });
    }

    /**
     * Keys sorted by radix are in ascending unsigned order: the keys of the drawn doubles (sortable, and shifted
     * by one with a sign bit as the Wilcoxon test makes them) and raw random longs, against a boxed sort by
     * {@link Long#compareUnsigned}.
     */
    @Test
    void radixSortOfKeysGivesTheUnsignedOrder() {
        SeededTries.forAll(60, List.of(inputs(0, 1), inputs(1, 2)), inputs(0, 9000), in -> {
            Random r = new Random(in.first().length);
            long[] keys = new long[in.first().length];
            for (int i = 0; i < keys.length; i++) {
                long sortable = RadixSort.sortable(in.first()[i]);
                keys[i] = switch (i % 3) {
                    case 0 -> sortable;
                    case 1 -> (sortable << 1) | (r.nextBoolean() ? 1 : 0);
                    default -> r.nextLong();
                };
            }
            long[] reference = Arrays.stream(keys).boxed().sorted(Long::compareUnsigned).mapToLong(Long::longValue)
                    .toArray();
            RadixSort.sortUnsigned(keys);
            assertArrayEquals(reference, keys);
        });
    }

    @Test
    void sortableKeysKeepTheOrderOfDoubleCompareAndInvert() {
        SeededTries.forAll(200, inputs(2, 2), in -> {
            double x = in.first()[0];
            double y = in.first()[1];
            long kx = RadixSort.sortable(x);
            long ky = RadixSort.sortable(y);
            assertArrayEquals(new int[] {Integer.signum(Double.compare(x, y))},
                    new int[] {Integer.signum(Long.compareUnsigned(kx, ky))});
            // A NaN comes back as the canonical NaN, which Double.compare holds equal to any NaN.
            assertArrayEquals(new double[] {x}, new double[] {RadixSort.unsortable(kx)});
        });
    }
}
