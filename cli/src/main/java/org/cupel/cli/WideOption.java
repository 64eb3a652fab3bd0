package org.cupel.cli;

import java.io.PrintWriter;
import picocli.CommandLine.Option;

/**
 * The {@code --wide} option of the commands that print tables. By default their text fits a terminal of
 * {@value #WIDTH} columns ({@link TerminalWriter}: tables wrap long cells within their columns or print one row
 * at a time, long lines wrap at spaces); with {@code --wide} every table row and every note is one line, for a
 * wide terminal, a file or grep. JSON output is never wrapped.
 */
public final class WideOption {
    /** The columns text output fits by default: a common wide terminal (common practice). */
    static final int WIDTH = 120;

    @Option(names = "--wide", description = "Print each table row and each note on one line, however long. "
            + "By default text fits " + WIDTH + " columns: long cells wrap within their column, a table too wide "
            + "for that prints one row at a time, and long lines wrap at spaces.")
    boolean wide;

    /** Where the command's text goes: {@code out} with --wide, else {@code out} fitted to {@value #WIDTH} columns. */
    PrintWriter text(PrintWriter out) {
        return wide ? out : new TerminalWriter(out, WIDTH);
    }
}
