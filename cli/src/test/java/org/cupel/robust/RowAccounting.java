package org.cupel.robust;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import java.util.stream.Collectors;
import org.cupel.ingest.ProjectLoader;
import org.cupel.project.DataIssue;
import org.cupel.project.FileAccount;
import org.cupel.project.Project;

/**
 * Guarantee 2 for one damaged project: per file, rows read = rows analysed + rows excluded, and each excluded
 * row is listed in the exceptions register once, with its line (row-level listings have column 0, as in
 * ProjectLoaderTest).
 */
final class RowAccounting {
    private RowAccounting() {
    }

    /** Rows that are neither analysed nor listed, summed over the files of the project (0 when all is well). */
    static long unaccountedRows(FuzzCase c) throws IOException {
        Path dir = Files.createTempDirectory("cupel-fuzz-rows");
        try {
            c.target().write(dir, c.content(), c.registerLayout());
            return unaccountedRows(ProjectLoader.inspect(dir));
        } finally {
            FuzzCheck.deleteTree(dir);
        }
    }

    static long unaccountedRows(Project p) {
        long missing = 0;
        for (FileAccount f : p.files()) {
            missing += Math.abs(f.rowsRead() - f.rowsAnalysed() - f.rowsExcluded());
            Set<Long> listedLines = p.exceptions().withSeverity(DataIssue.Severity.EXCLUDED).stream()
                    .filter(i -> i.where().file().equals(f.file()) && i.where().column() == 0)
                    .map(i -> i.where().line())
                    .collect(Collectors.toSet());
            missing += Math.abs(f.rowsExcluded() - listedLines.size());
        }
        return missing;
    }
}
