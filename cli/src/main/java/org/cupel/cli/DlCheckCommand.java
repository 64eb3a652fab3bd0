package org.cupel.cli;

import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.cupel.assay.Numbers;
import org.cupel.censored.BlankLimits;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code cupel dl-check}: detection limits estimated from replicate blanks, to check a lab's stated limit. */
@Command(name = "dl-check", mixinStandardHelpOptions = true,
        description = {"Estimate a method's detection limit from replicate blank (or low-spike) results in one "
                + "column: 3·s, Currie (1968) L_C and L_D, and the US EPA MDL (40 CFR 136 App. B)."},
        footer = {"", "Example:", "  cupel dl-check blank-replicates.csv --column Au_ppm"})
public final class DlCheckCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "FILE", description = "CSV, TSV or XLSX file of replicate results.")
    Path file;

    @Option(names = "--column", required = true, description = "Header of the value column, e.g. Au_ppm.")
    String column;

    @Option(names = "--json", description = "Print JSON (see docs/json-censored.md) instead of a table.")
    boolean json;

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
        out.printf(Locale.US, "%s, column %s: %d detected replicates used, %d censored left out; mean %s, s %s%n",
                col.file(), col.header(), b.n(), b.censored(), number(b.mean()), number(b.sd()));
        CensoredCommand.printIssues(out, col);
        out.println();
        TextTable t = new TextTable("Estimate", "Value", "Rule", "Source", "Note");
        for (BlankLimits.LimitEstimate l : b.limits()) {
            t.row(l.name(), CensoredCommand.value(l.value()), l.rule(), l.source(), l.value().note());
        }
        t.print(out);
        out.flush();
        return CupelCommand.OK;
    }

    private static String number(double v) {
        return Double.isFinite(v) ? Numbers.significant(v, 4) : "—";
    }
}
