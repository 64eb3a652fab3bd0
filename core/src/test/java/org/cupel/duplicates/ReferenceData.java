package org.cupel.duplicates;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** Reads the reference files under testdata/reference/duplicates (see testdata/README.md). */
final class ReferenceData {
    private ReferenceData() {
    }

    static Path dir() {
        String root = System.getProperty("cupel.testdata");
        if (root == null) {
            throw new IllegalStateException("system property cupel.testdata is not set (surefire sets it)");
        }
        return Path.of(root, "reference", "duplicates");
    }

    static JsonNode json(String name) {
        try {
            return new ObjectMapper().readTree(dir().resolve(name).toFile());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Columns original, duplicate of a reference pairs CSV: {a, b}. */
    static double[][] pairs(String name) {
        try {
            List<String> lines = Files.readAllLines(dir().resolve(name));
            int n = lines.size() - 1;
            double[][] out = new double[2][n];
            for (int i = 0; i < n; i++) {
                String[] cells = lines.get(i + 1).split(",");
                out[0][i] = Double.parseDouble(cells[0]);
                out[1][i] = Double.parseDouble(cells[1]);
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
