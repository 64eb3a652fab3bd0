package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
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
        Run r = run("check", MESSY.toString());
        assertEquals(CupelCommand.OK, r.code, r.err);
        assertTrue(r.out.contains("Project: Messy ingest fixture (18 samples in 2 batches)"), r.out);
        assertTrue(r.out.matches("(?s).*lab/batch-A\\.csv\\s+lab results\\s+21\\s+16\\s+5\\s+yes.*"), r.out);
        assertTrue(r.out.matches("(?s).*\\nCRM\\s+2\\n.*"), r.out);
        assertTrue(r.out.matches("(?s).*\\nAu\\s+g/t\\s+FA-AAS 9, FA-GRAV 4.*"), r.out);
        assertTrue(r.out.contains("Exceptions register ("), r.out);
        assertTrue(r.out.contains("lab/batch-A.csv:22"), r.out);
    }

    @Test
    void jsonHasTheSameContent() throws IOException {
        Run r = run("check", MESSY.toString(), "--json");
        assertEquals(CupelCommand.OK, r.code, r.err);
        JsonNode root = new ObjectMapper().readTree(r.out);
        assertTrue(root.get("usable").asBoolean());
        assertEquals(18, root.get("summary").get("samples").asInt());
        assertEquals(21, root.get("summary").get("files").get(0).get("rowsRead").asInt());
        JsonNode first = root.get("exceptions").get(0);
        assertEquals("EXCLUDED", first.get("severity").asText());
        assertEquals("lab/batch-A.csv", first.get("where").get("file").asText());
        assertFalse(first.get("fix").asText().isEmpty());
    }

    @Test
    void aFileThatCannotBeUsedGivesExitCode2AndIsListed() throws IOException {
        Files.createDirectories(dir.resolve("lab"));
        Files.writeString(dir.resolve("lab/a.csv"), "sample_id,Au_ppm\nA1,1\n");
        Files.writeString(dir.resolve("lab/b.csv"), "sample_id,Au_ppm\nA2,\"1\n");
        Run r = run("check", dir.toString());
        assertEquals(CupelCommand.INPUT_ERROR, r.code);
        assertTrue(r.out.contains("fatal") && r.out.contains("lab/b.csv:2:2"), r.out);
    }

    @Test
    void aMissingFolderIsAnInputErrorWithOneSentence() {
        Run r = run("check", dir.resolve("nope").toString());
        assertEquals(CupelCommand.INPUT_ERROR, r.code);
        assertTrue(r.err.startsWith("cupel: ") && r.err.contains("not a folder"), r.err);
    }

    @Test
    void helpShowsAnExample() {
        Run r = run("check", "--help");
        assertEquals(CupelCommand.OK, r.code);
        assertTrue(r.out.contains("cupel check demo-project"));
    }

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = CupelCommand.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }
}
