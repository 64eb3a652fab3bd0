package org.cupel.robust;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import org.cupel.cli.CliRun;
import org.cupel.cli.CupelCommand;

/**
 * Guarantee 1 for one damaged input: the command ends with 0 or 1 (the file was usable) or with exit code 2
 * and one line on stderr that names the damaged file; never 3, never a stack trace.
 */
final class FuzzCheck {
    private FuzzCheck() {
    }

    /** @return null when the outcome is acceptable, else what went wrong */
    static String problem(FuzzCase c) throws IOException {
        Path dir = Files.createTempDirectory("cupel-fuzz-cli");
        try {
            c.target().write(dir, c.content(), c.registerLayout());
            CliRun o = c.target().run(dir);
            return judge(c.target().blamable(c.registerLayout()), c.target().listsProblemsOnStdout(), o, dir);
        } finally {
            deleteTree(dir);
        }
    }

    /**
     * A damaged file can also leave a usable file with nothing to analyse: then the message names the
     * project folder that holds it ("no duplicates found" in a project whose register lost its rows).
     *
     * @param names the files a message may name: the damaged file, and the register when it was laid out wrongly
     * @param listsOnStdout whether the command ({@code check}) lists fatal problems on stdout
     */
    static String judge(List<String> names, boolean listsOnStdout, CliRun o, Path dir) {
        if (o.err().contains("\tat ") || o.err().contains("Exception")) {
            return "stack trace or exception name on stderr: " + o.err();
        }
        if (o.code() == CupelCommand.INPUT_ERROR && listsOnStdout && names.stream().anyMatch(o.out()::contains)) {
            return null;
        }
        if (o.code() == CupelCommand.INPUT_ERROR) {
            String msg = o.err().strip();
            if (msg.isEmpty() || msg.lines().count() != 1 || !msg.startsWith("cupel: ")) {
                return "exit 2 without one 'cupel: ...' line on stderr: [" + o.err() + "]";
            }
            if (names.stream().noneMatch(msg::contains) && !msg.contains(dir.toString())) {
                return "exit 2 but the message does not name " + names + ": " + msg;
            }
            return null;
        }
        if (o.code() == CupelCommand.OK || o.code() == CupelCommand.QC_FAILED) {
            return null;
        }
        return "exit code " + o.code() + ": " + o.err();
    }

    static void deleteTree(Path dir) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : (Iterable<Path>) s.sorted(Comparator.reverseOrder())::iterator) {
                Files.deleteIfExists(p);
            }
        }
    }
}
