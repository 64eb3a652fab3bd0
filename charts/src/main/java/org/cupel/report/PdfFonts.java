package org.cupel.report;

import com.lowagie.text.Font;
import com.lowagie.text.pdf.BaseFont;
import java.awt.Color;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The PDF's fonts: DejaVu Sans embedded when the system has it (the charts use it too, and it covers
 * ±, ≤, µ, σ and other signs assay tables need), else the PDF standard Helvetica.
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
                return new PdfFonts(BaseFont.createFont(reg.toString(), BaseFont.IDENTITY_H, BaseFont.EMBEDDED),
                        BaseFont.createFont(bold.toString(), BaseFont.IDENTITY_H, BaseFont.EMBEDDED));
            }
            return new PdfFonts(BaseFont.createFont(BaseFont.HELVETICA, BaseFont.WINANSI, BaseFont.NOT_EMBEDDED),
                    BaseFont.createFont(BaseFont.HELVETICA_BOLD, BaseFont.WINANSI, BaseFont.NOT_EMBEDDED));
        } catch (IOException e) {
            throw new IllegalStateException("no usable PDF font: " + e.getMessage(), e);
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
