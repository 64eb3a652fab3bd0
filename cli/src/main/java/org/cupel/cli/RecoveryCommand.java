package org.cupel.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.cupel.charts.PngWriter;
import org.cupel.charts.recovery.DeportmentChart;
import org.cupel.charts.recovery.DifferenceChart;
import org.cupel.charts.recovery.RecoveryByConditionChart;
import org.cupel.config.CupelConfig;
import org.cupel.ingest.ProjectFiles;
import org.cupel.ingest.ValueConventions;
import org.cupel.project.InputException;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.TestworkReader;
import org.cupel.report.ReportTable;
import org.cupel.report.recovery.TestworkSection;
import org.cupel.settings.ProjectSettings;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code cupel recovery}: smelt recoveries with intervals, pairwise verdicts, balance and deportment. */
@Command(name = "recovery",
        description = {"Recoveries of replicate smelts or fire-assay fusions per condition, with confidence "
                + "intervals, pairwise verdicts (different / equivalent / cannot tell), metal balance and deportment."},
        footer = {"", "Reads heads.csv and smelts.csv (docs/testwork.md) from the folder, or from its testwork/ folder.",
            "", "Example:", "  cupel recovery demo-project --charts charts --margin 0.5 --power-delta 1.0"},
        mixinStandardHelpOptions = true)
public final class RecoveryCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "FOLDER", description = "A testwork folder, a project holding testwork/, "
            + "or a smelts.csv file.")
    Path input;

    @Option(names = "--json", description = "Print the full result as JSON (docs/json-recovery.md).")
    boolean json;

    @Option(names = "--charts", paramLabel = "DIR", description = "Write the charts as PNG into DIR.")
    Path charts;

    @Option(names = "--margin", paramLabel = "PP", description = "Equivalence margin ± in percentage points "
            + "(default: the config's recovery.equivalenceMargin, else 0.5).")
    Double margin;

    @Option(names = "--power-delta", paramLabel = "PP", description = "Difference in percentage points the "
            + "replicate plan should detect (default: recovery.powerDifference, else 1.0).")
    Double powerDelta;

    @Mixin
    WideOption terminal;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        Path folder = Files.isRegularFile(input) ? input.toAbsolutePath().getParent() : input;
        if (!Files.isDirectory(folder)) {
            throw new InputException(input + ": no such folder; give the testwork folder (with heads.csv and "
                    + "smelts.csv) or a project folder.");
        }
        CupelConfig config = config(folder);
        RecoverySettings settings = config.section("recovery", RecoverySettings.class, RecoverySettings.DEFAULTS);
        if (margin != null) {
            settings = settings.toBuilder().equivalenceMargin(positive(margin, "--margin")).build();
        }
        if (powerDelta != null) {
            settings = settings.toBuilder().powerDifference(positive(powerDelta, "--power-delta")).build();
        }
        RecoveryResult result = RecoveryAnalysis.run(TestworkReader.read(ProjectFiles.of(folder, config), settings,
                ValueConventions.from(config)), settings);
        PrintWriter out = spec.commandLine().getOut();
        if (charts != null) {
            writeCharts(result, charts);
        }
        if (json) {
            Json.print(out, jsonView(result));
        } else {
            printText(terminal.text(out), result);
        }
        return CupelCommand.OK;
    }

    private static double positive(double v, String option) {
        if (!(v > 0)) {
            throw new InputException(option + " must be a positive number of percentage points, got " + v + ".");
        }
        return v;
    }

    private static CupelConfig config(Path folder) throws IOException {
        for (Path p : List.of(folder.resolve("cupel.yaml"), folder.toAbsolutePath().getParent() == null
                ? folder.resolve("cupel.yaml") : folder.toAbsolutePath().getParent().resolve("cupel.yaml"))) {
            if (Files.isRegularFile(p)) {
                return ProjectSettings.check(CupelConfig.fromYaml(Files.readString(p), p.toString()));
            }
        }
        return CupelConfig.defaults();
    }

    private static void writeCharts(RecoveryResult r, Path dir) throws IOException {
        Files.createDirectories(dir);
        for (String a : r.analytes()) {
            PngWriter.write(RecoveryByConditionChart.of(r, a), dir.resolve("recovery-" + a + ".png"), PngWriter.PRINT_DPI);
            PngWriter.write(DifferenceChart.of(r, a), dir.resolve("recovery-differences-" + a + ".png"),
                    PngWriter.PRINT_DPI);
            PngWriter.write(DeportmentChart.of(r, a), dir.resolve("deportment-" + a + ".png"), PngWriter.PRINT_DPI);
        }
    }

    private static Map<String, Object> jsonView(RecoveryResult r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("settings", r.settings());
        m.put("analytes", r.analytes());
        m.put("heads", r.heads());
        m.put("conditions", r.conditions());
        m.put("conditionsCensoredAtZero", r.conditionsCensoredAtZero());
        m.put("comparisons", r.comparisons());
        m.put("smelts", r.smelts().stream().map(JsonSmelt::of).toList());
        m.put("balances", r.balances());
        m.put("deportment", r.deportment());
        m.put("smeltDeportment", r.smeltDeportment());
        m.put("anyCensoredLoss", r.anyCensoredLoss());
        m.put("notes", r.notes());
        m.put("issues", r.issues().stream().map(i -> i.message()).toList());
        m.put("caution", r.safetyCaution());
        return m;
    }

    /** A smelt recovery without the nested head and product inputs repeated for every analyte. */
    record JsonSmelt(String testId, String condition, String replicate, String feed, double chargeGrams,
                     String analyte, double headGpt, double metalInChargeGrams, double collectedGrams,
                     double lossGrams, double byLoss, double direct, double calculated, double calculatedHeadGpt,
                     double accountability, boolean balanceCloses, double lowerBound, double upperBound, String note) {
        static JsonSmelt of(org.cupel.recovery.SmeltRecovery s) {
            return new JsonSmelt(s.smelt().testId(), s.smelt().condition(), s.smelt().replicate(), s.smelt().feed(),
                    s.smelt().chargeGrams(), s.analyte(), s.head().meanGpt(), s.metalInCharge(), s.collectedMetal(),
                    s.lossMetal(), s.byLoss(), s.direct(), s.calculated(), s.calculatedHeadGpt(), s.accountability(),
                    s.balanceCloses(), s.lowerBound(), s.upperBound(), s.note());
        }
    }

    private static void printText(PrintWriter out, RecoveryResult r) {
        for (ReportTable t : List.of(TestworkSection.recoveries(r), TestworkSection.comparisons(r),
                TestworkSection.balance(r), TestworkSection.deportment(r))) {
            out.println(t.title());
            TextTable text = new TextTable(t.columns().toArray(String[]::new));
            t.rows().forEach(row -> text.row(row.toArray()));
            text.print(out);
            if (!t.note().isEmpty()) {
                out.println(t.note());
            }
            out.println();
        }
        r.notes().forEach(out::println);
        r.issues().forEach(i -> out.println("input: " + i.message()));
        out.println();
        out.println(r.safetyCaution());
        out.flush();
    }
}
