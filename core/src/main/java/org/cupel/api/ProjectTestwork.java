package org.cupel.api;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.cupel.config.ConfigException;
import org.cupel.config.CupelConfig;
import org.cupel.ingest.ProjectFiles;
import org.cupel.ingest.ValueConventions;
import org.cupel.project.DataIssue;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.InputException;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.Testwork;
import org.cupel.recovery.TestworkReader;

/**
 * The testwork of a project folder: {@code testwork/}, or {@code smelts.csv} beside the register
 * (docs/testwork.md). Read when the project is opened, so that a testwork file that cannot be used stops the
 * opening as a lab file would, and so that the folder is not needed afterwards.
 */
final class ProjectTestwork {
    private ProjectTestwork() {
    }

    /** Whether the project in {@code folder} has testwork. */
    static boolean present(Path folder) {
        return Files.isDirectory(folder.resolve("testwork")) || Files.isRegularFile(folder.resolve("smelts.csv"));
    }

    /**
     * The folder's testwork, empty when it has none.
     *
     * @throws InputException when a testwork file cannot be used
     */
    static Optional<Testwork> read(Path folder, CupelConfig config, RecoverySettings settings) {
        if (!present(folder)) {
            return Optional.empty();
        }
        return Optional.of(TestworkReader.read(ProjectFiles.of(folder, config), settings,
                ValueConventions.from(config)));
    }

    /**
     * As {@link #read}, for {@code cupel check}: the testwork's problems join {@code register}, and a testwork
     * file that cannot be used becomes a fatal entry (then there is no testwork), so that check refuses what
     * the report refuses.
     */
    static Optional<Testwork> inspect(Path folder, CupelConfig config, RecoverySettings settings,
                                      ExceptionRegister register) {
        try {
            Optional<Testwork> testwork = read(folder, config, settings);
            testwork.ifPresent(t -> t.issues().forEach(register::add));
            return testwork;
        } catch (InputException | ConfigException e) {
            register.add(DataIssue.fatal(file(folder, e.getMessage()), e.getMessage()));
            return Optional.empty();
        }
    }

    /** The testwork file a message begins with (its own name for it), else the testwork folder. */
    private static String file(Path folder, String message) {
        for (String stem : List.of("heads", "smelts")) {
            for (Path dir : List.of(folder.resolve("testwork"), folder)) {
                for (String ext : List.of(".csv", ".tsv", ".txt", ".xlsx")) {
                    String name = dir.resolve(stem + ext).toString();
                    if (message.startsWith(name + ":")) {
                        return name;
                    }
                }
            }
        }
        return folder.resolve("testwork").toString();
    }
}
