package org.cupel.cli;

import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.cupel.censored.BlankLimits;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code cupel dl-check}: detection limits estimated from replicate blanks, to check a lab's stated limit. */
@Command(name = "dl-check", mixinStandardHelpOptions = true,
        description = {"Estimate a method's detection limit from replicate blank (or low-spike) results in one "
                + "column: 3·s, Currie's L_C and L_D (t-based, IUPAC 1995, and z-based, Currie 1968), and the US EPA "
                + "MDL_b (from blanks, with their mean) and MDL_s (t·s, for spiked samples; 40 CFR 136 App. B Rev. 2). "
                + "Censored replicates are used through the censored-data mean and SD."},
        footer = {"", "Example:", "  cupel dl-check blank-replicates.csv --column Au_ppm"})
public final class DlCheckCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "FILE", description = "CSV, TSV or XLSX file of replicate results.")
    Path file;

    @Option(names = "--column", required = true, description = "Header of the value column, e.g. Au_ppm.")
    String column;

    @Option(names = "--json", description = "Print JSON (see docs/json-censored.md) instead of a table.")
    boolean json;

    @Mixin
    WideOption terminal;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        ColumnReader.Column col = ColumnReader.read(file, column);
        BlankLimits b = BlankLimits.of(col.values());
        var out = spec.commandLine().getOut();
        if (json) {
            Json.print(out, CensoredJson.blanks(col.file(), col.header(), b));
            return CupelCommand.OK;
        }
        out = terminal.text(out);
        out.printf(Locale.US, "%s, column %s: %s%n", col.file(), col.header(), b.accounting());
        if (!b.sd().isAvailable()) {
            out.println("No SD: " + b.sd().note());
        } else if (!b.sd().note().isEmpty()) {
            out.println(b.sd().note());
        }
        CensoredCommand.printIssues(out, col);
        out.println();
        TextTable t = new TextTable("Estimate", "Value", "Rule", "Source", "Note");
        for (BlankLimits.LimitEstimate l : b.limits()) {
            t.row(l.name(), CensoredCommand.value(l.value()), l.rule(), l.source(), l.value().note());
        }
        t.print(out);
        out.println("L_C, L_D and 3·s are net levels above the blank mean (for blank-corrected results); MDL_b is a "
                + "reported level and includes the blank mean. The EPA MDL is the greater of MDL_b and MDL_s, MDL_s "
                + "computed from spiked samples, not from blanks.");
        out.flush();
        return CupelCommand.OK;
    }
}
