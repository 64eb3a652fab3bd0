package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckCommandTest {
    private static final Path MESSY = Path.of(System.getProperty("cupel.testdata"), "fixtures", "ingest",
            "messy-project");

    @TempDir
    Path dir;

    @Test
    void printsAccountingRolesAnalytesAndTheExceptionsRegister() {
        CliRun r = CliRun.run("check", MESSY.toString());
        assertEquals(CupelCommand.OK, r.code(), r.err());
        assertTrue(r.out().contains("Project: Messy ingest fixture (18 samples in 2 batches)"), r.out());
        assertTrue(r.out().matches("(?s).*lab/batch-A\\.csv\\s+lab results\\s+21\\s+16\\s+5\\s+yes.*"), r.out());
        assertTrue(r.out().matches("(?s).*\\nCRM\\s+2\\n.*"), r.out());
        assertTrue(r.out().matches("(?s).*\\nAu\\s+g/t\\s+FA-AAS 9, FA-GRAV 4.*"), r.out());
        assertTrue(r.out().contains("Exceptions register ("), r.out());
        assertTrue(r.out().contains("lab/batch-A.csv:22"), r.out());
    }

    @Test
    void jsonHasTheSameContent() throws IOException {
        CliRun r = CliRun.run("check", MESSY.toString(), "--json");
        assertEquals(CupelCommand.OK, r.code(), r.err());
        JsonNode root = new ObjectMapper().readTree(r.out());
        assertTrue(root.get("usable").asBoolean());
        assertEquals(18, root.get("summary").get("samples").asInt());
        assertEquals(21, root.get("summary").get("files").get(0).get("rowsRead").asInt());
        JsonNode first = root.get("exceptions").get(0);
        assertEquals("EXCLUDED", first.get("severity").asText());
        assertEquals("lab/batch-A.csv", first.get("where").get("file").asText());
        assertFalse(first.get("fix").asText().isEmpty());
    }

    /**
     * The fixture's cupel.yaml sets Au: g/t. Hand-counted cells with a value or a code: batch-A writes Au in
     * ppm, 14 FA-AAS cells (MX1001-1005, 1007, 1008, 1011-1015, MX1003 R, MX2001; the blank cell, the two
     * unreadable ones and the rows left out do not count) and 1 FA-GRAV cell (MX1004): 15; batch-B writes g/t
     * for MX1016, MX1019 (N/A), MX1005 and MX1001: 4. Ag is ppm in both files.
     */
    @Test
    void saysWhichUnitEachAnalyteIsShownInAndWhy() throws IOException {
        // --wide: the sentence is matched whole, unwrapped
        CliRun text = CliRun.run("check", MESSY.toString(), "--wide");
        assertTrue(text.out().contains("Units: Au is reported in g/t (ingest.units in cupel.yaml): the lab files write "
                + "1 file (15 results) ppm, 1 file (4 results) g/t"), text.out());
        assertFalse(text.out().contains("Units: Ag"), "Ag: one unit, nothing to explain");
        JsonNode units = new ObjectMapper().readTree(CliRun.run("check", MESSY.toString(), "--json").out()).get("units");
        assertEquals("CONFIGURED", units.get(0).get("basis").asText());
        assertEquals(4, units.get(0).get("results").get("G_PER_T").asInt());
        assertEquals("ONLY_UNIT", units.get(1).get("basis").asText());
    }

    @Test
    void aFileThatCannotBeUsedGivesExitCode2AndIsListed() throws IOException {
        Files.createDirectories(dir.resolve("lab"));
        Files.writeString(dir.resolve("lab/a.csv"), "sample_id,Au_ppm\nA1,1\n");
        Files.writeString(dir.resolve("lab/b.csv"), "sample_id,Au_ppm\nA2,\"1\n");
        CliRun r = CliRun.run("check", dir.toString());
        assertEquals(CupelCommand.INPUT_ERROR, r.code());
        assertTrue(r.out().contains("fatal") && r.out().contains("lab/b.csv:2:2"), r.out());
    }

    @Test
    void aMissingFolderIsAnInputErrorWithOneSentence() {
        CliRun r = CliRun.run("check", dir.resolve("nope").toString());
        assertEquals(CupelCommand.INPUT_ERROR, r.code());
        assertTrue(r.err().startsWith("cupel: ") && r.err().contains("not a folder"), r.err());
    }

    @Test
    void helpShowsAnExample() {
        CliRun r = CliRun.run("check", "--help");
        assertEquals(CupelCommand.OK, r.code());
        assertTrue(r.out().contains("cupel check demo-project"));
    }

}
