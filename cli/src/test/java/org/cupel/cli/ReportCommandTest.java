package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportCommandTest {
    private static final Path MESSY = Path.of(System.getProperty("cupel.testdata"), "fixtures", "ingest",
            "messy-project");

    /** The last run, whose standard error the checks read. */
    private CliRun last;

    private int run(String... args) {
        last = CliRun.run(args);
        return last.code();
    }

    @Test
    void writesTheAppendixOfAProjectFolder(@TempDir Path dir) throws Exception {
        Path qc = dir.resolve("qc");
        assertEquals(0, run("report", MESSY.toString(), "--out", qc.toString(), "--screen", "--quiet"), last.err());
        for (String f : new String[] {"index.html", "appendix.pdf", "appendix.docx", "summary.json",
            "tables/scope-batches.csv", "tables/data-exceptions.csv"}) {
            assertTrue(Files.size(qc.resolve(f)) > 0, f);
        }
        assertTrue(last.out().contains("written to"));
        assertEquals("", last.err(), "no progress bar when stderr is not a terminal");
    }

    // Screen resolution keeps these runs cheap; print resolution is covered by ReportWriterTest.
    @Test
    void anExistingFolderNeedsForce(@TempDir Path dir) {
        Path qc = dir.resolve("qc");
        assertEquals(0, run("report", MESSY.toString(), "--out", qc.toString(), "--screen", "--quiet"));
        assertEquals(CupelCommand.INPUT_ERROR, run("report", MESSY.toString(), "--out", qc.toString()));
        assertTrue(last.err().contains("--force"), last.err());
        assertEquals(0, run("report", MESSY.toString(), "--out", qc.toString(), "--force", "--pdf-size", "letter", "--screen"));
    }

    @Test
    void selectsBatchesForAWeeklyReview(@TempDir Path dir) throws Exception {
        Path full = dir.resolve("full");
        Path week = dir.resolve("week");
        assertEquals(0, run("report", MESSY.toString(), "--out", full.toString(), "--screen"));
        String batches = Files.readString(full.resolve("tables/scope-batches.csv"));
        String firstBatch = batches.split("\r\n")[1].split(",")[0];
        assertEquals(0, run("report", MESSY.toString(), "--out", week.toString(), "--batch", firstBatch, "--screen"));
        String selected = Files.readString(week.resolve("tables/scope-batches.csv"));
        assertEquals(2, selected.split("\r\n").length, "header and the one batch: " + selected);
        assertTrue(Files.readString(week.resolve("summary.json")).contains("batches " + firstBatch));
    }

    @Test
    void badInputGivesExitCodeTwoAndAMessage(@TempDir Path dir) {
        assertEquals(CupelCommand.INPUT_ERROR,
                run("report", MESSY.toString(), "--out", dir.resolve("a").toString(), "--since", "14/03/2025"));
        assertTrue(last.err().contains("YYYY-MM-DD"), last.err());
        assertEquals(CupelCommand.INPUT_ERROR,
                run("report", MESSY.toString(), "--out", dir.resolve("b").toString(), "--batch", "NO-SUCH-JOB"));
        assertTrue(last.err().contains("no samples"), last.err());
        assertEquals(CupelCommand.INPUT_ERROR, run("report", "--out", dir.resolve("c").toString()));
        assertEquals(CupelCommand.INPUT_ERROR,
                run("report", MESSY.toString(), "--demo", "--out", dir.resolve("d").toString()));
        assertFalse(Files.exists(dir.resolve("a")) || Files.exists(dir.resolve("b")));
    }

    @Test
    void theDemoProjectIsReportedUnderItsName(@TempDir Path dir) throws Exception {
        Path qc = dir.resolve("qc-appendix");
        assertEquals(0, run("report", "--demo", "--out", qc.toString(), "--screen", "--quiet"), last.err());
        String json = Files.readString(qc.resolve("summary.json"));
        assertTrue(json.contains("\"project\" : \"Vellmar Hills gold-silver project\""), json);
    }

    @Test
    void helpShowsAnExample() {
        assertEquals(0, run("report", "--help"));
        assertTrue(last.out().contains("cupel report --demo --out qc-appendix"));
    }
}
