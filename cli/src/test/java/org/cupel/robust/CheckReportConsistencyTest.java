package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.cupel.cli.CliRun;
import org.cupel.cli.CupelCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code cupel check} refuses (exit 2) exactly the inputs that the report refuses (issue 15, item 11): it reads
 * every input the report reads, testwork heads and smelts and every section of {@code cupel.yaml} included.
 * The report's reading and analyses are run through {@code cupel analyse}, which is the report without the
 * writing (the same {@code Cupel.open} and {@code QcAppendix}).
 */
class CheckReportConsistencyTest {
    private static final long SEED = 20_261_215L;
    private static final int TRIES = 60;
    private static final String STRAY = ",;\"\t:-{[<x";
    private static final List<String> FILES = List.of("lab/OAL-1.csv", "register.csv", "crm-catalog.csv",
            "cupel.yaml", "testwork/heads.csv", "testwork/smelts.csv");

    /** A small project with every kind of input (the fuzz targets' well-formed files). */
    private static Map<String, String> project() {
        Map<String, String> f = new LinkedHashMap<>();
        f.put("lab/OAL-1.csv", FuzzTarget.LAB);
        f.put("register.csv", FuzzTarget.REGISTER_CSV);
        f.put("crm-catalog.csv", FuzzTarget.CATALOG_CSV);
        f.put("cupel.yaml", FuzzTarget.CONFIG_YAML);
        f.put("testwork/heads.csv", FuzzTarget.HEADS_CSV);
        f.put("testwork/smelts.csv", FuzzTarget.SMELTS_CSV);
        return f;
    }

    private static void write(Path dir, Map<String, String> files) throws IOException {
        for (Map.Entry<String, String> e : files.entrySet()) {
            Path p = dir.resolve(e.getKey());
            Files.createDirectories(p.getParent());
            Files.writeString(p, e.getValue(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void theWellFormedProjectPassesBoth(@TempDir Path dir) throws IOException {
        write(dir, project());
        assertEquals(0, CliRun.run("check", dir.toString()).code());
        CliRun a = CliRun.run("analyse", dir.toString());
        assertEquals(0, a.code(), a.err());
    }

    /** On d55c4a7 check never read the testwork: it exited 0 where the report exited 2. */
    @Test
    void aDamagedSmeltsFileFailsCheckAsItFailsTheReport(@TempDir Path dir) throws IOException {
        Map<String, String> files = project();
        // Wide format (no product column) without a single product mass column.
        files.put("testwork/smelts.csv", "test_id,condition,replicate,feed,charge_g,Au_g/t\n"
                + "SM-01,A,1,F1,49.97,472.5\n");
        write(dir, files);
        CliRun report = CliRun.run("report", dir.toString(), "--out", dir.resolve("qc").toString(), "--quiet");
        assertEquals(CupelCommand.INPUT_ERROR, report.code(), report.err());
        CliRun check = CliRun.run("check", dir.toString());
        assertEquals(CupelCommand.INPUT_ERROR, check.code(), check.out());
        assertTrue(check.out().contains("fatal") && check.out().contains("smelts.csv"), check.out());
    }

    /** On d55c4a7 check bound only the ingest settings: a bad duplicates setting passed check and failed the report. */
    @Test
    void anInvalidSettingFailsCheckAsItFailsTheReport(@TempDir Path dir) throws IOException {
        Map<String, String> files = project();
        files.put("cupel.yaml", "project: P\nduplicates:\n  bootstrapResamples: 5\n");
        write(dir, files);
        CliRun report = CliRun.run("report", dir.toString(), "--out", dir.resolve("qc").toString(), "--quiet");
        assertEquals(CupelCommand.INPUT_ERROR, report.code(), report.err());
        CliRun check = CliRun.run("check", dir.toString(), "--json");
        assertEquals(CupelCommand.INPUT_ERROR, check.code(), check.out());
        assertTrue(check.out().contains("duplicates.bootstrapResamples: 5 is outside 100 to 100000 resamples"),
                check.out());
    }

    /**
     * Seeded damage to each input file in turn: check exits 2 exactly when the report's reading and analyses
     * do, and neither ends in an internal error. A failure prints the seed, the try, the file and its content.
     */
    @Test
    void checkRefusesExactlyWhatTheReportRefuses(@TempDir Path root) throws IOException {
        Random random = new Random(SEED);
        List<String> failures = new ArrayList<>();
        for (int i = 0; i < TRIES; i++) {
            Map<String, String> files = project();
            String target = FILES.get(i % FILES.size());
            String damaged = damage(files.get(target), random);
            files.put(target, damaged);
            Path dir = root.resolve("try-" + i);
            write(dir, files);
            CliRun check = CliRun.run("check", dir.toString());
            CliRun report = CliRun.run("analyse", dir.toString());
            boolean agree = (check.code() == CupelCommand.INPUT_ERROR) == (report.code() == CupelCommand.INPUT_ERROR);
            if (!agree || check.code() == CupelCommand.INTERNAL_ERROR || report.code() == CupelCommand.INTERNAL_ERROR) {
                failures.add("seed " + SEED + " try " + i + ", " + target + ": check exit " + check.code()
                        + ", report exit " + report.code() + " (" + report.err().strip() + ")\n--- " + target
                        + " ---\n" + damaged);
            }
        }
        assertEquals(List.of(), failures, String.join("\n\n", failures));
    }

    /** One to three edits of the kinds a file suffers: a cut, a lost or doubled line, a stray or wrong character. */
    static String damage(String text, Random random) {
        String s = text;
        int edits = 1 + random.nextInt(3);
        for (int e = 0; e < edits; e++) {
            List<String> lines = new ArrayList<>(List.of(s.split("\n", -1)));
            int at = s.isEmpty() ? 0 : random.nextInt(s.length());
            switch (random.nextInt(6)) {
                case 0 -> s = s.substring(0, at);
                case 1 -> {
                    lines.remove(random.nextInt(lines.size()));
                    s = String.join("\n", lines);
                }
                case 2 -> {
                    int l = random.nextInt(lines.size());
                    lines.add(l, lines.get(l));
                    s = String.join("\n", lines);
                }
                case 3 -> s = s.substring(0, at) + STRAY.charAt(random.nextInt(STRAY.length())) + s.substring(at);
                case 4 -> s = at < s.length() ? s.substring(0, at) + "?" + s.substring(at + 1) : s;
                default -> {
                    int l = random.nextInt(lines.size());
                    lines.set(l, lines.get(l).replaceFirst("[^,]*", ""));
                    s = String.join("\n", lines);
                }
            }
        }
        return s;
    }
}
