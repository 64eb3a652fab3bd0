package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.cupel.config.CupelConfig;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;

/**
 * Issue 15, item 3: a file whose cells read one character both as a thousands separator and as a decimal
 * mark is refused with the setting that decides, never read cell by cell (where {@code 1,234} became 1234
 * beside {@code 0,512} flagged as a decimal comma: a value 1000 times too large).
 */
class DecimalMarkTest extends InFolderTest {

    private LabFile read(String text, boolean decimalComma) {
        Path f = folder.write("lab/a.csv", text);
        CupelConfig config = CupelConfig.fromYaml("ingest:\n  decimalComma: " + decimalComma + "\n", "cupel.yaml");
        return new LabFileReader(IngestSettings.from(config)).read(f, "lab/a.csv");
    }

    @Test
    void aFileMixingDecimalCommasAndAThousandsSeparatorIsRefused() {
        InputException e = assertThrows(InputException.class,
                () -> read("Sample ID;Au_ppm;Ag_ppm;Cu_ppm\nR1;0,512;1,234;0,7\n", false));
        String m = e.getMessage();
        assertTrue(m.startsWith("lab/a.csv: the numbers mix two readings of ','"), m);
        assertTrue(m.contains("'1,234' (line 2, column 3)") && m.contains("'0,512' (line 2, column 2)"), m);
        assertTrue(m.contains("set ingest.decimalComma: true"), m);
    }

    /** The same cells with the setting: 0.512, 1.234 and 0.7 (the comma is the decimal mark throughout). */
    @Test
    void withDecimalCommaSetTheSameCellsReadAsDecimals() {
        LabFile f = read("Sample ID;Au_ppm;Ag_ppm;Cu_ppm\nR1;0,512;1,234;0,7\n", true);
        assertEquals(0.512, f.table().value(0, 0), 0.0);
        assertEquals(1.234, f.table().value(0, 1), 0.0);
        assertEquals(0.7, f.table().value(0, 2), 0.0);
        assertTrue(f.issues().isEmpty(), f.issues().toString());
    }

    /** A thousands separator alone is read as one (common practice: 1,234.5 in an English-locale export). */
    @Test
    void aThousandsSeparatorWithoutDecimalCommasIsRead() {
        LabFile f = read("Sample ID,Au_ppm\nR1,\"1,234.5\"\nR2,0.5\n", false);
        assertEquals(1234.5, f.table().value(0, 0), 0.0);
    }

    /** Decimal commas alone, without the setting, stay per-cell exceptions that name it. */
    @Test
    void decimalCommasAloneAreListedCellByCell() {
        LabFile f = read("Sample ID;Au_ppm;Ag_ppm\nR1;0,512;2\nR2;0.5;0,7\n", false);
        assertEquals(2, f.issues().size());
        assertTrue(f.issues().stream().allMatch(i -> i.severity() == DataIssue.Severity.EXCLUDED
                && i.fix().contains("ingest.decimalComma: true")), f.issues().toString());
    }

    /** The mirror case: with decimalComma true, 1.234 groups thousands while 0.5 looks like a decimal point. */
    @Test
    void aDecimalCommaFileMixingPointsIsRefusedToo() {
        InputException e = assertThrows(InputException.class,
                () -> read("Sample ID;Au_ppm;Ag_ppm\nR1;1.234;0,5\nR2;0.5;2\n", true));
        assertTrue(e.getMessage().contains("two readings of '.'") && e.getMessage().contains("ingest.decimalComma: false"),
                e.getMessage());
    }
}
