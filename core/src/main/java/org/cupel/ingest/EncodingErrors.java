package org.cupel.ingest;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.Charset;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Where a text file stops being valid in its encoding. A decoder reads ahead of whoever counts lines (by
 * thousands of bytes), so the line a failed read reports is not the line of the bad byte; this decodes
 * the file again from the start, counting line ends as the tokenizer does (CR, LF and CRLF; inside quotes
 * too, as physical lines), and stops at the first invalid byte.
 */
final class EncodingErrors {
    private static final int CHUNK = 1 << 16;

    private EncodingErrors() {
    }

    /**
     * The one-sentence message for the first invalid byte sequence of {@code file}: file, line and column,
     * the bytes in hex, the usual cause and the fix.
     *
     * @param skip bytes at the start that are not text (the byte-order mark)
     */
    static String locate(Path file, String displayName, Charset charset, int skip) {
        CharsetDecoder decoder = charset.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.allocate(CHUNK);
        CharBuffer out = CharBuffer.allocate(CHUNK);
        long line = 1;
        long column = 1;
        boolean afterCr = false;
        try (InputStream s = Files.newInputStream(file)) {
            s.skipNBytes(skip);
            boolean end = false;
            while (true) {
                if (!end) {
                    int n = s.read(in.array(), in.position(), in.remaining());
                    if (n < 0) {
                        end = true;
                    } else {
                        in.position(in.position() + n);
                    }
                }
                in.flip();
                CoderResult r = decoder.decode(in, out, end);
                out.flip();
                while (out.hasRemaining()) {
                    char c = out.get();
                    if (c == '\n' && afterCr) {
                        afterCr = false;
                        continue;
                    }
                    afterCr = c == '\r';
                    if (c == '\n' || c == '\r') {
                        line++;
                        column = 1;
                    } else {
                        column++;
                    }
                }
                out.clear();
                if (r.isError()) {
                    return message(displayName, charset, line, column, in, r.length());
                }
                in.compact();
                if (end && r.isUnderflow()) {
                    break;
                }
            }
        } catch (IOException e) {
            return displayName + ": the file could not be read again to find the invalid text (" + e.getMessage()
                    + "); save the file as \"CSV UTF-8\".";
        }
        return displayName + ": the text is not valid in its encoding (expected UTF-8, with or without byte-order "
                + "mark); save the file as \"CSV UTF-8\".";
    }

    private static String message(String file, Charset charset, long line, long column, ByteBuffer in, int length) {
        StringBuilder bytes = new StringBuilder();
        for (int i = 0; i < length && in.position() + i < in.limit(); i++) {
            bytes.append(i > 0 ? " " : "").append(String.format(Locale.ROOT, "0x%02X", in.get(in.position() + i) & 0xFF));
        }
        String expected = charset == StandardCharsets.UTF_8 ? "UTF-8, with or without byte-order mark"
                : charset.name() + " (as its byte-order mark says)";
        return file + ":" + line + ":" + column + ": the text is not valid " + charset.name() + " at byte(s) " + bytes
                + " (an accented letter or a symbol such as ° or µ saved as Latin-1 or Windows-1252 is the usual "
                + "cause), expected " + expected + "; save the file as \"CSV UTF-8\".";
    }
}
