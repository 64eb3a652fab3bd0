package org.cupel.report;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.cupel.charts.PngWriter;
import org.cupel.project.InputException;
import org.cupel.project.Workers;

/**
 * Writes the report's output folder: {@code index.html}, {@code appendix.pdf}, {@code charts/*.png},
 * {@code tables/*.csv}, {@code summary.json} and the marker file {@value #MARKER}.
 *
 * <p>Atomic: everything is written into a hidden temporary folder beside the target, and only a complete
 * folder is moved into place (a rename within one file system). An existing folder is replaced only with
 * {@code force}: it is renamed aside, the new folder renamed in, then the old one deleted. A run that fails
 * or is killed leaves either the previous report or none under the target name, never a mix; the
 * temporary folder of a killed run ({@code .<name>.cupel-tmp-<pid>}) may remain and can be deleted. To
 * protect other data, {@code force} replaces only an empty folder or one that holds the marker file.
 */
public final class ReportWriter {
    /** Marks a folder as written by Cupel, so {@code --force} may replace it. */
    public static final String MARKER = ".cupel-report";

    /** Charts drawn at once: the two cores of a typical QC workstation or CI runner. */
    static final int RENDER_THREADS = 2;

    private ReportWriter() {
    }

    public static void write(QcReport report, Path target, ReportOptions options, ReportProgress progress)
            throws IOException {
        Path out = target.toAbsolutePath().normalize();
        Path parent = out.getParent();
        if (parent == null) {
            throw new InputException("cannot write the report to the root folder " + out + "; give a folder name");
        }
        checkReplaceable(out, options.force());
        Files.createDirectories(parent);
        String name = out.getFileName().toString();
        long pid = ProcessHandle.current().pid();
        Path tmp = parent.resolve("." + name + ".cupel-tmp-" + pid);
        deleteTree(tmp);
        Files.createDirectory(tmp);
        try {
            build(report, tmp, options, progress);
            install(tmp, out, parent.resolve("." + name + ".cupel-old-" + pid));
        } catch (IOException | RuntimeException | Error e) {
            deleteTree(tmp);
            throw e;
        }
    }

    private static void checkReplaceable(Path out, boolean force) throws IOException {
        if (!Files.exists(out)) {
            return;
        }
        if (!Files.isDirectory(out)) {
            throw new InputException(out + " exists and is not a folder; choose another --out folder");
        }
        if (!force) {
            throw new InputException("output folder " + out + " already exists; add --force to replace it, "
                    + "or choose another --out folder");
        }
        if (!Files.exists(out.resolve(MARKER)) && !isEmpty(out)) {
            throw new InputException("output folder " + out + " holds files that Cupel did not write (no " + MARKER
                    + " marker); --force replaces only Cupel report folders, so choose another --out folder");
        }
    }

    private static void build(QcReport report, Path dir, ReportOptions options, ReportProgress progress)
            throws IOException {
        ReportFiles files = new ReportFiles(report);
        boolean separatePrint = options.chartDpi() != PngWriter.PRINT_DPI;
        progress.start(files.figures().size() * (separatePrint ? 2L : 1L) + files.tables().size() + 3);
        Files.createDirectory(dir.resolve("charts"));
        Files.createDirectory(dir.resolve("tables"));
        Path print = separatePrint ? Files.createDirectory(dir.resolve(".print")) : dir;
        writeCharts(files, dir, separatePrint ? print : null, options.chartDpi(), progress);
        for (ReportTable t : files.tables()) {
            progress.step("table " + files.table(t));
            CsvTables.write(t, dir.resolve(files.table(t)));
        }
        progress.step("index.html");
        Files.writeString(dir.resolve("index.html"), HtmlReport.render(report, files), StandardCharsets.UTF_8);
        progress.step("appendix.pdf");
        Path printDir = print;
        try (OutputStream os = Files.newOutputStream(dir.resolve("appendix.pdf"))) {
            PdfReport.write(report, files, f -> read(separatePrint
                    ? printDir.resolve(files.chart(f).replace('/', '_')) : dir.resolve(files.chart(f))),
                    options.paper(), os);
        }
        if (separatePrint) {
            deleteTree(print);
        }
        progress.step("summary.json");
        SummaryJson.write(report, dir.resolve("summary.json"));
        Files.writeString(dir.resolve(MARKER), "Written by Cupel (cupel report). "
                + "'cupel report --force' may replace this folder.\n", StandardCharsets.UTF_8);
    }

    /**
     * Renders the charts on up to {@value #RENDER_THREADS} threads. Each chart is built, drawn and written
     * by one task into its own file, so the bytes do not depend on the order tasks run in; progress is
     * reported in reading order.
     *
     * @param print where print-resolution copies go, or null when {@code dpi} is the print resolution
     */
    private static void writeCharts(ReportFiles files, Path dir, Path print, int dpi, ReportProgress progress)
            throws IOException {
        List<ReportBlock.Figure> figures = files.figures();
        int threads = Math.max(1, Math.min(RENDER_THREADS, Runtime.getRuntime().availableProcessors()));
        ExecutorService pool = Executors.newFixedThreadPool(threads, Workers.daemonThreads("cupel-chart"));
        try {
            List<Future<?>> done = new ArrayList<>(figures.size());
            for (ReportBlock.Figure f : figures) {
                done.add(pool.submit(() -> {
                    writeChart(f, files.chart(f), dir, print, dpi);
                    return null;
                }));
            }
            for (int i = 0; i < figures.size(); i++) {
                progress.step("chart " + files.chart(figures.get(i)));
                if (print != null) {
                    progress.step("print chart " + files.chart(figures.get(i)));
                }
                await(done.get(i));
            }
        } finally {
            pool.shutdownNow();
            awaitTermination(pool);
        }
    }

    private static void writeChart(ReportBlock.Figure f, String name, Path dir, Path print, int dpi)
            throws IOException {
        if (print == null) {
            PngWriter.writeForPrint(f.chart().get(), dir.resolve(name));
            return;
        }
        PngWriter.write(f.chart().get(), dir.resolve(name), dpi);
        PngWriter.writeForPrint(f.chart().get(), print.resolve(name.replace('/', '_')));
    }

    private static void await(Future<?> task) throws IOException {
        try {
            task.get();
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

    /** The output folder is deleted on failure only once no task can still write into it. */
    private static void awaitTermination(ExecutorService pool) throws IOException {
        try {
            if (!pool.awaitTermination(10, TimeUnit.MINUTES)) {
                throw new IOException("chart rendering did not stop");
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while stopping chart rendering", e);
        }
    }

    private static void install(Path tmp, Path out, Path old) throws IOException {
        boolean replacing = Files.exists(out);
        if (replacing) {
            deleteTree(old);
            move(out, old);
        }
        try {
            move(tmp, out);
        } catch (IOException e) {
            if (replacing) {
                move(old, out);
            }
            throw e;
        }
        if (replacing) {
            deleteTree(old);
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException | FileAlreadyExistsException e) {
            throw new IOException("could not move " + from + " to " + to + " in one step (" + e.getMessage()
                    + "); the report was not installed", e);
        }
    }

    private static byte[] read(Path p) {
        try {
            return Files.readAllBytes(p);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static boolean isEmpty(Path dir) throws IOException {
        try (DirectoryStream<Path> s = Files.newDirectoryStream(dir)) {
            return !s.iterator().hasNext();
        }
    }

    static void deleteTree(Path p) throws IOException {
        if (!Files.exists(p, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(p)) {
            for (Path q : (Iterable<Path>) walk.sorted(Comparator.reverseOrder())::iterator) {
                Files.deleteIfExists(q);
            }
        }
    }
}
