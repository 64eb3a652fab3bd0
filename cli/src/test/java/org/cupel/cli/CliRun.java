package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;

/**
 * One in-process run of the command line, as the CLI tests make it: the exit code and what the command wrote
 * to standard output and standard error, captured (so tables never reach the build log).
 *
 * @param code the exit code ({@link CupelCommand#OK}, {@link CupelCommand#QC_FAILED}, ...)
 * @param out standard output
 * @param err standard error
 */
public record CliRun(int code, String out, String err) {

    /** Runs {@code cupel args...}. */
    public static CliRun run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = CupelCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new CliRun(code, out.toString(), err.toString());
    }

    /** Runs {@code cupel args...}. */
    public static CliRun run(List<String> args) {
        return run(args.toArray(String[]::new));
    }

    /** Runs {@code cupel args...} and fails, showing standard error, unless it exits 0. */
    public static CliRun ok(String... args) {
        CliRun r = run(args);
        assertEquals(CupelCommand.OK, r.code, "cupel " + String.join(" ", args) + "\n" + r.err);
        return r;
    }

    /** Exit 2 with exactly one {@code cupel: } line on standard error (the input-error contract). */
    public boolean oneLineInputError() {
        return code == CupelCommand.INPUT_ERROR && err.strip().lines().count() == 1 && err.startsWith("cupel: ");
    }
}
