package org.cupel.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.Callable;
import org.cupel.api.Cupel;
import org.cupel.assay.Numbers;
import org.cupel.charts.PngWriter;
import org.cupel.charts.control.CrmBiasChart;
import org.cupel.charts.control.CrmControlChart;
import org.cupel.charts.control.CrmZScoreChart;
import org.cupel.config.CupelConfig;
import org.cupel.control.Verdict;
import org.cupel.control.crm.AnalyteReview;
import org.cupel.control.crm.CrmException;
import org.cupel.control.crm.CrmResult;
import org.cupel.control.crm.CrmResultsFile;
import org.cupel.control.crm.CrmReview;
import org.cupel.control.crm.SeriesReview;
import org.cupel.ingest.CatalogReader;
import org.cupel.project.InputException;
import org.cupel.project.Project;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code cupel crm}: CRM control of a project folder, or of a plain CSV of CRM results and a catalog. */
@Command(name = "crm",
        description = {"CRM control: z-scores, rule violations (1-3s, 2-2s and optional Westgard, Western Electric,",
                "Nelson rules), bias, drift (trend, EWMA, CUSUM) and probable swaps, per CRM and analyte.",
                "Limits: certified value ± 2 SD / ± 3 SD with the certificate's between-lab SD."},
        footer = {"", "Examples:", "  cupel crm demo-project", "  cupel crm demo-project --json > crm.json",
                "  cupel crm demo-project --charts crm-charts",
                "  cupel crm --results crm-results.csv --catalog crm-catalog.csv",
                "", "Results CSV columns: crm, batch, position, date (YYYY-MM-DD), then analytes such as Au_ppm."},
        mixinStandardHelpOptions = true)
public final class CrmCommand implements Callable<Integer> {

    @Parameters(index = "0", arity = "0..1", paramLabel = "<project-folder>",
            description = "Project folder (lab files, register, crm-catalog.csv).")
    Path folder;

    @Option(names = "--results", paramLabel = "FILE", description = "Plain CSV of CRM results (instead of a project).")
    Path results;

    @Option(names = "--catalog", paramLabel = "FILE", description = "CRM catalog CSV for --results.")
    Path catalog;

    @Option(names = "--json", description = "Write the review as JSON (docs/json-crm.md).")
    boolean json;

    @Option(names = "--charts", paramLabel = "DIR", description = "Write the CRM charts as 300 dpi PNGs into DIR.")
    Path chartDir;

    @Option(names = "--fail-on-qc", description = "Exit with code 1 when any CRM result fails.")
    boolean failOnQc;

    @Mixin
    WideOption terminal;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        Cupel cupel = load();
        Project p = cupel.project();
        CrmReview review = cupel.crm();
        PrintWriter out = spec.commandLine().getOut();
        if (chartDir != null) {
            writeCharts(review);
        }
        if (json) {
            Json.print(out, CrmJson.of(p.name(), review));
        } else {
            print(terminal.text(out), p, review);
        }
        return failOnQc && review.failures() > 0 ? CupelCommand.QC_FAILED : CupelCommand.OK;
    }

    private Cupel load() {
        if (results != null) {
            if (folder != null) {
                throw new InputException("give either a project folder or --results with --catalog, not both.");
            }
            if (catalog == null) {
                throw new InputException("--results needs --catalog FILE: the CRM catalog with crm, analyte, unit, "
                        + "certified_value, sd.");
            }
            var cat = CatalogReader.read(catalog, catalog.toString(), Map.of());
            return Cupel.of(CrmResultsFile.read(results, cat.catalog(), CupelConfig.defaults()));
        }
        if (folder == null) {
            throw new InputException("no input: give a project folder, or --results FILE --catalog FILE "
                    + "(try 'cupel crm --help').");
        }
        return Cupel.open(folder);
    }

    private void writeCharts(CrmReview r) throws IOException {
        Files.createDirectories(chartDir);
        for (SeriesReview s : r.series()) {
            PngWriter.write(CrmControlChart.of(s), chartDir.resolve(file("crm-" + s.crm() + "-" + s.analyte().name())),
                    PngWriter.PRINT_DPI);
        }
        for (AnalyteReview a : r.analytes()) {
            var of = r.series().stream().filter(s -> s.analyte().name().equals(a.analyte())).toList();
            PngWriter.write(CrmZScoreChart.of(a.analyte(), of), chartDir.resolve(file("crm-z-" + a.analyte())),
                    PngWriter.PRINT_DPI);
            PngWriter.write(CrmBiasChart.of(a.biasVsGrade(), of), chartDir.resolve(file("crm-bias-" + a.analyte())),
                    PngWriter.PRINT_DPI);
        }
    }

    private static String file(String stem) {
        return stem.replaceAll("[^A-Za-z0-9._-]", "_") + ".png";
    }

    private static void print(PrintWriter out, Project p, CrmReview r) {
        out.printf("CRM control: %s%n", p.name());
        long n = r.series().stream().mapToLong(SeriesReview::n).sum();
        out.printf("%d results in %d series: %d failures, %d warnings, %d probable swaps, %d exceptions.%s%n%n",
                n, r.series().size(), r.failures(), r.warnings(), r.swaps(), r.exceptions().size(),
                n == 0 ? " No CRM result: CRM control cannot be judged." : "");
        TextTable t = new TextTable("CRM", "Analyte", "n", "Certified", "SD", "Mean", "Bias %", "95% CI", "Fail",
                "Warn", "Swap", "Drift");
        for (SeriesReview s : r.series()) {
            var b = s.bias();
            // Certified value and SD as the certificate writes them; the mean on the limits' scale.
            t.row(s.crm(), s.analyte().label(), s.n(), s.limits().certifiedText(), s.limits().sdText(),
                    b.n() > 0 ? s.limits().limitText(b.meanResult()) : "–", pct(b.meanBiasPct()),
                    Double.isFinite(b.meanLowPct()) ? pct(b.meanLowPct()) + " to " + pct(b.meanHighPct()) : "–",
                    s.failures(), s.warnings(), s.swaps(), s.drift().drifting() ? "yes" : "no");
        }
        t.print(out);
        TextTable flagged = new TextTable("Sample", "Batch", "CRM", "Analyte", "Result", "z", "Verdict", "Rule");
        for (SeriesReview s : r.series()) {
            for (CrmResult x : s.results()) {
                if (x.verdict() != Verdict.PASS) {
                    flagged.row(x.point().sampleId(), x.point().batchId(), s.crm(), s.analyte().name(),
                            x.point().value().display(), sig(x.z()), x.verdict(),
                            x.isSwap() ? "probable swap with " + x.swapWith() : String.join(", ", x.rules()));
                }
            }
        }
        if (flagged.size() > 0) {
            out.println();
            flagged.print(out);
        }
        out.println();
        for (SeriesReview s : r.series()) {
            s.drift().findings().forEach(f -> out.printf("Drift, %s %s: %s%n", s.crm(), s.analyte().name(), f));
            s.drift().outliers().forEach(o -> out.printf("Outlier, %s %s: %s%n", s.crm(), s.analyte().name(),
                    o.finding()));
        }
        for (AnalyteReview a : r.analytes()) {
            a.drift().findings().forEach(f -> out.printf("Drift, all CRMs %s: %s%n", a.analyte(), f));
        }
        if (!r.exceptions().isEmpty()) {
            out.println();
            TextTable ex = new TextTable("Sample", "Batch", "CRM", "Analyte", "Reported", "Exception");
            for (CrmException e : r.exceptions()) {
                ex.row(e.sampleId(), e.batchId(), e.crm(), e.analyte(), e.found(), e.problem());
            }
            ex.print(out);
        }
        out.println();
        out.println("Limits: certified ± 2 SD (warn) and ± 3 SD (fail) from the certificate's between-lab SD, never "
                + "the CI of the certified value. Rules and edge cases: docs/control-rules.md.");
        out.flush();
    }

    private static String sig(double v) {
        return Double.isFinite(v) ? Numbers.significant(v, 3) : "–";
    }

    private static String pct(double v) {
        return Double.isFinite(v) ? String.format(java.util.Locale.ROOT, "%+.2f", v) : "–";
    }
}
