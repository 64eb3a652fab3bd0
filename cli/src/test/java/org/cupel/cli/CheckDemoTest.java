package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The demo project reads with exactly its planted input problems; every file balances. */
class CheckDemoTest {
    @TempDir
    Path dir;

    @Test
    void theDemoProjectChecksCleanly() throws IOException {
        Path demo = dir.resolve("demo");
        CliRun.ok("demo", demo.toString(), "--samples", "500");
        JsonNode root = new ObjectMapper().readTree(CliRun.ok("check", demo.toString(), "--json").out());
        for (JsonNode f : root.get("summary").get("files")) {
            assertEquals(f.get("rowsRead").asLong(), f.get("rowsAnalysed").asLong() + f.get("rowsExcluded").asLong(),
                    f.toString());
        }
        assertTrue(root.get("usable").asBoolean());
        // docs/demo.md plants exactly three input problems (a repeated ID, a text typo, a sample never
        // received) and states that nothing else is wrong with the inputs.
        StringBuilder problems = new StringBuilder();
        root.get("exceptions").forEach(i -> problems.append(i.get("where").get("file").asText()).append(": ")
                .append(i.get("problem").asText()).append('\n'));
        String all = problems.toString();
        assertEquals(3, root.get("exceptions").size(), all);
        assertTrue(all.contains("sample ID already on line"), all);
        assertTrue(all.contains("Au_ppm_FA-AAS: the value is not a number"), all);
        assertTrue(all.contains("register.csv: registered but no lab result was found"), all);
    }
}
