package org.cupel.ingest;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.CharacterCodingException;
import org.cupel.project.InputException;

/**
 * Splits delimited text into records by hand-written character scanning (no regular expressions):
 * RFC 4180 quoting with doubled quotes and line breaks inside quotes, CR, LF and CRLF line ends, cells
 * trimmed (also of byte-order marks, which a file saved twice with a mark carries into its first cell). Unquoted cells, nearly all of a lab file, are copied in runs from the read buffer into one
 * reused {@link CellRow}. A field longer than {@link #MAX_FIELD_CHARS} or a record wider than
 * {@link #MAX_CELLS} stops the read with a clear message instead of exhausting memory.
 */
final class DelimitedTokenizer {
    /** 1 MB of text in one cell is far beyond any assay value or sample ID; it means a broken quote. */
    static final int MAX_FIELD_CHARS = 1 << 20;
    static final int MAX_CELLS = 20_000;
    private static final int EOF = -1;

    private final Reader in;
    private final char delimiter;
    private final String file;
    private static final int BUFFER_CHARS = 1 << 16;
    private final char[] buf;
    /** Whether the buffer holds the whole input (never refilled), so that its end is the input's end. */
    private final boolean whole;
    private int pos;
    private int end;
    private long line = 1;

    DelimitedTokenizer(Reader in, char delimiter, String file) {
        this(in, delimiter, file, BUFFER_CHARS);
    }

    /**
     * Reads {@code text[0, length)} in place, without copying: the text is the buffer. The tokenizer never
     * writes to its buffer, so the text may be read by several tokenizers in turn.
     */
    DelimitedTokenizer(char[] text, int length, char delimiter, String file) {
        this.in = Reader.nullReader();
        this.delimiter = delimiter;
        this.file = file;
        this.buf = text;
        this.whole = true;
        // An empty text is at its end at once (a read into an empty buffer would return 0 forever).
        this.end = length == 0 ? EOF : length;
    }

    /** @param length the input's length when known (text already in memory): a smaller buffer then suffices */
    DelimitedTokenizer(Reader in, char delimiter, String file, int length) {
        this.in = in;
        this.delimiter = delimiter;
        this.file = file;
        this.buf = new char[Math.max(16, Math.min(BUFFER_CHARS, length))];
        this.whole = false;
    }

    /**
     * Reads the next record into {@code row}; false at the end of the input. An empty line gives one
     * empty cell.
     */
    boolean next(CellRow row) {
        if (peek() == EOF) {
            return false;
        }
        if (plainRecord(row)) {
            return true;
        }
        row.begin(line);
        long recordLine = line;
        while (true) {
            int from = row.length();
            int stop = readField(row, from, row.size() + 1);
            row.endCell(from);
            if (row.size() > MAX_CELLS) {
                throw new InputException(file + ":" + recordLine + ": a row has more than " + MAX_CELLS
                        + " cells, which is not a lab table; check that the file is a delimited text table.");
            }
            if (stop != delimiter) {
                return true;
            }
        }
    }

    /**
     * Reads the next record in place when it holds no quote and no NUL and lies whole in the buffer (nearly
     * every record of a lab file): its cells are ranges of the buffer, split at the delimiter and trimmed as
     * {@link #readField} and {@link CellRow#endCell} would, without copying a character. False, having read
     * nothing, for any other record, which {@link #next} then reads character by character (and reports what
     * is wrong with it).
     */
    private boolean plainRecord(CellRow row) {
        char[] b = buf;
        int e = end;
        char d = delimiter;
        row.borrow(b, line);
        int from = pos;
        int i = pos;
        while (i < e) {
            char x = b[i];
            // Digits, letters and the signs of numbers lie above '"': one test for most characters.
            if (x > '"' && x != d) {
                i++;
                continue;
            }
            if (x == d) {
                row.addTrimmed(from, i);
                if (row.size() > MAX_CELLS) {
                    return false;
                }
                from = ++i;
                continue;
            }
            if (x == '"' || x == 0) {
                return false;
            }
            if (x == '\n' || x == '\r') {
                break;
            }
            i++;
        }
        if (i == e && !whole || i - pos > MAX_FIELD_CHARS) {
            return false;
        }
        row.addTrimmed(from, i);
        if (row.size() > MAX_CELLS) {
            return false;
        }
        if (i < e) {
            if (b[i] == '\r' && i + 1 == e && !whole) {
                return false;
            }
            pos = b[i] == '\r' && i + 1 < e && b[i + 1] == '\n' ? i + 2 : i + 1;
            line++;
        } else {
            pos = e;
        }
        return true;
    }

    /** Reads one field into {@code row}; returns the character that ended it (delimiter, '\n' or EOF). */
    private int readField(CellRow row, int from, int column) {
        int c = read();
        while (c == ' ' || (c == '\t' && delimiter != '\t') || c == CellRow.BYTE_ORDER_MARK) {
            c = read();
        }
        if (c == '"') {
            return readQuoted(row, from, column);
        }
        while (true) {
            if (c == delimiter || c == EOF) {
                return c;
            }
            if (c == '\r' || c == '\n') {
                return endLine(c);
            }
            if (c == 0) {
                append(row, from, c, column);
            }
            // The character just read is still in the buffer: it is copied with the run that follows it.
            pos--;
            copyRun(row, from, column);
            c = read();
        }
    }

    /** Copies the plain characters that follow in the buffer (up to a delimiter, line end or NUL) at once. */
    private void copyRun(CellRow row, int from, int column) {
        int p = pos;
        char d = delimiter;
        while (p < end) {
            char x = buf[p];
            if (x == d || x == '\n' || x == '\r' || x == 0) {
                break;
            }
            p++;
        }
        if (p == pos) {
            return;
        }
        if (row.cellLength(from) + (p - pos) > MAX_FIELD_CHARS) {
            throw tooLong(column);
        }
        row.append(buf, pos, p);
        pos = p;
    }

    private int readQuoted(CellRow row, int from, int column) {
        long openLine = line;
        while (true) {
            int c = read();
            if (c == EOF) {
                throw new InputException(file + ":" + openLine + ":" + column + ": a quoted cell opened here is "
                        + "never closed (expected a closing \" before the end of the file); close the quote or "
                        + "double any quote inside the cell (\"\").");
            }
            if (c == '"') {
                if (peek() == '"') {
                    read();
                    append(row, from, '"', column);
                    continue;
                }
                return afterClosingQuote(row, from, column);
            }
            if (c == '\r') {
                if (peek() == '\n') {
                    read();
                }
                line++;
                append(row, from, '\n', column);
            } else {
                if (c == '\n') {
                    line++;
                }
                append(row, from, c, column);
            }
        }
    }

    /** Text between a closing quote and the delimiter is kept as written (lenient, as spreadsheets are). */
    private int afterClosingQuote(CellRow row, int from, int column) {
        while (true) {
            int c = read();
            if (c == delimiter || c == EOF) {
                return c;
            }
            if (c == '\r' || c == '\n') {
                return endLine(c);
            }
            append(row, from, c, column);
        }
    }

    private int endLine(int c) {
        if (c == '\r' && peek() == '\n') {
            read();
        }
        line++;
        return '\n';
    }

    private void append(CellRow row, int from, int c, int column) {
        if (c == 0) {
            throw new InputException(file + ":" + line + ":" + column + ": the file contains binary data (a NUL "
                    + "character), expected a text table; export the results as CSV or XLSX.");
        }
        if (row.cellLength(from) >= MAX_FIELD_CHARS) {
            throw tooLong(column);
        }
        row.append((char) c);
    }

    private InputException tooLong(int column) {
        return new InputException(file + ":" + line + ":" + column + ": a cell is longer than 1 MB, expected "
                + "short cell texts; check for an unbalanced quote (\") above this line.");
    }

    private int read() {
        int c = peek();
        if (c != EOF) {
            pos++;
        }
        return c;
    }

    private int peek() {
        if (pos < end) {
            return buf[pos];
        }
        if (end == EOF) {
            return EOF;
        }
        try {
            int n;
            do {
                n = in.read(buf, 0, buf.length);
            } while (n == 0);
            if (n < 0) {
                end = EOF;
                pos = 0;
                return EOF;
            }
            pos = 0;
            end = n;
            return buf[0];
        } catch (CharacterCodingException e) {
            throw new InputException(file + ":" + line + ": the text is not valid in its encoding (expected "
                    + "UTF-8, with or without byte-order mark); save the file as \"CSV UTF-8\".", e);
        } catch (IOException e) {
            throw new InputException(file + ":" + line + ": the file could not be read (" + e.getMessage()
                    + "); check that it is not locked or truncated.", e);
        }
    }
}
