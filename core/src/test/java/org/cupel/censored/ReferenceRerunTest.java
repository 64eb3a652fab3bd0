package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Re-derives testdata/reference/censored/survival_reference.csv with R's survival package where R is
 * installed (CI installs it), so the committed reference values cannot drift from their script.
 */
class ReferenceRerunTest {
    private static final Path RSCRIPT = Path.of("/usr/bin/Rscript");

    @Test
    void committedSurvivalReferenceMatchesAFreshRun(@TempDir Path dir) throws Exception {
        assumeTrue(Files.isExecutable(RSCRIPT), "R not installed");
        for (String f : List.of("censored_reference.R", "manganese.csv", "mixed.csv")) {
            Files.copy(Reference.dir().resolve(f), dir.resolve(f));
        }
        Process p = new ProcessBuilder(RSCRIPT.toString(), "censored_reference.R").directory(dir.toFile())
                .redirectErrorStream(true).redirectOutput(dir.resolve("log.txt").toFile()).start();
        assumeTrue(p.waitFor(120, TimeUnit.SECONDS), "R did not finish in time");
        assumeTrue(!Files.readString(dir.resolve("log.txt")).contains("no package called"),
                "the survival package is not installed");
        assertEquals(0, p.exitValue(), Files.readString(dir.resolve("log.txt")));
        // Same script, same R: identical text expected.
        assertEquals(Files.readAllLines(Reference.dir().resolve("survival_reference.csv")),
                Files.readAllLines(dir.resolve("survival_reference.csv")));
    }
}
