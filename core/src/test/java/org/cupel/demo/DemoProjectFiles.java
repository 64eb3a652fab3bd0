package org.cupel.demo;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A deliberately naive reader of what the generator wrote, independent of the ingest package, so the
 * demo tests check the files themselves: header block skipped up to the {@code Sample ID} row, tab or
 * comma split, BOM and CR removed.
 */
final class DemoProjectFiles {

    /** One data row of a lab file. */
    record LabRow(String file, int index, String id, List<String> cells) {
    }

    /** One register row. */
    record RegisterRow(String id, String role, String reference, String hole) {
    }

    /** Header names per lab file. */
    final Map<String, List<String>> headers = new LinkedHashMap<>();
    /** Rows per lab file, in file order. */
    final Map<String, List<LabRow>> labRows = new LinkedHashMap<>();
    final List<RegisterRow> register = new ArrayList<>();
    final Map<String, RegisterRow> registerById = new HashMap<>();
    /** Catalog rows: crm|analyte to {value, sd}. */
    final Map<String, double[]> catalog = new LinkedHashMap<>();

    DemoProjectFiles(MemorySink sink) {
        for (String path : sink.paths()) {
            if (path.startsWith("lab/")) {
                readLab(path, sink.text(path));
            }
        }
        List<String[]> reg = lines(sink.text("register.csv"), ",");
        for (String[] r : reg.subList(1, reg.size())) {
            RegisterRow row = new RegisterRow(r[0], r[1], r[2], r[3]);
            register.add(row);
            registerById.put(row.id(), row);
        }
        List<String[]> cat = lines(sink.text("crm-catalog.csv"), ",");
        for (String[] r : cat.subList(1, cat.size())) {
            catalog.put(r[0] + "|" + r[1], new double[] {Double.parseDouble(r[3]), Double.parseDouble(r[4])});
        }
    }

    private void readLab(String path, String text) {
        String delimiter = path.endsWith(".tsv") ? "\t" : ",";
        List<String[]> all = lines(text, delimiter);
        int start = 0;
        while (!all.get(start)[0].equals("Sample ID")) {
            start++;
        }
        headers.put(path, List.of(all.get(start)));
        List<LabRow> rows = new ArrayList<>();
        for (int i = start + 1; i < all.size(); i++) {
            String[] r = all.get(i);
            rows.add(new LabRow(path, rows.size(), r[0], List.of(r).subList(1, r.length)));
        }
        labRows.put(path, rows);
    }

    private static List<String[]> lines(String text, String delimiter) {
        String t = text.startsWith("\uFEFF") ? text.substring(1) : text;
        List<String[]> out = new ArrayList<>();
        for (String line : t.split("\n")) {
            String l = line.endsWith("\r") ? line.substring(0, line.length() - 1) : line;
            out.add(l.split(delimiter, -1));
        }
        return out;
    }

    List<LabRow> allLabRows() {
        List<LabRow> out = new ArrayList<>();
        labRows.values().forEach(out::addAll);
        return out;
    }

    /** Primary-lab batch files (not umpire, not re-assay). */
    List<String> primaryFiles() {
        return labRows.keySet().stream()
                .filter(p -> p.startsWith("lab/OAL-") && !p.contains("-GRAV")).toList();
    }

    /** A cell as a number: detected values as they are, {@code <x}/{@code -x} as NaN; null for other text. */
    static Double number(String cell) {
        if (cell.startsWith("<") || cell.startsWith("-") || cell.startsWith(">")) {
            return Double.NaN;
        }
        try {
            return Double.valueOf(cell);
        } catch (NumberFormatException e) {
            return null;
        }
    }

    /** Batch index (0-based) of a primary-lab file name. */
    static int batchOf(String path) {
        return Integer.parseInt(path.substring("lab/OAL-".length(), "lab/OAL-".length() + 5)) - 1;
    }
}
