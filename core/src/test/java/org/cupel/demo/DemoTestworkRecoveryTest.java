package org.cupel.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Path;
import org.cupel.ingest.ValueConventions;
import org.cupel.recovery.ComparisonVerdict;
import org.cupel.recovery.PairComparison;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.Testwork;
import org.cupel.recovery.TestworkReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo testwork reads cleanly with the recovery package's reader, and its default analysis reaches
 * the conclusions the set was designed for (docs/testwork.md): one pair of conditions different, one
 * pair that cannot be told apart.
 */
class DemoTestworkRecoveryTest {

    @TempDir
    static Path dir;
    private static Testwork testwork;
    private static RecoveryResult result;

    @BeforeAll
    static void analyse() throws IOException {
        DemoOnDisk.write(dir);
        testwork = TestworkReader.read(dir, RecoverySettings.DEFAULTS, ValueConventions.DEFAULTS);
        result = RecoveryAnalysis.run(testwork, RecoverySettings.DEFAULTS);
    }

    private static PairComparison gold(String a, String b) {
        return result.comparisons().stream()
                .filter(c -> c.analyte().equals("Au"))
                .filter(c -> c.first().equals(a) && c.second().equals(b) || c.first().equals(b) && c.second().equals(a))
                .findFirst().orElseThrow();
    }

    @Test
    void readsWithoutIssues() {
        assertEquals(0, testwork.issues().size(), testwork.issues().toString());
        assertEquals(11, testwork.smelts().size());
    }

    @Test
    void moreCollectorClearlyDiffers() {
        assertEquals(ComparisonVerdict.DIFFERENT, gold("LIT60-1050", "LIT90-1050").verdict());
    }

    @Test
    void hotterFusionCannotBeToldApartWithThreeReplicates() {
        assertEquals(ComparisonVerdict.CANNOT_TELL, gold("LIT60-1050", "LIT60-1100").verdict());
    }
}
