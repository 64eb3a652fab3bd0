package org.cupel.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.AssayValue;
import org.cupel.ingest.AnalyteHeader;
import org.cupel.ingest.HeaderParser;
import org.cupel.ingest.ParsedValue;
import org.cupel.ingest.RawRow;
import org.cupel.ingest.RawTable;
import org.cupel.ingest.TableReader;
import org.cupel.ingest.ValueParser;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;
import org.cupel.units.GradeUnit;

/** Reads one value column of a plain CSV (or XLSX) for the commands that summarise a single column. */
final class ColumnReader {

    /**
     * @param values every usable cell, in file order (blank cells as missing values)
     * @param issues cells that could not be read, or were read with a warning
     */
    record Column(String file, String header, List<AssayValue> values, List<DataIssue> issues) {
    }

    private ColumnReader() {
    }

    static Column read(Path file, String column) {
        RawTable table = TableReader.read(file);
        int idx = table.column(column);
        if (idx < 0) {
            throw new InputException(table.file() + ": no column named '" + column + "' in the header row (line "
                    + table.headerLine() + "); the columns are " + MessageText.list(table.columns())
                    + ". Pass one of them to --column.");
        }
        ValueParser parser = ValueParser.forPlainTable();
        // A header in the analyte grammar (Au_ppm) gives the unit, and with it the ceiling of 100 %.
        GradeUnit unit = new HeaderParser().parse(table.columns().get(idx)).map(AnalyteHeader::unit).orElse(null);
        List<AssayValue> values = new ArrayList<>();
        List<DataIssue> issues = new ArrayList<>(table.issues());
        for (RawRow row : table.rows()) {
            ParsedValue p = parser.parse(row.cell(idx), Double.NaN, table.at(row, idx), unit);
            if (p.issue() != null) {
                issues.add(p.issue());
            }
            if (p.usable()) {
                values.add(p.value());
            }
        }
        parser.checkDecimalMarks();
        return new Column(table.file(), table.columns().get(idx), values, issues);
    }
}
