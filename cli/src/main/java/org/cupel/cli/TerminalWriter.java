package org.cupel.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Writer;

/**
 * Text output that fits a terminal of {@link #width()} columns. A {@link TextTable} printed through it sets
 * itself to the width; any other line longer than the width is wrapped at its spaces, each continuation
 * indented two columns more than the line began, so that notes and lists stay readable. A word longer than a
 * whole line is cut at the width, the only place a word breaks. Widths count characters (code points): the
 * tables and notes use Latin letters, digits and signs such as ±, σ and –, each one column wide.
 */
final class TerminalWriter extends PrintWriter {
    private final int width;

    TerminalWriter(Writer out, int width) {
        super(new LineWrapper(out, width));
        this.width = width;
    }

    /** The number of columns every line fits. */
    int width() {
        return width;
    }

    /** Collects each line and writes it wrapped when it ends; what a flush finds unfinished is written as it is. */
    private static final class LineWrapper extends Writer {
        private final Writer out;
        private final int width;
        private final StringBuilder line = new StringBuilder();

        LineWrapper(Writer out, int width) {
            this.out = out;
            this.width = width;
        }

        @Override
        public void write(char[] cbuf, int off, int len) throws IOException {
            for (int i = off; i < off + len; i++) {
                if (cbuf[i] == '\n') {
                    boolean cr = line.length() > 0 && line.charAt(line.length() - 1) == '\r';
                    String text = cr ? line.substring(0, line.length() - 1) : line.toString();
                    for (String part : TextWrap.hanging(text, width)) {
                        out.write(part);
                        out.write(cr ? "\r\n" : "\n");
                    }
                    line.setLength(0);
                } else {
                    line.append(cbuf[i]);
                }
            }
        }

        @Override
        public void flush() throws IOException {
            out.write(line.toString());
            line.setLength(0);
            out.flush();
        }

        @Override
        public void close() throws IOException {
            flush();
            out.close();
        }
    }
}
