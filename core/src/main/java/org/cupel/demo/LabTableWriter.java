package org.cupel.demo;

import java.io.IOException;
import java.io.Writer;
import java.util.List;

/** Writes one lab result file: the lab's header block, the column header row, then one row per result. */
final class LabTableWriter implements AutoCloseable {

    private final Writer out;
    private final LabFileStyle style;
    private final List<DemoAnalyte> columns;
    private final String[] detectionText;
    private final String[] upperText;
    private final StringBuilder line = new StringBuilder(256);

    LabTableWriter(Writer out, LabFileStyle style, List<DemoAnalyte> columns, List<String> headerBlock)
            throws IOException {
        this.out = out;
        this.style = style;
        this.columns = columns;
        this.detectionText = columns.stream().map(DemoAnalyte::detectionLimitText).toArray(String[]::new);
        this.upperText = columns.stream().map(DemoAnalyte::upperLimitText).toArray(String[]::new);
        if (style.byteOrderMark()) {
            out.write('\uFEFF');
        }
        for (String h : headerBlock) {
            out.write(h);
            out.write(style.lineEnd());
        }
        line.append("Sample ID");
        for (DemoAnalyte a : columns) {
            String unit = a == DemoAnalyte.GOLD ? style.goldUnit() : a.unit();
            line.append(style.delimiter()).append(a.header(unit, style.spacedHeaders() ? ' ' : '_'));
        }
        flushLine();
    }

    /**
     * One result row.
     *
     * @param rowCode  missing-value code for every cell, or null
     * @param typoText text replacing the first column's value, or null
     */
    void row(String id, double[] values, String rowCode, String typoText) throws IOException {
        line.append(id);
        for (int a = 0; a < columns.size(); a++) {
            line.append(style.delimiter());
            if (rowCode != null) {
                line.append(rowCode);
            } else if (a == 0 && typoText != null) {
                line.append(typoText);
            } else {
                cell(a, values[a]);
            }
        }
        flushLine();
    }

    /** The text a lab writes for {@code value}: censored at the method's limits in this file's convention. */
    static String cellText(DemoAnalyte a, double value, LabFileStyle style) {
        return appendCell(new StringBuilder(), a, value, style, a.detectionLimitText(), a.upperLimitText()).toString();
    }

    private void cell(int column, double value) {
        appendCell(line, columns.get(column), value, style, detectionText[column], upperText[column]);
    }

    private static StringBuilder appendCell(StringBuilder sb, DemoAnalyte a, double value, LabFileStyle style,
                                            String detectionText, String upperText) {
        if (value < a.detectionLimit()) {
            return sb.append(style.negativeBelowDetection() ? '-' : '<').append(detectionText);
        }
        if (value > a.upperLimit()) {
            return sb.append('>').append(upperText);
        }
        return FixedDecimal.append(sb, value, a.decimals());
    }

    private void flushLine() throws IOException {
        line.append(style.lineEnd());
        out.append(line);
        line.setLength(0);
    }

    @Override
    public void close() throws IOException {
        out.close();
    }
}
