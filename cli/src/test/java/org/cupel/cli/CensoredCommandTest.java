package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CensoredCommandTest {
    /** USEPA (2009) Unified Guidance Example 15-1 manganese (ppb), with a blank cell and an unreadable one. */
    private static final String MANGANESE = "Sample ID,Mn_ppb\n"
            + String.join("\n", "S01,<2", "S02,<2", "S03,<2", "S04,3.3", "S05,<5", "S06,<5", "S07,<5", "S08,5.3",
                    "S09,6.3", "S10,7.7", "S11,8.4", "S12,9.5", "S13,10.0", "S14,11.9", "S15,12.1", "S16,12.6",
                    "S17,16.9", "S18,17.9", "S19,21.6", "S20,22.7", "S21,34.5", "S22,45.9", "S23,53.6", "S24,77.2",
                    "S25,106.3", "S26,", "S27,n.a.x") + "\n";

    @Test
    void tableShowsEveryMethodAndTheRecommendation(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("mn.csv");
        Files.writeString(csv, MANGANESE);
        Path png = dir.resolve("mn.png");
        // --wide: the line that counts the values starts with the (temporary, any length) path.
        CliRun r = CliRun.run("censored", csv.toString(), "--column", "Mn_ppb", "--chart", png.toString(), "--wide");
        assertEquals(0, r.code(), r.err());
        // USEPA (2009) Example 15-1: KM 19.867, ROS 19.828, lognormal MLE 23.004 (4 significant digits here).
        assertTrue(r.out().contains("Kaplan–Meier"), r.out());
        assertTrue(r.out().contains("19.87"), r.out());
        assertTrue(r.out().contains("19.83"), r.out());
        assertTrue(r.out().contains("23"), r.out());
        assertTrue(r.out().contains("Substitution DL/2"), r.out());
        assertTrue(r.out().contains("Recommendation: use Kaplan–Meier"), r.out());
        assertTrue(r.out().contains("n = 25, 6 below detection (limits 2, 5)"), r.out());
        assertTrue(Files.size(png) > 1000);
        String dump = System.getProperty("cupel.cli.out()");
        if (dump != null) {
            Files.writeString(Path.of(dump), r.out() + "\n--- stderr\n" + r.err());
            Files.copy(png, Path.of(dump + ".png"), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        }
    }

    @Test
    void jsonCarriesNullsAndNotesInsteadOfNaN(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("mn.csv");
        Files.writeString(csv, MANGANESE);
        CliRun r = CliRun.run("censored", csv.toString(), "--column", "Mn_ppb", "--json", "--km-lowest", "detect");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals(25, j.get("n").asInt());
        assertEquals("detect", j.get("kmLowestMass").asText());
        JsonNode km = j.get("summaries").get(0);
        assertEquals("Kaplan–Meier", km.get("method").asText());
        // 10th percentile lies in the censored mass: null with a note, never NaN.
        JsonNode p10 = km.get("percentiles").get(0);
        assertTrue(p10.get("value").isNull());
        assertTrue(p10.get("note").asText().contains("below the lowest detect"));
        assertEquals(23.004, j.get("summaries").get(3).get("mean").get("value").asDouble(), 5e-4);
        assertEquals("Kaplan–Meier", j.get("recommendation").get("method").asText());
        assertTrue(!r.out().contains("NaN"));
    }

    @Test
    void overLimitsTurnTheSummaryToMaximumLikelihood(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("au.csv");
        Files.writeString(csv, "Sample ID,Au_ppm\nS1,<0.005\nS2,0.012\nS3,<0.01\nS4,0.031\nS5,0.007\nS6,0.25\n"
                + "S7,1.84\nS8,<0.005\nS9,0.066\nS10,0.102\nS11,>10\nS12,0.044\nS13,3.2\nS14,0.009\n");
        Path png = dir.resolve("au.png");
        CliRun r = CliRun.run("censored", csv.toString(), "--column", "Au_ppm", "--chart", png.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Recommendation: use MLE lognormal"), r.out());
        assertTrue(r.out().contains("Kaplan–Meier: not applicable"), r.out());
        assertTrue(r.out().contains("No probability plot written: not applicable: ROS handles"), r.out());
        assertTrue(!Files.exists(png));
        String dump = System.getProperty("cupel.cli.out()");
        if (dump != null) {
            Files.writeString(Path.of(dump + ".au.txt"), r.out());
        }
    }

    @Test
    void unknownColumnIsAnInputErrorNamingTheColumns(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("mn.csv");
        Files.writeString(csv, MANGANESE);
        CliRun r = CliRun.run("censored", csv.toString(), "--column", "Au_ppm");
        assertEquals(CupelCommand.INPUT_ERROR, r.code());
        assertTrue(r.err().contains("no column named 'Au_ppm'") && r.err().contains("Mn_ppb"), r.err());
    }

    @Test
    void dlCheckGivesBothEpaLimitsAndCurrie(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("blanks.csv");
        Files.writeString(csv, "Sample ID,Au_ppm\nB1,1\nB2,2\nB3,3\nB4,4\nB5,5\nB6,6\nB7,7\n");
        CliRun r = CliRun.run("dl-check", csv.toString(), "--column", "Au_ppm", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        // Replicates 1..7: mean 4, s = √(28/6). 40 CFR 136 App. B table t(6, 0.99) = 3.143 (3 decimals, so
        // 5e-4·s): MDL_s = 3.143·s; every blank numerical, so MDL_b = mean + 3.143·s.
        double s = Math.sqrt(28 / 6.0);
        assertEquals(7, j.get("n").asInt());
        assertEquals(0, j.get("missing").asInt());
        java.util.Map<String, Double> byName = new java.util.HashMap<>();
        j.get("limits").forEach(l -> byName.put(l.get("name").asText(), l.get("value").asDouble()));
        assertEquals(3.143 * s, byName.get("EPA MDL_s"), 5e-4 * s);
        assertEquals(4 + 3.143 * s, byName.get("EPA MDL_b"), 5e-4 * s);
        CliRun text = CliRun.run("dl-check", csv.toString(), "--column", "Au_ppm");
        assertTrue(text.out().contains("Currie L_D (t)") && text.out().contains("EPA MDL_b")
                && text.out().contains("includes the blank mean"), text.out());
    }

    /**
     * 120 blanks, 118 below detection and a blank cell: nothing is left out silently. The counts are printed,
     * the SD-based limits say why they are not given, and MDL_b is the blank of rank 119 of 120.
     */
    @Test
    void dlCheckOnMostlyCensoredBlanksAccountsForEveryValue(@TempDir Path dir) throws Exception {
        StringBuilder csv = new StringBuilder("Sample ID,Au_ppm\n");
        for (int i = 0; i < 118; i++) {
            csv.append("B").append(i).append(",<0.005\n");
        }
        csv.append("B118,0.005\nB119,0.208\nB120,\n");
        Path file = dir.resolve("blanks.csv");
        Files.writeString(file, csv);
        // --wide: the checks read whole lines.
        CliRun text = CliRun.run("dl-check", file.toString(), "--column", "Au_ppm", "--wide");
        assertEquals(0, text.code(), text.err());
        assertTrue(text.out().contains("120 replicates used: 2 with a number, 118 below detection; 1 missing"),
                text.out());
        assertTrue(text.out().contains("No SD: 118 of 120 values censored"), text.out());
        JsonNode j = new ObjectMapper().readTree(CliRun.run("dl-check", file.toString(), "--column", "Au_ppm", "--json").out());
        assertEquals(118, j.get("belowDetection").asInt());
        assertTrue(j.get("sd").get("value").isNull());
        JsonNode mdlB = null;
        for (JsonNode l : j.get("limits")) {
            if (l.get("name").asText().equals("EPA MDL_b")) {
                mdlB = l;
            } else {
                assertTrue(l.get("value").isNull() && l.get("note").asText().contains("118 of 120"), l.toString());
            }
        }
        assertEquals(0.005, mdlB.get("value").asDouble(), 0);
        assertTrue(mdlB.get("rule").asText().contains("rank 119 of 120"), mdlB.toString());
    }

    @Test
    void helpShowsAnExample() {
        CliRun r = CliRun.run("censored", "--help");
        assertEquals(0, r.code());
        assertTrue(r.out().contains("cupel censored assays.csv --column Au_ppm"), r.out());
        assertTrue(CliRun.run("dl-check", "--help").out().contains("cupel dl-check"));
    }
}
