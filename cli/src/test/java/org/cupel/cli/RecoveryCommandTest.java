package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RecoveryCommandTest {
    private static final String FIXTURE = Path.of(System.getProperty("cupel.testdata", "../testdata"), "recovery",
            "testwork").toString();

    @Test
    void printsRecoveriesVerdictsBalanceAndCaution(@TempDir Path charts) throws Exception {
        // --wide: the checks read whole table rows.
        CliRun r = CliRun.run("recovery", FIXTURE, "--charts", charts.toString(), "--wide");
        assertEquals(0, r.code(), r.err());
        String out = r.out();
        assertTrue(out.contains("Recovery per condition") && out.contains("Borax 1050C"), out);
        assertTrue(out.contains("cannot tell with this many replicates") && out.contains("per condition"), out);
        assertTrue(out.contains("Metal balance per smelt") && out.contains("Deportment"), out);
        assertTrue(out.contains("29 CFR 1910.1025"), out);
        assertNotNull(ImageIO.read(charts.resolve("recovery-Au.png").toFile()), "--charts writes a PNG per chart");
        assertTrue(Files.exists(charts.resolve("deportment-Ag.png")));
    }

    @Test
    void jsonCarriesTheSameResults() throws Exception {
        CliRun r = CliRun.run("recovery", FIXTURE, "--json", "--margin", "0.8", "--power-delta", "2");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals(8, j.get("conditions").size());
        assertEquals(12, j.get("comparisons").size());
        assertEquals(0.8, j.get("settings").get("equivalenceMargin").asDouble(), 0);
        assertEquals(2.0, j.get("comparisons").get(0).get("plan").get("difference").asDouble(), 0);
        assertTrue(j.get("caution").asText().contains("lead"));
    }

    /**
     * The demo project (docs/testwork.md) plants a clear difference (LIT60-1050 against LIT90-1050) and a
     * pair that three replicates cannot resolve (LIT60-1050 against LIT60-1100).
     */
    @Test
    void demoProjectShowsADifferenceAndACannotTell(@TempDir Path dir) throws Exception {
        Path project = dir.resolve("demo");
        CliRun demo = CliRun.run("demo", project.toString());
        assertEquals(0, demo.code(), demo.err());
        CliRun r = CliRun.run("recovery", project.toString(), "--wide");
        assertEquals(0, r.code(), r.err());
        String[] lines = r.out().split("\n");
        assertTrue(java.util.Arrays.stream(lines).anyMatch(l -> l.startsWith("Au") && l.contains("LIT60-1050 − LIT90-1050")
                && l.contains(" different ")), r.out());
        assertTrue(java.util.Arrays.stream(lines).anyMatch(l -> l.startsWith("Au") && l.contains("LIT60-1050 − LIT60-1100")
                && l.contains("cannot tell") && l.contains("per condition")), r.out());
    }

    /** A smelt without a slag assay still gives valid JSON: its numbers are null beside a note. */
    @Test
    void unusableSmeltGivesValidJsonWithANote(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("heads.csv"), "feed,replicate,Au_g/t\nF1,1,40\nF1,2,41\n");
        Files.writeString(dir.resolve("smelts.csv"), "test_id,condition,feed,charge_g,product,mass_g,Au_g/t\n"
                + "T1,A,F1,50,button,20,95\nT1,A,F1,50,slag,130,\nT2,A,F1,50,button,20,96\nT2,A,F1,50,slag,130,0.5\n");
        CliRun r = CliRun.run("recovery", dir.toString(), "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        JsonNode t1 = j.get("smelts").get(0);
        assertTrue(t1.get("byLoss").isNull(), t1.toString());
        assertTrue(t1.get("note").asText().contains("slag"), t1.toString());
        assertEquals(1, j.get("conditions").get(0).get("n").asInt());
        assertTrue(j.get("conditions").get(0).get("tInterval").get("note").asText().contains("at least 2"));
    }

    @Test
    void missingFolderIsAnInputError() {
        CliRun r = CliRun.run("recovery", "/no/such/folder");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("/no/such/folder"), r.err());
    }
}
