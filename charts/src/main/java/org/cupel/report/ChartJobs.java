package org.cupel.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.cupel.charts.Canvas;
import org.cupel.charts.PngWriter;
import org.cupel.project.Workers;

/**
 * The report's charts, drawn on up to {@value #THREADS} threads while the caller writes the tables, the
 * page and the PDF; the PDF waits for each chart only when it reaches it. Each chart is built, drawn and
 * written by one task into its own file, so the bytes do not depend on the order tasks run in; progress
 * is reported in reading order, from the caller's thread. Work queued with {@link #afterCharts} runs on a
 * drawing thread once no chart is left to start.
 */
final class ChartJobs implements AutoCloseable {
    /** Charts drawn at once: the two cores of a typical QC workstation or CI runner. */
    static final int THREADS = 2;

    private final List<ReportBlock.Figure> figures;
    private final Map<ReportBlock.Figure, Integer> index = new IdentityHashMap<>();
    private final List<Future<?>> done = new ArrayList<>();
    private final ExecutorService pool;
    private final ReportFiles files;
    private final boolean separatePrint;
    private final ReportProgress progress;
    /** Each drawing thread paints every chart on its own canvas. */
    private final ThreadLocal<Canvas> canvases = ThreadLocal.withInitial(Canvas::new);
    private int reported;

    /**
     * Starts drawing every chart of {@code files}.
     *
     * @param print where print-resolution copies go, or null when {@code dpi} is the print resolution
     */
    ChartJobs(ReportFiles files, Path dir, Path print, int dpi, ReportProgress progress) {
        this.files = files;
        this.figures = files.figures();
        this.separatePrint = print != null;
        this.progress = progress;
        int threads = Math.max(1, Math.min(THREADS, Runtime.getRuntime().availableProcessors()));
        pool = Executors.newFixedThreadPool(threads, Workers.daemonThreads("cupel-chart"));
        for (ReportBlock.Figure f : figures) {
            index.put(f, index.size());
            done.add(pool.submit(() -> {
                write(f, files.chart(f), dir, print, dpi);
                return null;
            }));
        }
    }

    /** Waits until the chart of {@code f}, and every chart before it in reading order, is written. */
    void await(ReportBlock.Figure f) throws IOException {
        awaitUpTo(index.get(f));
    }

    /**
     * Runs {@code task} on the first drawing thread that finds no chart left to start: the tasks run in the
     * order they were queued, every chart first. A task that needs a chart waits for it with
     * {@link #awaitQuietly}.
     */
    <T> Future<T> afterCharts(Callable<T> task) {
        return pool.submit(task);
    }

    /**
     * Waits until the chart of {@code f} is written, without reporting progress: for tasks on other threads
     * than the caller's.
     */
    void awaitQuietly(ReportBlock.Figure f) throws IOException {
        await(done.get(index.get(f)));
    }

    /** Waits for a task queued with {@link #afterCharts}; its failure is thrown as the task threw it. */
    static <T> T result(Future<T> task) throws IOException {
        return await(task);
    }

    /** Waits until every chart is written. */
    void awaitAll() throws IOException {
        awaitUpTo(figures.size() - 1);
    }

    private void awaitUpTo(int last) throws IOException {
        for (; reported <= last; reported++) {
            String name = files.chart(figures.get(reported));
            progress.step("chart " + name);
            if (separatePrint) {
                progress.step("print chart " + name);
            }
            await(done.get(reported));
        }
    }

    /** Stops the drawing; the output folder may be deleted only once no task can still write into it. */
    @Override
    public void close() throws IOException {
        pool.shutdownNow();
        try {
            if (!pool.awaitTermination(10, TimeUnit.MINUTES)) {
                throw new IOException("chart rendering did not stop");
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while stopping chart rendering", e);
        }
    }

    /** Draws the chart of {@code f} at each resolution, then lets go of what it was drawn from. */
    private void write(ReportBlock.Figure f, String name, Path dir, Path print, int dpi) throws IOException {
        Canvas canvas = canvases.get();
        if (print == null) {
            PngWriter.writeForPrint(f.chart().get(), dir.resolve(name), canvas);
        } else {
            PngWriter.write(f.chart().get(), dir.resolve(name), dpi, canvas);
            PngWriter.writeForPrint(f.chart().get(), print.resolve(printName(name)), canvas);
        }
        f.release();
    }

    /** The file name of a chart's print copy in the print folder. */
    static String printName(String chart) {
        return chart.replace('/', '_');
    }

    private static <T> T await(Future<T> task) throws IOException {
        try {
            return task.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while drawing the charts", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof IOException io) {
                throw io;
            } else if (cause instanceof RuntimeException re) {
                throw re;
            } else if (cause instanceof Error err) {
                throw err;
            }
            throw new IOException(cause);
        }
    }
}
