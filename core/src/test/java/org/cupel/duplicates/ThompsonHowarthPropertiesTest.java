package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

class ThompsonHowarthPropertiesTest {
    private static final DuplicateSettings SETTINGS = DuplicateSettings.withDefaults().bootstrapResamples(100)
            .bootstrapSeed(5L).build();

    /** Thompson–Howarth sorts pairs by mean, so the order the pairs arrive in must not matter. */
    @Test
    void invariantToPairOrder() {
        SeededTries.forAll(100, Gen.longs(), ThompsonHowarthPropertiesTest::invariantToPairOrder);
    }

    private static void invariantToPairOrder(long seed) {
        Random random = new Random(seed);
        int n = 60 + random.nextInt(80);
        double[] a = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            // Values on a 0.01 grid so that tied means and tied |d| occur.
            double c = Math.round(100 * (0.1 + 5 * random.nextDouble())) / 100.0;
            a[i] = c;
            b[i] = Math.max(0.01, Math.round(100 * (c + 0.1 * c * random.nextGaussian())) / 100.0);
        }
        int[] perm = permutation(n, random);
        double[] pa = new double[n];
        double[] pb = new double[n];
        for (int i = 0; i < n; i++) {
            pa[i] = a[perm[i]];
            pb[i] = b[perm[i]];
        }
        PrecisionModelResult x = ThompsonHowarth.fit(a, b, new double[] {1}, SETTINGS);
        PrecisionModelResult y = ThompsonHowarth.fit(pa, pb, new double[] {1}, SETTINGS);
        assertArrayEquals(x.groups().means(), y.groups().means(), 1e-12);
        assertArrayEquals(x.groups().medianAbsDiff(), y.groups().medianAbsDiff(), 1e-12);
        assertEquals(x.thompsonHowarth().model(), y.thompsonHowarth().model());
        assertEquals(x.rmsRegression().model(), y.rmsRegression().model());
        assertEquals(x.line90().exceedances(), y.line90().exceedances());
    }

    private static int[] permutation(int n, Random random) {
        int[] p = new int[n];
        for (int i = 0; i < n; i++) {
            p[i] = i;
        }
        for (int i = n - 1; i > 0; i--) {
            int j = random.nextInt(i + 1);
            int t = p[i];
            p[i] = p[j];
            p[j] = t;
        }
        return p;
    }
}
