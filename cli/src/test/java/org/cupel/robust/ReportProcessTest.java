package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.cupel.cli.CupelCommand;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Guarantees 3 and 7 with real processes: a {@code cupel report} killed part-way leaves the previous
 * complete report (or none), never a mix; two runs with the same {@code SOURCE_DATE_EPOCH} give
 * byte-identical CSV and JSON. The in-process checks of the same writer are in ReportWriterTest and
 * ReportCommandTest (--force).
 */
class ReportProcessTest {
    private static final Path MESSY = Path.of(System.getProperty("cupel.testdata"), "fixtures", "ingest",
            "messy-project");

    @TempDir
    static Path runs;

    /** The two complete runs, started together (one per core): the determinism pair and the "previous report". */
    @BeforeAll
    static void twoCompleteRuns() throws Exception {
        Process a = report(runs.resolve("a"), false);
        Process b = report(runs.resolve("b"), false);
        assertEquals(0, a.waitFor());
        assertEquals(0, b.waitFor());
    }

    @Test
    void aKilledRunLeavesThePreviousReportWhole(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("qc");
        copyTree(runs.resolve("a"), out);
        Map<String, String> previous = HostileValuesReportTest.hashes(out);
        Process p = report(out, true);
        waitForTemporaryFolder(dir, p);
        p.destroyForcibly().waitFor();
        assertEquals(previous, HostileValuesReportTest.hashes(out), "the previous report, untouched");
    }

    @Test
    void aKilledFirstRunLeavesNoReport(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("qc");
        Process p = report(out, false);
        waitForTemporaryFolder(dir, p);
        p.destroyForcibly().waitFor();
        if (Files.exists(out)) {
            assertTrue(Files.exists(out.resolve("summary.json")) && Files.exists(out.resolve(".cupel-report")),
                    "the run finished before the kill: then the folder is complete");
        } else {
            assertFalse(Files.exists(out));
        }
    }

    @Test
    void twoRunsWithTheSameSourceDateEpochGiveIdenticalCsvAndJson() throws Exception {
        Map<String, String> ha = dataFiles(runs.resolve("a"));
        assertTrue(ha.containsKey("summary.json") && ha.keySet().stream().anyMatch(k -> k.endsWith(".csv")));
        assertEquals(ha, dataFiles(runs.resolve("b")));
    }

    /** Issue 15: the PDF is byte-identical too (font-subset tags, file identifier and dates fixed). */
    @Test
    void twoRunsWithTheSameSourceDateEpochGiveAnIdenticalPdf() throws Exception {
        assertArrayEquals(Files.readAllBytes(runs.resolve("a").resolve("appendix.pdf")),
                Files.readAllBytes(runs.resolve("b").resolve("appendix.pdf")));
    }

    /** The Word copy too: its dates come from the variable, not from the clock of either process. */
    @Test
    void twoRunsWithTheSameSourceDateEpochGiveAnIdenticalWordCopy() throws Exception {
        assertArrayEquals(Files.readAllBytes(runs.resolve("a").resolve("appendix.docx")),
                Files.readAllBytes(runs.resolve("b").resolve("appendix.docx")));
    }

    static void copyTree(Path from, Path to) throws IOException {
        try (Stream<Path> s = Files.walk(from)) {
            for (Path p : s.toList()) {
                Path t = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(t);
                } else {
                    Files.copy(p, t, java.nio.file.StandardCopyOption.COPY_ATTRIBUTES);
                }
            }
        }
    }

    /** A report run of the messy fixture in its own JVM, with the test class path. */
    private static Process report(Path out, boolean force) throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> cmd = new java.util.ArrayList<>(List.of(java, "-Djava.awt.headless=true", "-cp",
                System.getProperty("java.class.path"), CupelCommand.class.getName(), "report", MESSY.toString(),
                "--out", out.toString(), "--quiet"));
        if (force) {
            cmd.add("--force");
        }
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectErrorStream(true)
                .redirectOutput(new File(out + ".log"));
        pb.environment().put("SOURCE_DATE_EPOCH", "1767225600");
        return pb.start();
    }

    /** Waits until the run has started writing (its temporary folder appears) or has ended. */
    private static void waitForTemporaryFolder(Path dir, Process p) throws IOException, InterruptedException {
        while (p.isAlive()) {
            try (Stream<Path> s = Files.list(dir)) {
                if (s.anyMatch(x -> x.getFileName().toString().contains(".cupel-tmp-")
                        && Files.exists(x.resolve("charts")))) {
                    return;
                }
            }
            Thread.sleep(20);
        }
    }

    private static Map<String, String> dataFiles(Path out) throws IOException {
        Map<String, String> all = HostileValuesReportTest.hashes(out);
        Map<String, String> data = new TreeMap<>();
        all.forEach((k, v) -> {
            if (k.endsWith(".csv") || k.endsWith(".json")) {
                data.put(k, v.substring(0, v.indexOf(' ')));
            }
        });
        return data;
    }
}
