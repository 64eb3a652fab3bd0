package org.cupel.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.cupel.assay.QcRole;
import org.cupel.demo.DemoGenerator;
import org.cupel.demo.DemoSettings;
import org.cupel.demo.DemoSink;
import org.cupel.demo.DemoSummary;
import org.cupel.demo.PlantedProblem;
import org.cupel.project.InputException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code cupel demo <dir>}: writes the invented demo project. The files go to a temporary folder beside
 * the target, which is then moved into place, so a failed run leaves nothing half-written.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = {"Write the invented Vellmar Hills gold-silver demo project: lab files, sample register,",
                "CRM catalog and smelt testwork, with planted QC problems for the analyses to find."},
        footer = {"", "Examples:", "  cupel demo demo-project",
                "  cupel demo big-project --samples 1000000 --force"})
public final class DemoCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "<dir>", description = "Folder to create (must not exist or be empty).")
    Path dir;

    @Option(names = "--samples", paramLabel = "N",
            description = "Routine samples (default ${DEFAULT-VALUE}); from 10000 on, ten analytes instead of Au and Ag.")
    int samples = DemoSettings.DEFAULT_SAMPLES;

    @Option(names = "--seed", paramLabel = "S", description = "Random seed (default ${DEFAULT-VALUE}).")
    long seed = DemoSettings.DEFAULT_SEED;

    @Option(names = "--force", description = "Replace <dir> if it exists and is not empty.")
    boolean force;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        DemoSettings settings = settings();
        Path target = dir.toAbsolutePath().normalize();
        checkTarget(target);
        Path parent = target.getParent();
        Files.createDirectories(parent);
        Path temp = Files.createTempDirectory(parent, "." + target.getFileName() + ".tmp-");
        DemoSummary summary;
        try {
            summary = DemoGenerator.generate(settings, folderSink(temp));
            moveIntoPlace(temp, target);
        } catch (IOException | RuntimeException e) {
            deleteTree(temp);
            throw e;
        }
        print(spec.commandLine().getOut(), target, summary);
        return CupelCommand.OK;
    }

    private DemoSettings settings() {
        try {
            return new DemoSettings(samples, seed);
        } catch (IllegalArgumentException e) {
            throw new InputException("--samples " + samples + " is out of range: " + e.getMessage()
                    + "; give a value in that range.");
        }
    }

    private void checkTarget(Path target) throws IOException {
        if (Files.exists(target) && !Files.isDirectory(target)) {
            throw new InputException(target + " is a file, not a folder; give the name of a new folder.");
        }
        if (!force && Files.isDirectory(target) && !isEmpty(target)) {
            throw new InputException(target + " already exists and is not empty; choose a new folder,"
                    + " or add --force to replace it.");
        }
    }

    private static boolean isEmpty(Path folder) throws IOException {
        try (DirectoryStream<Path> s = Files.newDirectoryStream(folder)) {
            return !s.iterator().hasNext();
        }
    }

    static DemoSink folderSink(Path root) {
        return relative -> {
            Path file = root.resolve(relative).normalize();
            if (!file.startsWith(root)) {
                throw new IllegalArgumentException("demo file outside the project folder: " + relative);
            }
            Files.createDirectories(file.getParent());
            return new BufferedWriter(new OutputStreamWriter(Files.newOutputStream(file), StandardCharsets.UTF_8),
                    1 << 16);
        };
    }

    /** Swaps the finished folder in; an existing target (only with --force) is moved aside first, then deleted. */
    private static void moveIntoPlace(Path temp, Path target) throws IOException {
        Path old = null;
        if (Files.exists(target)) {
            old = Files.createTempDirectory(target.getParent(), "." + target.getFileName() + ".old-");
            Files.delete(old);
            Files.move(target, old, StandardCopyOption.ATOMIC_MOVE);
        }
        try {
            Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            if (old != null) {
                Files.move(old, target, StandardCopyOption.ATOMIC_MOVE);
            }
            throw e;
        }
        if (old != null) {
            deleteTree(old);
        }
    }

    private static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    private static void print(PrintWriter out, Path target, DemoSummary s) {
        out.printf(Locale.ROOT, "Wrote the demo project to %s: %d files.%n", target, s.files().size());
        out.printf(Locale.ROOT, "  %d lab batches, %d umpire batches, %d gravimetric re-assay files; analytes: %s%n",
                s.labBatches(), s.umpireBatches(), s.reassayFiles(),
                String.join(", ", s.analytes().stream().map(a -> a.symbol()).toList()));
        StringBuilder roles = new StringBuilder();
        for (Map.Entry<QcRole, Long> e : s.registered().entrySet()) {
            roles.append(roles.length() == 0 ? "" : ", ").append(e.getValue()).append(' ').append(e.getKey().label());
        }
        out.printf(Locale.ROOT, "  register: %d samples (%s); plus %d lab repeats%n", s.registeredTotal(), roles,
                s.labRepeats());
        out.println("Planted problems:");
        for (PlantedProblem p : s.planted()) {
            out.printf(Locale.ROOT, "  %-25s %s%s %s%n", p.kind(), p.where(), ids(p.sampleIds()), p.detail());
        }
        out.println("Next: cupel check " + target);
    }

    private static String ids(List<String> ids) {
        if (ids.isEmpty()) {
            return ":";
        }
        String shown = String.join(", ", ids.subList(0, Math.min(3, ids.size())));
        return " [" + shown + (ids.size() > 3 ? ", ... " + ids.size() + " in all" : "") + "]:";
    }
}
