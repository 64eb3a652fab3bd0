package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/** Notes printed through the terminal writer wrap at spaces with a hanging indent; short lines pass as they are. */
class TerminalWriterTest {

    private static String print(int width, String... lines) {
        StringWriter s = new StringWriter();
        PrintWriter out = new TerminalWriter(s, width);
        for (String l : lines) {
            out.print(l + "\n");
        }
        out.flush();
        return s.toString();
    }

    @Test
    void aLongLineWrapsAtSpacesWithItsContinuationIndented() {
        // 20 columns: "field duplicate: the" fits exactly; the rest continues two columns in.
        assertEquals("field duplicate: the\n  interval includes\n  zero\n",
                print(20, "field duplicate: the interval includes zero"));
        assertEquals("  batch OAL-00006:\n    0.0% of 3 pairs\n", print(20, "  batch OAL-00006: 0.0% of 3 pairs"));
    }

    @Test
    void shortLinesAndEmptyLinesPassUnchanged() {
        assertEquals("a short line\n\n", print(20, "a short line", ""));
    }

    @Test
    void aWordLongerThanTheLineIsCutAtTheWidth() {
        // 11 columns, then 9 after the two-column indent.
        assertEquals("lab/umpire-\n  BFA-U0001\n  .csv\n", print(11, "lab/umpire-BFA-U0001.csv"));
    }

    @Test
    void unfinishedTextIsWrittenOnFlush() {
        StringWriter s = new StringWriter();
        PrintWriter out = new TerminalWriter(s, 40);
        out.print("no newline");
        assertEquals("", s.toString(), "held until the line ends");
        out.flush();
        assertEquals("no newline", s.toString());
    }
}
