package org.cupel.report;

import java.io.BufferedOutputStream;
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
import java.util.Comparator;
import java.util.stream.Stream;
import org.cupel.charts.PngWriter;
import org.cupel.project.InputException;

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

    /**
     * The charts are drawn on worker threads from the start; meanwhile this thread writes the tables and
     * the page, then the PDF, which takes each chart as soon as it is written. Drawing the charts and
     * laying out the PDF are the two largest costs of a big report, and they no longer wait for each other.
     */
    private static void build(QcReport report, Path dir, ReportOptions options, ReportProgress progress)
            throws IOException {
        ReportFiles files = new ReportFiles(report);
        boolean separatePrint = options.chartDpi() != PngWriter.PRINT_DPI;
        progress.start(files.figures().size() * (separatePrint ? 2L : 1L) + files.tables().size() + 3);
        Files.createDirectory(dir.resolve("charts"));
        Files.createDirectory(dir.resolve("tables"));
        Path print = separatePrint ? Files.createDirectory(dir.resolve(".print")) : dir;
        try (ChartJobs charts = new ChartJobs(files, dir, separatePrint ? print : null, options.chartDpi(),
                progress)) {
            for (ReportTable t : files.tables()) {
                progress.step("table " + files.table(t));
                CsvTables.write(t, dir.resolve(files.table(t)));
            }
            progress.step("index.html");
            Files.writeString(dir.resolve("index.html"), HtmlReport.render(report, files), StandardCharsets.UTF_8);
            progress.step("appendix.pdf");
            // OpenPDF writes many small pieces (one per PDF object and content operator run): buffer them.
            try (OutputStream os = new BufferedOutputStream(Files.newOutputStream(dir.resolve("appendix.pdf")),
                    1 << 16)) {
                PdfReport.write(report, files, f -> printPng(charts, f, separatePrint
                        ? print.resolve(ChartJobs.printName(files.chart(f))) : dir.resolve(files.chart(f))),
                        options.paper(), os);
            } catch (UncheckedIOException e) {
                throw e.getCause();
            }
            charts.awaitAll();
        }
        if (separatePrint) {
            deleteTree(print);
        }
        progress.step("summary.json");
        SummaryJson.write(report, dir.resolve("summary.json"));
        Files.writeString(dir.resolve(MARKER), "Written by Cupel (cupel report). "
                + "'cupel report --force' may replace this folder.\n", StandardCharsets.UTF_8);
    }

    /** The print PNG of {@code f}, once its chart job has written it to {@code file}. */
    private static byte[] printPng(ChartJobs charts, ReportBlock.Figure f, Path file) {
        try {
            charts.await(f);
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
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
