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
        String[] r = run("recovery", FIXTURE, "--charts", charts.toString());
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
    }

    @Test
    void missingFolderIsAnInputError() {
        String[] r = run("recovery", "/no/such/folder");
        assertEquals("2", r[0]);
        assertTrue(r[2].contains("/no/such/folder"), r[2]);
    }
}
