package org.cupel.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.cupel.api.Cupel;
import org.cupel.assay.Numbers;
import org.cupel.assay.QcRole;
import org.cupel.charts.PngWriter;
import org.cupel.charts.duplicates.DuplicateFigures;
import org.cupel.duplicates.BatchPrecision;
import org.cupel.duplicates.DuplicateAnalysis;
import org.cupel.duplicates.DuplicatePair;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSetResult;
import org.cupel.duplicates.DuplicateSettings;
import org.cupel.duplicates.Estimate;
import org.cupel.duplicates.ModelFit;
import org.cupel.duplicates.OutlierPair;
import org.cupel.duplicates.PairList;
import org.cupel.duplicates.PairsFile;
import org.cupel.duplicates.PrecisionSummary;
import org.cupel.duplicates.RuleOutcome;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code cupel duplicates}: duplicate precision and bias on a project folder or a plain pairs CSV. */
@Command(name = "duplicates", mixinStandardHelpOptions = true,
        description = {"Precision of duplicate assays (HARD, RMS CV, Thompson–Howarth and RMS SD regression) and",
                "bias between duplicates and originals or between labs (RMA, paired t, Wilcoxon)."},
        footer = {"", "A pairs CSV has columns original, duplicate (values such as 1.23 or <0.005) and optional",
                "type (field, coarse, pulp, repeat, umpire), batch, id and dl (detection limit).", "",
                "Examples:", "  cupel duplicates demo-project --analyte Au --charts charts/",
                "  cupel duplicates pairs.csv --type pulp --json"})
public final class DuplicatesCommand implements Callable<Integer> {
    /** Flagged batches printed per set, less precise ones first. */
    private static final int BATCHES_SHOWN = 20;

    @Parameters(index = "0", paramLabel = "<project-folder | pairs.csv>",
            description = "A project folder, or a CSV/XLSX of pairs.")
    Path input;

    @Option(names = "--analyte", paramLabel = "NAME",
            description = "Analyte to analyse (project: default all; pairs file: the name to show, default 'value').")
    String analyte;

    @Option(names = "--type", paramLabel = "TYPE",
            description = "Only this duplicate type: field, coarse, pulp, repeat, umpire. For a pairs file "
                    + "without a type column, the type of its pairs (default pulp).")
    String type;

    @Option(names = "--unit", paramLabel = "UNIT", description = "Unit of a pairs file's values, for labels (default: none).")
    String unit;

    @Option(names = "--json", description = "Print the full results as JSON (see docs/json-schema-duplicates.md).")
    boolean json;

    @Option(names = "--charts", paramLabel = "DIR", description = "Write the charts as 300 dpi PNGs into DIR.")
    Path chartDir;

    @Option(names = "--dl-multiple", paramLabel = "X",
            description = "Leave pairs with mean below X times the detection limit out of relative measures "
                    + "(default 10, or duplicates.limitMultipleOfDetection).")
    Double dlMultiple;

    @Option(names = "--flagged-limit", paramLabel = "N", defaultValue = "100",
            description = "Flagged pairs listed per set in --json and the count of all (default 100).")
    int flaggedLimit;

    @Option(names = "--flagged-csv", paramLabel = "FILE",
            description = "Write every flagged pair of every set to FILE (CSV).")
    Path flaggedCsv;

    @Option(names = "--fail-on-qc", description = "Exit with code 1 when a set or a batch fails the acceptance rule.")
    boolean failOnQc;

    @Mixin
    WideOption terminal;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        QcRole only = type == null ? null : parseType(type);
        if (flaggedLimit < 0) {
            throw new InputException("--flagged-limit " + flaggedLimit + ": give a count of 0 or more.");
        }
        if (flaggedCsv != null && Files.exists(flaggedCsv) && Files.exists(input)
                && sameFile(flaggedCsv, input)) {
            throw new InputException("--flagged-csv " + flaggedCsv + ": this is the input file, which is never "
                    + "overwritten; give another path.");
        }
        List<DuplicateReport> reports = new ArrayList<>();
        List<DataIssue> issues = new ArrayList<>();
        if (Files.isDirectory(input)) {
            Cupel project = Cupel.open(input, s -> dlMultiple == null ? s : s.toBuilder()
                    .duplicates(s.duplicates().toBuilder().limitMultipleOfDetection(dlMultiple).build()).build());
            reports.addAll(project.duplicates(analyte, only));
            if (reports.isEmpty()) {
                throw new InputException(input + ": no duplicates found" + (only == null ? "" : " of type " + type)
                        + "; the sample register marks duplicates by role with the original sample ID as reference.");
            }
        } else {
            PairsFile.Result r = PairsFile.read(input, only == null ? QcRole.PULP_DUPLICATE : only);
            issues.addAll(r.issues());
            List<DuplicatePair> pairs = only == null ? r.pairs() : PairList.of(r.pairs()).ofType(only);
            if (pairs.isEmpty()) {
                throw new InputException(input + ": no usable pairs" + (only == null ? "" : " of type " + type)
                        + "; check the values and the type column, or drop --type.");
            }
            DuplicateSettings settings = dlMultiple == null ? DuplicateSettings.DEFAULTS
                    : DuplicateSettings.withDefaults().limitMultipleOfDetection(dlMultiple).build();
            reports.add(DuplicateAnalysis.run(analyte == null ? "value" : analyte, unit == null ? "" : unit, pairs,
                    List.of(), new double[0], settings));
        }
        for (DataIssue i : issues) {
            err.println("cupel: " + i.message());
        }
        err.flush();
        if (flaggedCsv != null) {
            int written = FlaggedPairsCsv.write(reports, flaggedCsv);
            if (!json) {
                out.println(written + " flagged pairs written to " + flaggedCsv);
            }
        }
        if (json) {
            Json.print(out, DuplicatesJson.of(input.toString(), reports, issues.stream().map(DataIssue::message).toList(),
                    flaggedLimit, flaggedCsv == null ? null : flaggedCsv.toString()));
        } else {
            PrintWriter text = terminal.text(out);
            for (DuplicateReport r : reports) {
                print(text, r);
            }
        }
        if (chartDir != null) {
            writeCharts(reports, out);
        }
        boolean failed = reports.stream().anyMatch(r -> !r.flaggedBatches().isEmpty()
                || r.sets().stream().anyMatch(s -> s.precision().rule() == RuleOutcome.FAIL));
        return failOnQc && failed ? CupelCommand.QC_FAILED : CupelCommand.OK;
    }

    private static boolean sameFile(Path a, Path b) {
        try {
            return Files.isSameFile(a, b);
        } catch (IOException e) {
            return false;
        }
    }

    static QcRole parseType(String text) {
        return QcRole.parse(text).filter(QcRole::isDuplicate).orElseThrow(() -> new InputException("--type " + text
                + ": not a duplicate type; use field, coarse, pulp, repeat or umpire."));
    }

    private static void print(PrintWriter out, DuplicateReport r) {
        String unit = r.unit().isEmpty() ? "" : " (" + r.unit() + ")";
        out.println(r.analyte() + unit + ": duplicate precision (" + r.detectionLimits() + ")");
        TextTable t = new TextTable("Type", "Pairs", "Used", "Excluded", "HARD limit", "Within", "Rule",
                "RMS CV (95% CI)", "Mean CV (biased)", "s_r");
        for (DuplicateSetResult s : r.sets()) {
            PrecisionSummary p = s.precision();
            t.row(s.type().label(), p.pairs(), p.usedRelative(), p.pairs() - p.usedRelative(), pct(p.hardLimit(), 0),
                    p.percentWithinLimit().available() ? String.format(Locale.ROOT, "%.1f%%",
                            p.percentWithinLimit().value()) : "-",
                    p.rule().name().toLowerCase(Locale.ROOT).replace('_', ' '), interval(p.rmsCv()),
                    p.meanCv().available() ? pct(p.meanCv().value(), 2) : "-",
                    p.repeatabilitySd().available() ? sig(p.repeatabilitySd().value()) : "-");
        }
        t.print(out);
        out.println();
        TextTable m = new TextTable("Type", "Model", "sigma0 (95% CI)", "k (95% CI)", "Above 90% line", "Above 99% line");
        for (DuplicateSetResult s : r.sets()) {
            if (!s.model().available()) {
                m.row(s.type().label(), "not fitted", s.model().note(), "", "", "");
                continue;
            }
            for (ModelFit f : List.of(s.model().thompsonHowarth(), s.model().rmsRegression())) {
                boolean th = f == s.model().thompsonHowarth();
                m.row(s.type().label(), f.method(), number(f.sigma0()), number(f.k()),
                        th ? s.model().line90().exceedances() + " (exp " + Math.round(s.model().line90().expected()) + ")" : "",
                        th ? s.model().line99().exceedances() + " (exp " + Math.round(s.model().line99().expected()) + ")" : "");
            }
        }
        m.print(out);
        for (DuplicateSetResult s : r.sets()) {
            if (!s.model().available()) {
                continue;
            }
            for (ModelFit f : List.of(s.model().thompsonHowarth(), s.model().rmsRegression())) {
                if (!f.constraint().isEmpty()) {
                    out.println(s.type().label() + ", " + f.method() + ": " + f.constraint());
                }
            }
            if (!s.model().fitNote().isEmpty()) {
                out.println(s.type().label() + ": " + s.model().fitNote());
            }
        }
        out.println();
        for (DuplicateSetResult s : r.sets()) {
            out.println(s.type().label() + ": " + s.bias().verdict());
            List<BatchPrecision> shown = s.batches().stream().filter(BatchPrecision::flagged)
                    .sorted(java.util.Comparator.comparing((BatchPrecision b) -> !b.lessPrecise())).toList();
            for (BatchPrecision b : shown.subList(0, Math.min(BATCHES_SHOWN, shown.size()))) {
                PrecisionSummary bp = b.precision();
                out.println("  batch " + (b.batch().isEmpty() ? "(none)" : b.batch()) + ": "
                        + String.format(Locale.ROOT, "%.1f%%", bp.percentWithinLimit().value()) + " of "
                        + bp.usedRelative() + " pairs within HARD " + pct(bp.hardLimit(), 0)
                        + (b.failsRule() ? String.format(Locale.ROOT, " (fails the rule: binomial p = %.2g)",
                        b.rule().pValue()) : "") + ", RMS CV " + interval(bp.rmsCv())
                        + (b.lessPrecise() ? String.format(Locale.ROOT,
                        " — less precise than the set (%.1f× its RMS CV, chi-square p = %.2g)",
                        b.dispersion().ratio(), b.dispersion().pValue()) : ""));
            }
            if (shown.size() > BATCHES_SHOWN) {
                out.println("  ... " + (shown.size() - BATCHES_SHOWN) + " more flagged batches (all in --json)");
            }
            printTooFew(out, s);
            printOutliers(out, s);
        }
        if (!r.orphans().isEmpty()) {
            out.println(r.orphans().size() + " duplicates without an original, e.g. " + r.orphans().get(0).id() + ": "
                    + r.orphans().get(0).reason());
        }
        out.println();
        out.flush();
    }

    /** Batches whose share is below the rule but whose pairs are too few to show it (BatchRuleTest). */
    private static void printTooFew(PrintWriter out, DuplicateSetResult s) {
        List<BatchPrecision> few = s.batches().stream().filter(BatchPrecision::tooFewPairs).toList();
        if (few.isEmpty()) {
            return;
        }
        BatchPrecision first = few.get(0);
        StringBuilder sb = new StringBuilder("  " + few.size() + (few.size() == 1 ? " batch" : " batches")
                + " below " + Numbers.compact(first.rule().acceptancePercent()) + " % within but too few pairs to "
                + "judge (one-sided binomial p >= " + Numbers.compact(first.rule().alpha()) + "): ");
        for (int i = 0; i < Math.min(BATCHES_SHOWN, few.size()); i++) {
            BatchPrecision b = few.get(i);
            sb.append(i == 0 ? "" : ", ").append(b.batch().isEmpty() ? "(none)" : b.batch()).append(" (")
                    .append(b.rule().within()).append(" of ").append(b.rule().n()).append(')');
        }
        out.println(sb + (few.size() > BATCHES_SHOWN ? ", ..." : ""));
    }

    /** Flagged pairs, original first in IDs and values; those below the relative threshold apart. */
    private static void printOutliers(PrintWriter out, DuplicateSetResult s) {
        List<OutlierPair> o = s.outliers();
        if (!o.isEmpty()) {
            out.println("  " + o.size() + " flagged pairs (original / duplicate); largest HARD:");
            for (OutlierPair x : o.subList(0, Math.min(5, o.size()))) {
                out.println("    " + pairText(x) + ", HARD " + pct(x.hard(), 1) + " — " + x.testLabels());
            }
        }
        List<OutlierPair> low = s.outliersBelowRelativeThreshold();
        if (!low.isEmpty()) {
            out.println("  " + low.size() + " pairs below the relative-measure threshold (mean < "
                    + Numbers.compact(s.precision().limitMultiple()) + "× DL, not judged by HARD) above the 99 % "
                    + "line; largest |d|:");
            for (OutlierPair x : low.subList(0, Math.min(5, low.size()))) {
                out.println("    " + pairText(x) + ", |d| " + sig(x.absDifference()));
            }
        }
    }

    private static String pairText(OutlierPair x) {
        return x.idsOriginalFirst() + (x.batch().isEmpty() ? "" : " [" + x.batch() + "]") + ": " + x.original()
                + " vs " + x.duplicate();
    }

    private void writeCharts(List<DuplicateReport> reports, PrintWriter out) {
        try {
            Files.createDirectories(chartDir);
            int n = 0;
            for (DuplicateReport r : reports) {
                if (r.sets().isEmpty()) {
                    continue;
                }
                String stem = safe("duplicates-" + r.analyte());
                PngWriter.write(DuplicateFigures.pairs(r), chartDir.resolve(stem + "-pairs.png"), PngWriter.PRINT_DPI);
                PngWriter.write(DuplicateFigures.bias(r), chartDir.resolve(stem + "-bias.png"), PngWriter.PRINT_DPI);
                PngWriter.write(DuplicateFigures.precision(r), chartDir.resolve(stem + "-precision.png"),
                        PngWriter.PRINT_DPI);
                n += 3;
            }
            if (!json) {
                out.println(n + " charts written to " + chartDir);
                out.flush();
            }
        } catch (IOException e) {
            throw new UncheckedIOException("could not write charts to " + chartDir + ": " + e.getMessage(), e);
        }
    }

    private static String safe(String s) {
        return s.replaceAll("[^A-Za-z0-9._-]", "_");
    }

    private static String interval(Estimate e) {
        if (!e.available()) {
            return "-";
        }
        return e.hasInterval() ? pct(e.value(), 2) + " (" + pct(e.ciLow(), 2) + "-" + pct(e.ciHigh(), 2) + ")"
                : pct(e.value(), 2);
    }

    private static String number(Estimate e) {
        if (!e.available()) {
            return e.note();
        }
        return sig(e.value()) + (e.hasInterval() ? " (" + sig(e.ciLow()) + " to " + sig(e.ciHigh()) + ")" : "");
    }

    private static String sig(double v) {
        return org.cupel.assay.Numbers.significant(v, 4);
    }

    private static String pct(double fraction, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f%%", 100 * fraction);
    }
}
