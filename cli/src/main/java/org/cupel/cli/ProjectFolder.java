package org.cupel.cli;

import java.nio.file.Path;
import org.cupel.ingest.ProjectLoader;
import org.cupel.project.Project;
import org.cupel.settings.ProjectSettings;

/**
 * Opens a project folder for a command: its {@code cupel.yaml} checked in full first (every section, every
 * key; {@link ProjectSettings#check}), so that a bad setting stops every command the same way and before
 * any work, then the project read with it.
 */
final class ProjectFolder {
    private ProjectFolder() {
    }

    /** @throws org.cupel.config.ConfigException for a bad setting, org.cupel.project.InputException for a bad file */
    static Project load(Path folder) {
        return ProjectLoader.load(folder, ProjectSettings.check(ProjectLoader.readConfig(folder)));
    }
}
