package org.cupel.control.crm;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Reads the reference CSVs under testdata/reference/control (see testdata/README.md). */
final class ReferenceData {
    private ReferenceData() {
    }

    static Path file(String name) {
        String dir = System.getProperty("cupel.testdata");
        if (dir == null) {
            throw new IllegalStateException("system property cupel.testdata is not set (surefire sets it)");
        }
        return Path.of(dir, "reference", "control", name);
    }

    /** A two-column key,value CSV. */
    static Map<String, Double> keyValues(String name) throws IOException {
        Map<String, Double> m = new LinkedHashMap<>();
        for (String line : Files.readAllLines(file(name)).subList(1, Files.readAllLines(file(name)).size())) {
            String[] f = line.split(",");
            m.put(f[0], Double.parseDouble(f[1]));
        }
        return m;
    }

    /** Rows of a numeric CSV with a header, as column name to values. */
    static Map<String, double[]> columns(String name) throws IOException {
        List<String> lines = Files.readAllLines(file(name));
        String[] head = lines.get(0).split(",");
        List<double[]> rows = new ArrayList<>();
        for (String l : lines.subList(1, lines.size())) {
            String[] f = l.split(",");
            double[] r = new double[f.length];
            for (int i = 0; i < f.length; i++) {
                r[i] = Double.parseDouble(f[i]);
            }
            rows.add(r);
        }
        Map<String, double[]> out = new LinkedHashMap<>();
        for (int c = 0; c < head.length; c++) {
            double[] col = new double[rows.size()];
            for (int r = 0; r < col.length; r++) {
                col[r] = rows.get(r)[c];
            }
            out.put(head[c], col);
        }
        return out;
    }
}
