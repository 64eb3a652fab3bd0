package org.cupel.cli;

import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.cupel.assay.Numbers;
import org.cupel.censored.CensoredAnalysis;
import org.cupel.censored.CensoredSample;
import org.cupel.censored.CensoredSettings;
import org.cupel.censored.CensoredSummary;
import org.cupel.censored.Censoring;
import org.cupel.censored.Estimate;
import org.cupel.censored.KaplanMeier;
import org.cupel.censored.Recommendation;
import org.cupel.charts.PngWriter;
import org.cupel.charts.censored.CensoredProbabilityPlot;
import org.cupel.project.DataIssue;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code cupel censored}: censored-data summary of one column of a CSV. */
@Command(name = "censored", mixinStandardHelpOptions = true,
        description = {"Summarise one column with values below detection (<0.005) and above range (>10), several "
                + "limits allowed: Kaplan–Meier, ROS, maximum likelihood (normal and lognormal), a substitution "
                + "comparison, and which estimate to use (Helsel 2012)."},
        footer = {"", "Example:", "  cupel censored assays.csv --column Au_ppm --chart au-probability.png"})
public final class CensoredCommand implements Callable<Integer> {
    private static final int ISSUES_SHOWN = 5;

    /** Where Kaplan–Meier puts the probability below the lowest detect. */
    enum KmLowest { limit, detect }

    @Parameters(index = "0", paramLabel = "FILE", description = "CSV, TSV or XLSX file with a header row.")
    Path file;

    @Option(names = "--column", required = true, description = "Header of the value column, e.g. Au_ppm.")
    String column;

    @Option(names = "--json", description = "Print JSON (see docs/json-censored.md) instead of tables.")
    boolean json;

    @Option(names = "--chart", paramLabel = "PNG", description = "Write the censored probability plot here.")
    Path chart;

    @Option(names = "--km-lowest", defaultValue = "limit", paramLabel = "limit|detect",
            description = "Kaplan–Meier: put the probability below the lowest detect at the lowest detection "
                    + "limit (default, as USEPA 2009) or at the lowest detect.")
    KmLowest kmLowest;

    @Mixin
    WideOption terminal;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        ColumnReader.Column col = ColumnReader.read(file, column);
        CensoredSettings settings = CensoredSettings.withDefaults().kmLowestMass(kmLowest == KmLowest.detect
                ? KaplanMeier.LowestMass.AT_LOWEST_DETECT : KaplanMeier.LowestMass.AT_LOWEST_LIMIT).build();
        CensoredAnalysis a = CensoredAnalysis.of(CensoredSample.of(col.values()), settings);
        boolean drawable = !a.ros().points().isEmpty();
        if (chart != null && drawable) {
            PngWriter.write(CensoredProbabilityPlot.create(a.ros(), col.header(), "Censored probability plot: "
                    + col.header()), chart, PngWriter.PRINT_DPI);
        }
        var out = spec.commandLine().getOut();
        if (json) {
            Json.print(out, CensoredJson.analysis(col.file(), col.header(), kmLowest.name(), a));
            return CupelCommand.OK;
        }
        out = terminal.text(out);
        printHeader(out, col, a.sample());
        TextTable t = new TextTable("Method", "n", "Censored", "Mean", "SE", "95% CI", "SD", "Median", "P10", "P90");
        for (CensoredSummary s : a.summaries()) {
            t.row(s.method(), s.n(), s.nCensored(), value(s.mean()), se(s.mean()), ci(s.mean()), value(s.sd()),
                    value(s.median()), value(s.percentiles().get(0).estimate()),
                    value(s.percentiles().get(3).estimate()));
        }
        t.print(out);
        Recommendation rec = a.recommendation();
        out.println();
        out.println("Recommendation: " + (rec.method().equals(Recommendation.NONE) ? "no mean estimate"
                : "use " + rec.method()) + ". " + rec.reason() + ".");
        out.println("Substitution rows are a comparison only (Helsel 2012): never report them.");
        out.println();
        out.println("Notes:");
        for (CensoredSummary s : a.summaries()) {
            if (!s.method().startsWith("Substitution")) {
                out.println("  " + s.method() + ": " + String.join("; ", s.notes()));
            }
        }
        if (chart != null) {
            out.println();
            out.println(drawable ? "Probability plot written to " + chart
                    : "No probability plot written: " + a.ros().summary().notes().get(0) + ".");
        }
        out.flush();
        return CupelCommand.OK;
    }

    static void printIssues(java.io.PrintWriter out, ColumnReader.Column col) {
        if (col.issues().isEmpty()) {
            return;
        }
        out.println(col.issues().size() + " cell" + (col.issues().size() == 1 ? "" : "s")
                + " with problems (left out or read with a warning):");
        col.issues().stream().limit(ISSUES_SHOWN).map(DataIssue::message).forEach(m -> out.println("  " + m));
        if (col.issues().size() > ISSUES_SHOWN) {
            out.println("  ... and " + (col.issues().size() - ISSUES_SHOWN) + " more");
        }
    }

    private static void printHeader(java.io.PrintWriter out, ColumnReader.Column col, CensoredSample s) {
        out.printf(Locale.US, "%s, column %s: n = %d, %d below detection (limits %s), %d above range%s, %d missing%n",
                col.file(), col.header(), s.size(), s.count(Censoring.BELOW), limits(s.distinctBelowLimits()),
                s.count(Censoring.ABOVE), s.count(Censoring.ABOVE) > 0 ? " (limits "
                        + limits(s.distinctAboveLimits()) + ")" : "", s.missingCount());
        printIssues(out, col);
        out.println();
    }

    static String limits(double[] xs) {
        if (xs.length == 0) {
            return "none";
        }
        StringBuilder sb = new StringBuilder();
        for (double x : xs) {
            sb.append(sb.length() == 0 ? "" : ", ").append(Numbers.compact(x));
        }
        return sb.toString();
    }

    static String value(Estimate e) {
        return e.isAvailable() ? Numbers.significant(e.value(), 4) : "—";
    }

    private static String se(Estimate e) {
        return e.isAvailable() && Double.isFinite(e.standardError()) ? Numbers.significant(e.standardError(), 3) : "—";
    }

    private static String ci(Estimate e) {
        return e.hasInterval() ? Numbers.significant(e.lower(), 4) + "–" + Numbers.significant(e.upper(), 4) : "—";
    }
}
