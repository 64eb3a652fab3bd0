package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code cupel analyse} runs the appendix's analyses without charts and reports the sections it built. */
class AnalyseCommandTest {

    @Test
    void analysesTheDemoProjectWithoutWritingFiles(@TempDir Path dir) throws Exception {
        Path project = dir.resolve("demo");
        CliRun.ok("demo", project.toString());
        long filesBefore;
        try (var s = java.nio.file.Files.walk(dir)) {
            filesBefore = s.count();
        }
        String json = CliRun.ok("analyse", project.toString(), "--json-summary").out();
        assertTrue(json.contains("\"ingestMillis\"") && json.contains("\"analysisMillis\""), json);
        assertTrue(json.contains("\"stageMillis\"") && json.contains("\"duplicates\"") && json.contains("\"tables\""), json);
        assertTrue(json.contains("\"id\" : \"duplicates\""), json);
        try (var s = java.nio.file.Files.walk(dir)) {
            assertEquals(filesBefore, s.count(), "analyse writes no file");
        }
    }

    @Test
    void aMissingFolderIsAnInputError(@TempDir Path dir) {
        CliRun r = CliRun.run("analyse", dir.resolve("nowhere").toString());
        assertEquals(CupelCommand.INPUT_ERROR, r.code());
        assertTrue(r.err().contains("is not a folder"), r.err());
    }
}
