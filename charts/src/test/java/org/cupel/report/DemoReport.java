package org.cupel.report;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.cupel.config.CupelConfig;
import org.cupel.demo.DemoGenerator;
import org.cupel.demo.DemoSettings;
import org.cupel.ingest.ProjectFiles;
import org.cupel.ingest.ProjectLoader;
import org.cupel.ingest.ValueConventions;
import org.cupel.project.Project;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.TestworkReader;
import org.cupel.settings.ProjectSettings;

/**
 * The QC appendix of the demo project (default size and seed, testwork included), read from a generated
 * folder the way {@code cupel report --demo} reads it, for tests that look at the real tables of the report.
 */
final class DemoReport {
    private DemoReport() {
    }

    static QcReport build(Path scratch) throws IOException {
        Path folder = Files.createDirectories(scratch.resolve("demo-project"));
        DemoGenerator.generate(DemoSettings.defaults(), relative -> {
            Path file = folder.resolve(relative).normalize();
            Files.createDirectories(file.getParent());
            return new BufferedWriter(new OutputStreamWriter(Files.newOutputStream(file), StandardCharsets.UTF_8));
        });
        CupelConfig config = ProjectSettings.check(ProjectLoader.readConfig(folder));
        Project project = ProjectLoader.load(folder, config);
        RecoverySettings settings = config.section("recovery", RecoverySettings.class, RecoverySettings.DEFAULTS);
        RecoveryResult testwork = RecoveryAnalysis.run(
                TestworkReader.read(ProjectFiles.of(folder, config), settings, ValueConventions.from(config)), settings);
        return QcAppendix.build(project, Optional.of(testwork), "all batches", ReportFixture.GENERATED);
    }
}
