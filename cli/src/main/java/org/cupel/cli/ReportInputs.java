package org.cupel.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.cupel.ingest.ProjectFiles;
import org.cupel.ingest.ProjectLoader;
import org.cupel.ingest.ValueConventions;
import org.cupel.project.Project;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.TestworkReader;

/**
 * What a report reads from a project folder: the project, and the recovery results when the folder holds
 * testwork ({@code testwork/}, or {@code smelts.csv} beside the register; docs/testwork.md).
 */
record ReportInputs(Project project, Optional<RecoveryResult> testwork) {

    static ReportInputs load(Path folder) {
        Project project = ProjectLoader.load(folder);
        if (!Files.isDirectory(folder.resolve("testwork")) && !Files.isRegularFile(folder.resolve("smelts.csv"))) {
            return new ReportInputs(project, Optional.empty());
        }
        RecoverySettings settings = project.config().section("recovery", RecoverySettings.class,
                RecoverySettings.DEFAULTS);
        RecoveryResult result = RecoveryAnalysis.run(TestworkReader.read(ProjectFiles.of(folder, project.config()),
                settings, ValueConventions.from(project.config())), settings);
        return new ReportInputs(project, Optional.of(result));
    }
}
