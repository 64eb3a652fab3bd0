package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.cupel.cli.CliRun;
import org.cupel.cli.CupelCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A project larger than the heap allows ends, in a real JVM with a small {@code -Xmx}, with one sentence
 * naming the setting to change and exit 3 — not an {@link OutOfMemoryError} stack trace — even though the
 * analyses run on worker threads. (The opposite case, the million-sample project completing in 2 GiB, is a
 * benchmark: bench/run-e2e.sh, docs/performance.md.)
 */
class HeapLimitProcessTest {

    /**
     * 100,000 samples are about 13 MB of CSV; 16 MiB of heap cannot hold them as typed columns, so the run
     * must run out of memory whichever stage it reaches first.
     */
    @Test
    void aProjectTooLargeForTheHeapEndsWithOneSentenceAndExitThree(@TempDir Path dir) throws Exception {
        Path project = dir.resolve("big");
        CliRun.ok("demo", project.toString(), "--samples", "100000");

        Process p = analyse(project, "-Xmx16m");
        assertTrue(p.waitFor(5, TimeUnit.MINUTES), "the small-heap run ended");
        String stderr = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);

        assertEquals(3, p.exitValue(), stderr);
        assertTrue(stderr.startsWith("cupel: the input does not fit in the Java heap (16 MiB"), stderr);
        assertTrue(stderr.contains("CUPEL_JAVA_OPTS=-Xmx"), stderr);
        assertFalse(stderr.contains("\tat ") || stderr.contains("Exception in thread"), stderr);
        assertEquals(1, stderr.strip().lines().count(), stderr);
    }

    private static Process analyse(Path project, String heap) throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> cmd = List.of(java, heap, "-Djava.awt.headless=true", "-cp",
                System.getProperty("java.class.path"), CupelCommand.class.getName(), "analyse", project.toString());
        return new ProcessBuilder(cmd).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
    }
}
