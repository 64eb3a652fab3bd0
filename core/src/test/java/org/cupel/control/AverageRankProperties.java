package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Size;
import org.apache.commons.math3.stat.correlation.SpearmansCorrelation;
import org.apache.commons.math3.stat.ranking.NaturalRanking;

/**
 * {@link CarryOver#averageRanks} gives exactly the ranks of Commons Math's NaturalRanking (ties averaged),
 * so Spearman's ρ from them is bit for bit the one SpearmansCorrelation gives. Values are drawn from a few
 * levels so that ties are common.
 */
class AverageRankProperties {
    @Property(tries = 500)
    void ranksAndRhoMatchCommonsMath(@ForAll @Size(min = 3, max = 60) List<@IntRange(min = -4, max = 8) Integer> a,
                                     @ForAll @Size(min = 3, max = 60) List<@IntRange(min = 0, max = 30) Integer> b) {
        int n = Math.min(a.size(), b.size());
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = a.get(i) * 0.25;
            y[i] = b.get(i) == 0 ? -0.0 : b.get(i) * 0.1;
        }
        assertArrayEquals(new NaturalRanking().rank(x), CarryOver.averageRanks(x), 0);
        assertArrayEquals(new NaturalRanking().rank(y), CarryOver.averageRanks(y), 0);
        double expected = new SpearmansCorrelation().correlation(x, y);
        double actual = new org.apache.commons.math3.stat.correlation.PearsonsCorrelation()
                .correlation(CarryOver.averageRanks(x), CarryOver.averageRanks(y));
        assertEquals(Double.doubleToLongBits(expected), Double.doubleToLongBits(actual));
    }
}
