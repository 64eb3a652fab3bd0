package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.AssayValue;
import org.junit.jupiter.api.Test;

/**
 * Carry-over statistics against scipy 1.10 and R 4.2 (Debian): scipy.stats.spearmanr and scipy.stats.linregress
 * over testdata/reference/control-blanks/carry_over_pairs.csv, by carry_over.py beside it.
 */
class CarryOverTest {
    private static final Path DIR = Path.of(System.getProperty("cupel.testdata"), "reference", "control-blanks");

    private static CarryOverRelation fromPairsFile() throws IOException {
        List<BlankResult> results = new ArrayList<>();
        List<String> lines = Files.readAllLines(DIR.resolve("carry_over_pairs.csv"));
        for (int i = 1; i < lines.size(); i++) {
            String[] c = lines.get(i).split(",", -1);
            double blank = Double.parseDouble(c[1]);
            AssayValue v = c[2].equals("<") ? AssayValue.belowDetection(blank) : AssayValue.detected(blank, 0.005);
            BlankObservation o = new BlankObservation(i, "B" + i, "J1", i, "Au", "g/t", v, 0.005, "S" + i,
                    AssayValue.detected(Double.parseDouble(c[0]), 0.005));
            results.add(BlankReview.judge(o, BlankSettings.DEFAULTS));
        }
        return CarryOver.relation("Au", results);
    }

    @Test
    void matchesScipy() throws IOException {
        CarryOverRelation r = fromPairsFile();
        JsonNode e = new ObjectMapper().readTree(DIR.resolve("carry_over_expected.json").toFile());
        assertEquals(e.get("n_rank").asInt(), r.nRank());
        assertEquals(e.get("n_regression").asInt(), r.nRegression());
        // 1e-12: same closed forms (ranks, Pearson on ranks, least squares); only rounding differs.
        assertEquals(e.get("spearman_rho").asDouble(), r.spearmanRho(), 1e-12);
        assertEquals(e.get("slope").asDouble(), r.slope(), 1e-12);
        assertEquals(e.get("intercept").asDouble(), r.intercept(), 1e-12);
        assertEquals(e.get("slope_stderr").asDouble(), r.slopeStdErr(), 1e-12);
        // p-values come from two t-distribution implementations (Commons Math vs scipy/Cephes): relative
        // 1e-6 covers their series truncation at p ~ 1e-11.
        assertEquals(e.get("spearman_p").asDouble(), r.spearmanP(), 1e-6 * e.get("spearman_p").asDouble());
        assertEquals(e.get("slope_p").asDouble(), r.slopeP(), 1e-6 * e.get("slope_p").asDouble());
        assertEquals("", r.note());
    }

    /** R 4.2 (Debian): cor.test(method = "spearman", exact = FALSE) and lm, by carry_over.R beside the data. */
    @Test
    void matchesR() throws IOException {
        CarryOverRelation r = fromPairsFile();
        java.util.Map<String, Double> e = new java.util.HashMap<>();
        for (String line : Files.readAllLines(DIR.resolve("carry_over_expected_r.csv")).subList(1, 9)) {
            String[] c = line.split(",");
            e.put(c[0], Double.parseDouble(c[1]));
        }
        assertEquals(e.get("n_rank").intValue(), r.nRank());
        assertEquals(e.get("n_regression").intValue(), r.nRegression());
        // 1e-12: same closed forms, only rounding differs (values written with 17 significant digits).
        assertEquals(e.get("spearman_rho"), r.spearmanRho(), 1e-12);
        assertEquals(e.get("slope"), r.slope(), 1e-12);
        assertEquals(e.get("slope_stderr"), r.slopeStdErr(), 1e-12);
        assertEquals(e.get("intercept"), r.intercept(), 1e-12);
        // Relative 1e-6: R's pt and Commons Math's t distribution are separate implementations at p ~ 1e-11.
        assertEquals(e.get("spearman_p"), r.spearmanP(), 1e-6 * e.get("spearman_p"));
        assertEquals(e.get("slope_p"), r.slopeP(), 1e-6 * e.get("slope_p"));
    }

    @Test
    void tooFewPairsGiveANoteNotANumber() {
        BlankObservation o = new BlankObservation(0, "B1", "J1", 2, "Au", "g/t", AssayValue.detected(0.02, 0.005),
                0.005, "S1", AssayValue.detected(3.0, 0.005));
        CarryOverRelation r = CarryOver.relation("Au", List.of(BlankReview.judge(o, BlankSettings.DEFAULTS)));
        assertTrue(Double.isNaN(r.spearmanRho()));
        assertTrue(r.note().contains("at least 3"), r.note());
    }

    @Test
    void correlationPAtSmallNMatchesTheTTable() {
        // Critical value of Pearson/Spearman-t r at n = 10, two-sided alpha 0.05 is 0.632 (t(8, 0.975) =
        // 2.306; r = t / sqrt(t² + 8) = 0.6319): standard t table (e.g. Zar, Biostatistical Analysis,
        // Appendix table B.3) — recalled from memory; 1e-3 because the table gives 3 decimals.
        double t = 2.306004;
        double r = t / Math.sqrt(t * t + 8);
        assertEquals(0.632, r, 1e-3);
        assertEquals(0.05, CarryOver.correlationP(r, 10), 1e-6);
    }
}
