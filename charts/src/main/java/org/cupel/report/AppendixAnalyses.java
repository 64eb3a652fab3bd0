package org.cupel.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Supplier;
import org.cupel.censored.AnalyteCensoring;
import org.cupel.censored.CensoredSettings;
import org.cupel.control.BatchReview;
import org.cupel.control.crm.CrmReview;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSettings;
import org.cupel.duplicates.PairExtraction;
import org.cupel.project.Project;
import org.cupel.project.Workers;

/**
 * The core analyses behind the appendix, computed side by side. The tasks share nothing but the
 * (immutable) project: CRM review then batch review (which needs the CRM outcomes), detection-limit
 * handling, and the duplicates of each analyte. Running them on separate threads changes no result, only
 * the wall time on a machine with more than one core; each task is deterministic on its own.
 *
 * @param stageMillis wall time of each analysis (for the duplicates, from the first analyte's start to the last
 *     one's end), in the order the appendix reads them, for the benchmark
 */
public record AppendixAnalyses(CrmReview crms, BatchReview batches, List<AnalyteCensoring> censoring,
                               List<DuplicateReport> duplicates, Map<String, Long> stageMillis) {

    public AppendixAnalyses {
        stageMillis = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(stageMillis));
    }

    /** Runs the analyses of {@code project}, using up to as many threads as there are chains and cores. */
    public static AppendixAnalyses of(Project project) {
        DuplicateSettings duplicateSettings = project.config().section("duplicates", DuplicateSettings.class,
                DuplicateSettings.DEFAULTS);
        CensoredSettings censoredSettings = CensoredSettings.from(project.config());
        int threads = Math.max(1, Math.min(3, Runtime.getRuntime().availableProcessors()));
        ExecutorService pool = Executors.newFixedThreadPool(threads, Workers.daemonThreads("cupel-analysis"));
        try {
            // The pool's queue is first in, first out: the CRM review goes first and the batch review, which
            // waits for it, last, so that it never holds a thread while the review it needs is still queued,
            // even on a single thread. The duplicates of each analyte are a task of their own: the
            // costliest analysis then spreads over the cores instead of deciding the wall time alone.
            Future<Timed<CrmReview>> crms = pool.submit(() -> Timed.of(() -> CrmReview.of(project)));
            Future<Timed<List<AnalyteCensoring>>> censoring = pool.submit(
                    () -> Timed.of(() -> AnalyteCensoring.of(project, censoredSettings)));
            List<Future<Timed<Optional<DuplicateReport>>>> duplicates = new ArrayList<>();
            for (Supplier<Optional<DuplicateReport>> analyte : PairExtraction.perAnalyte(project, duplicateSettings)) {
                duplicates.add(pool.submit(() -> Timed.of(analyte)));
            }
            Future<Timed<BatchReview>> batches = pool.submit(() -> {
                CrmReview reviewed = Workers.result(crms, "the analyses").value();
                return Timed.of(() -> BatchReview.of(project, reviewed.outcomes()));
            });
            Timed<CrmReview> crmReview = Workers.result(crms, "the analyses");
            Timed<BatchReview> batchReview = Workers.result(batches, "the analyses");
            Timed<List<AnalyteCensoring>> censored = Workers.result(censoring, "the analyses");
            List<DuplicateReport> reports = new ArrayList<>();
            List<Timed<?>> duplicateTimes = new ArrayList<>();
            for (Future<Timed<Optional<DuplicateReport>>> f : duplicates) {
                Timed<Optional<DuplicateReport>> t = Workers.result(f, "the analyses");
                t.value().ifPresent(reports::add);
                duplicateTimes.add(t);
            }
            Map<String, Long> millis = new LinkedHashMap<>();
            millis.put("crm", crmReview.millis());
            millis.put("batches", batchReview.millis());
            millis.put("censored", censored.millis());
            millis.put("duplicates", Timed.spanMillis(duplicateTimes));
            return new AppendixAnalyses(crmReview.value(), batchReview.value(), censored.value(), reports, millis);
        } finally {
            pool.shutdownNow();
        }
    }

    /** A result with the interval in which it was computed. */
    private record Timed<T>(T value, long startNanos, long endNanos) {
        static <T> Timed<T> of(Supplier<T> work) {
            long start = System.nanoTime();
            T value = work.get();
            return new Timed<>(value, start, System.nanoTime());
        }

        long millis() {
            return (endNanos - startNanos) / 1_000_000;
        }

        /** Wall time from the first start to the last end of {@code parts} (0 when there are none). */
        static long spanMillis(List<Timed<?>> parts) {
            long start = parts.stream().mapToLong(Timed::startNanos).min().orElse(0);
            long end = parts.stream().mapToLong(Timed::endNanos).max().orElse(0);
            return (end - start) / 1_000_000;
        }
    }
}
