package org.cupel.report;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.util.Date;
import java.util.Locale;
import java.util.Optional;
import java.util.zip.CRC32;
import java.util.zip.Deflater;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.apache.commons.compress.archivers.zip.ZipArchiveOutputStream;
import org.apache.poi.ooxml.POIXMLProperties;
import org.apache.poi.xwpf.usermodel.XWPFDocument;

/**
 * Saves a Word document so that the same report always gives the same bytes, compressing each part once.
 *
 * <p>POI stamps the package with the clock twice: the core properties' creation date, and the modification
 * time of every entry of the ZIP container (POI 5.5.1 leaves the entries undated and Commons Compress, which
 * writes them, takes the clock's time; seen in the entries of a document POI wrote). Here the properties
 * take the report's generation time (fixed by {@code SOURCE_DATE_EPOCH}), and the container is copied entry
 * by entry, in POI's order, with that time as each entry's MS-DOS date; MS-DOS dates start in 1980, so an
 * earlier generation time is written as 1980-01-01 00:00. Nothing else in the package varies: POI numbers
 * relationships, pictures and drawing objects in the order they are added, and writes no revision-save IDs.
 *
 * <p>Since the copy is what compresses, POI's own save stores its parts (deflate level 0), and the copy
 * stores the PNG pictures as they are: their pixel data is deflated already (level 3, {@code PngEncoder}),
 * and deflating the 49 MB of print charts of a million-sample report again took about 2 s of CPU to make
 * them 2-11 % smaller (8-30 % on the demo's charts). A package's ZIP items may be stored or deflated
 * (ISO/IEC 29500-2:2008, "Open Packaging Conventions", annex C, the ZIP clarifications); LibreOffice and
 * POI read the stored pictures ({@code DocxReportTest}).
 *
 * <p>On the way, the main document part goes through a {@link MainPart}, which writes what was kept out of
 * POI's object model ({@link DocxTables}).
 */
final class DocxPackage {
    private static final LocalDateTime DOS_EPOCH = LocalDateTime.of(1980, 1, 1, 0, 0);

    /** Writes the main document part, given its XML as POI saved it. */
    interface MainPart {
        void write(String xml, Writer out) throws IOException;
    }

    private DocxPackage() {
    }

    static void write(XWPFDocument doc, String title, Instant generated, MainPart main, OutputStream out)
            throws IOException {
        POIXMLProperties.CoreProperties core = doc.getProperties().getCoreProperties();
        core.setTitle(DocxText.clean(title));
        core.setCreator("Cupel");
        core.setCreated(Optional.of(Date.from(generated)));
        core.setModified(Optional.of(Date.from(generated)));
        doc.getProperties().getExtendedProperties().setApplication("Cupel");
        ChunkedBytes saved = new ChunkedBytes();
        try (ZipArchiveOutputStream z = new ZipArchiveOutputStream(saved)) {
            z.setLevel(Deflater.NO_COMPRESSION);
            doc.write(z);
        }
        String mainName = doc.getPackagePart().getPartName().getName().substring(1);
        restamp(saved.input(), entryTime(generated), mainName, main, out);
    }

    private static LocalDateTime entryTime(Instant generated) {
        LocalDateTime utc = LocalDateTime.ofInstant(generated, ZoneOffset.UTC).withNano(0);
        return utc.isBefore(DOS_EPOCH) ? DOS_EPOCH : utc;
    }

    /**
     * Copies the ZIP container with every entry dated {@code time}: PNG pictures stored, the main part
     * {@code mainName} as {@code main} writes it, every other part deflated. {@link ZipEntry#setTimeLocal}
     * stores the date as given, without the time-zone conversion {@link ZipEntry#setTime} applies, so the
     * bytes do not depend on the machine's zone.
     */
    private static void restamp(InputStream zip, LocalDateTime time, String mainName, MainPart main,
                                OutputStream out) throws IOException {
        try (ZipInputStream in = new ZipInputStream(zip);
             ZipOutputStream z = new ZipOutputStream(new NonClosing(out))) {
            for (ZipEntry e = in.getNextEntry(); e != null; e = in.getNextEntry()) {
                ZipEntry copy = new ZipEntry(e.getName());
                copy.setTimeLocal(time);
                if (e.getName().equals(mainName)) {
                    z.putNextEntry(copy);
                    Writer text = new BufferedWriter(new OutputStreamWriter(z, StandardCharsets.UTF_8), 1 << 16);
                    main.write(new String(in.readAllBytes(), StandardCharsets.UTF_8), text);
                    text.flush();
                } else if (e.getName().toLowerCase(Locale.ROOT).endsWith(".png")) {
                    byte[] png = in.readAllBytes();
                    stored(copy, png);
                    z.putNextEntry(copy);
                    z.write(png);
                } else {
                    z.putNextEntry(copy);
                    in.transferTo(z);
                }
                z.closeEntry();
            }
        }
    }

    /** A stored entry carries its size and CRC-32 in its header, so they are set before it is written. */
    private static void stored(ZipEntry entry, byte[] data) {
        CRC32 crc = new CRC32();
        crc.update(data);
        entry.setMethod(ZipEntry.STORED);
        entry.setSize(data.length);
        entry.setCompressedSize(data.length);
        entry.setCrc(crc.getValue());
    }

    /** Lets the caller close its own stream. */
    private static final class NonClosing extends java.io.FilterOutputStream {
        NonClosing(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void close() throws IOException {
            flush();
        }
    }
}
