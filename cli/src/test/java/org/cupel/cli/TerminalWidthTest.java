package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every command that prints tables, run on the demo project (and blanks on its test file), fits a terminal of
 * 120 columns by default, and with --wide prints the same words with every table row on one line (issue 17,
 * item 5). The two outputs hold the same words: wrapping moved words to new lines, it never cut one.
 */
class TerminalWidthTest {
    private static final int WIDTH = 120;

    @TempDir
    static Path dir;
    private static final Map<String, List<String>> COMMANDS = new LinkedHashMap<>();

    @BeforeAll
    static void writeTheDemoProject() {
        String demo = dir.resolve("demo").toString();
        CliRun.ok("demo", demo);
        String lab = dir.resolve("demo").resolve("lab").resolve("OAL-00001.csv").toString();
        String blanks = Path.of(System.getProperty("cupel.testdata"), "control-blanks", "blank-results.csv")
                .toString();
        for (String c : new String[] {"check", "crm", "batches", "duplicates", "analyse", "recovery"}) {
            COMMANDS.put(c, List.of(c, demo));
        }
        COMMANDS.put("blanks", List.of("blanks", blanks));
        COMMANDS.put("censored", List.of("censored", lab, "--column", "Au_ppm_FA-AAS"));
        COMMANDS.put("dl-check", List.of("dl-check", lab, "--column", "Au_ppm_FA-AAS"));
    }

    private static String run(List<String> args, boolean wide) {
        List<String> all = new ArrayList<>(args);
        if (wide) {
            all.add("--wide");
        }
        CliRun r = CliRun.run(all);
        assertTrue(r.code() == 0 || r.code() == 1, all + " ran: exit " + r.code() + " " + r.err());
        return r.out();
    }

    /** The words of the output, less rule lines and the run times that analyse prints. */
    private static Set<String> words(String text) {
        Set<String> out = new TreeSet<>();
        for (String line : text.split("\n")) {
            if (!line.contains(" ms")) {
                for (String w : line.strip().split("\\s+")) {
                    if (!w.isEmpty() && !w.matches("-+")) {
                        out.add(w);
                    }
                }
            }
        }
        return out;
    }

    @Test
    void everyLineFits120ColumnsAndWideGivesTheSameWordsOnLongerLines() {
        int widerThanTheTerminal = 0;
        for (Map.Entry<String, List<String>> c : COMMANDS.entrySet()) {
            String fitted = run(c.getValue(), false);
            for (String line : fitted.split("\n")) {
                assertTrue(line.codePointCount(0, line.length()) <= WIDTH, c.getKey() + ": line of "
                        + line.codePointCount(0, line.length()) + " columns: " + line);
            }
            String wide = run(c.getValue(), true);
            assertEquals(words(wide), words(fitted), c.getKey() + ": the same words fitted and --wide");
            if (wide.lines().anyMatch(l -> l.codePointCount(0, l.length()) > WIDTH)) {
                widerThanTheTerminal++;
            }
        }
        assertTrue(widerThanTheTerminal >= 5, "most commands print something wider than 120 columns with --wide: "
                + widerThanTheTerminal);
    }

    @Test
    void wideKeepsEachTableRowOnOneLine() {
        List<String> recovery = COMMANDS.get("recovery");
        String wide = run(recovery, true);
        String fitted = run(recovery, false);
        // The pairwise table's header and a row: one line each with --wide.
        String header = wide.lines().filter(l -> l.startsWith("Analyte  Pair")).findFirst().orElse("");
        assertTrue(header.contains("Games–Howell p") && header.contains("Notes"), wide);
        assertTrue(wide.lines().anyMatch(l -> l.startsWith("Au ") && l.contains("LIT60-1050 − LIT90-1050")
                && l.contains("different")), wide);
        // Fitted, it is printed one row at a time: the header's words are labels of their own lines.
        assertFalse(fitted.lines().anyMatch(l -> l.startsWith("Analyte  Pair")), fitted);
        assertTrue(fitted.lines().anyMatch(l -> l.startsWith("Games–Howell p ")), fitted);
    }
}
