package org.cupel.recovery;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.AssayValue;
import org.cupel.assay.SourceLocation;

/** Small in-memory testwork for the tests (invented numbers). */
final class Fixtures {
    static final SourceLocation HERE = new SourceLocation("test", 1, 0);

    private Fixtures() {
    }

    static Product button(double grams, double auGpt) {
        return new Product("button", ProductRole.COLLECTED, grams, Map.of("Au", AssayValue.detected(auGpt)), HERE);
    }

    static Product slag(double grams, AssayValue au) {
        return new Product("slag", ProductRole.LOSS, grams, Map.of("Au", au), HERE);
    }

    static Smelt smelt(String id, String condition, double charge, Product... products) {
        return new Smelt(id, condition, id, "F1", charge, List.of(products), HERE);
    }

    static Testwork testwork(List<Double> heads, List<Smelt> smelts) {
        List<AssayValue> h = new ArrayList<>();
        heads.forEach(v -> h.add(AssayValue.detected(v)));
        Map<String, Map<String, List<AssayValue>>> m = new LinkedHashMap<>();
        m.put("F1", Map.of("Au", h));
        return new Testwork(List.of("Au"), m, smelts, List.of());
    }

    /** Three conditions, three smelts each, of a 50 g/t feed; slag grades set the recoveries. */
    static Testwork threeConditions() {
        List<Smelt> s = new ArrayList<>();
        double[][] slag = {{0.55, 0.62, 0.48}, {0.58, 0.51, 0.66}, {1.9, 2.3, 2.1}};
        String[] names = {"A", "B", "C"};
        for (int c = 0; c < 3; c++) {
            for (int r = 0; r < 3; r++) {
                s.add(smelt(names[c] + r, names[c], 100, button(30, 165), slag(90, AssayValue.detected(slag[c][r]))));
            }
        }
        return testwork(List.of(50.2, 49.6, 50.1), s);
    }
}
