package org.cupel.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.concurrent.Callable;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import org.cupel.api.Cupel;
import org.cupel.charts.PngWriter;
import org.cupel.project.BatchSelection;
import org.cupel.project.InputException;
import org.cupel.report.CsvTables;
import org.cupel.report.GenerationTime;
import org.cupel.report.PdfReport;
import org.cupel.report.QcAppendix;
import org.cupel.report.QcReport;
import org.cupel.report.ReportOptions;
import org.cupel.report.ReportProgress;
import org.cupel.report.ReportWriter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code cupel report}: the QC appendix of a project (or of the demo project) as one output folder. */
@Command(name = "report", mixinStandardHelpOptions = true,
        description = {"Write the QC appendix of a project: index.html, appendix.pdf, appendix.docx (an editable",
                "Word copy), charts/*.png, tables/*.csv and summary.json, into a new folder (written in full, then",
                "moved into place)."},
        footer = {"", "Examples:",
                "  cupel report demo-project --out qc-appendix",
                "  cupel report my-project --out week-12 --since 2025-03-17 --until 2025-03-23 --force",
                "  cupel report my-project --out job-1044 --batch JOB-1044 --pdf-size letter",
                "  cupel report --demo --out qc-appendix",
                "", "SOURCE_DATE_EPOCH (seconds since 1970) fixes the generation time printed in the report."})
public final class ReportCommand implements Callable<Integer> {

    @Parameters(arity = "0..1", paramLabel = "<project-folder>",
            description = "The project folder (cupel.yaml, register.csv, crm-catalog.csv, lab/).")
    Path projectFolder;

    @Option(names = "--demo", description = "Report on the built-in demo project instead of a folder.")
    boolean demo;

    @Option(names = "--out", required = true, paramLabel = "<dir>", description = "The output folder to create.")
    Path out;

    @Option(names = "--force", description = "Replace an existing output folder written by Cupel.")
    boolean force;

    @Option(names = "--pdf-size", paramLabel = "a4|letter", defaultValue = "a4",
            description = "PDF paper size: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    PdfReport.Paper paper;

    @Option(names = "--screen", description = "Write charts/*.png at 96 dpi for screens (the PDF keeps 300 dpi).")
    boolean screen;

    @Option(names = "--since", paramLabel = "YYYY-MM-DD", description = "Only batches reported on or after this date.")
    String since;

    @Option(names = "--until", paramLabel = "YYYY-MM-DD", description = "Only batches reported on or before this date.")
    String until;

    @Option(names = "--batch", arity = "1..*", paramLabel = "ID", description = "Only these batches (repeatable).")
    List<String> batches = new ArrayList<>();

    @Option(names = "--quiet", description = "No progress bar.")
    boolean quiet;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        CsvTables.prepare();
        BatchSelection selection = new BatchSelection(date("--since", since), date("--until", until),
                new LinkedHashSet<>(batches));
        QcReport report = appendix(selection);
        ReportOptions options = new ReportOptions(paper, screen ? PngWriter.SCREEN_DPI : PngWriter.PRINT_DPI, force);
        try (Progress progress = Progress.open(!quiet && System.console() != null)) {
            ReportWriter.write(report, out, options, progress);
        }
        spec.commandLine().getOut().printf("QC appendix of %s (%s) written to %s%n", report.project(),
                selection.describe(), out.toAbsolutePath().normalize());
        spec.commandLine().getOut().flush();
        return CupelCommand.OK;
    }

    /**
     * The report of the selected batches. The project itself is not kept once its report is built: at a
     * million samples its columns are about half of the heap in use, and the writing (charts, PDF) needs
     * only the report, whose sections hold the results they format.
     */
    private QcReport appendix(BatchSelection selection) throws IOException {
        Cupel project = demo ? DemoProject.open(projectFolder) : Cupel.open(folder());
        return QcAppendix.build(project.select(selection), selection.describe(),
                GenerationTime.from(System.getenv(), Clock.systemUTC()));
    }

    private Path folder() {
        if (projectFolder == null) {
            throw new InputException("no project folder given; name one (cupel report my-project --out qc) "
                    + "or use --demo");
        }
        if (!Files.isDirectory(projectFolder)) {
            throw new InputException(projectFolder + " is not a folder; give the project folder that holds "
                    + "register.csv and lab/");
        }
        return projectFolder;
    }

    private static LocalDate date(String option, String text) {
        if (text == null) {
            return null;
        }
        try {
            return LocalDate.parse(text.strip());
        } catch (DateTimeParseException e) {
            throw new InputException(option + " '" + text + "' is not a date; write it as YYYY-MM-DD, "
                    + "for example 2025-03-17");
        }
    }

    /** The progress bar on stderr, shown only when stderr is a terminal. */
    static final class Progress implements ReportProgress, AutoCloseable {
        private final boolean shown;
        private ProgressBar bar;

        private Progress(boolean shown) {
            this.shown = shown;
        }

        static Progress open(boolean shown) {
            return new Progress(shown);
        }

        @Override
        public void start(long steps) {
            if (shown) {
                bar = new ProgressBarBuilder().setTaskName("Report").setInitialMax(steps)
                        .setConsumer(new ConsoleProgressBarConsumer(System.err)).build();
            }
        }

        @Override
        public void step(String what) {
            if (bar != null) {
                bar.step();
                bar.setExtraMessage(what);
            }
        }

        @Override
        public void close() {
            if (bar != null) {
                bar.close();
            }
        }
    }
}
