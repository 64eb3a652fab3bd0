package org.cupel.censored;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Reads the files under {@code testdata/reference/censored/} (see testdata/README.md). */
final class Reference {
    private Reference() {
    }

    static Path dir() {
        return Path.of(System.getProperty("cupel.testdata", "../testdata"), "reference", "censored");
    }

    /** survival_reference.csv: key → value, written by censored_reference.R with R's survival package. */
    static Map<String, Double> survival() {
        Map<String, Double> out = new HashMap<>();
        for (String line : lines("survival_reference.csv").subList(1, lines("survival_reference.csv").size())) {
            String[] kv = line.split(",");
            out.put(kv[0], Double.parseDouble(kv[1]));
        }
        return out;
    }

    /** USEPA (2009) Unified Guidance Example 15-1 manganese (ppb): 25 values, 6 below detection. */
    static CensoredSample manganese() {
        CensoredSample.Builder b = CensoredSample.builder();
        for (String line : lines("manganese.csv").subList(1, 26)) {
            String[] f = line.split(",");
            double v = Double.parseDouble(f[0]);
            if (Boolean.parseBoolean(f[1])) {
                b.below(v);
            } else {
                b.detected(v);
            }
        }
        return b.build();
    }

    /** mixed.csv: the manganese data with interval and right-censored values (lower 0 = below detection). */
    static CensoredSample mixed() {
        return intervals("mixed.csv");
    }

    /** identification_reference.csv: key → value, written by identification_reference.R. */
    static Map<String, Double> identification() {
        Map<String, Double> out = new HashMap<>();
        List<String> all = lines("identification_reference.csv");
        for (String line : all.subList(1, all.size())) {
            String[] kv = line.split(",");
            out.put(kv[0], Double.parseDouble(kv[1]));
        }
        return out;
    }

    /**
     * A lower,upper file: lower = upper a detect, lower 0 below detection at upper, upper Inf above range at
     * lower, otherwise the interval (lower, upper].
     */
    static CensoredSample intervals(String name) {
        CensoredSample.Builder b = CensoredSample.builder();
        List<String> all = lines(name);
        for (String line : all.subList(1, all.size())) {
            String[] f = line.split(",");
            double lo = Double.parseDouble(f[0]);
            double hi = f[1].equals("Inf") ? Double.POSITIVE_INFINITY : Double.parseDouble(f[1]);
            if (lo == hi) {
                b.detected(lo);
            } else if (lo == 0) {
                b.below(hi);
            } else if (Double.isInfinite(hi)) {
                b.above(lo);
            } else {
                b.between(lo, hi);
            }
        }
        return b.build();
    }

    private static List<String> lines(String name) {
        try {
            return Files.readAllLines(dir().resolve(name));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
