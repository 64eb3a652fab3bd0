package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code cupel batches} on the demo project (docs/demo.md): the planted contaminated blank fails its batch
 * and sends the samples after it back; the drifting CRM's failures add their brackets.
 */
class BatchesCommandTest {
    @TempDir
    static Path dir;
    static Path project;

    @BeforeAll
    static void demo() {
        project = dir.resolve("demo");
        CliRun r = CliRun.run("demo", project.toString());
        assertEquals(0, r.code(), r.err());
    }

    @Test
    void jsonNamesTheFailedBatchAndTheReassaySamples() throws Exception {
        Path csv = dir.resolve("reassay.csv");
        CliRun r = CliRun.run("batches", project.toString(), "--json", "--reassay-csv", csv.toString(), "--fail-on-qc");
        assertEquals(1, r.code(), r.err());
        JsonNode doc = new ObjectMapper().readTree(r.out());
        assertTrue(doc.get("anyBatchFailed").asBoolean());
        JsonNode carry = null;
        for (JsonNode b : doc.get("blanks").get("results")) {
            if (b.get("carryOver").asBoolean()) {
                carry = b;
            }
        }
        String blank = carry.get("observation").get("sampleId").asText();
        String batch = carry.get("observation").get("batch").asText();
        for (JsonNode v : doc.get("verdicts")) {
            if (v.get("batch").asText().equals(batch)) {
                assertEquals("FAIL", v.get("verdict").asText());
            }
        }
        JsonNode entries = doc.get("reassay").get("entries");
        int byBlank = 0;
        for (JsonNode e : entries) {
            if (e.get("triggeredBy").toString().contains("\"" + blank + "\"")) {
                byBlank++;
                assertEquals(batch, e.get("batch").asText());
                assertTrue(e.get("position").asInt() > carry.get("observation").get("position").asInt());
            }
        }
        assertTrue(byBlank > 0);
        // The drifting CRM of the demo fails late batches too: their samples are listed as well.
        assertTrue(entries.size() > byBlank);
        List<String> lines = Files.readAllLines(csv);
        assertEquals("sample_id,batch,position,analyte,triggered_by,reason", lines.get(0),
                "the report's CSV header style (docs/report.md, CSV tables)");
        assertEquals(entries.size() + 1, lines.size());
    }

    @Test
    void tableShowsVerdictsReassayBlanksAndInsertion() {
        CliRun r = CliRun.run("batches", project.toString());
        assertEquals(0, r.code(), r.err());
        for (String heading : new String[] {"Batch verdicts", "Re-assay list", "Blanks that did not pass",
            "Insertion rates"}) {
            assertTrue(r.out().contains(heading), heading);
        }
        assertTrue(r.out().contains("probable carry-over"));
    }

    // The demo generator codes three samples IS and two NR in both analyte columns (docs/demo.md, planted
    // problems; PlantLog), and sends 125 umpire checks to Brisk Fen Analytical in five batches of 25.
    @Test
    void tableListsTheSamplesToResubmitAndTheUmpireLabApart() throws Exception {
        CliRun r = CliRun.run("batches", project.toString());
        assertEquals(0, r.code(), r.err());
        String[][] planted = {{"VH0000502", "OAL-00005", "IS", "insufficient sample"},
            {"VH0000898", "OAL-00008", "NR", "not received"}, {"VH0001650", "OAL-00014", "IS", "insufficient sample"},
            {"VH0002252", "OAL-00019", "NR", "not received"}, {"VH0002769", "OAL-00023", "IS", "insufficient sample"}};
        String out = r.out();
        String resubmit = out.substring(out.indexOf("Samples to re-submit (5,"));
        for (String[] p : planted) {
            assertTrue(resubmit.lines().anyMatch(l -> l.startsWith(p[0]) && l.contains(p[1]) && l.contains("Au, Ag")
                    && l.contains(" " + p[2] + " ") && l.contains(p[3])), String.join(" ", p) + "\n" + resubmit);
        }
        assertTrue(out.replace('\n', ' ').contains("Umpire lab (Brisk Fen Analytical): 5 batches (BFA-U0001–BFA-U0005), "
                + "125 check assays, not counted among the batches above"), out);
        assertTrue(out.lines().allMatch(l -> !l.startsWith("Umpire") || l.length() <= 120), "prose wrapped to 120");
        String table = out.substring(0, out.indexOf("Reasons"));
        assertTrue(table.lines().noneMatch(l -> l.startsWith("BFA-")), "umpire batches are not primary rows");
        assertTrue(!out.contains("cannot judge"), "no primary batch of the demo lacks controls");
        JsonNode doc = new ObjectMapper().readTree(CliRun.run("batches", project.toString(), "--json").out());
        assertEquals(5, doc.get("resubmit").size());
        assertEquals("IS", doc.get("resubmit").get(0).get("labCodes").get(0).asText());
        assertEquals(125, doc.get("umpireLabs").get(0).get("checkAssays").asInt());
    }

    @Test
    void missingFolderIsAnInputError() {
        assertEquals(2, CliRun.run("batches", dir.resolve("nope").toString()).code());
    }
}
