package org.cupel.report;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.time.Instant;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.util.Date;
import java.util.Optional;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.apache.poi.ooxml.POIXMLProperties;
import org.apache.poi.xwpf.usermodel.XWPFDocument;

/**
 * Saves a Word document so that the same report always gives the same bytes. POI stamps the package with
 * the clock twice: the core properties' creation date, and the modification time of every entry of the ZIP
 * container (POI 5.5.1 leaves the entries undated and Commons Compress, which writes them, takes the
 * clock's time; seen in the entries of a document POI wrote). Here the properties
 * take the report's generation time (fixed by {@code SOURCE_DATE_EPOCH}), and the container is copied entry
 * by entry, in POI's order, with that time as each entry's MS-DOS date; MS-DOS dates start in 1980, so an
 * earlier generation time is written as 1980-01-01 00:00. Nothing else in the package varies: POI numbers
 * relationships, pictures and drawing objects in the order they are added, and writes no revision-save IDs.
 */
final class DocxPackage {
    private static final LocalDateTime DOS_EPOCH = LocalDateTime.of(1980, 1, 1, 0, 0);

    private DocxPackage() {
    }

    static void write(XWPFDocument doc, String title, Instant generated, OutputStream out) throws IOException {
        POIXMLProperties.CoreProperties core = doc.getProperties().getCoreProperties();
        core.setTitle(DocxText.clean(title));
        core.setCreator("Cupel");
        core.setCreated(Optional.of(Date.from(generated)));
        core.setModified(Optional.of(Date.from(generated)));
        doc.getProperties().getExtendedProperties().setApplication("Cupel");
        ByteArrayOutputStream saved = new ByteArrayOutputStream(1 << 20);
        doc.write(saved);
        restamp(saved.toByteArray(), entryTime(generated), out);
    }

    private static LocalDateTime entryTime(Instant generated) {
        LocalDateTime utc = LocalDateTime.ofInstant(generated, ZoneOffset.UTC).withNano(0);
        return utc.isBefore(DOS_EPOCH) ? DOS_EPOCH : utc;
    }

    /**
     * Copies the ZIP container with every entry dated {@code time}. {@link ZipEntry#setTimeLocal} stores the
     * date as given, without the time-zone conversion {@link ZipEntry#setTime} applies, so the bytes do not
     * depend on the machine's zone.
     */
    private static void restamp(byte[] zip, LocalDateTime time, OutputStream out) throws IOException {
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(zip));
             ZipOutputStream z = new ZipOutputStream(new NonClosing(out))) {
            for (ZipEntry e = in.getNextEntry(); e != null; e = in.getNextEntry()) {
                ZipEntry copy = new ZipEntry(e.getName());
                copy.setTimeLocal(time);
                z.putNextEntry(copy);
                in.transferTo(z);
                z.closeEntry();
            }
        }
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
