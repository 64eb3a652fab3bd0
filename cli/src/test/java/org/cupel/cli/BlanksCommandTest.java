package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** {@code cupel blanks} on testdata/control-blanks/blank-results.csv (invented blanks). */
class BlanksCommandTest {
    private static final String FILE = Path.of(System.getProperty("cupel.testdata"), "control-blanks",
            "blank-results.csv").toString();

    private static String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = CupelCommand.run(args, new PrintWriter(out), new PrintWriter(err));
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    @Test
    void tableNamesTheContaminatedBlankAndItsPrecedingSample() {
        String[] r = run("blanks", FILE);
        assertEquals("0", r[0], r[2]);
        assertTrue(r[1].contains("BLK-003"), r[1]);
        assertTrue(r[1].matches("(?s).*BLK-003 .*S-044 .*25\\.4 .*yes.*"), r[1]);
        assertTrue(r[2].contains("blank-results.csv:9:5"), r[2]);
    }

    @Test
    void failOnQcExitsOne() {
        assertEquals("1", run("blanks", FILE, "--fail-on-qc")[0]);
    }

    @Test
    void jsonCarriesResultsAndSummaries() throws Exception {
        String[] r = run("blanks", FILE, "--json");
        JsonNode doc = new ObjectMapper().readTree(r[1]);
        JsonNode sum = doc.get("blanks").get("summaries").get(0);
        assertEquals("Au", sum.get("analyte").asText());
        assertEquals(1, sum.get("carryOver").asInt());
        assertEquals(7, sum.get("n").asInt());
        assertEquals("FAIL", doc.get("blanks").get("results").get(2).get("verdict").get("verdict").asText());
    }

    @Test
    void badMultipleIsAUsageError() {
        String[] r = run("blanks", FILE, "--warn-multiple", "8");
        assertEquals("2", r[0]);
        assertTrue(r[2].contains("warnMultiple"), r[2]);
    }

    @Test
    void helpHasAnExample() {
        assertTrue(run("blanks", "--help")[1].contains("Example:"));
    }
}
