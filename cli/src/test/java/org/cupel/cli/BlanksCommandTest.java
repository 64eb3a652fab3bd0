package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** {@code cupel blanks} on testdata/control-blanks/blank-results.csv (invented blanks). */
class BlanksCommandTest {
    private static final String FILE = Path.of(System.getProperty("cupel.testdata"), "control-blanks",
            "blank-results.csv").toString();

    @Test
    void tableNamesTheContaminatedBlankAndItsPrecedingSample() {
        CliRun r = CliRun.run("blanks", FILE);
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("BLK-003"), r.out());
        assertTrue(r.out().matches("(?s).*BLK-003 .*S-044 .*25\\.4 .*yes.*"), r.out());
        assertTrue(r.err().contains("blank-results.csv:9:5"), r.err());
    }

    @Test
    void failOnQcExitsOne() {
        assertEquals(1, CliRun.run("blanks", FILE, "--fail-on-qc").code());
    }

    @Test
    void jsonCarriesResultsAndSummaries() throws Exception {
        CliRun r = CliRun.run("blanks", FILE, "--json");
        JsonNode doc = new ObjectMapper().readTree(r.out());
        JsonNode sum = doc.get("blanks").get("summaries").get(0);
        assertEquals("Au", sum.get("analyte").asText());
        assertEquals(1, sum.get("carryOver").asInt());
        assertEquals(7, sum.get("n").asInt());
        assertEquals("FAIL", doc.get("blanks").get("results").get(2).get("verdict").get("verdict").asText());
    }

    @Test
    void badMultipleIsAUsageError() {
        CliRun r = CliRun.run("blanks", FILE, "--warn-multiple", "8");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("warnMultiple"), r.err());
    }

    @Test
    void helpHasAnExample() {
        assertTrue(CliRun.run("blanks", "--help").out().contains("Example:"));
    }
}
