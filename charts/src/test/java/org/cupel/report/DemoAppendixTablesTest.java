package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.lowagie.text.PageSize;
import com.lowagie.text.pdf.PdfReader;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.cupel.charts.PngWriter;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The tables of the demo appendix as a reader of the PDF meets them (issue 17, item 5): no table header
 * word and no setting name is broken mid-word ("Certificat / e SD", "fieldHardLimitPercen / t" were).
 * Checked twice: in the layout model (every word no wider than its column), and in the printed PDF, whose
 * words pdftotext reads back with their boxes (a word broken over two lines reads as two words, one above
 * the other at the same left edge, that together make the word). The pages are rendered with pdftoppm as
 * well. The poppler checks are skipped, with a message, when poppler-utils is not installed.
 */
class DemoAppendixTablesTest {
    private static final String PDFTOTEXT = "/usr/bin/pdftotext";
    private static final String PDFTOPPM = "/usr/bin/pdftoppm";
    private static final String CHROMIUM = "/usr/bin/chromium";
    /**
     * Added to a copy of the page (never to the report): one line per table with its caption, the widths of
     * the table and of its box, the box's overflow and right edge, and the width of the window's page area.
     */
    private static final String MEASURE = "<script>window.addEventListener('load',function(){var out=[];"
            + "document.querySelectorAll('figure.table').forEach(function(f){var s=f.querySelector('.scroll');"
            + "var t=s.querySelector('table');out.push([f.querySelector('figcaption').firstChild.textContent.trim(),"
            + "t.scrollWidth,s.clientWidth,getComputedStyle(s).overflowX,Math.ceil(s.getBoundingClientRect().right),"
            + "document.documentElement.clientWidth].join('|'));});var pre=document.createElement('pre');"
            + "pre.id='measure';pre.textContent=out.join(String.fromCharCode(10));document.body.appendChild(pre);});"
            + "</script>";
    private static final PdfFonts FONTS = PdfFonts.load();
    private static final float AVAILABLE = PageSize.A4.getWidth() - 2 * PdfReport.MARGIN_X;
    private static final Pattern WORD = Pattern.compile(
            "<word xMin=\"([\\d.]+)\" yMin=\"([\\d.]+)\" xMax=\"[\\d.]+\" yMax=\"([\\d.]+)\">(.*?)</word>");

    private static final Pattern SIGNED = Pattern.compile("[-−+(][0-9]");

    @TempDir
    static Path dir;
    static List<ReportTable> tables;
    static Path pdf;
    static Path html;

    @BeforeAll
    static void writeTheDemoAppendix() throws IOException {
        QcReport report = DemoReport.build(dir);
        Path out = dir.resolve("qc");
        ReportWriter.write(report, out, new ReportOptions(PdfReport.Paper.A4, PngWriter.SCREEN_DPI, false),
                ReportProgress.NONE);
        pdf = out.resolve("appendix.pdf");
        html = out.resolve("index.html");
        tables = new ArrayList<>();
        for (ReportSection s : report.sections()) {
            for (ReportBlock b : s.blocks()) {
                if (b instanceof ReportBlock.Table t) {
                    tables.add(t.table());
                }
            }
        }
    }

    @Test
    void everyHeaderWordAndSettingNameFitsItsColumnInTheLayout() {
        assertTrue(tables.size() > 30, "the demo appendix has its tables: " + tables.size());
        for (ReportTable t : tables) {
            PdfTableLayout layout = PdfTableLayout.of(t, FONTS.bold(), FONTS.regular(), AVAILABLE);
            for (PdfTableLayout.Part part : layout.parts()) {
                assertTrue(PdfTableLayout.sum(part.widths()) <= AVAILABLE + 0.01f, t.id() + " fits the page");
                for (int i = 0; i < part.columns().length; i++) {
                    int c = part.columns()[i];
                    float inner = part.widths()[i] - 2 * layout.padding();
                    for (String w : PdfTableLayoutTest.words(t.columns().get(c))) {
                        float width = FONTS.bold().getWidthPoint(w, layout.size());
                        assertTrue(width <= inner, t.id() + ": header word \"" + w + "\" (" + width
                                + " pt) fits its column (" + inner + " pt)");
                    }
                }
            }
        }
        ReportTable thresholds = table("thresholds");
        PdfTableLayout layout = PdfTableLayout.of(thresholds, FONTS.bold(), FONTS.regular(), AVAILABLE);
        assertEquals(TableBreaks.WORDS, layout.breaks(), "setting names print whole");
        float inner = layout.parts().get(0).widths()[0] - 2 * layout.padding();
        for (List<String> row : thresholds.rows()) {
            float width = FONTS.regular().getWidthPoint(row.get(0), layout.size());
            assertTrue(width <= inner, row.get(0) + " (" + width + " pt) fits the Setting column (" + inner + " pt)");
        }
    }

    @Test
    void noHeaderWordSettingNameOrCellWordIsSplitInThePrintedPdf() throws Exception {
        assumeTrue(ExternalTool.installed(PDFTOTEXT), "pdftotext is not installed at " + PDFTOTEXT
                + " (Debian package poppler-utils); skipping the printed-table test");
        String boxes = ExternalTool.run(List.of(PDFTOTEXT, "-bbox-layout", pdf.toString(), "-"), dir, 180);
        Set<String> headerWords = new HashSet<>();
        Set<String> whole = new HashSet<>();
        for (ReportTable t : tables) {
            for (String h : t.columns()) {
                headerWords.addAll(PdfTableLayoutTest.words(h));
            }
            boolean wordsOnly = PdfTableLayout.of(t, FONTS.bold(), FONTS.regular(), AVAILABLE).breaks()
                    == TableBreaks.WORDS;
            for (List<String> row : t.rows().subList(0, Math.min(t.rows().size(), TableLimit.SHOWN))) {
                for (String cell : row) {
                    if (wordsOnly) {
                        whole.addAll(PdfTableLayoutTest.words(TableBreaks.typeset(cell).replace('\u00A0', ' ')));
                    }
                }
            }
        }
        whole.addAll(headerWords);
        // Digits alone would pair by chance ("1" above "2" in the contents makes "12"); a word with a letter,
        // or a signed number ("(-3.51", which OpenPDF's own rule broke after the minus), cannot.
        whole.removeIf(w -> w.length() < 3
                || !(w.chars().anyMatch(Character::isLetter) || SIGNED.matcher(w).find()));
        List<String> split = new ArrayList<>();
        Set<String> printed = new HashSet<>();
        String[] pages = boxes.split("<page ");
        for (int p = 1; p < pages.length; p++) {
            List<Box> words = boxes(pages[p]);
            words.forEach(w -> printed.add(w.text));
            split.addAll(brokenWords(words, whole, p));
        }
        assertTrue(split.isEmpty(), "words broken over two lines: " + split);
        for (ReportTable t : tables) {
            for (String h : t.columns()) {
                for (String w : h.split(" +")) {
                    // Whole, or at the hyphen of a hyphenated word, each part whole.
                    assertTrue(printed.contains(w) || printed.containsAll(PdfTableLayoutTest.words(w)),
                            t.id() + ": header word \"" + w + "\" is printed whole");
                }
            }
        }
    }

    @Test
    void everyPageRenders() throws Exception {
        assumeTrue(ExternalTool.installed(PDFTOPPM), "pdftoppm is not installed at " + PDFTOPPM
                + " (Debian package poppler-utils); skipping the rendered-page test");
        Path pages = Files.createDirectory(dir.resolve("pages"));
        ExternalTool.run(List.of(PDFTOPPM, "-r", "20", "-png", pdf.toString(), pages.resolve("p").toString()), dir,
                300);
        List<Path> pngs;
        try (Stream<Path> s = Files.list(pages)) {
            pngs = s.sorted().toList();
        }
        assertEquals(new PdfReader(pdf.toString()).getNumberOfPages(), pngs.size(), "every page rendered");
        for (Path p : pngs) {
            BufferedImage img = ImageIO.read(p.toFile());
            assertTrue(ExternalTool.inkShare(img) > 0.003, "page has content: " + p.getFileName());
        }
    }

    /**
     * The page at 1400 pixels shows every table of the demo whole (a table of many columns may use the window
     * beyond the text column); at 800 pixels the widest scroll sideways in their own box. At either width no
     * box runs past the window, so nothing is cut off by the page.
     */
    @Test
    void wideTablesFitTheWindowOrScrollInTheirOwnBox() throws Exception {
        assumeTrue(ExternalTool.installed(CHROMIUM), "chromium is not installed at " + CHROMIUM
                + " (Debian package chromium); skipping the page-width test");
        Path page = html.resolveSibling("measure.html");
        Files.writeString(page, Files.readString(html).replace("</body>", MEASURE + "</body>"));
        int scrolled = 0;
        for (int width : new int[] {1400, 800}) {
            String dom = ExternalTool.run(ExternalTool.chromium(CHROMIUM, dir, width, "--dump-dom",
                    page.toUri().toString()), dir, 120);
            Matcher m = Pattern.compile("<pre id=\"measure\">(.*?)</pre>", Pattern.DOTALL).matcher(dom);
            assertTrue(m.find(), "the page was measured at " + width + " px");
            String[] lines = m.group(1).split("\n");
            assertEquals(tables.size(), lines.length, "one line per table");
            for (String line : lines) {
                String[] f = line.split("\\|");
                int table = Integer.parseInt(f[1]);
                int box = Integer.parseInt(f[2]);
                assertEquals("auto", f[3], f[0] + ": its box scrolls sideways");
                assertTrue(Integer.parseInt(f[4]) <= Integer.parseInt(f[5]), f[0] + " at " + width
                        + " px: the box ends inside the window (" + line + ")");
                if (width == 1400) {
                    assertTrue(table <= box, f[0] + " is shown whole at 1400 px (" + line + ")");
                } else if (table > box) {
                    scrolled++;
                }
            }
        }
        assertTrue(scrolled > 0, "at 800 px some tables are wider than the window and scroll");
    }

    private record Box(float x, float top, float bottom, String text) {
    }

    private static List<Box> boxes(String page) {
        List<Box> out = new ArrayList<>();
        Matcher m = WORD.matcher(page);
        while (m.find()) {
            out.add(new Box(Float.parseFloat(m.group(1)), Float.parseFloat(m.group(2)), Float.parseFloat(m.group(3)),
                    m.group(4).replace("&lt;", "<").replace("&gt;", ">").replace("&quot;", "\"")
                            .replace("&apos;", "'").replace("&amp;", "&")));
        }
        return out;
    }

    /**
     * Pairs of words one line apart at the same left edge (cells are set flush left; a broken word starts its
     * line, since a line breaks inside a word only when the word alone does not fit) that together make a
     * word that must stay whole. A break after the hyphen of a hyphenated word ("Carry-" / "over") is allowed.
     */
    private static List<String> brokenWords(List<Box> words, Set<String> whole, int page) {
        Map<Integer, List<Box>> byLeftEdge = new HashMap<>();
        for (Box b : words) {
            byLeftEdge.computeIfAbsent(Math.round(b.x * 2), k -> new ArrayList<>()).add(b);
        }
        List<String> out = new ArrayList<>();
        for (List<Box> column : byLeftEdge.values()) {
            for (Box upper : column) {
                for (Box lower : column) {
                    float lineHeight = upper.bottom - upper.top;
                    float gap = lower.top - upper.top;
                    boolean nextLine = gap > 0 && gap < 1.6f * lineHeight;
                    if (nextLine && whole.contains(upper.text + lower.text) && !hyphenBreak(upper.text, lower.text)) {
                        out.add("page " + page + ": \"" + upper.text + "\" / \"" + lower.text + "\"");
                    }
                }
            }
        }
        return out;
    }

    private static boolean hyphenBreak(String upper, String lower) {
        int n = upper.length();
        return n >= 2 && upper.charAt(n - 1) == '-' && Character.isLowerCase(upper.charAt(n - 2))
                && Character.isLowerCase(lower.charAt(0));
    }

    private static ReportTable table(String id) {
        return tables.stream().filter(t -> t.id().equals(id)).findFirst()
                .orElseThrow(() -> new AssertionError("no table " + id));
    }
}
