package org.cupel.robust;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.cupel.cli.CupelCommand;

/** One in-process run of the command line, as the robustness tests of issue 15 make it. */
record Cli(int code, String out, String err) {

    static Cli run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = CupelCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Cli(code, out.toString(), err.toString());
    }
}
