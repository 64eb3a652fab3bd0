package org.cupel.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import org.cupel.report.NoBreak;

/**
 * A plain aligned text table for terminal output; numbers right-aligned, text left-aligned.
 *
 * <p>Printed through a {@link TerminalWriter}, the table fits the writer's width, as a typesetter fits a
 * table to a page. When its rows are too long, cells wrap within their columns at spaces, each column kept at
 * least as wide as its longest word, so that no word, number, ID or range of numbers is broken, nor "±" parted
 * from its number ({@link NoBreak}). The room beyond that goes first to the cells, then to the headers, which
 * cost one line each when they wrap; within each, first to the columns that need least to print whole, so
 * that short cells (numbers, intervals, IDs) stay on one line and long texts share the wrapping. When the
 * longest words do not fit side by side with two spaces between columns, one space is tried; failing that,
 * the table is printed one row at a time, each row as lines of "header  value", rows separated by a blank
 * line. Printed anywhere else ({@code --wide}), every row is one line.
 */
public final class TextTable {
    private static final String GAP = "  ";
    /** The gutter of a table that fits only so. */
    private static final String NARROW_GAP = " ";
    /** The widest column that is given its whole width before long-text columns get any. */
    private static final int SHORT = 24;

    private final List<String> headers;
    private final List<List<String>> rows = new ArrayList<>();

    public TextTable(String... headers) {
        this.headers = List.of(headers);
    }

    public TextTable row(Object... cells) {
        if (cells.length != headers.size()) {
            throw new IllegalArgumentException("expected " + headers.size() + " cells, got " + cells.length);
        }
        List<String> r = new ArrayList<>(cells.length);
        for (Object c : cells) {
            r.add(c == null ? "" : NoBreak.ranges(NoBreak.plusMinus(c.toString().replace('\n', ' '))));
        }
        rows.add(r);
        return this;
    }

    public int size() {
        return rows.size();
    }

    public void print(PrintWriter out) {
        int limit = out instanceof TerminalWriter t ? t.width() : Integer.MAX_VALUE;
        int[] natural = widths(Measure.LINES);
        int[] least = widths(Measure.WORDS);
        if (total(natural, GAP) <= limit) {
            grid(out, natural, GAP);
        } else if (total(least, GAP) <= limit) {
            grid(out, fitted(least, natural, limit - total(least, GAP)), GAP);
        } else if (total(least, NARROW_GAP) <= limit) {
            grid(out, fitted(least, natural, limit - total(least, NARROW_GAP)), NARROW_GAP);
        } else {
            stacked(out, limit);
        }
        out.flush();
    }

    /** What a column's width is measured by: its longest word, its longest cell, or its longest cell or header. */
    private enum Measure { WORDS, CELLS, LINES }

    private int[] widths(Measure m) {
        int[] w = new int[headers.size()];
        for (int c = 0; c < w.length; c++) {
            w[c] = longest(headers.get(c), m != Measure.LINES);
            for (List<String> r : rows) {
                w[c] = Math.max(w[c], longest(r.get(c), m == Measure.WORDS));
            }
        }
        return w;
    }

    /** The least widths widened by {@code room} columns: first towards the cells' widths, then the headers'. */
    private int[] fitted(int[] least, int[] natural, int room) {
        int[] cells = widths(Measure.CELLS);
        int[] w = least.clone();
        int left = widen(w, cells, room);
        widen(w, natural, left);
        return w;
    }

    private static int longest(String text, boolean words) {
        if (!words) {
            return TextWrap.columns(text);
        }
        int most = 0;
        for (String word : text.split(" ")) {
            most = Math.max(most, TextWrap.columns(word));
        }
        return most;
    }

    private static int total(int[] widths, String gap) {
        int sum = gap.length() * Math.max(0, widths.length - 1);
        for (int w : widths) {
            sum += w;
        }
        return sum;
    }

    /**
     * Widens {@code w} towards {@code target} by at most {@code room} columns: short columns (numbers,
     * intervals, IDs: at most {@value #SHORT} wide), those that lack least first, get all they lack; the rest
     * share what is left in proportion to what they lack (rounding leftovers one column each). Returns the room
     * left over.
     */
    private static int widen(int[] w, int[] target, int room) {
        Integer[] order = new Integer[w.length];
        for (int c = 0; c < w.length; c++) {
            order[c] = c;
        }
        Arrays.sort(order, Comparator.comparingInt(c -> target[c] - w[c]));
        int next = 0;
        while (next < order.length && target[order[next]] <= SHORT && target[order[next]] - w[order[next]] <= room) {
            room -= target[order[next]] - w[order[next]];
            w[order[next]] = target[order[next]];
            next++;
        }
        long lacking = 0;
        for (int i = next; i < order.length; i++) {
            lacking += target[order[i]] - w[order[i]];
        }
        if (lacking <= room) {
            for (int i = next; i < order.length; i++) {
                w[order[i]] = target[order[i]];
            }
            return (int) (room - lacking);
        }
        int[] extra = new int[w.length];
        int given = 0;
        for (int i = next; i < order.length; i++) {
            int c = order[i];
            extra[c] = (int) (room * (long) (target[c] - w[c]) / lacking);
            given += extra[c];
        }
        for (int i = next; i < order.length && given < room; i++) {
            int c = order[i];
            if (w[c] + extra[c] < target[c]) {
                extra[c]++;
                given++;
            }
        }
        for (int c = 0; c < w.length; c++) {
            w[c] += extra[c];
        }
        return 0;
    }

    private void grid(PrintWriter out, int[] width, String gap) {
        printRow(out, headers, width, gap, false);
        StringBuilder rule = new StringBuilder();
        for (int c = 0; c < width.length; c++) {
            rule.append(c == 0 ? "" : gap).append("-".repeat(width[c]));
        }
        out.println(rule);
        for (List<String> r : rows) {
            printRow(out, r, width, gap, true);
        }
    }

    /** One row, its cells wrapped within their columns: as many lines as its longest cell needs. */
    private static void printRow(PrintWriter out, List<String> cells, int[] width, String gap,
                                 boolean alignNumbers) {
        List<List<String>> wrapped = new ArrayList<>();
        int height = 1;
        for (int c = 0; c < width.length; c++) {
            List<String> lines = TextWrap.lines(cells.get(c), width[c]);
            wrapped.add(lines);
            height = Math.max(height, lines.size());
        }
        for (int line = 0; line < height; line++) {
            StringBuilder sb = new StringBuilder();
            for (int c = 0; c < width.length; c++) {
                List<String> lines = wrapped.get(c);
                String text = line < lines.size() ? lines.get(line) : "";
                boolean right = alignNumbers && looksNumeric(cells.get(c));
                String pad = " ".repeat(width[c] - TextWrap.columns(text));
                sb.append(c == 0 ? "" : gap).append(right ? pad + text : text + (c == width.length - 1 ? "" : pad));
            }
            out.println(sb.toString().stripTrailing().replace(NoBreak.SPACE, ' '));
        }
    }

    /** Each row as lines of header and value, the headers in a column of their own. */
    private void stacked(PrintWriter out, int limit) {
        int label = 0;
        for (String h : headers) {
            label = Math.max(label, TextWrap.columns(h));
        }
        label = Math.min(label, limit / 3);
        int[] width = {label, limit - label - GAP.length()};
        for (int r = 0; r < rows.size(); r++) {
            if (r > 0) {
                out.println();
            }
            for (int c = 0; c < headers.size(); c++) {
                printRow(out, List.of(headers.get(c), rows.get(r).get(c)), width, GAP, false);
            }
        }
    }

    private static boolean looksNumeric(String s) {
        return !s.isEmpty() && s.matches("[<>+\\-]?[0-9.,]+%?( ±[ \\u00A0][0-9.,]+%?)?");
    }
}
