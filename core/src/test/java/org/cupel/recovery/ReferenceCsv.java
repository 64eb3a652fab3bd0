package org.cupel.recovery;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Reads the small reference CSVs under testdata/reference/recovery (written by R or Python; no quoted commas). */
final class ReferenceCsv {
    private ReferenceCsv() {
    }

    static List<Map<String, String>> rows(String file) throws IOException {
        Path dir = Path.of(System.getProperty("cupel.testdata", "../testdata"), "reference", "recovery");
        List<String> lines = Files.readAllLines(dir.resolve(file));
        String[] header = unquote(lines.get(0).split(","));
        List<Map<String, String>> out = new ArrayList<>();
        for (String line : lines.subList(1, lines.size())) {
            String[] cells = unquote(line.split(",", -1));
            Map<String, String> row = new LinkedHashMap<>();
            for (int c = 0; c < header.length; c++) {
                row.put(header[c], cells[c]);
            }
            out.add(row);
        }
        return out;
    }

    static double number(Map<String, String> row, String column) {
        String s = row.get(column);
        return s.equals("Inf") ? Double.POSITIVE_INFINITY : Double.parseDouble(s);
    }

    private static String[] unquote(String[] cells) {
        for (int i = 0; i < cells.length; i++) {
            cells[i] = cells[i].replace("\"", "");
        }
        return cells;
    }
}
