package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.util.List;
import java.util.Map;
import org.cupel.testing.SpecialFunctionReference;
import org.junit.jupiter.api.Test;

/** The normal quantile ROS plots against ({@link Ros#quantile}, Commons Statistics). */
class NormalQuantileTest {

    /**
     * testdata/reference/special-functions/normal_quantile.csv: Φ⁻¹(p) by mpmath at 50 digits (Newton on
     * log Φ), rounded to the nearest double, at 4,954 probabilities from 1e-300 to 1 − 2⁻⁵³, the ROS plotting
     * positions r/(n + 1) and (r − 3/8)/(n + 1/4) of n = 10⁶ at both ends included. Tolerance 8 ulps of the
     * reference: erfc⁻¹ (Boost's algorithm, ported by Commons Numbers) is documented to a few ulps, and
     * the result is multiplied by √2; the largest distance measured is 3 ulps (AS 241, carried by hand
     * before, was 4).
     */
    @Test
    void withinAFewUlpsOfMpmath() {
        for (Map<String, Double> r : SpecialFunctionReference.rows("normal_quantile.csv")) {
            double ulps = SpecialFunctionReference.ulps(Ros.quantile(r.get("p")), r.get("z"));
            assertTrue(ulps <= 8, () -> "p = " + r.get("p") + ": " + ulps + " ulps from " + r.get("z"));
        }
    }

    @Test
    void matchesScipyNormPpf() throws IOException {
        // testdata/reference/censored/normal_quantile.csv: scipy 1.10 stats.norm.ppf (Cephes ndtri) at 2,874
        // probabilities from 1e-300 to 1 − 2⁻⁵³. Both are a few ulps from the truth (scipy is 2 ulps off at
        // p = 1e-100 by the mpmath values above), so 2e-15 · max(1, |z|), about 9 ulps of 1.
        List<String> rows = Files.readAllLines(Reference.dir().resolve("normal_quantile.csv"));
        for (String row : rows.subList(1, rows.size())) {
            String[] f = row.split(",");
            double expected = Double.parseDouble(f[1]);
            assertEquals(expected, Ros.quantile(Double.parseDouble(f[0])), 2e-15 * Math.max(1, Math.abs(expected)),
                    row);
        }
    }

    @Test
    void ends() {
        assertEquals(Double.NEGATIVE_INFINITY, Ros.quantile(0));
        assertEquals(Double.POSITIVE_INFINITY, Ros.quantile(1));
        assertEquals(0, Ros.quantile(0.5));
    }
}
