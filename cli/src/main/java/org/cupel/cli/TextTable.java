package org.cupel.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;

/** A plain aligned text table for terminal output; numbers right-aligned, text left-aligned. */
public final class TextTable {
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
            r.add(c == null ? "" : c.toString().replace('\n', ' '));
        }
        rows.add(r);
        return this;
    }

    public int size() {
        return rows.size();
    }

    public void print(PrintWriter out) {
        int[] width = new int[headers.size()];
        for (int c = 0; c < width.length; c++) {
            width[c] = headers.get(c).length();
            for (List<String> r : rows) {
                width[c] = Math.max(width[c], r.get(c).length());
            }
        }
        printRow(out, headers, width, false);
        StringBuilder rule = new StringBuilder();
        for (int c = 0; c < width.length; c++) {
            rule.append(c == 0 ? "" : "  ").append("-".repeat(width[c]));
        }
        out.println(rule);
        for (List<String> r : rows) {
            printRow(out, r, width, true);
        }
        out.flush();
    }

    private static void printRow(PrintWriter out, List<String> cells, int[] width, boolean alignNumbers) {
        StringBuilder sb = new StringBuilder();
        for (int c = 0; c < width.length; c++) {
            String cell = cells.get(c);
            boolean right = alignNumbers && looksNumeric(cell);
            String pad = " ".repeat(width[c] - cell.length());
            sb.append(c == 0 ? "" : "  ").append(right ? pad + cell : cell + (c == width.length - 1 ? "" : pad));
        }
        out.println(sb.toString().stripTrailing());
    }

    private static boolean looksNumeric(String s) {
        return !s.isEmpty() && s.matches("[<>+\\-]?[0-9.,]+%?( ± [0-9.,]+%?)?");
    }
}
