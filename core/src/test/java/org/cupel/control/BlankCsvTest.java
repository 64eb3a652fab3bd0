package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The plain blank CSV of docs/blank-csv.md (testdata/control-blanks/blank-results.csv, invented). */
class BlankCsvTest {
    private static final Path FILE = Path.of(System.getProperty("cupel.testdata"), "control-blanks",
            "blank-results.csv");

    @Test
    void readsBlanksWithPrecedingGradesAndLimits() {
        BlankCsv.Blanks b = BlankCsv.read(FILE);
        assertEquals(8, b.observations().size());
        BlankObservation third = b.observations().get(2);
        assertEquals("BLK-003", third.sampleId());
        assertEquals(0.31, third.value().value(), 0);
        assertEquals(25.4, third.precedingGrade().value(), 0);
        assertEquals("S-044", third.precedingId());
        // BLK-006 has no stated limit: the smallest limit of the file's Au results.
        assertEquals(0.005, b.observations().get(5).detectionLimit(), 0);
        assertEquals(1, b.issues().size());
        assertTrue(b.issues().get(0).message().contains(":9:5"), b.issues().get(0).message());

        BlankReport r = BlankReview.review(b.observations(), BlankSettings.DEFAULTS);
        assertEquals(1, r.carryOverFindings().size());
        assertEquals("BLK-003", r.carryOverFindings().get(0).observation().sampleId());
        assertEquals(1, r.summaries().get(0).missing());
    }

    @Test
    void missingColumnIsAnInputErrorNamingTheFile(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("b.csv");
        Files.writeString(f, "sample_id,position,Au_ppm\nB1,1,0.01\n");
        InputException e = assertThrows(InputException.class, () -> BlankCsv.read(f));
        assertTrue(e.getMessage().contains("b.csv:1: no 'batch' column"), e.getMessage());
    }
}
