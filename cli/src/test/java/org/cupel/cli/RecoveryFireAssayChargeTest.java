package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Ordinary fire-assay charges: 30 g of a 5 g/t feed hold about 150 µg of gold, so the reconciliation's
 * A V Aᵀ is about 10⁻¹² g². {@code recovery} and {@code analyse} used to stop with exit 3 ("matrix is
 * singular") on such testwork.
 */
class RecoveryFireAssayChargeTest {
    private static final String HEADS = "feed,replicate,Au_g/t\nF1,1,5.02\nF1,2,4.95\nF1,3,5.06\nF1,4,4.98\n";
    private static final String SMELTS = """
            test_id,condition,replicate,feed,charge_g,product,mass_g,Au_g/t
            T1,A,1,F1,30.00,button,28.1,5.12
            T1,A,1,F1,30.00,slag,61.2,0.071
            T2,A,2,F1,30.02,button,27.6,5.20
            T2,A,2,F1,30.02,slag,60.8,0.064
            T3,A,3,F1,29.98,button,28.4,5.05
            T3,A,3,F1,29.98,slag,61.5,0.080
            T4,B,1,F1,30.01,button,28.0,5.18
            T4,B,1,F1,30.01,slag,60.9,0.041
            T5,B,2,F1,30.00,button,27.9,5.25
            T5,B,2,F1,30.00,slag,61.0,0.038
            T6,B,3,F1,29.99,button,28.3,5.10
            T6,B,3,F1,29.99,slag,61.3,0.045
            """;

    /**
     * Smelt T1 by hand: metal in charge 30.00 g × 5.0025 g/t (mean head) = 150.075 µg; slag 61.2 g × 0.071 g/t =
     * 4.3452 µg; recovery by loss 100·(1 − 4.3452/150.075) = 97.1046 %. The reconciled recovery moves it by
     * less than the balance's uncertainty (within 1 point here), and the closure test has a p-value.
     */
    @Test
    void thirtyGramChargesAtFiveGramsPerTonneReconcile(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("heads.csv"), HEADS);
        Files.writeString(dir.resolve("smelts.csv"), SMELTS);
        CliRun table = CliRun.run("recovery", dir.toString());
        assertEquals(0, table.code(), table.err());
        assertTrue(table.out().contains("Metal balance per smelt"), table.out());
        CliRun json = CliRun.run("recovery", dir.toString(), "--json");
        assertEquals(0, json.code(), json.err());
        JsonNode j = new ObjectMapper().readTree(json.out());
        assertEquals(6, j.get("balances").size());
        JsonNode t1 = j.get("smelts").get(0);
        assertEquals("T1", t1.get("testId").asText());
        assertEquals(150.075e-6, t1.get("metalInChargeGrams").asDouble(), 1e-12);
        assertEquals(100 * (1 - 4.3452 / 150.075), t1.get("byLoss").asDouble(), 1e-9);
        for (JsonNode b : j.get("balances")) {
            assertEquals("", b.get("note").asText(), b.toString());
            double p = b.get("reconciliation").get("p").asDouble();
            assertTrue(p > 0 && p <= 1, b.toString());
        }
        JsonNode b1 = j.get("balances").get(0);
        assertEquals(t1.get("byLoss").asDouble(), b1.get("reconciledRecovery").asDouble(), 1.0);
    }

    /** The same testwork inside a project: {@code analyse} runs the recovery analysis with the rest. */
    @Test
    void analyseRunsOnAFireAssayProject(@TempDir Path dir) throws Exception {
        Path project = dir.resolve("demo");
        CliRun demo = CliRun.run("demo", project.toString());
        assertEquals(0, demo.code(), demo.err());
        Files.writeString(project.resolve("testwork").resolve("heads.csv"), HEADS);
        Files.writeString(project.resolve("testwork").resolve("smelts.csv"), SMELTS);
        CliRun r = CliRun.run("analyse", project.toString(), "--json-summary");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("\"id\" : \"testwork\""), r.out());
    }
}
