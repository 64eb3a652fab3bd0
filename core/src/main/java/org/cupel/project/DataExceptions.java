package org.cupel.project;

import java.util.List;

/**
 * A project's data-exceptions register and the row accounting of its input files, as the report's "Data
 * exceptions" section lists them: every input problem in the order found, and per file
 * rows read = rows analysed + rows excluded, so that a reader sees that no row was lost.
 *
 * @param issues every input problem, the rows and values left out of the analyses included
 * @param files row accounting per input file
 */
public record DataExceptions(List<DataIssue> issues, List<FileAccount> files) {

    public DataExceptions {
        issues = List.copyOf(issues);
        files = List.copyOf(files);
    }

    /** The register and accounts of {@code project} as they are now. */
    public static DataExceptions of(Project project) {
        return new DataExceptions(project.exceptions().all(), project.files());
    }

    public List<DataIssue> withSeverity(DataIssue.Severity severity) {
        return issues.stream().filter(i -> i.severity() == severity).toList();
    }

    /** Whether an input file could not be used at all. */
    public boolean hasFatal() {
        return issues.stream().anyMatch(i -> i.severity() == DataIssue.Severity.FATAL);
    }

    /** The files whose rows read are not the rows analysed plus the rows excluded (none, unless Cupel has a bug). */
    public List<FileAccount> unbalanced() {
        return files.stream().filter(f -> !f.balances()).toList();
    }
}
