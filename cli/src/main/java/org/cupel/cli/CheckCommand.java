package org.cupel.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import org.cupel.api.Cupel;
import org.cupel.assay.Numbers;
import org.cupel.ingest.ProjectSummary;
import org.cupel.project.DataExceptions;
import org.cupel.project.DataIssue;
import org.cupel.project.FileAccount;
import org.cupel.project.Project;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code cupel check}: validates a project's inputs and prints the row accounting and the exceptions register. */
@Command(name = "check",
        description = {"Validate a project's inputs as the report reads them: every lab file, the register, the",
                "CRM catalog, the testwork and every setting of cupel.yaml; print the row accounting of each",
                "file, the samples per QC role, the analytes with their units, methods and detection limits,",
                "and every input problem found."},
        footer = {"", "Exit codes: 0 inputs usable (warnings and exclusions may be listed), 2 a file could not be used.",
                "", "Example:", "  cupel check demo-project", "  cupel check demo-project --json > check.json"},
        mixinStandardHelpOptions = true)
public final class CheckCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "<project-folder>",
            description = "Folder holding lab/ and optionally register.csv, crm-catalog.csv, cupel.yaml.")
    Path folder;

    @Option(names = "--json", description = "Print the result as JSON (docs/check.md) instead of tables.")
    boolean json;

    @Mixin
    WideOption terminal;

    @Spec
    CommandSpec spec;

    /** The JSON document of {@code cupel check --json}. */
    record CheckReport(ProjectSummary summary, boolean usable, List<org.cupel.units.UnitChoice> units,
                       List<DataIssue> exceptions) {
    }

    @Override
    public Integer call() {
        Cupel cupel = Cupel.inspect(folder);
        Project p = cupel.project();
        DataExceptions exceptions = cupel.exceptions();
        ProjectSummary s = ProjectSummary.of(p);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            Json.print(out, new CheckReport(s, !exceptions.hasFatal(), List.copyOf(p.units().values()),
                    exceptions.issues()));
        } else {
            printTables(terminal.text(out), s, exceptions.issues());
            printUnits(terminal.text(out), p);
        }
        return exceptions.hasFatal() ? CupelCommand.INPUT_ERROR : CupelCommand.OK;
    }

    private static void printTables(PrintWriter out, ProjectSummary s, List<DataIssue> issues) {
        out.println("Project: " + s.project() + " (" + s.samples() + " samples in " + s.batches() + " batches)");
        out.println();
        TextTable files = new TextTable("file", "kind", "rows read", "analysed", "excluded", "balances");
        for (FileAccount f : s.files()) {
            files.row(f.file(), f.kind(), f.rowsRead(), f.rowsAnalysed(), f.rowsExcluded(), f.balances() ? "yes" : "NO");
        }
        files.print(out);
        out.println();
        TextTable roles = new TextTable("QC role", "samples");
        s.roles().forEach(roles::row);
        roles.print(out);
        out.println();
        TextTable analytes = new TextTable("analyte", "unit", "methods (values)", "detection limits", "values",
                "several results");
        for (ProjectSummary.AnalyteSummary a : s.analytes()) {
            analytes.row(a.analyte(), a.unit(), counts(a.methods()),
                    a.detectionLimits().stream().map(Numbers::compact).collect(Collectors.joining(", ")),
                    counts(a.qualifiers()), a.rowsWithSeveralResults());
        }
        analytes.print(out);
        out.println();
        if (issues.isEmpty()) {
            out.println("No input problems found.");
            return;
        }
        out.println("Exceptions register (" + issues.size() + "):");
        TextTable t = new TextTable("severity", "where", "sample", "found", "problem", "fix");
        for (DataIssue i : issues) {
            String problem = i.expected().isEmpty() ? i.problem() : i.problem() + " (expected " + i.expected() + ")";
            t.row(i.severity().name().toLowerCase(java.util.Locale.ROOT), i.where(), i.sampleId(), i.found(),
                    problem, i.fix());
        }
        t.print(out);
    }

    /** Why each analyte is shown in its unit, where the lab files disagree or cupel.yaml sets it. */
    private static void printUnits(PrintWriter out, Project p) {
        p.units().values().stream().filter(u -> u.filesDisagree()
                        || u.basis() == org.cupel.units.UnitChoice.Basis.CONFIGURED)
                .forEach(u -> out.println("Units: " + u.sentence()));
        out.flush();
    }

    private static String counts(Map<String, Integer> m) {
        return m.entrySet().stream().map(e -> (e.getKey().isEmpty() ? "(unnamed)" : e.getKey()) + " " + e.getValue())
                .collect(Collectors.joining(", "));
    }
}
