package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Flagged duplicate pairs as the CLI prints them, on the demo project. The demo's lab file OAL-00010.csv reports
 * VH0001166 (the original) at 0.783 g/t and its lab repeat VH0001166-R at 0.895; OAL-00016.csv reports VH0001934
 * at 0.005 and its field duplicate VH0001936 at 0.063 (mean 0.034, below 10 × the FA-AAS limit 0.005 = 0.05);
 * OAL-00002.csv reports VH0000231 at 0.027 and its coarse-reject duplicate VH0000232 at 0.063 (mean 0.045, also
 * below 0.05, and |d| = 0.036 above the 99 % line of the coarse-reject Thompson–Howarth model).
 */
class DuplicatesFlaggedPairsCommandTest {
    @TempDir
    Path dir;

    @Test
    void idsAreInTheOrderOfTheValuesAndLowPairsAreNotRankedByHard() throws Exception {
        Path demo = dir.resolve("demo");
        CliRun.ok("demo", demo.toString());
        String out = CliRun.ok("duplicates", demo.toString(), "--analyte", "Au").out();
        // Before: "VH0001166-R / VH0001166 [OAL-00010]: 0.783 vs 0.895", the duplicate's ID before the original's value.
        assertTrue(out.contains("VH0001166 / VH0001166-R [OAL-00010]: 0.783 vs 0.895"), out);
        assertFalse(out.contains("VH0001166-R / VH0001166"), out);
        // Before: the field pair led the "largest HARD" list at 85.3 %, although HARD is not used below 10 × DL.
        assertFalse(out.contains("VH0001934 / VH0001936 [OAL-00016]: 0.005 vs 0.063, HARD"), out);
        assertTrue(out.contains("VH0000231 / VH0000232 [OAL-00002]: 0.027 vs 0.063, |d| 0.036"), out);
        assertTrue(out.contains("below the relative-measure threshold (mean < 10× DL, not judged by HARD)"), out);
        // OAL-00008.csv reports "VH0000979,0.070": as the lab wrote it (before issue 17: "0.07 vs 0.317").
        assertTrue(out.contains("VH0000979 / VH0000980 [OAL-00008]: 0.070 vs 0.317"), out);

        JsonNode doc = new ObjectMapper().readTree(CliRun.ok("duplicates", demo.toString(), "--analyte", "Au", "--json").out());
        JsonNode field = doc.get("analytes").get(0).get("sets").get(0);
        assertEquals("FIELD_DUPLICATE", field.get("type").asText());
        boolean asWritten = false;
        for (JsonNode o : field.get("outliers")) {
            asWritten |= o.get("originalId").asText().equals("VH0000979") && o.get("original").asText().equals("0.070");
        }
        assertTrue(asWritten, "the JSON text of the value as the lab wrote it");
        for (JsonNode o : field.get("outliers")) {
            assertFalse(o.get("id").asText().equals("VH0001936"), "ranked by HARD: " + o);
        }
        JsonNode coarse = doc.get("analytes").get(0).get("sets").get(1);
        assertEquals("COARSE_DUPLICATE", coarse.get("type").asText());
        boolean listedApart = false;
        for (JsonNode o : coarse.get("outliersBelowRelativeThreshold")) {
            listedApart |= o.get("id").asText().equals("VH0000232") && o.get("originalId").asText().equals("VH0000231")
                    && o.get("original").asText().equals("0.027") && o.get("duplicate").asText().equals("0.063");
        }
        assertTrue(listedApart, coarse.get("outliersBelowRelativeThreshold").toString());
    }
}
