package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RecoveryCommandTest {
    private static final String FIXTURE = Path.of(System.getProperty("cupel.testdata", "../testdata"), "recovery",
            "testwork").toString();

    private static String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = CupelCommand.run(args, new PrintWriter(out), new PrintWriter(err));
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    @Test
    void printsRecoveriesVerdictsBalanceAndCaution(@TempDir Path charts) throws Exception {
        // --wide: the checks read whole table rows.
        String[] r = run("recovery", FIXTURE, "--charts", charts.toString(), "--wide");
        assertEquals("0", r[0], r[2]);
        String out = r[1];
        System.out.println(out);
        assertTrue(out.contains("Recovery per condition") && out.contains("Borax 1050C"), out);
        assertTrue(out.contains("cannot tell with this many replicates") && out.contains("per condition"), out);
        assertTrue(out.contains("Metal balance per smelt") && out.contains("Deportment"), out);
        assertTrue(out.contains("29 CFR 1910.1025"), out);
        assertTrue(Files.size(charts.resolve("recovery-Au.png")) > 1000);
        assertTrue(Files.exists(charts.resolve("deportment-Ag.png")));
    }

    @Test
    void jsonCarriesTheSameResults() throws Exception {
        String[] r = run("recovery", FIXTURE, "--json", "--margin", "0.8", "--power-delta", "2");
        assertEquals("0", r[0], r[2]);
        JsonNode j = new ObjectMapper().readTree(r[1]);
        assertEquals(8, j.get("conditions").size());
        assertEquals(12, j.get("comparisons").size());
        assertEquals(0.8, j.get("settings").get("equivalenceMargin").asDouble(), 0);
        assertEquals(2.0, j.get("comparisons").get(0).get("plan").get("difference").asDouble(), 0);
        assertTrue(j.get("caution").asText().contains("lead"));
        Files.writeString(Path.of("target", "recovery-fixture.json"), r[1]);
    }

    /**
     * The demo project (docs/testwork.md) plants a clear difference (LIT60-1050 against LIT90-1050) and a
     * pair that three replicates cannot resolve (LIT60-1050 against LIT60-1100).
     */
    @Test
    void demoProjectShowsADifferenceAndACannotTell(@TempDir Path dir) throws Exception {
        Path project = dir.resolve("demo");
        String[] demo = run("demo", project.toString());
        assertEquals("0", demo[0], demo[2]);
        String[] r = run("recovery", project.toString(), "--wide");
        assertEquals("0", r[0], r[2]);
        System.out.println(r[1]);
        String[] lines = r[1].split("\n");
        assertTrue(java.util.Arrays.stream(lines).anyMatch(l -> l.startsWith("Au") && l.contains("LIT60-1050 − LIT90-1050")
                && l.contains(" different ")), r[1]);
        assertTrue(java.util.Arrays.stream(lines).anyMatch(l -> l.startsWith("Au") && l.contains("LIT60-1050 − LIT60-1100")
                && l.contains("cannot tell") && l.contains("per condition")), r[1]);
    }

    /** A smelt without a slag assay still gives valid JSON: its numbers are null beside a note. */
    @Test
    void unusableSmeltGivesValidJsonWithANote(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("heads.csv"), "feed,replicate,Au_g/t\nF1,1,40\nF1,2,41\n");
        Files.writeString(dir.resolve("smelts.csv"), "test_id,condition,feed,charge_g,product,mass_g,Au_g/t\n"
                + "T1,A,F1,50,button,20,95\nT1,A,F1,50,slag,130,\nT2,A,F1,50,button,20,96\nT2,A,F1,50,slag,130,0.5\n");
        String[] r = run("recovery", dir.toString(), "--json");
        assertEquals("0", r[0], r[2]);
        JsonNode j = new ObjectMapper().readTree(r[1]);
        JsonNode t1 = j.get("smelts").get(0);
        assertTrue(t1.get("byLoss").isNull(), t1.toString());
        assertTrue(t1.get("note").asText().contains("slag"), t1.toString());
        assertEquals(1, j.get("conditions").get(0).get("n").asInt());
        assertTrue(j.get("conditions").get(0).get("tInterval").get("note").asText().contains("at least 2"));
    }

    @Test
    void missingFolderIsAnInputError() {
        String[] r = run("recovery", "/no/such/folder");
        assertEquals("2", r[0]);
        assertTrue(r[2].contains("/no/such/folder"), r[2]);
    }
}
