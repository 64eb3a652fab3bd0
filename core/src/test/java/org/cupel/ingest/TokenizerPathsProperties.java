package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.Reader;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import org.cupel.project.InputException;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * The tokenizer splits a record without quotes in place, its cells ranges of its buffer; every other record
 * it reads character by character. Both give the same records: each text is read whole (the in-place split
 * applies to nearly every record), through the streaming buffer, and from a reader that hands over one
 * character at a time (no record but an empty line lies whole in the buffer, so every record is read
 * character by character), and the records (line, cells) and any input error must be the same. Texts mix
 * delimiters, quotes, CR, LF and CRLF, blanks, byte-order marks, zero-width and other spaces, NUL and
 * non-ASCII letters.
 */
class TokenizerPathsProperties {
    private static final String CHARS = ",,;;\t\"\r\n\n    abcAuRS019..<>-=+BDLNRIS/%\u0000\uFEFF\u00e9\u00a0\u200B\u2003\u000B";

    record Text(String text, char delimiter) {
        @Override
        public String toString() {
            return "delimiter " + (int) delimiter + ", text \"" + text.replace("\r", "\\r").replace("\n", "\\n")
                    .replace("\t", "\\t").replace("\u0000", "\\0") + "\"";
        }
    }

    private static final Gen<Text> TEXTS = r -> {
        StringBuilder sb = new StringBuilder();
        int n = r.nextInt(0, 400);
        boolean noNul = r.nextBoolean();
        boolean noQuotes = r.nextInt(3) == 0;
        for (int i = 0; i < n; i++) {
            char c = CHARS.charAt(r.nextInt(CHARS.length()));
            if ((noNul && c == 0) || (noQuotes && c == '"')) {
                c = 'x';
            }
            sb.append(c);
        }
        return new Text(sb.toString(), ",;\t".charAt(r.nextInt(3)));
    };

    @Test
    void inPlaceRecordsEqualCharacterByCharacterRecords() {
        SeededTries.forAll(400, TEXTS, t -> {
            char[] chars = t.text().toCharArray();
            String whole = records(new DelimitedTokenizer(chars, chars.length, t.delimiter(), "f.csv"));
            String streamed = records(new DelimitedTokenizer(new StringReader(t.text()), t.delimiter(), "f.csv", 16));
            String byChar = records(new DelimitedTokenizer(oneAtATime(t.text()), t.delimiter(), "f.csv", 16));
            assertEquals(byChar, whole);
            assertEquals(byChar, streamed);
        });
    }

    /** Every record as its line and cells, then the input error that stopped the read, if any. */
    private static String records(DelimitedTokenizer t) {
        List<String> out = new ArrayList<>();
        CellRow row = new CellRow();
        try {
            while (t.next(row)) {
                out.add(row.line() + " " + row.cells());
            }
        } catch (InputException e) {
            out.add("error " + e.getMessage());
        }
        return String.join("\n", out);
    }

    /** A reader that hands over one character per read. */
    private static Reader oneAtATime(String text) {
        return new Reader() {
            private int pos;

            @Override
            public int read(char[] cbuf, int off, int len) {
                if (pos == text.length()) {
                    return -1;
                }
                if (len == 0) {
                    return 0;
                }
                cbuf[off] = text.charAt(pos++);
                return 1;
            }

            @Override
            public void close() {
            }
        };
    }
}
