package org.cupel.report;

import com.lowagie.text.Font;
import com.lowagie.text.pdf.BaseFont;
import java.awt.Color;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.SecureRandom;
import java.util.SplittableRandom;

/**
 * The PDF's fonts: DejaVu Sans embedded when the system has it (the charts use it too, and it covers
 * ±, ≤, µ, σ and other signs assay tables need), else the PDF standard Helvetica.
 *
 * <p>An embedded subset font is named with a six-letter tag ({@code ABCDEF+DejaVuSans}); OpenPDF draws the
 * letters from a {@code SecureRandom}, so each run wrote different bytes. The tag only has to tell the
 * subsets of one file apart (ISO 32000-1:2008, 9.6.4 "Font subsets"), so each font here gets a fixed
 * sequence seeded by its name ({@link FixedTagSource}), and the fonts are loaded uncached: a cached font
 * is shared by every document of the JVM, and its tag source would move on from one report to the next.
 */
record PdfFonts(BaseFont regular, BaseFont bold) {
    private static final Color INK = new Color(29, 35, 48);
    private static final Color MUTED = new Color(91, 98, 112);
    private static final Color ACCENT = new Color(0, 114, 178);
    private static final String DIR = "/usr/share/fonts/truetype/dejavu/";

    static PdfFonts load() {
        try {
            Path reg = Path.of(DIR, "DejaVuSans.ttf");
            Path bold = Path.of(DIR, "DejaVuSans-Bold.ttf");
            if (Files.isReadable(reg) && Files.isReadable(bold)) {
                return new PdfFonts(embedded(reg), embedded(bold));
            }
            return new PdfFonts(BaseFont.createFont(BaseFont.HELVETICA, BaseFont.WINANSI, BaseFont.NOT_EMBEDDED),
                    BaseFont.createFont(BaseFont.HELVETICA_BOLD, BaseFont.WINANSI, BaseFont.NOT_EMBEDDED));
        } catch (IOException e) {
            throw new IllegalStateException("no usable PDF font: " + e.getMessage(), e);
        }
    }

    private static BaseFont embedded(Path file) throws IOException {
        BaseFont f = BaseFont.createFont(file.toString(), BaseFont.IDENTITY_H, BaseFont.EMBEDDED,
                BaseFont.NOT_CACHED, null, null);
        f.setSecureRandom(new FixedTagSource(file.getFileName().toString()));
        return f;
    }

    /**
     * The "random" source OpenPDF draws subset tags from, made a fixed sequence: the same font gives the same
     * tag in every run. Nothing secret depends on it (the PDF is not encrypted).
     */
    static final class FixedTagSource extends SecureRandom {
        private static final long serialVersionUID = 1L;
        private final transient SplittableRandom sequence;

        FixedTagSource(String fontName) {
            this.sequence = new SplittableRandom(fontName.hashCode());
        }

        @Override
        public synchronized void nextBytes(byte[] bytes) {
            for (int i = 0; i < bytes.length; i++) {
                bytes[i] = (byte) sequence.nextInt(256);
            }
        }
    }

    Font title() {
        return new Font(bold, 24f, Font.NORMAL, INK);
    }

    Font kicker() {
        return new Font(bold, 10f, Font.NORMAL, ACCENT);
    }

    Font heading1() {
        return new Font(bold, 16f, Font.NORMAL, INK);
    }

    Font heading2() {
        return new Font(bold, 12f, Font.NORMAL, INK);
    }

    Font body() {
        return new Font(regular, 9.5f, Font.NORMAL, INK);
    }

    Font bodyBold() {
        return new Font(bold, 9.5f, Font.NORMAL, INK);
    }

    Font muted() {
        return new Font(regular, 8.5f, Font.NORMAL, MUTED);
    }

    Font tableHead(float size) {
        return new Font(bold, size, Font.NORMAL, INK);
    }

    Font tableBody(float size) {
        return new Font(regular, size, Font.NORMAL, INK);
    }

    Font frame() {
        return new Font(regular, 8f, Font.NORMAL, MUTED);
    }
}
