package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.apache.commons.math3.stat.correlation.PearsonsCorrelation;
import org.apache.commons.math3.stat.correlation.SpearmansCorrelation;
import org.apache.commons.math3.stat.ranking.NaturalRanking;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * {@link CarryOver#averageRanks} gives exactly the ranks of Commons Math's NaturalRanking (ties averaged),
 * so Spearman's ρ from them is bit for bit the one SpearmansCorrelation gives. Values are drawn from a few
 * levels so that ties are common.
 */
class AverageRankProperties {
    /** Levels a in [-4, 8] (x = a/4) and b in [0, 30] (y = b/10, with b = 0 read as −0.0), 3 to 60 of each. */
    record Levels(List<Integer> a, List<Integer> b) {
    }

    @Test
    void ranksAndRhoMatchCommonsMath() {
        // All tied (ρ undefined on both sides), at either end of the levels.
        List<Gen<Levels>> allTied = List.of(Gen.constant(new Levels(List.of(-4, -4, -4), List.of(0, 0, 0))),
                Gen.constant(new Levels(List.of(8, 8, 8), List.of(30, 30, 30))));
        Gen<List<Integer>> a = Gen.ints(-4, 8).list(3, 60);
        Gen<List<Integer>> b = Gen.ints(0, 30).list(3, 60);
        SeededTries.forAll(500, allTied, r -> new Levels(a.next(r), b.next(r)), in -> {
            int n = Math.min(in.a().size(), in.b().size());
            double[] x = new double[n];
            double[] y = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = in.a().get(i) * 0.25;
                y[i] = in.b().get(i) == 0 ? -0.0 : in.b().get(i) * 0.1;
            }
            assertArrayEquals(new NaturalRanking().rank(x), CarryOver.averageRanks(x), 0);
            assertArrayEquals(new NaturalRanking().rank(y), CarryOver.averageRanks(y), 0);
            double expected = new SpearmansCorrelation().correlation(x, y);
            double actual = new PearsonsCorrelation().correlation(CarryOver.averageRanks(x), CarryOver.averageRanks(y));
            assertEquals(Double.doubleToLongBits(expected), Double.doubleToLongBits(actual));
        });
    }
}
