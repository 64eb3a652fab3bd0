package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.stat.ranking.NaturalRanking;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * The one-walk W+ of {@link PairedTests#positiveRankSum} (kept by hand for speed), over the differences'
 * magnitudes and signs as sorted keys ({@link PairedTests#signedRankKey}), equals the sum of the
 * mid-ranks of the positive differences among all |d| from Commons Math's NaturalRanking (ties AVERAGE), the
 * definition of the Wilcoxon signed-rank statistic (Wilcoxon 1945, Biometrics Bulletin 1). Differences are
 * drawn from a few levels of either sign so that ties, also across signs, are common; zeros are left out as
 * the test does (Wilcoxon's zero handling).
 */
class PositiveRankSumProperties {

    @Test
    void equalsTheSumOfMidRanksOfThePositiveDifferences() {
        Gen<List<Integer>> levels = Gen.ints(-6, 6).list(1, 80);
        SeededTries.forAll(1000, levels, in -> {
            double[] d = in.stream().filter(v -> v != 0).mapToDouble(v -> v * 0.5).toArray();
            double[] abs = Arrays.stream(d).map(Math::abs).toArray();
            double[] ranks = new NaturalRanking().rank(abs);
            double expected = 0;
            for (int i = 0; i < d.length; i++) {
                if (d[i] > 0) {
                    expected += ranks[i];
                }
            }
            long[] keys = new long[d.length];
            for (int i = 0; i < d.length; i++) {
                keys[i] = PairedTests.signedRankKey(abs[i], d[i] > 0);
            }
            long[] sorted = Arrays.stream(keys).boxed().sorted(Long::compareUnsigned).mapToLong(Long::longValue)
                    .toArray();
            assertEquals(expected, PairedTests.positiveRankSum(sorted), 0.0, "exact: mid-ranks are halves");
        });
    }
}
