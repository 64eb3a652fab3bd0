package org.cupel.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import org.cupel.api.Cupel;
import org.cupel.project.InputException;
import org.cupel.report.GenerationTime;
import org.cupel.report.QcAppendix;
import org.cupel.report.QcReport;
import org.cupel.report.ReportSection;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code cupel analyse}: every analysis of the QC appendix (ingest, detection limits, CRMs, blanks,
 * duplicates, verdicts, tables) without drawing a chart or writing a file. It prints each section's
 * headline figures and how long the ingest and the analyses took, so it doubles as the end-to-end
 * benchmark (bench/run-e2e.sh).
 */
@Command(name = "analyse", aliases = "analyze", mixinStandardHelpOptions = true,
        description = {"Run every analysis of the QC appendix on a project, without charts or output files,",
                "and print the headline figures of each section with the ingest and analysis times."},
        footer = {"", "Examples:",
                "  cupel analyse demo-project",
                "  cupel analyse my-project --json-summary",
                "  CUPEL_JAVA_OPTS=-Xmx4g cupel analyse big-project"})
public final class AnalyseCommand implements Callable<Integer> {

    @Parameters(paramLabel = "<project-folder>",
            description = "The project folder (cupel.yaml, register.csv, crm-catalog.csv, lab/).")
    Path projectFolder;

    @Option(names = {"--json-summary", "--json"}, description = "Print the summary as JSON.")
    boolean json;

    @Mixin
    WideOption terminal;

    @Spec
    CommandSpec spec;

    /** What the command prints: sizes, the two phase times, and each section's headline figures. */
    record Summary(String project, int samples, int analytes, long ingestMillis, long analysisMillis,
                   Map<String, Long> stageMillis, List<SectionHeadlines> sections) {
    }

    /** One section's id, title and headline figures. */
    record SectionHeadlines(String id, String title, Map<String, Object> headlines) {
    }

    @Override
    public Integer call() {
        if (!Files.isDirectory(projectFolder)) {
            throw new InputException(projectFolder + " is not a folder; give the project folder that holds "
                    + "register.csv and lab/");
        }
        long start = System.nanoTime();
        Cupel cupel = Cupel.open(projectFolder);
        long loaded = System.nanoTime();
        Map<String, Long> stages = new LinkedHashMap<>(cupel.analyseAll());
        long computed = System.nanoTime();
        QcReport report = QcAppendix.build(cupel, "all batches",
                GenerationTime.from(System.getenv(), Clock.systemUTC()));
        long analysed = System.nanoTime();
        stages.put("tables", (analysed - computed) / 1_000_000);
        Summary summary = new Summary(cupel.project().name(), cupel.project().samples().size(),
                cupel.project().analytes().size(), (loaded - start) / 1_000_000, (analysed - loaded) / 1_000_000,
                stages, report.sections().stream()
                        .map(s -> new SectionHeadlines(s.id(), s.title(), new TreeMap<>(s.headlines())))
                        .toList());
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            Json.print(out, summary);
        } else {
            print(terminal.text(out), summary);
        }
        return CupelCommand.OK;
    }

    /** "crm 310 ms, batches 420 ms, ..." : each chain's own wall time; chains overlap on several cores. */
    private static String stages(Map<String, Long> millis) {
        StringBuilder text = new StringBuilder();
        millis.forEach((stage, ms) -> text.append(text.isEmpty() ? "" : ", ").append(stage).append(' ')
                .append(ms).append(" ms"));
        return text.toString();
    }

    private static void print(PrintWriter out, Summary s) {
        out.printf("%s: %d samples, %d analytes; ingest %d ms, analyses %d ms (%s)%n", s.project(), s.samples(),
                s.analytes(), s.ingestMillis(), s.analysisMillis(), stages(s.stageMillis()));
        TextTable table = new TextTable("Section", "Headline", "Value");
        for (SectionHeadlines section : s.sections()) {
            for (Map.Entry<String, Object> e : section.headlines().entrySet()) {
                row(table, section.title(), e.getKey(), e.getValue());
            }
        }
        table.print(out);
        out.flush();
    }

    /**
     * One row per headline; a group of headlines (samples by role) is one row per member, "samplesByRole.crm",
     * and a list of entries (samples to re-submit) one row per entry, "resubmit.1"; never a map's own text.
     */
    private static void row(TextTable table, String section, String key, Object value) {
        if (value instanceof Map<?, ?> group) {
            group.forEach((k, v) -> row(table, section, key + "." + k, v));
        } else if (value instanceof List<?> list && list.stream().anyMatch(Map.class::isInstance)) {
            for (int i = 0; i < list.size(); i++) {
                table.row(section, key + "." + (i + 1), entryText(list.get(i)));
            }
        } else {
            table.row(section, key, headlineText(key, value));
        }
    }

    /** An entry's members in their order, "VH0000502; OAL-00005; Au, Ag; IS; insufficient sample". */
    private static String entryText(Object entry) {
        if (!(entry instanceof Map<?, ?> members)) {
            return String.valueOf(entry);
        }
        return members.values().stream()
                .map(v -> v instanceof List<?> l ? l.stream().map(String::valueOf).collect(Collectors.joining(", "))
                        : headlineText("", v))
                .collect(Collectors.joining("; "));
    }

    /**
     * A headline value as a reader writes it: a percentage headline (its key says "Percent" or "%") with its
     * sign and at least one decimal, {@code 5.0 %}; a number not computable as "not computed"; other numbers
     * in their shortest form.
     */
    static String headlineText(String key, Object value) {
        if (value instanceof Double || value instanceof Float) {
            double v = ((Number) value).doubleValue();
            if (!Double.isFinite(v)) {
                return "not computed";
            }
            boolean percent = key.contains("%") || key.toLowerCase(java.util.Locale.ROOT).contains("percent");
            String text = percent && v == Math.rint(v) ? String.format(java.util.Locale.ROOT, "%.1f", v)
                    : org.cupel.assay.Numbers.compact(v);
            return percent ? text + " %" : text;
        }
        return String.valueOf(value);
    }
}
