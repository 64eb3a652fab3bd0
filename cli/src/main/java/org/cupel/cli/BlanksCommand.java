package org.cupel.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;
import org.cupel.control.BlankCsv;
import org.cupel.control.BlankReport;
import org.cupel.control.BlankReview;
import org.cupel.control.BlankSettings;
import org.cupel.control.Verdict;
import org.cupel.project.DataIssue;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code cupel blanks}: judge the blanks of a plain CSV and look for carry-over. */
@Command(name = "blanks", mixinStandardHelpOptions = true,
        description = {"Judge blank results from a plain CSV (no project needed): thresholds as multiples of",
                "the detection limit, carry-over from the preceding sample, and the blank-vs-grade relation.",
                "CSV columns: sample_id, batch, position, [preceding_id], Au_ppm ..., [preceding_Au_ppm], [dl_Au]",
                "(see docs/blank-csv.md)."},
        footer = {"", "Example:", "  cupel blanks blank-results.csv --fail-multiple 10 --json"})
final class BlanksCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "BLANK-CSV", description = "CSV of blank results.")
    Path file;

    @Option(names = "--json", description = "Print the results as JSON (docs/json-batches.md).")
    boolean json;

    @Option(names = "--fail-multiple", paramLabel = "X",
            description = "Fail a blank above X × detection limit (default: ${DEFAULT-VALUE}).")
    double failMultiple = BlankSettings.DEFAULTS.failMultiple();

    @Option(names = "--warn-multiple", paramLabel = "X",
            description = "Warn above X × detection limit (default: ${DEFAULT-VALUE}).")
    double warnMultiple = BlankSettings.DEFAULTS.warnMultiple();

    @Option(names = "--fail-on-qc", description = "Exit with status 1 when any blank fails.")
    boolean failOnQc;

    @Mixin
    WideOption terminal;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        BlankSettings settings;
        try {
            settings = BlankSettings.withDefaults().failMultiple(failMultiple).warnMultiple(warnMultiple).build();
        } catch (IllegalArgumentException e) {
            throw new picocli.CommandLine.ParameterException(spec.commandLine(), e.getMessage());
        }
        BlankCsv.Blanks blanks = BlankCsv.read(file);
        for (DataIssue i : blanks.issues()) {
            err.println("cupel: " + i.message());
        }
        err.flush();
        BlankReport report = BlankReview.review(blanks.observations(), settings);
        if (json) {
            Map<String, Object> doc = new LinkedHashMap<>();
            doc.put("file", file.toString());
            doc.put("blanks", report);
            doc.put("issues", blanks.issues());
            Json.print(out, doc);
        } else {
            BlankTables.print(terminal.text(out), report);
        }
        boolean failed = report.results().stream().anyMatch(r -> r.verdict().verdict() == Verdict.FAIL);
        return failOnQc && failed ? CupelCommand.QC_FAILED : CupelCommand.OK;
    }
}
