package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
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

    private static String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = CupelCommand.run(args, new PrintWriter(out), new PrintWriter(err));
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    @BeforeAll
    static void demo() {
        project = dir.resolve("demo");
        String[] r = run("demo", project.toString());
        assertEquals("0", r[0], r[2]);
    }

    @Test
    void jsonNamesTheFailedBatchAndTheReassaySamples() throws Exception {
        Path csv = dir.resolve("reassay.csv");
        String[] r = run("batches", project.toString(), "--json", "--reassay-csv", csv.toString(), "--fail-on-qc");
        assertEquals("1", r[0], r[2]);
        JsonNode doc = new ObjectMapper().readTree(r[1]);
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
        String[] r = run("batches", project.toString());
        assertEquals("0", r[0], r[2]);
        for (String heading : new String[] {"Batch verdicts", "Re-assay list", "Blanks that did not pass",
            "Insertion rates"}) {
            assertTrue(r[1].contains(heading), heading);
        }
        assertTrue(r[1].contains("probable carry-over"));
    }

    @Test
    void missingFolderIsAnInputError() {
        assertEquals("2", run("batches", dir.resolve("nope").toString())[0]);
    }
}
