package org.cupel.report;

import java.util.regex.Pattern;

/**
 * How much of a long table the page and the PDF print. The CSV always holds every row; the page shows the
 * first {@value #SHOWN} rows and says so, which keeps a report of a million-sample project readable and
 * its PDF bounded.
 */
final class TableLimit {
    static final int SHOWN = 500;

    private static final Pattern NUMERIC =
            Pattern.compile("[<>≤≥+\\-−]?[0-9][0-9.,]*(e[+-]?[0-9]+)?\\s?%?( ± [0-9.,]+%?)?");

    private TableLimit() {
    }

    /** The table's note, plus a line on the rows not shown when the table is longer than {@link #SHOWN}. */
    static String note(ReportTable t, String csvPath) {
        String cut = t.rows().size() > SHOWN
                ? String.format(java.util.Locale.US, "First %,d of %,d rows shown; every row is in %s.", SHOWN,
                        t.rows().size(), csvPath)
                : "";
        if (t.note().isEmpty()) {
            return cut;
        }
        return cut.isEmpty() ? t.note() : t.note() + " " + cut;
    }

    /** Cells that read as numbers are right-aligned so that digits line up. */
    static boolean isNumeric(String cell) {
        return NUMERIC.matcher(cell).matches();
    }
}
