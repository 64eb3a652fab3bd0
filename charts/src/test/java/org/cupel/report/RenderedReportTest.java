package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.cupel.charts.PngWriter;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The report as a reader meets it: the page rendered by headless Chromium, the PDF rendered by pdftoppm
 * (Debian packages chromium and poppler-utils, which CI installs). Each test is skipped, with a message,
 * when its program is absent.
 */
class RenderedReportTest {
    private static final String CHROMIUM = "/usr/bin/chromium";
    private static final String PDFTOPPM = "/usr/bin/pdftoppm";
    private static final String PDFTOTEXT = "/usr/bin/pdftotext";

    @TempDir
    static Path dir;
    static Path out;
    static QcReport report;

    @BeforeAll
    static void writeReport() throws IOException {
        report = ReportFixture.report();
        out = dir.resolve("qc");
        ReportWriter.write(report, out, new ReportOptions(PdfReport.Paper.A4, PngWriter.SCREEN_DPI, false),
                ReportProgress.NONE);
    }

    @Test
    void chromiumLoadsThePageWithEverySectionAndNoBrokenImage() throws Exception {
        assumeTrue(ExternalTool.installed(CHROMIUM), "chromium is not installed at " + CHROMIUM
                + " (Debian package chromium); skipping the rendered-page test");
        String url = out.resolve("index.html").toUri().toString();
        String dom = ExternalTool.run(chromium("--dump-dom", url), dir, 120);
        assertTrue(dom.contains("</html>"), "the page loaded: " + dom.length() + " characters of DOM");
        for (ReportSection s : report.sections()) {
            // A serialised DOM escapes only & < > in text.
            String text = s.title().replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
            assertTrue(dom.contains(text + "</h2>"), "section heading present: " + s.title());
        }
        assertFalse(dom.contains("<script"), "no script element reached the DOM");
        Matcher m = Pattern.compile("<img src=\"([^\"]+)\"").matcher(dom);
        List<String> images = new ArrayList<>();
        while (m.find()) {
            images.add(m.group(1));
        }
        assertEquals(new ReportFiles(report).figures().size(), images.size());
        for (String src : images) {
            Path img = out.resolve(src);
            assertTrue(img.normalize().startsWith(out) && Files.size(img) > 0, "image exists and is not empty: " + src);
        }
        Path shot = dir.resolve("shot.png");
        ExternalTool.run(chromium("--screenshot=" + shot, url), dir, 120);
        BufferedImage png = ImageIO.read(shot.toFile());
        assertTrue(ExternalTool.inkShare(png) > 0.02, "the screenshot is not blank");
    }

    @Test
    void pdfPagesRenderAndChartPagesAreNotBlank() throws Exception {
        assumeTrue(ExternalTool.installed(PDFTOPPM), "pdftoppm is not installed at " + PDFTOPPM
                + " (Debian package poppler-utils); skipping the rendered-PDF test");
        Path pages = Files.createDirectory(dir.resolve("pages"));
        ExternalTool.run(List.of(PDFTOPPM, "-r", "40", "-png", out.resolve("appendix.pdf").toString(),
                pages.resolve("p").toString()), dir, 180);
        List<Path> pngs;
        try (Stream<Path> s = Files.list(pages)) {
            pngs = s.sorted().toList();
        }
        // A title page, then each section on a new page; the fixture's long table and two charts add pages.
        assertTrue(pngs.size() >= report.sections().size() + 2, "page count " + pngs.size());
        int chartPages = 0;
        for (Path p : pngs) {
            BufferedImage img = ImageIO.read(p.toFile());
            assertTrue(ExternalTool.inkShare(img) > 0.003, "page has content: " + p.getFileName());
            if (ExternalTool.chartBluePixels(img) > 300) {
                chartPages++;
            }
        }
        assertTrue(chartPages >= 1, "the charts are drawn on at least one page");
    }

    @Test
    void contentsPageNumbersAreThePagesWhereTheSectionsStart() throws Exception {
        assumeTrue(ExternalTool.installed(PDFTOTEXT), "pdftotext is not installed at " + PDFTOTEXT
                + " (Debian package poppler-utils); skipping the contents-page test");
        List<Integer> contents = contentsPages(out.resolve("appendix.pdf"), report.sections(), dir);
        List<String> pages = pageTexts(out.resolve("appendix.pdf"), dir);
        for (int i = 0; i < contents.size(); i++) {
            String heading = (i + 1) + ". " + report.sections().get(i).title();
            assertEquals(contents.get(i), firstPageWithLine(pages, heading),
                    "contents page of \"" + heading + "\" against the page its heading is on");
        }
        // The fixture's long table pushes later sections on: the numbers are not simply 2, 3, 4, ...
        assertTrue(contents.get(contents.size() - 1) > contents.size() + 1, contents.toString());
    }

    /**
     * The page numbers the title page's contents list gives, in section order. Read with layout kept, where
     * each entry is one line: number, title, leader (drawn, not text), page.
     */
    static List<Integer> contentsPages(Path pdf, List<ReportSection> sections, Path work) throws Exception {
        String first = ExternalTool.run(List.of(PDFTOTEXT, "-layout", "-f", "1", "-l", "1", pdf.toString(), "-"),
                work, 120);
        List<Integer> pages = new ArrayList<>();
        for (int i = 0; i < sections.size(); i++) {
            Pattern entry = Pattern.compile("^\\s*" + (i + 1) + "\\s+" + Pattern.quote(sections.get(i).title())
                    + "\\s+(\\d+)\\s*$", Pattern.MULTILINE);
            Matcher m = entry.matcher(first);
            assertTrue(m.find(), "contents entry " + (i + 1) + " " + sections.get(i).title() + " in\n" + first);
            pages.add(Integer.parseInt(m.group(1)));
        }
        return pages;
    }

    /** The text of every page; pdftotext ends each page with a form feed. */
    static List<String> pageTexts(Path pdf, Path work) throws Exception {
        String all = ExternalTool.run(List.of(PDFTOTEXT, pdf.toString(), "-"), work, 120);
        return List.of(all.split("\f", -1));
    }

    /** The 1-based number of the first page holding {@code line} as a whole line, or -1. */
    static int firstPageWithLine(List<String> pages, String line) {
        for (int p = 0; p < pages.size(); p++) {
            if (pages.get(p).lines().anyMatch(l -> l.strip().equals(line))) {
                return p + 1;
            }
        }
        return -1;
    }

    private List<String> chromium(String mode, String url) throws IOException {
        return ExternalTool.chromium(CHROMIUM, dir, 1280, mode, url);
    }
}
