package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.cupel.charts.PngWriter;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportWriterTest {
    private static final ReportOptions SCREEN = new ReportOptions(PdfReport.Paper.A4, PngWriter.SCREEN_DPI, false);
    /** Print resolution draws each chart once (the PDF reuses the PNG), which keeps these tests quick. */
    private static final ReportOptions PRINT = ReportOptions.DEFAULTS;

    @Test
    void writesEveryPartUnderSafeNames(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("qc");
        ReportWriter.write(ReportFixture.report(), out, SCREEN, ReportProgress.NONE);
        for (String f : List.of("index.html", "appendix.pdf", "appendix.docx", "summary.json", ReportWriter.MARKER,
                "charts/script_alert_1_script.png", "charts/x.png", "tables/x.csv", "tables/data-exceptions.csv",
                "tables/scope-batches.csv", "tables/references.csv")) {
            assertTrue(Files.size(out.resolve(f)) > 0, f);
        }
        try (Stream<Path> all = Files.walk(dir)) {
            for (Path p : (Iterable<Path>) all::iterator) {
                String name = p.getFileName().toString();
                assertFalse(name.contains("<") || name.contains(">") || name.contains(".."), name);
            }
        }
        assertFalse(Files.exists(out.resolve("charts/.print")), "print-resolution copies are not left behind");
        assertEquals(List.of(".qc.cupel-lock", "qc"), listing(dir),
                "no temporary folder is left beside the report, only the empty lock file");
        assertEquals(0, Files.size(dir.resolve(".qc.cupel-lock")));
        String pdf = new String(Files.readAllBytes(out.resolve("appendix.pdf")), java.nio.charset.StandardCharsets.ISO_8859_1);
        assertTrue(pdf.startsWith("%PDF-"));
    }

    @Test
    void eachChartLetsItsDataGoOnceDrawnAtBothResolutions(@TempDir Path dir) throws IOException {
        QcReport report = ReportFixture.report();
        List<ReportBlock.Figure> figures = new ReportFiles(report).figures();
        assertFalse(figures.isEmpty());
        for (ReportBlock.Figure f : figures) {
            assertTrue(f.chart().get() != null && f.chart().get() != null, "built as often as asked before writing");
        }
        ReportWriter.write(report, dir.resolve("qc"), SCREEN, ReportProgress.NONE);
        assertTrue(Files.size(dir.resolve("qc/charts/x.png")) > 0, "drawn at screen resolution first");
        for (ReportBlock.Figure f : figures) {
            IllegalStateException e = assertThrows(IllegalStateException.class, () -> f.chart().get(), f.name());
            assertTrue(e.getMessage().contains("released"), e.getMessage());
        }
        assertThrows(IllegalStateException.class,
                () -> ReportWriter.write(report, dir.resolve("again"), PRINT, ReportProgress.NONE),
                "a report is written once; the second write fails instead of drawing empty charts");
        assertEquals(List.of(".again.cupel-lock", ".qc.cupel-lock", "qc"), listing(dir),
                "the failed second write leaves no folder behind");
    }

    @Test
    void csvNeutralisesFormulasFromTheData(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("qc");
        ReportWriter.write(ReportFixture.report(), out, PRINT, ReportProgress.NONE);
        String csv = Files.readString(out.resolve("tables/x.csv"));
        assertTrue(csv.contains("\r\nS-7,-0.430,'=SUM(A1:A9)\r\n"), "negative number kept, formula neutralised");
        String ex = Files.readString(out.resolve("tables/data-exceptions.csv"));
        assertTrue(ex.contains("'=1+1"));
        assertTrue(ex.contains(",-0.5,"));
    }

    @Test
    void aFailureLeavesNoFolder(@TempDir Path dir) {
        Path out = dir.resolve("qc");
        QcReport broken = withFailingChart(ReportFixture.report());
        assertThrows(IllegalStateException.class, () -> ReportWriter.write(broken, out, PRINT, ReportProgress.NONE));
        assertEquals(List.of(".qc.cupel-lock"), listing(dir),
                "neither the report nor its temporary folder exists (the lock file stays: see OutputLock)");
    }

    @Test
    void anExistingFolderNeedsForceAndSurvivesAFailedReplacement(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("qc");
        ReportWriter.write(ReportFixture.report(), out, PRINT, ReportProgress.NONE);
        byte[] before = Files.readAllBytes(out.resolve("index.html"));
        InputException e = assertThrows(InputException.class,
                () -> ReportWriter.write(ReportFixture.report(), out, PRINT, ReportProgress.NONE));
        assertTrue(e.getMessage().contains("--force"));
        ReportOptions force = new ReportOptions(PdfReport.Paper.A4, PngWriter.PRINT_DPI, true);
        assertThrows(IllegalStateException.class,
                () -> ReportWriter.write(withFailingChart(ReportFixture.report()), out, force, ReportProgress.NONE));
        assertArrayEquals(before, Files.readAllBytes(out.resolve("index.html")), "the previous report is intact");
        assertEquals(List.of(".qc.cupel-lock", "qc"), listing(dir));
        Files.writeString(out.resolve("stale.txt"), "from an older run");
        ReportWriter.write(ReportFixture.report(), out, force, ReportProgress.NONE);
        assertFalse(Files.exists(out.resolve("stale.txt")), "replaced whole, not merged");
        assertEquals(List.of(".qc.cupel-lock", "qc"), listing(dir));
    }

    @Test
    void forceNeverReplacesAFolderCupelDidNotWrite(@TempDir Path dir) throws IOException {
        Path out = Files.createDirectory(dir.resolve("thesis"));
        Files.writeString(out.resolve("chapter1.docx"), "precious");
        ReportOptions force = new ReportOptions(PdfReport.Paper.A4, PngWriter.PRINT_DPI, true);
        assertThrows(InputException.class, () -> ReportWriter.write(ReportFixture.report(), out, force,
                ReportProgress.NONE));
        assertEquals("precious", Files.readString(out.resolve("chapter1.docx")));
    }

    @Test
    void twoRunsGiveIdenticalCsvJsonAndHtml(@TempDir Path dir) throws IOException {
        Path a = dir.resolve("a");
        Path b = dir.resolve("b");
        ReportWriter.write(ReportFixture.report(), a, PRINT, ReportProgress.NONE);
        ReportWriter.write(ReportFixture.report(), b, PRINT, ReportProgress.NONE);
        List<String> files = new ArrayList<>(listing(a.resolve("tables")).stream().map(f -> "tables/" + f).toList());
        files.add("summary.json");
        files.add("index.html");
        for (String f : files) {
            assertArrayEquals(Files.readAllBytes(a.resolve(f)), Files.readAllBytes(b.resolve(f)), f);
        }
        assertEquals(listing(a.resolve("charts")), listing(b.resolve("charts")));
        // Drawn on two threads in whatever order they finish, the charts are still the same bytes.
        for (String f : listing(a.resolve("charts"))) {
            assertArrayEquals(Files.readAllBytes(a.resolve("charts").resolve(f)),
                    Files.readAllBytes(b.resolve("charts").resolve(f)), f);
        }
    }

    /**
     * The PDF too is the same bytes run after run: OpenPDF's random font-subset tags, its clock-based file
     * identifier and creation date are fixed by the report (issue 15). Two runs in one JVM also prove that the
     * fonts' tag sources do not carry over from one document to the next. The Word copy, written on a drawing
     * thread beside the PDF, is the same bytes too, at either chart resolution.
     */
    @Test
    void twoRunsGiveAnIdenticalPdfAndWordCopyDatedByTheReport(@TempDir Path dir) throws IOException {
        Path a = dir.resolve("a");
        Path b = dir.resolve("b");
        ReportWriter.write(ReportFixture.report(), a, PRINT, ReportProgress.NONE);
        ReportWriter.write(ReportFixture.report(), b, PRINT, ReportProgress.NONE);
        byte[] pdf = Files.readAllBytes(a.resolve("appendix.pdf"));
        assertArrayEquals(pdf, Files.readAllBytes(b.resolve("appendix.pdf")));
        byte[] word = Files.readAllBytes(a.resolve("appendix.docx"));
        assertArrayEquals(word, Files.readAllBytes(b.resolve("appendix.docx")));
        Path screen = dir.resolve("screen");
        ReportWriter.write(ReportFixture.report(), screen, SCREEN, ReportProgress.NONE);
        assertArrayEquals(word, Files.readAllBytes(screen.resolve("appendix.docx")),
                "the Word copy takes the print charts whatever the screen charts' resolution");
        String text = new String(pdf, java.nio.charset.StandardCharsets.ISO_8859_1);
        // ReportFixture.GENERATED is 1767225600 s = 2026-01-01 00:00:00 UTC.
        assertTrue(text.contains("/CreationDate(D:20260101000000Z)"), "creation date from the report");
    }

    @Test
    void summaryJsonHasSortedKeysAndNoNaN() throws IOException {
        String json = SummaryJson.toJson(ReportFixture.report());
        assertFalse(json.contains("NaN"));
        assertTrue(json.contains("\"bias\" : null"), "not computed: null, as in every JSON Cupel writes");
        assertTrue(json.indexOf("\"cautions\"") < json.indexOf("\"data-exceptions\"")
                && json.indexOf("\"data-exceptions\"") < json.indexOf("\"scope\""), "section keys sorted");
        assertFalse(json.contains("generated"), "the JSON depends on the inputs only");
    }

    @Test
    void progressCountsEveryStep(@TempDir Path dir) throws IOException {
        long[] seen = new long[2];
        ReportWriter.write(ReportFixture.report(), dir.resolve("qc"), SCREEN, new ReportProgress() {
            @Override
            public void start(long steps) {
                seen[0] = steps;
            }

            @Override
            public void step(String what) {
                seen[1]++;
            }
        });
        assertEquals(seen[0], seen[1]);
    }

    static QcReport withFailingChart(QcReport r) {
        List<ReportSection> sections = new ArrayList<>(r.sections());
        sections.add(new ReportSection("late", "Late", List.of(new ReportBlock.Figure("boom", "fails",
                () -> {
                    throw new IllegalStateException("chart failed");
                })), Map.of()));
        return new QcReport(r.project(), r.selection(), r.generated(), sections);
    }

    static List<String> listing(Path dir) {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
