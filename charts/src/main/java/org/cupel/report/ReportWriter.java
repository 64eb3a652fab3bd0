package org.cupel.report;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.concurrent.Future;
import java.util.function.Function;
import java.util.stream.Stream;
import org.cupel.charts.PngWriter;
import org.cupel.project.FileProblems;
import org.cupel.project.InputException;

/**
 * Writes the report's output folder: {@code index.html}, {@code appendix.pdf}, {@code appendix.docx},
 * {@code charts/*.png}, {@code tables/*.csv}, {@code summary.json} and the marker file {@value #MARKER}.
 *
 * <p>Atomic: everything is written into a hidden temporary folder beside the target, and only a complete
 * folder is moved into place (a rename within one file system). An existing folder is replaced only with
 * {@code force}: it is renamed aside, the new folder renamed in, then the old one deleted. A run that fails
 * or is killed leaves either the previous report or none under the target name, never a mix.
 *
 * <p>Nothing but a Cupel report is ever replaced. {@code force} replaces only an empty folder or one that
 * holds the marker file, and the target is checked again just before the move: a folder that appeared, or
 * lost its marker, while the report was being written is left alone and the run ends with an input error.
 * One run at a time per target: the run holds {@link OutputLock} from start to end, and a second run on the
 * same target stops at once with an input error. Under that lock, the leftovers of killed runs are deleted
 * ({@link StaleOutputs}).
 *
 * <p>Any failure of the file system at the output location (no such folder, permission denied, a file in
 * the way, a full disk) ends as an {@link InputException} naming the location: it is the user's to fix, not
 * a bug.
 */
public final class ReportWriter {
    /** Marks a folder as written by Cupel, so {@code --force} may replace it. */
    public static final String MARKER = ".cupel-report";
    /** Marks a temporary folder that a run is still writing (removed before the folder is moved into place). */
    static final String PARTIAL_MARKER = ".cupel-report-partial";

    private ReportWriter() {
    }

    /**
     * Writes {@code report} into the folder {@code target}. A report is written once: each chart is drawn
     * once and its figure then lets go of the results it was drawn from (at a million samples, half of the
     * heap), so a second write of the same report fails; build the report again to write it again.
     */
    @SuppressWarnings("try") // the lock is held for the body's duration, not used in it
    public static void write(QcReport report, Path target, ReportOptions options, ReportProgress progress)
            throws IOException {
        Path out = target.toAbsolutePath().normalize();
        Path parent = out.getParent();
        if (parent == null) {
            throw new InputException("cannot write the report to the root folder " + out + "; give a folder name");
        }
        requireFolderPath(out);
        boolean existed = checkReplaceable(out, options.force());
        String name = out.getFileName().toString();
        try {
            Files.createDirectories(parent);
            try (OutputLock lock = OutputLock.tryAcquire(parent, name).orElseThrow(() -> busy(out, parent, name))) {
                StaleOutputs.clean(parent, name);
                long pid = ProcessHandle.current().pid();
                writeAndInstall(report, options, progress, out, parent.resolve("." + name + ".cupel-tmp-" + pid),
                        parent.resolve("." + name + ".cupel-old-" + pid), existed);
            }
        } catch (IOException e) {
            throw new InputException("cannot write the report to " + out + " (" + FileProblems.describe(e)
                    + "); choose an --out folder in a place where you can create files, with space to spare", e);
        }
    }

    private static void writeAndInstall(QcReport report, ReportOptions options, ReportProgress progress, Path out,
                                        Path tmp, Path old, boolean existed) throws IOException {
        Files.createDirectory(tmp);
        try {
            Files.writeString(tmp.resolve(PARTIAL_MARKER), "A cupel report run is writing this folder.\n",
                    StandardCharsets.UTF_8);
            build(report, tmp, options, progress);
            Files.delete(tmp.resolve(PARTIAL_MARKER));
            recheckBeforeInstall(out, options.force(), existed);
            install(tmp, out, old);
        } catch (IOException | RuntimeException | Error e) {
            deleteTree(tmp);
            throw e;
        }
    }

    /** The first part of the path that exists must be a folder (a file there makes the path unusable). */
    private static void requireFolderPath(Path out) {
        for (Path p = out.getParent(); p != null; p = p.getParent()) {
            if (Files.exists(p)) {
                if (!Files.isDirectory(p)) {
                    throw new InputException("cannot write the report to " + out + ": " + p + " is a file, not a "
                            + "folder; choose an --out path inside a folder");
                }
                return;
            }
        }
    }

    private static InputException busy(Path out, Path parent, String name) {
        return new InputException("another cupel report run is writing " + out + " right now (it holds "
                + OutputLock.file(parent, name) + "); wait for it to finish, or choose another --out folder");
    }

    /** @return whether the target exists (and may be replaced) */
    private static boolean checkReplaceable(Path out, boolean force) throws IOException {
        if (!Files.exists(out, LinkOption.NOFOLLOW_LINKS)) {
            return false;
        }
        if (!Files.isDirectory(out, LinkOption.NOFOLLOW_LINKS)) {
            throw new InputException(out + " exists and is not a folder; choose another --out folder");
        }
        if (!force) {
            throw new InputException("output folder " + out + " already exists; add --force to replace it, "
                    + "or choose another --out folder");
        }
        if (!Files.exists(out.resolve(MARKER)) && !StaleOutputs.isEmpty(out)) {
            throw new InputException("output folder " + out + " holds files that Cupel did not write (no " + MARKER
                    + " marker); --force replaces only Cupel report folders, so choose another --out folder");
        }
        return true;
    }

    /**
     * The target as it is now, just before the move: someone may have created it, or put files of their own
     * there, while the report was being written. Only what was checked at the start may be replaced.
     */
    private static void recheckBeforeInstall(Path out, boolean force, boolean existed) throws IOException {
        if (!existed && Files.exists(out, LinkOption.NOFOLLOW_LINKS)) {
            throw new InputException("output folder " + out + " appeared while the report was being written; it "
                    + "was left untouched and the report was not installed: move it away and run again, or choose "
                    + "another --out folder");
        }
        if (existed) {
            checkReplaceable(out, force);
        }
    }

    /**
     * The charts are drawn on worker threads from the start; meanwhile this thread writes the tables and
     * the page, then the PDF, which takes each chart as soon as it is written. The Word copy is written on
     * a drawing thread once no chart is left to start, beside the end of the PDF: drawing the charts and
     * laying out the PDF are the two largest costs of a big report, and written one after the other the PDF
     * and the Word copy left one of two cores idle for the last seconds (about 3 s at a million samples).
     */
    private static void build(QcReport report, Path dir, ReportOptions options, ReportProgress progress)
            throws IOException {
        ReportFiles files = new ReportFiles(report);
        boolean separatePrint = options.chartDpi() != PngWriter.PRINT_DPI;
        progress.start(files.figures().size() * (separatePrint ? 2L : 1L) + files.tables().size() + 4);
        Files.createDirectory(dir.resolve("charts"));
        Files.createDirectory(dir.resolve("tables"));
        Path print = separatePrint ? Files.createDirectory(dir.resolve(".print")) : dir;
        Function<ReportBlock.Figure, Path> printFile = f -> separatePrint
                ? print.resolve(ChartJobs.printName(files.chart(f))) : dir.resolve(files.chart(f));
        try (ChartJobs charts = new ChartJobs(files, dir, separatePrint ? print : null, options.chartDpi(),
                progress)) {
            Future<Void> word = charts.afterCharts(() -> {
                write(dir.resolve("appendix.docx"), os -> DocxReport.write(report, files,
                        f -> printPng(charts::awaitQuietly, f, printFile.apply(f)), options.paper(), os));
                return null;
            });
            for (ReportTable t : files.tables()) {
                progress.step("table " + files.table(t));
                CsvTables.write(t, dir.resolve(files.table(t)));
            }
            progress.step("index.html");
            Files.writeString(dir.resolve("index.html"), HtmlReport.render(report, files), StandardCharsets.UTF_8);
            progress.step("appendix.pdf");
            write(dir.resolve("appendix.pdf"), os -> PdfReport.write(report, files,
                    f -> printPng(charts::await, f, printFile.apply(f)), options.paper(), os));
            progress.step("appendix.docx");
            ChartJobs.result(word);
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

    /** Something written to an output stream. */
    @FunctionalInterface
    private interface Writing {
        void to(OutputStream out) throws IOException;
    }

    /**
     * Writes {@code file} through a buffer: OpenPDF and the Word packaging write many small pieces (one per
     * PDF object and content operator run).
     */
    private static void write(Path file, Writing writing) throws IOException {
        try (OutputStream os = new BufferedOutputStream(Files.newOutputStream(file), 1 << 16)) {
            writing.to(os);
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    /** Waits for a chart. */
    @FunctionalInterface
    private interface ChartWait {
        void until(ReportBlock.Figure f) throws IOException;
    }

    /** The print PNG of {@code f}, once its chart job has written it to {@code file}. */
    private static byte[] printPng(ChartWait wait, ReportBlock.Figure f, Path file) {
        try {
            wait.until(f);
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void install(Path tmp, Path out, Path old) throws IOException {
        boolean replacing = Files.exists(out, LinkOption.NOFOLLOW_LINKS);
        if (replacing) {
            deleteTree(old);
            move(out, old);
            if (!Files.exists(old.resolve(MARKER)) && !StaleOutputs.isEmpty(old)) {
                // Swapped for another folder between the check and the move: put it back, untouched.
                move(old, out);
                throw new InputException("output folder " + out + " was replaced by a folder Cupel did not write "
                        + "while the report was being written; it was left untouched: choose another --out folder");
            }
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

    static void deleteTree(Path p) throws IOException {
        if (!Files.exists(p, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(p)) {
            for (Path q : (Iterable<Path>) walk.sorted(Comparator.reverseOrder())::iterator) {
                Files.deleteIfExists(q);
            }
        }
    }
}
