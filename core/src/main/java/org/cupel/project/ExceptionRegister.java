package org.cupel.project;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.cupel.assay.SourceLocation;

/**
 * Every problem found in a project's input, in the order found. Rows left out of the analyses are
 * listed here with their reason; the report prints this as its data-exceptions table.
 */
public final class ExceptionRegister {
    private final List<DataIssue> issues = new ArrayList<>();

    public void add(DataIssue issue) {
        issues.add(issue);
    }

    public void warn(SourceLocation where, String sampleId, String found, String problem, String expected, String fix) {
        add(new DataIssue(DataIssue.Severity.WARNING, where, sampleId, found, problem, expected, fix));
    }

    public void exclude(SourceLocation where, String sampleId, String found, String problem, String expected,
                        String fix) {
        add(new DataIssue(DataIssue.Severity.EXCLUDED, where, sampleId, found, problem, expected, fix));
    }

    public void fatal(SourceLocation where, String problem, String fix) {
        add(new DataIssue(DataIssue.Severity.FATAL, where, "", "", problem, "", fix));
    }

    public List<DataIssue> all() {
        return Collections.unmodifiableList(issues);
    }

    public List<DataIssue> withSeverity(DataIssue.Severity severity) {
        return issues.stream().filter(i -> i.severity() == severity).toList();
    }

    public int size() {
        return issues.size();
    }

    public boolean hasFatal() {
        return issues.stream().anyMatch(i -> i.severity() == DataIssue.Severity.FATAL);
    }
}
