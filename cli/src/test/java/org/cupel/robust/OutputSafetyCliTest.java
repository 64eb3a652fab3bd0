package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.BufferedReader;
import java.io.File;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.cupel.cli.CliRun;
import org.cupel.cli.CupelCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15 at the command line, with real processes where the danger is another process: {@code cupel report}
 * never deletes a folder it did not write (one created at {@code --out} during the run survives, and the run
 * exits 2), a second run on the same {@code --out} stops at once with exit 2, a killed run's temporary folder
 * is cleaned by the next run, and an output location or a setting that cannot be used is an input error
 * (exit 2, one sentence), not an internal error.
 */
class OutputSafetyCliTest {
    private static final Path MESSY = Path.of(System.getProperty("cupel.testdata"), "fixtures", "ingest",
            "messy-project");

    private static String java() {
        return Path.of(System.getProperty("java.home"), "bin", "java").toString();
    }

    /** A report run of the messy fixture in its own JVM, its output and errors in {@code <out>.log}. */
    private static Process report(Path out) throws IOException {
        return new ProcessBuilder(java(), "-Djava.awt.headless=true", "-cp", System.getProperty("java.class.path"),
                CupelCommand.class.getName(), "report", MESSY.toString(), "--out", out.toString(), "--quiet")
                .redirectErrorStream(true).redirectOutput(new File(out + ".log")).start();
    }

    /** Waits until the run's temporary folder holds {@code inside} (it is writing), or the run has ended. */
    private static boolean waitForTemporary(Path parent, String inside, Process p) throws Exception {
        while (p.isAlive()) {
            try (Stream<Path> s = Files.list(parent)) {
                if (s.anyMatch(x -> x.getFileName().toString().contains(".cupel-tmp-")
                        && Files.exists(x.resolve(inside)))) {
                    return true;
                }
            }
            Thread.sleep(10);
        }
        return false;
    }

    private static List<String> hidden(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.contains(".cupel-tmp-")
                    || n.contains(".cupel-old-")).sorted().toList();
        }
    }

    /**
     * The reported loss: {@code report --out r/p &}, then {@code mkdir r/p} with a file of the user's in it
     * while the report is written. On d55c4a7 the run renamed r/p aside, deleted it with the file, and exited 0.
     */
    @Test
    void aFolderCreatedAtOutDuringTheRunKeepsItsFilesAndTheRunExitsTwo(@TempDir Path dir) throws Exception {
        Path r = Files.createDirectories(dir.resolve("r"));
        Path out = r.resolve("p");
        Process p = report(out);
        assertTrue(waitForTemporary(r, "charts", p), "the run started writing");
        Files.createDirectory(out);
        Files.writeString(out.resolve("notes.txt"), "keep\n");
        int code = p.waitFor();
        String log = Files.readString(Path.of(out + ".log"));
        assertEquals(CupelCommand.INPUT_ERROR, code, log);
        assertEquals("keep\n", Files.readString(out.resolve("notes.txt")));
        assertEquals(List.of("notes.txt"), list(out));
        assertEquals(1, log.strip().lines().count(), log);
        assertTrue(log.startsWith("cupel: output folder " + out + " appeared while the report was being written; "
                + "it was left untouched"), log);
        assertEquals(List.of(), hidden(r), "the run's temporary folder is removed");
    }

    /** A second run on an output folder that a live run holds stops at once (exit 2), and deletes nothing. */
    @Test
    void aSecondRunOnTheSameOutStopsAtOnce(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("qc");
        assertEquals(0, CliRun.run("report", MESSY.toString(), "--out", out.toString(), "--screen", "--quiet").code());
        Path lockFile = dir.resolve(".qc.cupel-lock");
        Process holder = new ProcessBuilder(java(), "-cp", System.getProperty("java.class.path"),
                LockHolder.class.getName(), lockFile.toString()).redirectErrorStream(true).start();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(holder.getInputStream(),
                StandardCharsets.UTF_8))) {
            assertEquals("locked", r.readLine());
            CliRun second = CliRun.run("report", MESSY.toString(), "--out", out.toString(), "--force", "--screen", "--quiet");
            assertEquals(CupelCommand.INPUT_ERROR, second.code(), second.err());
            assertEquals("cupel: another cupel report run is writing " + out + " right now (it holds " + lockFile
                    + "); wait for it to finish, or choose another --out folder", second.err().strip());
            assertTrue(Files.exists(out.resolve("index.html")), "the first report is untouched");
        } finally {
            holder.destroyForcibly().waitFor();
        }
        assertEquals(0, CliRun.run("report", MESSY.toString(), "--out", out.toString(), "--force", "--screen", "--quiet")
                .code(), "the lock is free once the holder has ended");
    }

    /** A killed run leaves its temporary folder (megabytes); the next run beside it deletes it. */
    @Test
    void theNextRunCleansTheTemporaryFolderOfAKilledRun(@TempDir Path dir) throws Exception {
        Process p = report(dir.resolve("killed"));
        boolean writing = waitForTemporary(dir, "charts", p);
        p.destroyForcibly().waitFor();
        assumeTrue(writing, "the run ended before it could be killed while writing");
        assertEquals(1, hidden(dir).size(), "the killed run left its temporary folder: " + hidden(dir));
        CliRun next = CliRun.run("report", MESSY.toString(), "--out", dir.resolve("next").toString(), "--screen", "--quiet");
        assertEquals(0, next.code(), next.err());
        assertEquals(List.of(), hidden(dir));
        assertFalse(Files.exists(dir.resolve("killed")));
    }

    /** On d55c4a7 each of these ended as "internal error" (exit 3). */
    @Test
    void anOutputLocationThatCannotBeUsedIsAnInputError(@TempDir Path dir) throws IOException {
        Path readme = Files.writeString(dir.resolve("README.md"), "text\n");
        CliRun throughAFile = CliRun.run("report", MESSY.toString(), "--out", readme.resolve("sub").toString(), "--quiet");
        assertEquals(CupelCommand.INPUT_ERROR, throughAFile.code(), throughAFile.err());
        assertEquals("cupel: cannot write the report to " + readme.resolve("sub") + ": " + readme + " is a file, not "
                + "a folder; choose an --out path inside a folder", throughAFile.err().strip());

        CliRun demo = CliRun.run("demo", readme.resolve("sub").toString());
        assertEquals(CupelCommand.INPUT_ERROR, demo.code(), demo.err());
        assertEquals(1, demo.err().strip().lines().count(), demo.err());
        assertTrue(demo.err().startsWith("cupel: " + readme + ": "), demo.err());

        assumeTrue(Files.isDirectory(Path.of("/proc/self")), "a Linux /proc");
        CliRun proc = CliRun.run("report", MESSY.toString(), "--out", "/proc/x", "--quiet");
        assertEquals(CupelCommand.INPUT_ERROR, proc.code(), proc.err());
        assertEquals(1, proc.err().strip().lines().count(), proc.err());
        assertTrue(proc.err().startsWith("cupel: cannot write the report to /proc/x ("), proc.err());
    }

    /** Absurd bootstrap counts: one sentence naming the file, line, column and the allowed range. */
    @Test
    void anAbsurdBootstrapCountIsAnInputError(@TempDir Path dir) throws IOException {
        Path project = dir.resolve("p");
        ReportProcessTest.copyTree(MESSY, project);
        List<String> errors = new ArrayList<>();
        for (String value : List.of("1000000000000", "2000000000", "-5")) {
            Files.writeString(project.resolve("cupel.yaml"), "censored:\n  bootstrapReplicates: " + value + "\n",
                    StandardOpenOption.APPEND);
            CliRun r = CliRun.run("report", project.toString(), "--out", dir.resolve("qc").toString(), "--quiet");
            assertEquals(CupelCommand.INPUT_ERROR, r.code(), r.err());
            assertEquals(1, r.err().strip().lines().count(), r.err());
            errors.add(r.err().strip());
            Files.writeString(project.resolve("cupel.yaml"), Files.readString(MESSY.resolve("cupel.yaml")));
        }
        assertEquals(List.of(
                "cupel: cupel.yaml:7:24: censored.bootstrapReplicates should be a whole number from -2147483648 to "
                        + "2147483647, but the config has the number 1000000000000; correct the value (docs/config.md "
                        + "describes each setting).",
                "cupel: cupel.yaml:7:24: censored.bootstrapReplicates: 2000000000 is outside 0 to 100000 resamples; "
                        + "write a whole number in that range (the default is 1000; 0 for no bootstrap)",
                "cupel: cupel.yaml:7:24: censored.bootstrapReplicates: -5 is outside 0 to 100000 resamples; write a "
                        + "whole number in that range (the default is 1000; 0 for no bootstrap)"), errors);
        assertFalse(Files.exists(dir.resolve("qc")));
    }

    private static List<String> list(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
