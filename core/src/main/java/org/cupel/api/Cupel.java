package org.cupel.api;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Supplier;
import java.util.function.UnaryOperator;
import org.cupel.assay.QcRole;
import org.cupel.censored.AnalyteCensoring;
import org.cupel.config.CupelConfig;
import org.cupel.control.BatchReview;
import org.cupel.control.BlankReport;
import org.cupel.control.crm.CrmReview;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.PairExtraction;
import org.cupel.ingest.ProjectLoader;
import org.cupel.project.BatchSelection;
import org.cupel.project.DataExceptions;
import org.cupel.project.InputException;
import org.cupel.project.Project;
import org.cupel.project.ProjectFilter;
import org.cupel.project.Workers;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.Testwork;
import org.cupel.settings.ProjectSettings;

/**
 * Cupel from Java: a project opened from its folder, and every analysis of the QC appendix on it, each
 * returning the immutable result records the report and the commands format (docs/java-api.md).
 *
 * <pre>{@code
 * Cupel cupel = Cupel.open(Path.of("demo-project"));
 * for (SeriesReview s : cupel.crm().series()) {
 *     System.out.println(s.crm() + " " + s.analyte().name() + ": " + s.failures() + " failures");
 * }
 * }</pre>
 *
 * <p>Opening reads and checks every input (the settings, the lab files, the register, the CRM catalog and the
 * testwork) and stops at the first that cannot be used. Each analysis is computed the first time it is asked
 * for and then kept, so a {@code Cupel} may be asked again and shared between threads: a result asked for by
 * several threads at once is computed once, by the first, while the others wait for it.
 * {@link #analyseAll()} computes them side by side, as the report does.
 */
public final class Cupel {
    /** Threads of {@link #analyseAll()}: its longest chain is two analyses, the duplicates split by analyte. */
    private static final int MAX_THREADS = 3;

    private final Project project;
    private final ProjectSettings settings;
    private final Once<CrmReview> crm;
    private final Once<BatchReview> batches;
    private final Once<List<AnalyteCensoring>> censored;
    private final Once<List<DuplicateReport>> duplicates;
    private final Once<Optional<RecoveryResult>> recovery;

    private Cupel(Project project, Once<Optional<RecoveryResult>> recovery) {
        this.project = project;
        this.settings = ProjectSettings.of(project.config());
        this.recovery = recovery;
        this.crm = new Once<>(() -> CrmReview.of(project));
        this.batches = new Once<>(() -> BatchReview.of(project, crm().outcomes()));
        this.censored = new Once<>(() -> List.copyOf(AnalyteCensoring.of(project, settings.censored())));
        this.duplicates = new Once<>(() -> List.copyOf(PairExtraction.analyse(project, settings.duplicates())));
    }

    /**
     * Opens the project in {@code folder} with the settings of its {@code cupel.yaml} (the defaults when it has
     * none).
     *
     * @throws InputException for a folder or an input file that cannot be used; the message is one sentence
     *     naming the file (and line and column), what was expected there and how to fix it
     * @throws org.cupel.config.ConfigException for a setting of {@code cupel.yaml} that cannot be used, likewise
     */
    public static Cupel open(Path folder) {
        return open(folder, UnaryOperator.identity());
    }

    /**
     * Opens the project in {@code folder} with settings given in code: {@code override} receives the settings of
     * the folder's {@code cupel.yaml} and returns those to use, for example
     * {@code s -> s.toBuilder().duplicates(s.duplicates().toBuilder().pulpHardLimitPercent(5).build()).build()}.
     * A setting changed here counts as set by the user, as if the file gave it, and the report labels it so.
     *
     * @throws InputException for a folder or an input file that cannot be used (see {@link #open(Path)})
     * @throws org.cupel.config.ConfigException for a setting of {@code cupel.yaml} that cannot be used
     */
    public static Cupel open(Path folder, UnaryOperator<ProjectSettings> override) {
        CupelConfig file = ProjectLoader.readConfig(folder);
        ProjectSettings settings = override.apply(ProjectSettings.of(file));
        CupelConfig config = settings.applyTo(file);
        Project project = ProjectLoader.load(folder, config);
        Optional<Testwork> testwork = ProjectTestwork.read(folder, config, settings.recovery());
        return new Cupel(project, analysed(testwork, settings));
    }

    /**
     * Opens the project in {@code folder} as far as its files allow, for checking it ({@code cupel check}): an
     * input file or a {@code cupel.yaml} that cannot be used becomes a fatal entry of {@link #exceptions()}
     * instead of an exception (a refused {@code cupel.yaml} leaves every setting at its default), and the
     * problems of the testwork join the register.
     */
    public static Cupel inspect(Path folder) {
        Project project = ProjectLoader.inspect(folder, ProjectSettings::check);
        ProjectSettings settings = ProjectSettings.of(project.config());
        Optional<Testwork> testwork = ProjectTestwork.inspect(folder, project.config(), settings.recovery(),
                project.exceptions());
        return new Cupel(project, analysed(testwork, settings));
    }

    /** A project built in memory or read by other means, without testwork. */
    public static Cupel of(Project project) {
        return of(project, Optional.empty());
    }

    /**
     * A project built in memory or read by other means, with the recovery results of its testwork already
     * computed (empty when it has none).
     */
    public static Cupel of(Project project, Optional<RecoveryResult> recovery) {
        Once<Optional<RecoveryResult>> given = new Once<>(() -> recovery);
        given.get();
        return new Cupel(project, given);
    }

    private static Once<Optional<RecoveryResult>> analysed(Optional<Testwork> testwork, ProjectSettings settings) {
        return new Once<>(() -> testwork.map(t -> RecoveryAnalysis.run(t, settings.recovery())));
    }

    /**
     * This project narrowed to the batches of {@code selection}, so that every analysis sees only the samples
     * under review (the weekly batch review); the testwork is not tied to batches and stays.
     *
     * @throws InputException when no sample is in the selected batches
     */
    public Cupel select(BatchSelection selection) {
        if (selection.selectsAll()) {
            return this;
        }
        Project narrowed = ProjectFilter.batches(project, selection);
        if (narrowed.samples().size() == 0) {
            throw new InputException("no samples in " + selection.describe() + " of project " + project.name()
                    + "; check the dates and batch IDs against the Batches table of a full report");
        }
        return new Cupel(narrowed, recovery);
    }

    /** The project as read: samples, analyte columns, CRM catalog, settings, input problems. */
    public Project project() {
        return project;
    }

    /** The settings in force, every section of {@code cupel.yaml} with what code gave. */
    public ProjectSettings settings() {
        return settings;
    }

    /** The CRM review: z-scores, rule outcomes, bias, drift and probable swaps per CRM and analyte. */
    public CrmReview crm() {
        return crm.get();
    }

    /**
     * The batch review: a verdict per batch and analyte from the CRM and blank outcomes, the re-assay and
     * re-submit lists, the blank review and the insertion rates.
     */
    public BatchReview batches() {
        return batches.get();
    }

    /** The blank review (thresholds, verdicts, carry-over), part of {@link #batches()}. */
    public BlankReport blanks() {
        return batches().blanks();
    }

    /** The detection-limit handling of each analyte: censored-data summaries and the estimate to use. */
    public List<AnalyteCensoring> censored() {
        return censored.get();
    }

    /** The duplicate precision and bias of each analyte that has duplicates, in the project's analyte order. */
    public List<DuplicateReport> duplicates() {
        return duplicates.get();
    }

    /**
     * The duplicates of one analyte and/or one duplicate type, computed on each call.
     *
     * @param analyte analyte name, or null for every analyte
     * @param type duplicate type, or null for every type
     * @throws InputException when the project has no such analyte
     */
    public List<DuplicateReport> duplicates(String analyte, QcRole type) {
        if (analyte == null && type == null) {
            return duplicates();
        }
        return List.copyOf(PairExtraction.analyse(project, settings.duplicates(), analyte, type));
    }

    /** The recovery analysis of the project's testwork; empty when the project has none. */
    public Optional<RecoveryResult> recovery() {
        return recovery.get();
    }

    /** The data-exceptions register and the row accounting of every input file. */
    public DataExceptions exceptions() {
        return DataExceptions.of(project);
    }

    /**
     * Computes every analysis not computed yet, side by side on up to three threads: the CRM review and then
     * the batch review (which needs the CRM outcomes), the detection-limit handling, the duplicates of each
     * analyte as a task of its own (the costliest analysis then spreads over the cores instead of deciding the
     * wall time alone), and the recovery analysis. The tasks share nothing but the immutable project, and each
     * is deterministic on its own, so running them side by side changes no result, only the wall time.
     *
     * @return the wall time in milliseconds of each analysis when it was computed (for the duplicates, from the
     *     first analyte's start to the last one's end), in the order the appendix reads them: {@code crm},
     *     {@code batches}, {@code censored}, {@code duplicates}, then {@code recovery} when there is testwork
     */
    public Map<String, Long> analyseAll() {
        int threads = Math.max(1, Math.min(MAX_THREADS, Runtime.getRuntime().availableProcessors()));
        ExecutorService pool = Executors.newFixedThreadPool(threads, Workers.daemonThreads("cupel-analysis"));
        try {
            // The pool's queue is first in, first out: the CRM review goes first and the batch review, which
            // waits for it, last, so that it never holds a thread while the review it needs is still queued,
            // even on a single thread.
            List<Future<?>> chains = new ArrayList<>();
            chains.add(pool.submit(this::crm));
            chains.add(pool.submit(this::censored));
            boolean splitDuplicates = !duplicates.done();
            List<Future<Timed<Optional<DuplicateReport>>>> perAnalyte = new ArrayList<>();
            if (splitDuplicates) {
                for (Supplier<Optional<DuplicateReport>> task : PairExtraction.perAnalyte(project,
                        settings.duplicates())) {
                    perAnalyte.add(pool.submit(() -> Timed.of(task)));
                }
            }
            chains.add(pool.submit(this::recovery));
            chains.add(pool.submit(this::batches));
            if (splitDuplicates) {
                keepDuplicates(perAnalyte);
            }
            chains.forEach(f -> Workers.result(f, "the analyses"));
        } finally {
            pool.shutdownNow();
        }
        Map<String, Long> millis = new LinkedHashMap<>();
        millis.put("crm", crm.millis());
        millis.put("batches", batches.millis());
        millis.put("censored", censored.millis());
        millis.put("duplicates", duplicates.millis());
        if (recovery().isPresent()) {
            millis.put("recovery", recovery.millis());
        }
        return millis;
    }

    /**
     * Keeps the duplicate reports of the analytes that have duplicates, with the span from the first task's
     * start to the last one's end.
     */
    private void keepDuplicates(List<Future<Timed<Optional<DuplicateReport>>>> perAnalyte) {
        List<DuplicateReport> reports = new ArrayList<>();
        long start = System.nanoTime();
        long end = start;
        for (int i = 0; i < perAnalyte.size(); i++) {
            Timed<Optional<DuplicateReport>> t = Workers.result(perAnalyte.get(i), "the analyses");
            t.value().ifPresent(reports::add);
            start = i == 0 ? t.startNanos() : Math.min(start, t.startNanos());
            end = i == 0 ? t.endNanos() : Math.max(end, t.endNanos());
        }
        duplicates.offer(List.copyOf(reports), start, end);
    }

    /** A result with the interval in which it was computed. */
    private record Timed<T>(T value, long startNanos, long endNanos) {
        static <T> Timed<T> of(Supplier<T> work) {
            long start = System.nanoTime();
            T value = work.get();
            return new Timed<>(value, start, System.nanoTime());
        }
    }
}
