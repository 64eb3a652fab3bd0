package org.cupel.robust;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * One damage done to a well-formed input file, of the kinds lab files really suffer (issues 9 and 15): stray
 * bytes, cut lines, a delimiter too many or too few, a quote left open, a huge field, Latin-1 or broken UTF-8
 * in a UTF-8 file, NUL bytes, a 10,000-column header, an empty file, a header with no rows, a ragged row
 * (a cell too many or too few), decimal commas mixed with a thousands separator, and a register that is
 * missing or misnamed ({@link Kind#MISSING_REGISTER} changes the project's layout, not the bytes: see
 * {@link FuzzTarget#write}). {@code at} is where in the file (0..1 of its length), {@code size} how much.
 */
record Mutation(Kind kind, double at, int size) {

    enum Kind {
        RANDOM_BYTES, TRUNCATE, CUT_LINE, EXTRA_DELIMITER, DROP_DELIMITER, OPEN_QUOTE, HUGE_FIELD, LATIN1,
        INVALID_UTF8, NUL, WIDE_HEADER, EMPTY, HEADER_ONLY, DUPLICATE_LINE, SWAP_DELIMITER, BLANK_LINES,
        RAGGED_ROW, MIXED_DECIMAL, MISSING_REGISTER
    }

    /** How a missing or misnamed register is laid out ({@code size} picks one). */
    enum RegisterLayout { ABSENT, WRONG_CASE, TSV_NAME, FOLDER, DANGLING_LINK }

    private static final byte[] DELIMITERS = {',', ';', '\t'};

    /** One to four mutations drawn from {@code random}: the distribution of every fuzz property and run. */
    static List<Mutation> some(Random random) {
        List<Mutation> out = new ArrayList<>();
        int n = 1 + random.nextInt(4);
        for (int i = 0; i < n; i++) {
            out.add(new Mutation(Kind.values()[random.nextInt(Kind.values().length)], random.nextDouble(),
                    1 + random.nextInt(64)));
        }
        return out;
    }

    /** The register layout of the last {@link Kind#MISSING_REGISTER} among {@code mutations}, or null. */
    static RegisterLayout registerLayout(List<Mutation> mutations) {
        RegisterLayout layout = null;
        for (Mutation m : mutations) {
            if (m.kind == Kind.MISSING_REGISTER) {
                layout = RegisterLayout.values()[m.size % RegisterLayout.values().length];
            }
        }
        return layout;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s@%.3f×%d", kind, at, size);
    }

    static byte[] applyAll(byte[] seed, List<Mutation> mutations) {
        byte[] b = seed;
        for (Mutation m : mutations) {
            b = m.apply(b);
        }
        return b;
    }

    byte[] apply(byte[] in) {
        int pos = (int) Math.min(in.length, Math.floor(at * in.length));
        Random r = new Random(Double.doubleToLongBits(at) ^ size);
        switch (kind) {
            case RANDOM_BYTES: {
                byte[] noise = new byte[size];
                r.nextBytes(noise);
                return splice(in, pos, Math.min(size / 2, in.length - pos), noise);
            }
            case TRUNCATE:
                return Arrays.copyOf(in, pos);
            case CUT_LINE: {
                int end = indexOf(in, (byte) '\n', pos);
                return end < 0 ? Arrays.copyOf(in, pos) : splice(in, pos, end - pos, new byte[0]);
            }
            case EXTRA_DELIMITER:
                return splice(in, pos, 0, new byte[] {DELIMITERS[size % 3]});
            case DROP_DELIMITER: {
                int d = indexOfDelimiter(in, pos);
                return d < 0 ? in : splice(in, d, 1, new byte[0]);
            }
            case OPEN_QUOTE:
                return splice(in, pos, 0, new byte[] {'"'});
            case HUGE_FIELD: {
                byte[] field = new byte[size * 4096];
                Arrays.fill(field, (byte) ('0' + size % 10));
                return splice(in, pos, 0, field);
            }
            case LATIN1:
                return splice(in, pos, 0, "Fe\u00e9\u00b5g/t\u00b0".getBytes(StandardCharsets.ISO_8859_1));
            case INVALID_UTF8:
                return splice(in, pos, 0, new byte[] {(byte) 0xC3, (byte) 0x28, (byte) 0xFF, (byte) 0xE2, (byte) 0x82});
            case NUL:
                return splice(in, pos, 0, new byte[] {0});
            case WIDE_HEADER:
                return wideHeader(in);
            case EMPTY:
                return new byte[0];
            case HEADER_ONLY: {
                int nl = indexOf(in, (byte) '\n', 0);
                return nl < 0 ? in : Arrays.copyOf(in, nl + 1);
            }
            case DUPLICATE_LINE: {
                int start = lastIndexOf(in, (byte) '\n', pos) + 1;
                int end = indexOf(in, (byte) '\n', pos);
                return end < 0 ? in : splice(in, end + 1, 0, Arrays.copyOfRange(in, start, end + 1));
            }
            case SWAP_DELIMITER: {
                byte[] out = in.clone();
                byte to = DELIMITERS[size % 3];
                for (int i = pos; i < out.length; i++) {
                    if (out[i] == ',' || out[i] == ';' || out[i] == '\t') {
                        out[i] = to;
                    }
                }
                return out;
            }
            case BLANK_LINES:
                return splice(in, pos, 0, "\r\n\n ,,\n\r".getBytes(StandardCharsets.US_ASCII));
            case RAGGED_ROW:
                return ragged(in, pos, size % 2 == 0);
            case MIXED_DECIMAL:
                return mixedDecimal(in, pos);
            case MISSING_REGISTER:
                return in;
            default:
                throw new AssertionError(kind);
        }
    }

    /** The data line holding {@code pos} (the second line when {@code pos} is on the first): {start, end}. */
    private static int[] dataLine(byte[] in, int pos) {
        int start = lastIndexOf(in, (byte) '\n', pos) + 1;
        if (start == 0) {
            int nl = indexOf(in, (byte) '\n', 0);
            start = nl < 0 ? in.length : nl + 1;
        }
        int end = indexOf(in, (byte) '\n', start);
        end = end < 0 ? in.length : end;
        if (end > start && in[end - 1] == '\r') {
            end--;
        }
        return new int[] {start, end};
    }

    private static byte delimiterOf(byte[] in, int from, int to) {
        for (int i = from; i < to; i++) {
            if (in[i] == ',' || in[i] == ';' || in[i] == '\t') {
                return in[i];
            }
        }
        return ',';
    }

    /** A data line with an extra cell appended ({@code extra}), or with its last cell cut off. */
    private static byte[] ragged(byte[] in, int pos, boolean extra) {
        int[] line = dataLine(in, pos);
        byte d = delimiterOf(in, line[0], line[1]);
        if (extra) {
            return splice(in, line[1], 0, new byte[] {d, '9', '.', '9'});
        }
        for (int i = line[1] - 1; i >= line[0]; i--) {
            if (in[i] == d) {
                return splice(in, i, line[1] - i, new byte[0]);
            }
        }
        return in;
    }

    /**
     * A data line whose second and third cells become {@code "0,512"} (a decimal comma) and {@code "1,234"}
     * (a thousands separator, or a decimal comma: the ambiguity of issue 15), quoted so the cell count stays.
     */
    private static byte[] mixedDecimal(byte[] in, int pos) {
        int[] line = dataLine(in, pos);
        byte d = delimiterOf(in, line[0], line[1]);
        String text = new String(in, line[0], line[1] - line[0], StandardCharsets.ISO_8859_1);
        String[] cells = text.split(java.util.regex.Pattern.quote(String.valueOf((char) d)), -1);
        String[] out = Arrays.copyOf(cells, Math.max(cells.length, 3));
        out[1] = "\"0,512\"";
        out[2] = "\"1,234\"";
        for (int i = 0; i < out.length; i++) {
            out[i] = out[i] == null ? "" : out[i];
        }
        byte[] replaced = String.join(String.valueOf((char) d), out).getBytes(StandardCharsets.ISO_8859_1);
        return splice(in, line[0], line[1] - line[0], replaced);
    }

    /** The first line followed by 10,000 extra header cells, then the rest. */
    private static byte[] wideHeader(byte[] in) {
        int nl = indexOf(in, (byte) '\n', 0);
        int at = nl < 0 ? in.length : nl;
        ByteArrayOutputStream extra = new ByteArrayOutputStream();
        for (int i = 0; i < 10_000; i++) {
            extra.writeBytes((",X" + i + "_ppm").getBytes(StandardCharsets.US_ASCII));
        }
        return splice(in, at, 0, extra.toByteArray());
    }

    private static byte[] splice(byte[] in, int at, int remove, byte[] insert) {
        byte[] out = new byte[in.length - remove + insert.length];
        System.arraycopy(in, 0, out, 0, at);
        System.arraycopy(insert, 0, out, at, insert.length);
        System.arraycopy(in, at + remove, out, at + insert.length, in.length - at - remove);
        return out;
    }

    private static int indexOf(byte[] b, byte x, int from) {
        for (int i = from; i < b.length; i++) {
            if (b[i] == x) {
                return i;
            }
        }
        return -1;
    }

    private static int lastIndexOf(byte[] b, byte x, int before) {
        for (int i = Math.min(before, b.length) - 1; i >= 0; i--) {
            if (b[i] == x) {
                return i;
            }
        }
        return -1;
    }

    private static int indexOfDelimiter(byte[] b, int from) {
        for (int i = from; i < b.length; i++) {
            if (b[i] == ',' || b[i] == ';' || b[i] == '\t') {
                return i;
            }
        }
        return -1;
    }
}
