package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.cupel.cli.CliRun;
import org.cupel.cli.CupelCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Mistakes in {@code cupel.yaml} stop every command that reads a project, with the same one sentence (issue 15,
 * item 6). On d55c4a7 a misspelt section ({@code Ingest:}, {@code reprot:}) was ignored by all of them, an alias
 * was read as its anchor's name, and a negative detection limit was accepted and then ignored.
 */
class ConfigMistakesCliTest {

    /** Every command that reads a project folder, by its arguments after the folder. */
    private static final Map<String, List<String>> COMMANDS = Map.of(
            "check", List.of("--wide"), "analyse", List.of(), "crm", List.of(), "batches", List.of(),
            "duplicates", List.of(), "recovery", List.of(), "report", List.of("--out", "QC", "--quiet"));

    private static CliRun run(String command, Path project) {
        List<String> args = new java.util.ArrayList<>(List.of(command, project.toString()));
        COMMANDS.get(command).forEach(a -> args.add(a.equals("QC") ? project.resolve("qc").toString() : a));
        return CliRun.run(args.toArray(String[]::new));
    }

    private static Path project(Path dir, String yaml) throws IOException {
        Map<String, String> files = Map.of("lab/OAL-1.csv", FuzzTarget.LAB, "register.csv", FuzzTarget.REGISTER_CSV,
                "crm-catalog.csv", FuzzTarget.CATALOG_CSV, "testwork/heads.csv", FuzzTarget.HEADS_CSV,
                "testwork/smelts.csv", FuzzTarget.SMELTS_CSV, "cupel.yaml", yaml);
        for (Map.Entry<String, String> e : files.entrySet()) {
            Files.createDirectories(dir.resolve(e.getKey()).getParent());
            Files.writeString(dir.resolve(e.getKey()), e.getValue());
        }
        return dir;
    }

    /** Each command exits 2 and gives {@code expected}: on stderr, or (check) as a fatal entry of its register. */
    private static void everyCommandRefuses(Path project, String expected) {
        for (String command : COMMANDS.keySet()) {
            CliRun r = run(command, project);
            assertEquals(CupelCommand.INPUT_ERROR, r.code(), command + ": " + r.out() + r.err());
            if (command.equals("check")) {
                // The register shows the location and the problem in columns of their own.
                String where = expected.substring(0, expected.indexOf(": "));
                assertTrue(r.out().contains("fatal     " + where + " "), command + ": " + r.out());
                assertTrue(r.out().contains(expected.substring(where.length() + 2)), command + ": " + r.out());
            } else if (command.equals("recovery")) {
                // recovery also reads a testwork folder's own config or its parent's, so it names the path.
                assertEquals("cupel: " + project.resolve("cupel.yaml") + expected.substring("cupel.yaml".length()),
                        r.err().strip(), command);
            } else {
                assertEquals("cupel: " + expected, r.err().strip(), command);
            }
        }
    }

    @Test
    void aMisspeltSectionStopsEveryCommandWithDidYouMean(@TempDir Path dir) throws IOException {
        everyCommandRefuses(project(dir, "project: P\nIngest:\n  decimalComma: true\n"),
                "cupel.yaml:2:1: 'Ingest' is not a section of the config; did you mean 'ingest'? The top-level keys "
                        + "are project, ingest, censored, duplicates, crm, blanks, reassay, insertion, recovery "
                        + "(docs/config.md); correct or remove it.");
    }

    @Test
    void aMistypedKeyDeepInASectionStopsEveryCommand(@TempDir Path dir) throws IOException {
        everyCommandRefuses(project(dir, "blanks:\n  absolute:\n    Cu: {fial: 50}\n"),
                "cupel.yaml:3:10: 'fial' is not a setting of blanks.absolute.Cu; did you mean 'fail'? The settings "
                        + "there are fail, warn (docs/config.md); correct or remove the key.");
    }

    @Test
    void aTypeErrorSpeaksTheUsersWords(@TempDir Path dir) throws IOException {
        everyCommandRefuses(project(dir, "ingest:\n  detectionLimits: [0.005, 0.5]\n"),
                "cupel.yaml:2:20: ingest.detectionLimits should be a mapping of names to numbers (name: value, one "
                        + "per line), but the config has a list; correct the value (docs/config.md describes each "
                        + "setting).");
    }

    @Test
    void anAliasIsRefused(@TempDir Path dir) throws IOException {
        everyCommandRefuses(project(dir, "blanks: &strict\n  failMultiple: 7\ncrm:\n  ewmaLambda: *strict\n"),
                "cupel.yaml:4:15: '*strict' is a YAML alias, which Cupel does not expand (it would be read as the "
                        + "text 'strict'); write the value out in full here.");
    }

    @Test
    void aNegativeOrZeroDetectionLimitIsRefusedWithFileKeyAndFix(@TempDir Path dir) throws IOException {
        everyCommandRefuses(project(dir, "ingest:\n  detectionLimits: {Au: -0.005}\n"),
                "cupel.yaml:2:25: ingest.detectionLimits.Au: -0.005 is not a detection limit: it must be a positive "
                        + "number in the unit of the lab file's column; write it as, for example, Au: 0.005, or "
                        + "remove the key");
        everyCommandRefuses(project(dir, "ingest:\n  detectionLimits: {Au: 0}\n"),
                "cupel.yaml:2:25: ingest.detectionLimits.Au: 0 is not a detection limit: it must be a positive "
                        + "number in the unit of the lab file's column; write it as, for example, Au: 0.005, or "
                        + "remove the key");
    }
}
