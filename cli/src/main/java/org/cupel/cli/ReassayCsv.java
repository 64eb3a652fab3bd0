package org.cupel.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.cupel.report.ReportTable;

/**
 * Writes a report table as RFC 4180 CSV, spreadsheet-safe: a cell that a spreadsheet would read as a
 * formula (starting with {@code = + - @}, tab or carriage return) gets a leading single quote.
 */
final class ReassayCsv {
    private ReassayCsv() {
    }

    static void write(ReportTable table, Path file) throws IOException {
        StringBuilder sb = new StringBuilder();
        line(sb, table.columns());
        for (List<String> row : table.rows()) {
            line(sb, row);
        }
        Files.writeString(file, sb.toString(), StandardCharsets.UTF_8);
    }

    private static void line(StringBuilder sb, List<String> cells) {
        for (int i = 0; i < cells.size(); i++) {
            sb.append(i == 0 ? "" : ",").append(field(cells.get(i)));
        }
        sb.append("\r\n");
    }

    static String field(String cell) {
        String c = cell;
        if (!c.isEmpty() && "=+-@\t\r".indexOf(c.charAt(0)) >= 0) {
            c = "'" + c;
        }
        if (c.contains(",") || c.contains("\"") || c.contains("\n") || c.contains("\r")) {
            c = "\"" + c.replace("\"", "\"\"") + "\"";
        }
        return c;
    }
}
