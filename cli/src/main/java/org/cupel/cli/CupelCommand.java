package org.cupel.cli;

import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.FileSystemException;
import java.util.concurrent.Callable;
import org.cupel.config.ConfigException;
import org.cupel.project.FileProblems;
import org.cupel.project.InputException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * The {@code cupel} command. Subcommands are thin: they parse options, call core analyses and chart
 * rendering, and print. Exit codes: 0 ok, 1 QC failures found (with {@code --fail-on-qc}), 2 usage or
 * input error, 3 internal error (also when the input does not fit in the Java heap: see
 * {@link #outOfMemory}).
 */
@Command(name = "cupel",
        mixinStandardHelpOptions = true,
        versionProvider = CupelCommand.Version.class,
        description = {"Statistical QA/QC for assay data: lab batches, CRMs, blanks, duplicates,",
                "detection limits, smelt recoveries, and the QC appendix of a resource report."},
        footer = {"", "Example:", "  cupel demo demo-project && cupel report demo-project --out qc-appendix"},
        subcommands = {
            CommandLine.HelpCommand.class,
            CheckCommand.class,
            CrmCommand.class,
            DemoCommand.class,
            BlanksCommand.class,
            BatchesCommand.class,
            CensoredCommand.class,
            DlCheckCommand.class,
            DuplicatesCommand.class,
            RecoveryCommand.class,
            ReportCommand.class,
            AnalyseCommand.class,
        })
public final class CupelCommand implements Callable<Integer> {

    public static final int OK = 0;
    public static final int QC_FAILED = 1;
    public static final int INPUT_ERROR = 2;
    public static final int INTERNAL_ERROR = 3;

    @Option(names = "--verbose", scope = CommandLine.ScopeType.INHERIT,
            description = "Print the stack trace of an error as well as its message.")
    boolean verbose;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return OK;
    }

    public static void main(String[] args) {
        System.exit(run(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /** Runs the command line with the given streams; used by {@link #main} and by tests. */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CupelCommand top = new CupelCommand();
        CommandLine cl = new CommandLine(top);
        cl.setOut(out);
        cl.setErr(err);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            FileSystemException refused = fileSystemRefusal(ex);
            boolean isInput = ex instanceof InputException || ex instanceof ConfigException || refused != null;
            String text = refused != null ? FileProblems.describe(refused) + "; check the path, that its folders "
                    + "exist and that you may write there" : ex.getMessage();
            // One line per error: a message may quote a cell or parser text that holds line breaks.
            String message = text == null ? ex.getClass().getSimpleName()
                    : text.strip().replaceAll("\\s*\\R\\s*", " ");
            err.println((isInput ? "cupel: " : "cupel: internal error: ") + message);
            if (top.verbose) {
                ex.printStackTrace(err);
            } else if (!isInput) {
                err.println("cupel: run again with --verbose for the stack trace, and please report it.");
            }
            err.flush();
            return isInput ? INPUT_ERROR : INTERNAL_ERROR;
        });
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("cupel: " + ex.getMessage());
            CommandLine.UnmatchedArgumentException.printSuggestions(ex, err);
            err.println("Try '" + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help'.");
            err.flush();
            return INPUT_ERROR;
        });
        try {
            return cl.execute(args);
        } catch (OutOfMemoryError e) {
            return outOfMemory(e, err);
        }
    }

    /**
     * The file system's refusal behind {@code ex} (a missing folder, a file in the way, no permission), or
     * null. A command's files are the user's to name and place, so such a refusal is an input error (exit 2)
     * whichever command meets it; the report and the readers word their own messages, this covers the rest
     * (the demo's folder, --charts folders).
     */
    static FileSystemException fileSystemRefusal(Throwable ex) {
        if (ex instanceof FileSystemException f) {
            return f;
        }
        return ex instanceof UncheckedIOException u && u.getCause() instanceof FileSystemException f ? f : null;
    }

    /**
     * The one-sentence message for an input too large for the heap, instead of a stack trace. Exit 3:
     * the input is valid, the run was not given the memory it needs.
     */
    static int outOfMemory(OutOfMemoryError e, PrintWriter err) {
        long maxMiB = Runtime.getRuntime().maxMemory() / (1024 * 1024);
        err.println("cupel: the input does not fit in the Java heap (" + maxMiB + " MiB, " + e.getMessage()
                + "); run again with a larger heap, for example CUPEL_JAVA_OPTS=-Xmx8g (see docs/performance.md).");
        err.flush();
        return INTERNAL_ERROR;
    }

    /**
     * The version the shaded jar's manifest gives ({@code Implementation-Version}, set from the Maven project
     * version in cli/pom.xml); run from compiled classes (an IDE, the tests) there is no manifest, and the
     * text says so rather than invent a number.
     */
    static final class Version implements CommandLine.IVersionProvider {
        static final String FROM_CLASSES = "development build (run from compiled classes, not from the jar)";

        @Override
        public String[] getVersion() {
            return new String[] {text(CupelCommand.class)};
        }

        /** "cupel " and the Implementation-Version of the jar that holds {@code c}. */
        static String text(Class<?> c) {
            String v = c.getPackage().getImplementationVersion();
            return "cupel " + (v == null || v.isBlank() ? FROM_CLASSES : v);
        }
    }
}
