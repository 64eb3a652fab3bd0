package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The comparisons table says why a pair whose unadjusted interval excludes zero is still "cannot tell": the Holm
 * adjustment over the analyte's comparisons (Holm 1979). On the demo testwork, Au LIT90-1050 − LIT60-1050-HALF
 * has the 95 % CI 0.09 to 6.60 pp and Welch p = 0.048 but Holm-adjusted p = 0.192 over 6 comparisons; Au
 * LIT60-1050 − LIT60-1100 (CI −2.06 to 0.95) contains zero and needs no such note.
 */
class RecoveryHolmReasonTest {

    @Test
    void cannotTellCarriesTheHolmReason(@TempDir Path dir) {
        Path project = dir.resolve("demo");
        assertEquals(0, CliRun.run("demo", project.toString()).code());
        // --wide: each table row on one line, as the checks read it.
        CliRun r = CliRun.run("recovery", project.toString(), "--wide");
        assertEquals(0, r.code(), r.err());
        String[] lines = r.out().split("\n");
        String held = Arrays.stream(lines).filter(l -> l.startsWith("Au") && l.contains("LIT90-1050 − LIT60-1050-HALF"))
                .findFirst().orElseThrow();
        assertTrue(held.contains("cannot tell") && held.contains("CI excludes 0 (Welch p = 0.048)")
                && held.contains("Holm-adjusted p = 0.192 over the 6 comparisons of Au"), held);
        String open = Arrays.stream(lines).filter(l -> l.startsWith("Au") && l.contains("LIT60-1050 − LIT60-1100"))
                .findFirst().orElseThrow();
        assertFalse(open.contains("Holm-adjusted"), open);
        assertTrue(r.out().contains("with 2 or 3 smelts per condition there are only 3 or 10 distinct resamples"), r.out());
    }
}
