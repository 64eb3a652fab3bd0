package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * Issue 15, item 7: numbers no assay can be never reach the statistics. A grade is a mass fraction, so
 * 100 % is its ceiling: 1,000,000 g/t = 1,000,000 ppm = 1e9 ppb = 100 % (1 g/t = 1 part per million by
 * mass; common practice); in oz/st the ceiling is 1e6 / (240/7) = 29,166.67 (1 oz/st = 34.2857 g/t, the
 * conversion tested in GradeUnitTest). Numbers a double cannot hold (1e400 overflows, 1e-400 underflows to
 * 0) are left out too. Each is an exception naming its cell.
 */
class ImpossibleValuesTest {
    private static final SourceLocation AT = new SourceLocation("lab/a.csv", 7, 3);
    private final ValueParser parser = new ValueParser(ValueConventions.DEFAULTS);

    @ParameterizedTest(name = "{0} {1} is left out")
    @CsvSource({"1e308, g/t", "1e160, ppm", "1000001, g/t", "100.5, %", "29167, oz/st", "1.1e9, ppb",
            ">2e6, g/t", "<1e200, ppm", "-1e300, g/t"})
    void aGradeAbove100PercentIsLeftOutWithItsCell(String cell, String unit) {
        ParsedValue p = parser.parse(cell, Double.NaN, AT, GradeUnit.parse(unit).orElseThrow());
        assertNull(p.value(), cell);
        DataIssue i = p.issue();
        assertEquals(AT, i.where());
        assertEquals(DataIssue.Severity.EXCLUDED, i.severity());
        assertTrue(i.problem().contains("above 100 %"), i.problem());
    }

    @ParameterizedTest(name = "{0} {1} is read")
    @CsvSource({"1000000, g/t, 1000000", "100, %, 100", "29166, oz/st, 29166", "999999999, ppb, 999999999",
            "0.0005, g/t, 0.0005"})
    void aGradeUpTo100PercentIsRead(String cell, String unit, double expected) {
        assertEquals(expected, parser.parse(cell, Double.NaN, AT, GradeUnit.parse(unit).orElseThrow()).value()
                .value(), 0.0);
    }

    /** Without a unit the ceiling is 1e9: 100 % in ppb, the smallest grade unit read. */
    @Test
    void withoutAUnitTheCeilingIs1e9() {
        assertEquals(1e9, parser.parse("1e9", Double.NaN, AT).value().value(), 0.0);
        assertTrue(parser.parse("1.5e9", Double.NaN, AT).issue().problem().contains("100 % even in ppb"));
    }

    @ParameterizedTest(name = "{0} cannot be held by a double")
    @CsvSource({"1e-400", "1e400", "<1e-400", "2.5e-320"})
    void aNumberOutsideTheRangeOfADoubleIsLeftOutNotReadAsZeroOrInfinity(String cell) {
        ParsedValue p = parser.parse(cell, Double.NaN, AT);
        assertNull(p.value(), cell);
        assertEquals(AT, p.issue().where());
        assertTrue(p.issue().problem().contains("too large or too small"), p.issue().problem());
    }

    /** A lab file's hot path (plain numbers) applies the same ceiling as the full parse. */
    @Test
    void theLabFileReaderLeavesOutAnImpossibleValueAndKeepsTheRest() throws Exception {
        java.nio.file.Path dir = java.nio.file.Files.createTempDirectory("cupel-impossible");
        try {
            java.nio.file.Path f = new ProjectFolder(dir).write("a.csv",
                    "Sample ID,Au_ppm,Ag_ppm\nS1,1e308,2\nS2,0.5,1e-400\nS3,2000000,3\n");
            LabFile lab = new LabFileReader(IngestSettings.DEFAULTS).read(f, "a.csv");
            assertEquals(3, lab.table().size());
            assertEquals(3, lab.issues().size(), lab.issues().toString());
            assertEquals(java.util.List.of("a.csv:2:2", "a.csv:3:3", "a.csv:4:2"),
                    lab.issues().stream().map(i -> i.where().toString()).toList());
        } finally {
            try (var s = java.nio.file.Files.walk(dir)) {
                s.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }
}
