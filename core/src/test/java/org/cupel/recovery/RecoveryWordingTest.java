package org.cupel.recovery;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.AssayValue;
import org.junit.jupiter.api.Test;

/** The recovery notes state the real smelt counts. */
class RecoveryWordingTest {

    /** Two conditions of four smelts each (invented; slag grades set the recoveries). */
    private static Testwork fourSmelts() {
        List<Smelt> s = new ArrayList<>();
        double[][] slag = {{1.1, 1.3, 1.2, 1.25}, {2.0, 2.6, 2.3, 2.2}};
        for (int c = 0; c < 2; c++) {
            for (int r = 0; r < 4; r++) {
                String cond = c == 0 ? "A" : "B";
                s.add(Fixtures.smelt(cond + r, cond, 100, Fixtures.button(30, 30),
                        Fixtures.slag(90, AssayValue.detected(slag[c][r]))));
            }
        }
        return Fixtures.testwork(List.of(10.1, 9.9), s);
    }

    /**
     * Four smelts per condition: C(2·4 − 1, 4) = C(7, 4) = 35 distinct resamples (worked by hand); the note
     * used to say "2 or 3 smelts ... 3 or 10" whatever the counts. Two and three smelts: C(3, 2) = 3, C(5, 3) = 10.
     */
    @Test
    void bootstrapNoteStatesTheRealCounts() {
        RecoveryResult r = RecoveryAnalysis.run(fourSmelts(), RecoverySettings.DEFAULTS);
        assertTrue(r.notes().stream().anyMatch(n -> n.startsWith("No bootstrap intervals: with 4 smelts per "
                + "condition there are only 35 distinct resamples")), r.notes().toString());
        String mixed = RecoveryAnalysis.bootstrapNote(RecoveryAnalysis.run(Fixtures.threeConditions(),
                RecoverySettings.DEFAULTS).conditions());
        assertTrue(mixed.contains("with 3 smelts per condition there are only 10 distinct"), mixed);
    }
}
