package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code cupel analyse} runs the appendix's analyses without charts and reports the sections it built. */
class AnalyseCommandTest {

    @Test
    void analysesTheDemoProjectWithoutWritingFiles(@TempDir Path dir) throws Exception {
        Path project = dir.resolve("demo");
        StringWriter err = new StringWriter();
        assertEquals(0, CupelCommand.run(new String[] {"demo", project.toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(err)), err.toString());
        long filesBefore;
        try (var s = java.nio.file.Files.walk(dir)) {
            filesBefore = s.count();
        }
        StringWriter out = new StringWriter();
        assertEquals(0, CupelCommand.run(new String[] {"analyse", project.toString(), "--json-summary"},
                new PrintWriter(out), new PrintWriter(err)), err.toString());
        String json = out.toString();
        assertTrue(json.contains("\"ingestMillis\"") && json.contains("\"analysisMillis\""), json);
        assertTrue(json.contains("\"stageMillis\"") && json.contains("\"duplicates\"") && json.contains("\"tables\""), json);
        assertTrue(json.contains("\"id\" : \"duplicates\""), json);
        try (var s = java.nio.file.Files.walk(dir)) {
            assertEquals(filesBefore, s.count(), "analyse writes no file");
        }
    }

    @Test
    void aMissingFolderIsAnInputError(@TempDir Path dir) {
        StringWriter err = new StringWriter();
        int code = CupelCommand.run(new String[] {"analyse", dir.resolve("nowhere").toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(CupelCommand.INPUT_ERROR, code);
        assertTrue(err.toString().contains("is not a folder"), err.toString());
    }
}
