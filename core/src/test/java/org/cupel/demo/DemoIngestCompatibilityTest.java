package org.cupel.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.cupel.assay.Qualifier;
import org.cupel.assay.SourceLocation;
import org.cupel.demo.PlantedProblem.Kind;
import org.cupel.ingest.AnalyteHeader;
import org.cupel.ingest.HeaderParser;
import org.cupel.ingest.ParsedValue;
import org.cupel.ingest.RawRow;
import org.cupel.ingest.RawTable;
import org.cupel.ingest.TableReader;
import org.cupel.ingest.ValueConventions;
import org.cupel.ingest.ValueParser;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo's lab files read with the ingest primitives and default conventions: every header is an
 * analyte header, every cell a value, except the one planted typo; repeat rows are recognised.
 */
class DemoIngestCompatibilityTest {

    @TempDir
    static Path dir;
    private static DemoSummary summary;

    @BeforeAll
    static void write() throws IOException {
        summary = DemoOnDisk.write(dir);
    }

    private static List<Path> labFiles() throws IOException {
        try (Stream<Path> s = Files.list(dir.resolve("lab"))) {
            return s.sorted().toList();
        }
    }

    @Test
    void everyCellReadsUnderTheDefaultConventionsExceptThePlantedTypo() throws IOException {
        ValueParser parser = new ValueParser(ValueConventions.DEFAULTS);
        HeaderParser headers = new HeaderParser();
        List<String> unreadable = new ArrayList<>();
        int below = 0;
        int above = 0;
        for (Path f : labFiles()) {
            RawTable t = TableReader.read(f);
            assertTrue(t.headerBlock().containsKey("job"), f + " " + t.headerBlock());
            assertTrue(t.headerBlock().containsKey("lab"), f.toString());
            assertTrue(t.headerBlock().containsKey("date reported"), f.toString());
            for (int c = 1; c < t.columns().size(); c++) {
                Optional<AnalyteHeader> h = headers.parse(t.columns().get(c));
                assertTrue(h.isPresent(), f + ": " + t.columns().get(c));
            }
            for (RawRow r : t.rows()) {
                for (int c = 1; c < t.columns().size(); c++) {
                    ParsedValue v = parser.parse(r.cell(c), Double.NaN, new SourceLocation(t.file(), r.line(), c + 1));
                    if (!v.usable()) {
                        unreadable.add(r.cell(0));
                    } else if (v.value().qualifier() == Qualifier.BELOW_DETECTION) {
                        below++;
                    } else if (v.value().qualifier() == Qualifier.ABOVE_UPPER_LIMIT) {
                        above++;
                    }
                }
            }
        }
        PlantedProblem typo = summary.planted(Kind.TEXT_TYPO);
        assertEquals(typo.sampleIds(), unreadable);
        assertTrue(below > 100, "below detection " + below);
        assertTrue(above >= 4, "above the upper limit " + above);
    }

    @Test
    void gravimetricColumnsAreASecondMethodOfTheSameAnalytes() throws IOException {
        HeaderParser headers = new HeaderParser();
        AnalyteHeader aas = headers.parse("Au_ppm_FA-AAS").orElseThrow();
        AnalyteHeader grav = headers.parse("Au_ppm_FA-GRAV").orElseThrow();
        assertEquals(aas.analyte(), grav.analyte());
        assertFalse(aas.method().equals(grav.method()));
        Path first = labFiles().stream().filter(p -> p.toString().endsWith("-GRAV.csv")).findFirst().orElseThrow();
        assertEquals(List.of("Sample ID", "Au_ppm_FA-GRAV", "Ag_ppm_FA-GRAV"), TableReader.read(first).columns());
    }

    @Test
    void labRepeatRowsAreRecognisedByTheDefaultMarkers() throws IOException {
        int repeats = 0;
        for (Path f : labFiles()) {
            for (RawRow r : TableReader.read(f).rows()) {
                Optional<String> original = ValueConventions.DEFAULTS.repeatOf(r.cell(0));
                if (original.isPresent()) {
                    repeats++;
                    assertEquals(r.cell(0), original.get() + DemoGenerator.REPEAT_SUFFIX);
                }
            }
        }
        assertEquals(summary.labRepeats(), repeats);
    }
}
