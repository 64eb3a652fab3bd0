package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The shaded {@code cli/target/cupel.jar} as a user runs it, after packaging (Failsafe, integration-test
 * phase). The jar is minimised (classes nothing refers to are left out) and Surefire's tests run on the
 * classes, not on the jar: a class loaded only by name (Tablesaw's column types, XChart's fonts, POI's
 * schemas, OpenPDF's fonts) would be missing from the jar alone. These runs touch every output: tables
 * through Tablesaw, charts, HTML, PDF, the Word copy and the JSON.
 */
class ShadedJarIT {
    private static final Path JAR = Path.of("target", "cupel.jar");

    @TempDir
    static Path dir;

    private static Path report;

    @BeforeAll
    static void writeTheDemoAppendix() throws Exception {
        report = dir.resolve("appendix");
        Run r = run("report", "--demo", "--out", report.toString(), "--quiet");
        assertEquals(0, r.code, r.err);
    }

    @Test
    void theVersionIsThePomVersion() throws Exception {
        Run r = run("--version");
        assertEquals(0, r.code, r.err);
        assertEquals("cupel " + System.getProperty("cupel.version"), r.out.strip());
    }

    @Test
    void theDemoAppendixHasEveryOutput() throws IOException {
        for (String f : List.of("index.html", "appendix.pdf", "appendix.docx", "summary.json")) {
            assertTrue(Files.size(report.resolve(f)) > 0, f);
        }
        try (Stream<Path> tables = Files.list(report.resolve("tables"));
             Stream<Path> charts = Files.list(report.resolve("charts"))) {
            assertTrue(tables.filter(p -> p.toString().endsWith(".csv")).count() >= 40, "tables/*.csv");
            assertTrue(charts.filter(p -> p.toString().endsWith(".png")).count() >= 20, "charts/*.png");
        }
        // The planted carry-over blank (PlantLog) fails its batch in the table written through Tablesaw.
        String verdicts = Files.readString(report.resolve("tables/batch-verdicts.csv"));
        assertTrue(verdicts.contains("OAL-00012"), "batch-verdicts.csv names OAL-00012");
    }

    @Test
    void theCommandsThatReadOtherFilesRunFromTheJar() throws Exception {
        Path project = dir.resolve("demo");
        assertEquals(0, run("demo", project.toString()).code);
        Run check = run("check", project.toString(), "--json");
        assertEquals(0, check.code, check.err);
        assertTrue(check.out.strip().startsWith("{"), "only JSON on stdout");
        Run recovery = run("recovery", project.resolve("testwork").toString());
        assertEquals(0, recovery.code, recovery.err);
        Run duplicates = run("duplicates", project.toString(), "--json");
        assertEquals(0, duplicates.code, duplicates.err);
    }

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java")
                .toString(), "-Xmx1g", "-Djava.awt.headless=true", "-jar", JAR.toString()));
        command.addAll(List.of(args));
        Path out = Files.createTempFile(dir, "out", ".txt");
        Path err = Files.createTempFile(dir, "err", ".txt");
        Process p = new ProcessBuilder(command).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        assertTrue(p.waitFor(10, TimeUnit.MINUTES), "cupel " + String.join(" ", args) + " did not end");
        return new Run(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8));
    }
}
