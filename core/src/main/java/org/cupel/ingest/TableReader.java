package org.cupel.ingest;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.Function;
import java.util.function.Predicate;
import java.util.stream.Collectors;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;

/**
 * Reads a table file (.csv, .tsv, .txt or .xlsx) into a {@link RawTable}. Text files: UTF-8 with or
 * without byte-order mark (UTF-16 with a byte-order mark too, as spreadsheets save "Unicode text"),
 * delimiter sniffed among comma, semicolon and tab, RFC 4180 quotes, any line ending. Above the table a
 * lab's header block of {@code key: value} or {@code key,value} lines is collected. Problems that make the
 * file unusable throw {@link InputException} with a one-sentence message saying where, what was expected
 * and how to fix it.
 */
public final class TableReader {
    /** Column headers that name the sample ID column (matched as {@link RawTable#column}). */
    public static final List<String> SAMPLE_ID_ALIASES = List.of("sample id", "sample_id", "sampleid", "sample",
            "sample no", "sample number", "sample #", "id");
    private static final Set<String> NORMALISED_ID_ALIASES = SAMPLE_ID_ALIASES.stream()
            .map(RawTable::normalise).collect(Collectors.toUnmodifiableSet());
    private static final int SNIFF_BYTES = 64 * 1024;

    private TableReader() {
    }

    /** Reads {@code file}; the header row is the first row with a sample-ID column, else the widest early row. */
    public static RawTable read(Path file) {
        return read(file, TableReader::hasSampleIdColumn);
    }

    public static RawTable read(Path file, Predicate<List<String>> isHeaderRow) {
        return read(file, file.toString(), isHeaderRow, null);
    }

    /**
     * @param displayName the file name used in messages and source locations
     * @param sheet for XLSX, the sheet to read; null or empty for the first
     */
    public static RawTable read(Path file, String displayName, Predicate<List<String>> isHeaderRow, String sheet) {
        List<RawRow> rows = new ArrayList<>();
        List<DataIssue> ragged = new ArrayList<>();
        RawTable[] head = new RawTable[1];
        scan(file, displayName, isHeaderRow, sheet, h -> {
            head[0] = h;
            return new TableAssembler.RowSink() {
                @Override
                public void row(CellRow row) {
                    rows.add(row.toRawRow());
                }

                @Override
                public void ragged(CellRow row, DataIssue issue) {
                    ragged.add(issue);
                }
            };
        });
        RawTable h = head[0];
        List<DataIssue> issues = new ArrayList<>(h.issues());
        issues.addAll(ragged);
        return new RawTable(h.file(), h.headerBlock(), h.columns(), h.headerLine(), rows, issues);
    }

    /**
     * Reads {@code file} as {@link #read(Path, String, Predicate, String)} does, but hands each data row to
     * the sink that {@code open} returns for the table's head (a {@link RawTable} without rows) instead of
     * keeping the rows; the row passed is reused for the next one.
     */
    static void scan(Path file, String displayName, Predicate<List<String>> isHeaderRow, String sheet,
                     Function<RawTable, TableAssembler.RowSink> open) {
        if (!Files.isRegularFile(file) || !Files.isReadable(file)) {
            throw new InputException(displayName + ": the file does not exist or cannot be read; check the path "
                    + "and its permissions.");
        }
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        List<DataIssue> warnings = new ArrayList<>();
        if (name.endsWith(".xlsx") || name.endsWith(".xlsm")) {
            Iterator<RawRow> rows = XlsxSheetReader.read(file, displayName, sheet, isHeaderRow, warnings)
                    .iterator();
            TableAssembler.assemble(displayName, row -> {
                if (!rows.hasNext()) {
                    return false;
                }
                row.set(rows.next());
                return true;
            }, true, isHeaderRow, warnings, open);
            return;
        }
        if (name.endsWith(".xls")) {
            throw new InputException(displayName + ": the old binary Excel format (.xls) is not read; save the "
                    + "workbook as .xlsx or the sheet as CSV UTF-8.");
        }
        scanText(file, displayName, isHeaderRow, warnings, open);
    }

    /** The file's size in bytes, or 0 when it cannot be read (reading it then reports why). */
    static long sizeOf(Path file) {
        try {
            return Files.size(file);
        } catch (IOException e) {
            return 0;
        }
    }

    /**
     * An estimate of the rows of a text table of {@code bytes} bytes with {@code cells} cells per row of about
     * {@code bytesPerCell} bytes each (delimiter included), to size arrays before reading: a lower figure per
     * cell overestimates, a higher one risks growing the arrays once.
     */
    static int estimatedRows(long bytes, int cells, int bytesPerCell) {
        return (int) Math.min(Integer.MAX_VALUE / 2, bytes / ((long) bytesPerCell * Math.max(1, cells) + 2));
    }

    /** Whether a row holds a sample-ID column header. */
    public static boolean hasSampleIdColumn(List<String> cells) {
        for (String c : cells) {
            if (NORMALISED_ID_ALIASES.contains(RawTable.normalise(c))) {
                return true;
            }
        }
        return false;
    }

    private static void scanText(Path file, String displayName, Predicate<List<String>> isHeaderRow,
                                 List<DataIssue> warnings, Function<RawTable, TableAssembler.RowSink> open) {
        byte[] head = head(file, displayName);
        Charset charset = charsetOf(head);
        rejectBinary(head, charset, displayName);
        // A file shorter than the sniffing sample, as most lab files are, is already in memory: decoded
        // once, sniffed and tokenized from the same characters. Text that does not decode takes the
        // streaming path, whose message names the line.
        CharBuffer whole = head.length < SNIFF_BYTES ? decodeStrictly(head, charset) : null;
        if (whole != null) {
            char delimiter = DelimiterSniffer.sniff(whole.array(), whole.limit(), isHeaderRow);
            DelimitedTokenizer t = new DelimitedTokenizer(whole.array(), whole.limit(), delimiter, displayName);
            TableAssembler.assemble(displayName, t::next, false, isHeaderRow, warnings, open);
            return;
        }
        char[] prefix = decodePrefix(head, charset).toCharArray();
        char delimiter = DelimiterSniffer.sniff(prefix, prefix.length, isHeaderRow);
        try {
            scanStream(file, displayName, head, charset, delimiter, isHeaderRow, warnings, open);
        } catch (InputException e) {
            // The decoder reads ahead of the tokenizer, so the line it failed on is found again, exactly.
            if (e.getCause() instanceof CharacterCodingException) {
                throw new InputException(EncodingErrors.locate(file, displayName, charset, bomLength(head, charset)),
                        e.getCause());
            }
            throw e;
        }
    }

    private static void scanStream(Path file, String displayName, byte[] head, Charset charset, char delimiter,
                                   Predicate<List<String>> isHeaderRow, List<DataIssue> warnings,
                                   Function<RawTable, TableAssembler.RowSink> open) {
        try (InputStream in = head.length < SNIFF_BYTES ? new ByteArrayInputStream(head) : Files.newInputStream(file);
             Reader reader = new InputStreamReader(skipBom(in, head), charset.newDecoder()
                     .onMalformedInput(CodingErrorAction.REPORT)
                     .onUnmappableCharacter(CodingErrorAction.REPORT))) {
            DelimitedTokenizer t = head.length < SNIFF_BYTES
                    ? new DelimitedTokenizer(reader, delimiter, displayName, head.length + 1)
                    : new DelimitedTokenizer(reader, delimiter, displayName);
            TableAssembler.assemble(displayName, t::next, false, isHeaderRow, warnings, open);
        } catch (IOException e) {
            throw new InputException(displayName + ": the file could not be read (" + e.getMessage()
                    + "); check that it is not locked or truncated.", e);
        }
    }

    private static byte[] head(Path file, String displayName) {
        try {
            // A file smaller than the sample, as most lab files are, is read whole into one array of its size.
            if (Files.size(file) < SNIFF_BYTES) {
                return Files.readAllBytes(file);
            }
            try (InputStream in = Files.newInputStream(file)) {
                return in.readNBytes(SNIFF_BYTES);
            }
        } catch (IOException e) {
            throw new InputException(displayName + ": the file could not be read (" + e.getMessage()
                    + "); check the path and its permissions.", e);
        }
    }

    private static Charset charsetOf(byte[] b) {
        if (b.length >= 2 && (b[0] & 0xFF) == 0xFF && (b[1] & 0xFF) == 0xFE) {
            return StandardCharsets.UTF_16LE;
        }
        if (b.length >= 2 && (b[0] & 0xFF) == 0xFE && (b[1] & 0xFF) == 0xFF) {
            return StandardCharsets.UTF_16BE;
        }
        return StandardCharsets.UTF_8;
    }

    private static int bomLength(byte[] b, Charset charset) {
        if (charset != StandardCharsets.UTF_8) {
            return 2;
        }
        boolean utf8Bom = b.length >= 3 && (b[0] & 0xFF) == 0xEF && (b[1] & 0xFF) == 0xBB && (b[2] & 0xFF) == 0xBF;
        return utf8Bom ? 3 : 0;
    }

    private static InputStream skipBom(InputStream in, byte[] head) throws IOException {
        in.skipNBytes(bomLength(head, charsetOf(head)));
        return in;
    }

    private static void rejectBinary(byte[] b, Charset charset, String displayName) {
        if (b.length >= 4 && b[0] == 'P' && b[1] == 'K' && b[2] == 3 && b[3] == 4) {
            throw new InputException(displayName + ": the file is a ZIP archive (probably an Excel workbook), "
                    + "expected a text table; give it the .xlsx extension or save the sheet as CSV UTF-8.");
        }
        if (charset != StandardCharsets.UTF_8) {
            return;
        }
        for (byte x : b) {
            if (x == 0) {
                throw new InputException(displayName + ": the file contains binary data (NUL bytes), expected a "
                        + "text table; export the results as CSV or XLSX.");
            }
        }
    }

    /** The whole text of a file held in {@code bytes} without its byte-order mark, or null when it does not decode. */
    private static CharBuffer decodeStrictly(byte[] bytes, Charset charset) {
        int start = bomLength(bytes, charset);
        try {
            CharBuffer chars = charset.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes, start, bytes.length - start));
            return chars.hasArray() && chars.arrayOffset() == 0 && chars.position() == 0 ? chars : null;
        } catch (CharacterCodingException e) {
            return null;
        }
    }

    /** The sniffing sample, cut at its last line break so a split character does not fail decoding. */
    private static String decodePrefix(byte[] head, Charset charset) {
        int start = bomLength(head, charset);
        int end = head.length;
        if (head.length == SNIFF_BYTES) {
            while (end > start && head[end - 1] != '\n') {
                end--;
            }
        }
        return new String(head, start, end - start, charset);
    }
}
