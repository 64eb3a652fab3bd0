package org.cupel.ingest;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;

/**
 * A table as read from a file: the lab's header block above it, the column headers, and the data rows.
 * Nothing is interpreted yet; the readers of lab files, the register and the catalog work on this.
 *
 * @param file the file name used in messages
 * @param headerBlock {@code key: value} lines above the table, keys lower-case with single spaces
 * @param columns the header row, trimmed
 * @param headerLine the 1-based line (or sheet row) of the header row
 * @param rows the data rows below the header that line up with it; rows whose cells are all empty are not
 *     kept, ragged rows (see {@link TableAssembler}) are listed in {@code issues} instead
 * @param issues problems that did not stop the read: formulas read as cached values, sheets not read (warnings),
 *     cells that cannot be read and ragged rows left out (excluded; a whole row has column 0)
 */
public record RawTable(String file, Map<String, String> headerBlock, List<String> columns, long headerLine,
                       List<RawRow> rows, List<DataIssue> issues) {

    public RawTable {
        headerBlock = Map.copyOf(headerBlock);
        columns = List.copyOf(columns);
        rows = List.copyOf(rows);
        issues = List.copyOf(issues);
    }

    public RawTable(String file, Map<String, String> headerBlock, List<String> columns, long headerLine,
                    List<RawRow> rows) {
        this(file, headerBlock, columns, headerLine, rows, List.of());
    }

    /**
     * The 0-based index of the first column whose header matches one of {@code aliases}, or -1.
     * Matching ignores case, surrounding space, and treats {@code _}, {@code -} and space alike.
     */
    public int column(String... aliases) {
        // Each header is normalised once per call, not once per alias: a lab file is asked for a few
        // columns by several aliases each, and a million-sample project has thousands of files.
        String[] headers = new String[columns.size()];
        for (String alias : aliases) {
            String a = normalise(alias);
            for (int i = 0; i < headers.length; i++) {
                if (headers[i] == null) {
                    headers[i] = normalise(columns.get(i));
                }
                if (headers[i].equals(a)) {
                    return i;
                }
            }
        }
        return -1;
    }

    /** Data rows left out while reading (ragged rows): they count as read and excluded. */
    public long rowsLeftOut() {
        return issues.stream().filter(i -> i.severity() == DataIssue.Severity.EXCLUDED && i.where().column() == 0)
                .count();
    }

    /** Where {@code row}'s cell in {@code column} (0-based) is; the location's column is 1-based. */
    public SourceLocation at(RawRow row, int column) {
        return new SourceLocation(file, row.line(), column + 1);
    }

    /** Where {@code row} is, as a whole. */
    public SourceLocation at(RawRow row) {
        return new SourceLocation(file, row.line(), 0);
    }

    /** Header matching form: lower case, {@code _ -} and runs of space as one space, trimmed. */
    public static String normalise(String header) {
        StringBuilder sb = new StringBuilder(header.length());
        boolean space = false;
        for (int i = 0; i < header.length(); i++) {
            char c = header.charAt(i);
            if (c == '_' || c == '-' || Character.isWhitespace(c)) {
                space = sb.length() > 0;
            } else {
                if (space) {
                    sb.append(' ');
                    space = false;
                }
                sb.append(c);
            }
        }
        return sb.toString().toLowerCase(Locale.ROOT);
    }
}
