package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.util.List;
import org.junit.jupiter.api.Test;

class NormalQuantileTest {

    @Test
    void matchesScipyNormPpf() throws IOException {
        // testdata/reference/censored/normal_quantile.csv: scipy 1.10 stats.norm.ppf (Cephes ndtri) at 2,874
        // probabilities from 1e-300 to 1 − 2⁻⁵³, ROS plotting positions r/(n + 1) of n = 10⁶ included.
        // Wichura (1988) states PPND16 accurate to about 1e-16 relative; both are a few ulps from the truth,
        // so 2e-15 · max(1, |z|) (about 9 ulps of 1; the largest difference seen is 7.6e-16).
        List<String> rows = Files.readAllLines(Reference.dir().resolve("normal_quantile.csv"));
        for (String row : rows.subList(1, rows.size())) {
            String[] f = row.split(",");
            double p = Double.parseDouble(f[0]);
            double expected = Double.parseDouble(f[1]);
            assertEquals(expected, NormalQuantile.of(p), 2e-15 * Math.max(1, Math.abs(expected)), row);
        }
    }

    @Test
    void endsAndOutsideTheUnitInterval() {
        assertEquals(Double.NEGATIVE_INFINITY, NormalQuantile.of(0));
        assertEquals(Double.POSITIVE_INFINITY, NormalQuantile.of(1));
        assertEquals(0, NormalQuantile.of(0.5));
        assertTrue(Double.isNaN(NormalQuantile.of(-0.1)));
        assertTrue(Double.isNaN(NormalQuantile.of(Double.NaN)));
    }
}
