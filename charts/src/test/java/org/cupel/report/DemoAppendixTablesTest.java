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
    private static final PdfFonts FONTS = PdfFonts.load();
    private static final float AVAILABLE = PageSize.A4.getWidth() - 2 * PdfReport.MARGIN_X;
    private static final Pattern WORD = Pattern.compile(
            "<word xMin=\"([\\d.]+)\" yMin=\"([\\d.]+)\" xMax=\"[\\d.]+\" yMax=\"([\\d.]+)\">(.*?)</word>");

    private static final Pattern SIGNED = Pattern.compile("[-−+(][0-9]");

    @TempDir
    static Path dir;
    static List<ReportTable> tables;
    static Path pdf;

    @BeforeAll
    static void writeTheDemoAppendix() throws IOException {
        QcReport report = DemoReport.build(dir);
        Path out = dir.resolve("qc");
        ReportWriter.write(report, out, new ReportOptions(PdfReport.Paper.A4, PngWriter.SCREEN_DPI, false),
                ReportProgress.NONE);
        pdf = out.resolve("appendix.pdf");
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
