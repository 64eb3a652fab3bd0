package org.cupel.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.cupel.config.CupelConfig;
import org.cupel.ingest.ProjectFiles;
import org.cupel.ingest.ValueConventions;
import org.cupel.project.Project;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.TestworkReader;

/**
 * What a report reads from a project folder: the project, and the recovery results when the folder holds
 * testwork ({@code testwork/}, or {@code smelts.csv} beside the register; docs/testwork.md).
 * {@code cupel check} reads the same through {@link #testwork}, so that it refuses what the report refuses.
 */
record ReportInputs(Project project, Optional<RecoveryResult> testwork) {

    static ReportInputs load(Path folder) {
        Project project = ProjectFolder.load(folder);
        return new ReportInputs(project, testwork(folder, project.config()));
    }

    /** Whether the report of {@code folder} reads testwork. */
    static boolean hasTestwork(Path folder) {
        return Files.isDirectory(folder.resolve("testwork")) || Files.isRegularFile(folder.resolve("smelts.csv"));
    }

    /**
     * The recovery results of the folder's testwork, empty when it has none.
     *
     * @throws org.cupel.project.InputException when a testwork file cannot be used
     */
    static Optional<RecoveryResult> testwork(Path folder, CupelConfig config) {
        if (!hasTestwork(folder)) {
            return Optional.empty();
        }
        RecoverySettings settings = config.section("recovery", RecoverySettings.class, RecoverySettings.DEFAULTS);
        return Optional.of(RecoveryAnalysis.run(TestworkReader.read(ProjectFiles.of(folder, config), settings,
                ValueConventions.from(config)), settings));
    }
}
