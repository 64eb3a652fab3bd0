package org.cupel.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;
import org.cupel.censored.AnalyteCensoring;
import org.cupel.censored.CensoredSettings;
import org.cupel.control.BatchReview;
import org.cupel.control.crm.CrmReview;
import org.cupel.duplicates.DuplicateSettings;
import org.cupel.duplicates.PairExtraction;
import org.cupel.ingest.ProjectLoader;
import org.cupel.project.Project;

/**
 * Times each core stage of the analysis on one project folder, one stage after the other on this
 * thread, so that a change to one stage can be measured without profiling the whole run:
 *
 * <pre>
 * mvn -B -Pbench -pl bench -am package -DskipTests
 * java -Xmx2g -cp bench/target/benchmarks.jar org.cupel.bench.StageTimer /tmp/cupel-bench/demo-1000000 [repeats] [stage...]
 * </pre>
 *
 * Stages: {@code ingest crm batches censored duplicates} (default all). The ingest always runs once (the
 * other stages need its project); with repeats &gt; 1 every named stage runs that many times and each run is
 * printed, so the first (cold, JIT warming) and later (warm) figures can be told apart. Wall and CPU time of
 * this thread are printed in milliseconds, and the ingest's rate in MB of CSV per second of wall time. With
 * {@code -XX:ActiveProcessorCount=1} the ingest runs on one thread (no read-ahead), which is how the
 * one-core ingest rate is measured (docs/performance.md).
 */
public final class StageTimer {
    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

    private StageTimer() {
    }

    public static void main(String[] args) {
        Path folder = Path.of(args[0]);
        int repeats = args.length > 1 ? Integer.parseInt(args[1]) : 1;
        List<String> stages = args.length > 2 ? List.of(args).subList(2, args.length)
                : List.of("ingest", "crm", "batches", "censored", "duplicates");
        double megabytes = inputBytes(folder) / 1e6;
        Project project = timeIngest(folder, megabytes);
        for (int r = 1; r < repeats && stages.contains("ingest"); r++) {
            timeIngest(folder, megabytes);
        }
        CrmReview crms = null;
        for (int r = 0; r < repeats; r++) {
            if (stages.contains("crm") || stages.contains("batches")) {
                crms = time("crm", () -> CrmReview.of(project));
            }
            if (stages.contains("batches")) {
                List<org.cupel.control.ControlOutcome> outcomes = crms.outcomes();
                time("batches", () -> BatchReview.of(project, outcomes));
            }
            if (stages.contains("censored")) {
                time("censored", () -> AnalyteCensoring.of(project, CensoredSettings.from(project.config())));
            }
            if (stages.contains("duplicates")) {
                DuplicateSettings settings = project.config().section("duplicates", DuplicateSettings.class,
                        DuplicateSettings.DEFAULTS);
                time("duplicates", () -> PairExtraction.analyse(project, settings));
            }
        }
    }

    /** The ingest, with its rate in MB of input per second of wall time. */
    private static Project timeIngest(Path folder, double megabytes) {
        long wall = System.nanoTime();
        Project project = time("ingest", () -> ProjectLoader.load(folder));
        System.out.printf(Locale.ROOT, "            %.1f MB in, %.1f MB/s wall%n", megabytes,
                megabytes / ((System.nanoTime() - wall) / 1e9));
        return project;
    }

    /** Bytes of the register and the lab files: what the ingest parses. */
    private static long inputBytes(Path folder) {
        try (java.util.stream.Stream<Path> labs = java.nio.file.Files.list(folder.resolve(ProjectLoader.LAB_DIR))) {
            long lab = labs.mapToLong(StageTimer::size).sum();
            return lab + size(folder.resolve(ProjectLoader.REGISTER));
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static long size(Path file) {
        try {
            return java.nio.file.Files.isRegularFile(file) ? java.nio.file.Files.size(file) : 0;
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static <T> T time(String stage, Supplier<T> work) {
        long wall = System.nanoTime();
        long cpu = THREADS.getCurrentThreadCpuTime();
        T result = work.get();
        System.out.printf(Locale.ROOT, "%-11s wall %8.0f ms   cpu %8.0f ms%n", stage,
                (System.nanoTime() - wall) / 1e6, (THREADS.getCurrentThreadCpuTime() - cpu) / 1e6);
        return result;
    }
}
