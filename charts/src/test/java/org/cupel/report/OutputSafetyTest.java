package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.cupel.charts.PngWriter;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The report writer never deletes what it did not write (issue 15, items 1, 8 and 11), in process: a folder
 * that appears at the target while the report is written, a report folder that loses its marker meanwhile, a
 * second run on the same target, the leftovers of killed runs, and an output path that cannot be a folder.
 * The command-line versions with real processes are in the cli module's {@code OutputSafetyCliTest}.
 */
class OutputSafetyTest {
    private static final ReportOptions PRINT = ReportOptions.DEFAULTS;
    private static final ReportOptions FORCE = new ReportOptions(PdfReport.Paper.A4, PngWriter.PRINT_DPI, true);

    /** Runs {@code action} once, at the first step of the writing (after the start-of-run checks). */
    private static ReportProgress during(Runnable action) {
        return new ReportProgress() {
            private boolean done;

            @Override
            public void start(long steps) {
            }

            @Override
            public void step(String what) {
                if (!done) {
                    done = true;
                    action.run();
                }
            }
        };
    }

    private static void write(Path file, String text) {
        try {
            Files.createDirectories(file.getParent());
            Files.writeString(file, text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Test
    void aFolderThatAppearsWhileTheReportIsWrittenIsLeftUntouched(@TempDir Path dir) throws IOException {
        for (ReportOptions options : List.of(PRINT, FORCE)) {
            Path out = dir.resolve(options.force() ? "forced" : "plain");
            InputException e = assertThrows(InputException.class, () -> ReportWriter.write(ReportFixture.report(),
                    out, options, during(() -> write(out.resolve("notes.txt"), "keep"))));
            assertEquals("keep", Files.readString(out.resolve("notes.txt")));
            assertEquals(List.of("notes.txt"), ReportWriterTest.listing(out));
            assertTrue(e.getMessage().contains("appeared while the report was being written; it was left untouched"),
                    e.getMessage());
        }
        assertEquals(List.of(".forced.cupel-lock", ".plain.cupel-lock", "forced", "plain"),
                ReportWriterTest.listing(dir), "no temporary folder left behind");
    }

    @Test
    void aReportFolderThatLosesItsMarkerMeanwhileIsNotReplaced(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("qc");
        ReportWriter.write(ReportFixture.report(), out, PRINT, ReportProgress.NONE);
        InputException e = assertThrows(InputException.class, () -> ReportWriter.write(ReportFixture.report(), out,
                FORCE, during(() -> {
                    try {
                        Files.delete(out.resolve(ReportWriter.MARKER));
                    } catch (IOException x) {
                        throw new UncheckedIOException(x);
                    }
                    write(out.resolve("mine/notes.txt"), "keep");
                })));
        assertTrue(e.getMessage().contains("holds files that Cupel did not write"), e.getMessage());
        assertEquals("keep", Files.readString(out.resolve("mine/notes.txt")));
        assertTrue(Files.exists(out.resolve("index.html")), "the folder as it was, untouched");
    }

    @Test
    @SuppressWarnings("try") // the lock is held for the body's duration
    void aSecondRunOnTheSameFolderStopsAtOnceWithOneSentence(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("qc");
        try (OutputLock held = OutputLock.tryAcquire(dir, "qc").orElseThrow()) {
            InputException e = assertThrows(InputException.class,
                    () -> ReportWriter.write(ReportFixture.report(), out, FORCE, ReportProgress.NONE));
            assertEquals("another cupel report run is writing " + out + " right now (it holds "
                    + dir.resolve(".qc.cupel-lock") + "); wait for it to finish, or choose another --out folder",
                    e.getMessage());
        }
        assertFalse(Files.exists(out));
        ReportWriter.write(ReportFixture.report(), out, PRINT, ReportProgress.NONE);
        assertTrue(Files.exists(out.resolve(ReportWriter.MARKER)), "free again once the first run is done");
    }

    @Test
    @SuppressWarnings("try") // the lock is held for the body's duration
    void theLeftoversOfKilledRunsAreDeletedButNothingElse(@TempDir Path dir) throws IOException {
        write(dir.resolve(".qc.cupel-tmp-4242/" + ReportWriter.PARTIAL_MARKER), "");
        write(dir.resolve(".qc.cupel-tmp-4242/charts/a.png"), "png");
        write(dir.resolve(".qc.cupel-old-77/" + ReportWriter.MARKER), "");
        write(dir.resolve(".qc.cupel-old-77/index.html"), "old report");
        Files.createDirectories(dir.resolve(".other.cupel-tmp-5"));
        write(dir.resolve(".held.cupel-tmp-6/" + ReportWriter.PARTIAL_MARKER), "");
        write(dir.resolve(".qc.cupel-tmp-9/notes.txt"), "no marker: not certainly ours");
        write(dir.resolve(".qc.cupel-tmp-x1/" + ReportWriter.PARTIAL_MARKER), "not a process id");
        write(dir.resolve("qc.cupel-tmp-3/" + ReportWriter.PARTIAL_MARKER), "not hidden: not our name");
        try (OutputLock live = OutputLock.tryAcquire(dir, "held").orElseThrow()) {
            ReportWriter.write(ReportFixture.report(), dir.resolve("qc"), PRINT, ReportProgress.NONE);
        }
        assertEquals(List.of(".held.cupel-lock", ".held.cupel-tmp-6", ".qc.cupel-lock", ".qc.cupel-tmp-9",
                ".qc.cupel-tmp-x1", "qc", "qc.cupel-tmp-3"), ReportWriterTest.listing(dir));
    }

    @Test
    void anOutputPathThroughAFileIsAnInputError(@TempDir Path dir) throws IOException {
        write(dir.resolve("README.md"), "text");
        Path out = dir.resolve("README.md").resolve("sub");
        InputException e = assertThrows(InputException.class,
                () -> ReportWriter.write(ReportFixture.report(), out, PRINT, ReportProgress.NONE));
        assertEquals("cannot write the report to " + out + ": " + dir.resolve("README.md") + " is a file, not a "
                + "folder; choose an --out path inside a folder", e.getMessage());
    }
}
