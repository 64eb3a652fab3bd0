package org.cupel.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
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
 * The core analyses behind the appendix, computed side by side. The three chains share nothing but the
 * (immutable) project: CRM review then batch review (which needs the CRM outcomes), detection-limit
 * handling, and duplicates. Running them on separate threads changes no result, only the wall time on a
 * machine with more than one core; each chain is deterministic on its own.
 *
 * @param stageMillis wall time of each chain, in the order the appendix reads them, for the benchmark
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
            // Submitted in this order on purpose: the pool's queue is first in, first out, so the CRM review
            // is always taken before the batch review that waits for it, even on a single thread.
            Future<Timed<List<DuplicateReport>>> duplicates = pool.submit(
                    () -> Timed.of(() -> PairExtraction.analyse(project, duplicateSettings)));
            Future<Timed<CrmReview>> crms = pool.submit(() -> Timed.of(() -> CrmReview.of(project)));
            Future<Timed<BatchReview>> batches = pool.submit(() -> {
                CrmReview reviewed = Workers.result(crms, "the analyses").value();
                return Timed.of(() -> BatchReview.of(project, reviewed.outcomes()));
            });
            Future<Timed<List<AnalyteCensoring>>> censoring = pool.submit(
                    () -> Timed.of(() -> AnalyteCensoring.of(project, censoredSettings)));
            Timed<CrmReview> crmReview = Workers.result(crms, "the analyses");
            Timed<BatchReview> batchReview = Workers.result(batches, "the analyses");
            Timed<List<AnalyteCensoring>> censored = Workers.result(censoring, "the analyses");
            Timed<List<DuplicateReport>> pairs = Workers.result(duplicates, "the analyses");
            Map<String, Long> millis = new LinkedHashMap<>();
            millis.put("crm", crmReview.millis());
            millis.put("batches", batchReview.millis());
            millis.put("censored", censored.millis());
            millis.put("duplicates", pairs.millis());
            return new AppendixAnalyses(crmReview.value(), batchReview.value(), censored.value(), pairs.value(),
                    millis);
        } finally {
            pool.shutdownNow();
        }
    }

    private record Timed<T>(T value, long millis) {
        static <T> Timed<T> of(Supplier<T> work) {
            long start = System.nanoTime();
            T value = work.get();
            return new Timed<>(value, (System.nanoTime() - start) / 1_000_000);
        }
    }
}
