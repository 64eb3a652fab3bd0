package org.cupel.project;

import org.cupel.assay.SourceLocation;

/**
 * One problem found in the input, phrased so a user can fix it: where, what was found, what was
 * expected, and how to fix it.
 *
 * @param severity whether the row was still analysed, left out, or the file not read
 * @param where file, line and column
 * @param sampleId the sample concerned, empty when none
 * @param found the offending text, verbatim (escaped only at output), cut short when longer than a few lines
 *     ({@link MessageText#shorten})
 * @param problem one sentence: what is wrong
 * @param expected what the reader expected there
 * @param fix how to fix it
 */
public record DataIssue(Severity severity, SourceLocation where, String sampleId, String found, String problem,
                        String expected, String fix) {

    /** How far a problem reaches. */
    public enum Severity {
        /** Noted; the row is analysed. */
        WARNING,
        /** The row (or the value) is left out of the analyses and listed in the exceptions table. */
        EXCLUDED,
        /** The file could not be used at all. */
        FATAL
    }

    public DataIssue {
        sampleId = sampleId == null ? "" : sampleId;
        found = found == null ? "" : MessageText.shorten(found);
        expected = expected == null ? "" : expected;
        fix = fix == null ? "" : fix;
    }

    /**
     * A file that could not be used at all, from the one-sentence message of the error that stopped it; the
     * message's own {@code file:line:col:} prefix becomes the location.
     */
    public static DataIssue fatal(String file, String message) {
        SourceLocation where = SourceLocation.ofFile(file);
        String text = message;
        if (message.startsWith(file + ":")) {
            String[] parts = message.substring(file.length() + 1).split(":", 3);
            long line = parts.length > 1 ? digits(parts[0]) : 0;
            int col = parts.length > 2 && line > 0 ? (int) digits(parts[1]) : 0;
            where = new SourceLocation(file, Math.max(line, 0), Math.max(col, 0));
            int cut = file.length() + 1 + (line > 0 ? parts[0].length() + 1 : 0) + (col > 0 ? parts[1].length() + 1 : 0);
            text = message.substring(cut).strip();
        }
        return new DataIssue(Severity.FATAL, where, "", "", text, "", "");
    }

    private static long digits(String s) {
        try {
            return Long.parseLong(s.strip());
        } catch (NumberFormatException e) {
            return -1;
        }
    }

    /** One line: {@code file:line:col: problem (found 'x'; expected y). Fix: z}. */
    public String message() {
        StringBuilder sb = new StringBuilder().append(where).append(": ").append(problem);
        if (!found.isEmpty() || !expected.isEmpty()) {
            sb.append(" (");
            if (!found.isEmpty()) {
                sb.append("found '").append(found).append('\'');
            }
            if (!expected.isEmpty()) {
                sb.append(found.isEmpty() ? "" : "; ").append("expected ").append(expected);
            }
            sb.append(')');
        }
        if (!fix.isEmpty()) {
            sb.append(". Fix: ").append(fix);
        }
        return sb.toString();
    }
}
