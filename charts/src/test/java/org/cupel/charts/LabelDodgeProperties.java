package org.cupel.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/** Labels moved apart along an axis: never overlapping, in order, inside the span, and no further than needed. */
class LabelDodgeProperties {
    private static final double EPS = 1e-9;

    /** Labels' wanted centres and sizes, the gap kept between them and the span they must stay in. */
    record Labels(double[] wanted, double[] sizes, double gap, double min, double max) {
        @Override
        public String toString() {
            return "wanted " + Arrays.toString(wanted) + ", sizes " + Arrays.toString(sizes) + ", gap " + gap
                    + ", span " + min + " to " + max;
        }
    }

    private static Labels draw(java.util.Random r, int n, double span) {
        double[] wanted = new double[n];
        double[] sizes = new double[n];
        for (int i = 0; i < n; i++) {
            // Clustered positions, as the thin parts at the top of bars are.
            wanted[i] = r.nextBoolean() ? span * r.nextDouble() : span * (0.9 + 0.1 * r.nextDouble());
            sizes[i] = 4 + 12 * r.nextDouble();
        }
        return new Labels(wanted, sizes, 2 * r.nextDouble(), 0, span);
    }

    @Test
    void labelsNeverOverlapKeepTheirOrderAndStayInTheSpan() {
        Gen<Labels> any = r -> draw(r, r.nextInt(12), 100 + 400 * r.nextDouble());
        // None, one, two on the same spot, many crowded at one end.
        List<Gen<Labels>> edges = List.of(r -> draw(r, 0, 100), r -> draw(r, 1, 100),
                r -> new Labels(new double[] {50, 50}, new double[] {10, 10}, 2, 0, 100),
                r -> new Labels(new double[] {99, 99.5, 100, 100, 98}, new double[] {12, 12, 12, 12, 12}, 1, 0, 100),
                r -> new Labels(new double[] {0, 0, 1}, new double[] {12, 12, 12}, 1, 0, 100));
        SeededTries.forAll(500, edges, any, in -> {
            double[] at = LabelDodge.place(in.wanted(), in.sizes(), in.gap(), in.min(), in.max());
            Integer[] order = byWanted(in.wanted());
            double need = Arrays.stream(in.sizes()).sum() + Math.max(0, in.sizes().length - 1) * in.gap();
            for (int k = 1; k < order.length; k++) {
                int p = order[k - 1];
                int q = order[k];
                assertTrue(at[p] + in.sizes()[p] / 2 + in.gap() <= at[q] - in.sizes()[q] / 2 + EPS,
                        "labels " + p + " and " + q + " overlap: " + Arrays.toString(at));
            }
            if (need <= in.max() - in.min()) {
                for (int i = 0; i < at.length; i++) {
                    assertTrue(at[i] - in.sizes()[i] / 2 >= in.min() - EPS
                            && at[i] + in.sizes()[i] / 2 <= in.max() + EPS, "label " + i + " outside the span");
                }
            }
        });
    }

    @Test
    void labelsThatDoNotTouchStayWhereTheyBelong() {
        SeededTries.forAll(300, r -> {
            int n = r.nextInt(8);
            double[] wanted = new double[n];
            double[] sizes = new double[n];
            double at = 10;
            for (int i = 0; i < n; i++) {
                sizes[i] = 4 + 8 * r.nextDouble();
                at += sizes[i] / 2;
                wanted[i] = at;
                at += sizes[i] / 2 + 2 + 20 * r.nextDouble();
            }
            return new Labels(wanted, sizes, 2, 0, at + 10);
        }, in -> assertArrayEquals(in.wanted(), LabelDodge.place(in.wanted(), in.sizes(), in.gap(), in.min(),
                in.max()), EPS));
    }

    /**
     * Hand-worked: two labels 10 high wanted at 50 and 52 with a gap of 2 must be 12 apart; the least squares
     * placement splits the 10 they lack evenly, 45 and 57 (mean 51, as wanted). A lone label wanted at 2 in
     * [0, 100] is pushed in to 5, its half size; three 10 high wanted at 100 with gap 3 take 36 and end at the top:
     * starts 64, 77, 90, centres 69, 82, 95 (ties keep their order).
     */
    @Test
    void overlapsAreSplitEvenlyAndTheSpanIsKept() {
        assertArrayEquals(new double[] {45, 57}, LabelDodge.place(new double[] {50, 52}, new double[] {10, 10}, 2, 0,
                100), EPS);
        assertArrayEquals(new double[] {57, 45}, LabelDodge.place(new double[] {52, 50}, new double[] {10, 10}, 2, 0,
                100), EPS);
        assertArrayEquals(new double[] {5}, LabelDodge.place(new double[] {2}, new double[] {10}, 2, 0, 100), EPS);
        assertArrayEquals(new double[] {69, 82, 95}, LabelDodge.place(new double[] {100, 100, 100},
                new double[] {10, 10, 10}, 3, 0, 100), EPS);
        assertEquals(0, LabelDodge.place(new double[0], new double[0], 2, 0, 100).length);
    }

    private static Integer[] byWanted(double[] wanted) {
        Integer[] order = new Integer[wanted.length];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        Arrays.sort(order, (p, q) -> Double.compare(wanted[p], wanted[q]));
        return order;
    }
}
