package org.cupel.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The 50-digit mpmath values of testdata/reference/special-functions/ (written by special_functions.py there;
 * see testdata/README.md): one row per line, its numbers by column name, and the distance of a computed value
 * from a reference value in units in the last place of the reference.
 */
public final class SpecialFunctionReference {
    private SpecialFunctionReference() {
    }

    /** The rows of {@code file}, each a map from column name to number. */
    public static List<Map<String, Double>> rows(String file) {
        Path path = Path.of(System.getProperty("cupel.testdata", "../testdata"), "reference", "special-functions", file);
        try {
            List<String> lines = Files.readAllLines(path);
            String[] header = lines.get(0).split(",");
            List<Map<String, Double>> out = new ArrayList<>();
            for (String line : lines.subList(1, lines.size())) {
                String[] cells = line.split(",");
                Map<String, Double> row = new HashMap<>();
                for (int c = 0; c < header.length; c++) {
                    row.put(header[c], Double.parseDouble(cells[c]));
                }
                out.add(row);
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * |got − reference| in units of {@code Math.ulp(reference)}: 0 when equal (infinities included), infinite
     * when {@code got} is NaN or one of the two is infinite and the other not.
     */
    public static double ulps(double got, double reference) {
        if (got == reference) {
            return 0;
        }
        if (Double.isNaN(got) || Double.isInfinite(got) || Double.isInfinite(reference)) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.abs(got - reference) / Math.ulp(reference);
    }
}
