package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import picocli.CommandLine;

/**
 * Every command and subcommand answers {@code --help} with its usage and exit code 0, and {@code cupel help
 * <command>} does the same. The commands are taken from picocli's own subcommand map (aliases included), so a
 * command added later is covered without editing this test.
 */
class HelpForEveryCommandTest {

    /** Every command path below {@code cupel}, by each name it answers to (aliases too). */
    static List<List<String>> commandPaths() {
        List<List<String>> paths = new ArrayList<>();
        collect(new CommandLine(new CupelCommand()), new ArrayList<>(), paths);
        return paths;
    }

    private static void collect(CommandLine cl, List<String> prefix, List<List<String>> into) {
        for (Map.Entry<String, CommandLine> e : cl.getSubcommands().entrySet()) {
            List<String> path = new ArrayList<>(prefix);
            path.add(e.getKey());
            into.add(path);
            collect(e.getValue(), path, into);
        }
    }

    @TestFactory
    Stream<DynamicTest> everyCommandAnswersHelpWithItsUsageAndExitZero() {
        List<List<String>> paths = commandPaths();
        assertTrue(paths.size() >= 12, "the subcommand map lists the commands: " + paths);
        return paths.stream().map(path -> DynamicTest.dynamicTest("cupel " + String.join(" ", path) + " --help",
                () -> {
                    List<String> args = new ArrayList<>(path);
                    args.add("--help");
                    CliRun r = CliRun.run(args);
                    assertEquals(CupelCommand.OK, r.code(), "exit code of " + args + "; stderr: " + r.err());
                    // The help command prints its description before the usage line.
                    assertTrue(r.out().contains("Usage: cupel " + canonicalName(path) + " "), r.out());
                    assertFalse(r.err().contains("Missing required"), r.err());
                }));
    }

    @TestFactory
    Stream<DynamicTest> helpCommandShowsTheUsageOfEveryCommand() {
        return commandPaths().stream().filter(p -> p.size() == 1 && !p.get(0).equals("help"))
                .map(path -> DynamicTest.dynamicTest("cupel help " + path.get(0), () -> {
                    CliRun r = CliRun.run(List.of("help", path.get(0)));
                    assertEquals(CupelCommand.OK, r.code(), r.err());
                    assertTrue(r.out().contains("Usage: cupel " + canonicalName(path) + " "), r.out());
                }));
    }

    /** The name picocli prints in the usage line (an alias such as {@code analyze} prints {@code analyse}). */
    private static String canonicalName(List<String> path) {
        CommandLine cl = new CommandLine(new CupelCommand());
        for (String name : path) {
            cl = cl.getSubcommands().get(name);
        }
        return cl.getCommandName();
    }
}
