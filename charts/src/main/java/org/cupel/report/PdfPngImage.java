package org.cupel.report;

import com.lowagie.text.Image;
import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfNumber;
import java.io.IOException;
import org.cupel.charts.PngEncoder;

/**
 * A PNG chart as a PDF image without decoding it. A PDF Flate stream with the PNG predictors (Predictor 15:
 * the filter type is given per row, as in PNG) reads a PNG's IDAT data unchanged (ISO 32000-1:2008,
 * "Document management — Portable document format — Part 1: PDF 1.7", section 7.4.4.4, "LZW and Flate
 * predictor functions"), so an 8-bit RGB, non-interlaced PNG is embedded as its compressed bytes: no
 * decode, no re-compression, and the PDF is no larger than the PNGs. Other PNGs go through OpenPDF's
 * decoder.
 */
final class PdfPngImage {
    private static final int PNG_PREDICTORS = 15;

    private PdfPngImage() {
    }

    static Image of(byte[] png) throws IOException {
        PngEncoder.Idat idat = PngEncoder.idat(png);
        if (idat == null || idat.bitDepth() != 8 || idat.colourType() != 2 || idat.interlaced()) {
            return Image.getInstance(png);
        }
        Image img = Image.getInstance(idat.width(), idat.height(), 3, 8, idat.data());
        img.setDeflated(true);
        PdfDictionary parms = new PdfDictionary();
        parms.put(PdfName.PREDICTOR, new PdfNumber(PNG_PREDICTORS));
        parms.put(PdfName.COLORS, new PdfNumber(3));
        parms.put(PdfName.BITSPERCOMPONENT, new PdfNumber(8));
        parms.put(PdfName.COLUMNS, new PdfNumber(idat.width()));
        PdfDictionary additional = new PdfDictionary();
        additional.put(PdfName.DECODEPARMS, parms);
        img.setAdditional(additional);
        return img;
    }
}
