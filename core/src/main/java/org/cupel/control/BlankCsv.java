package org.cupel.control;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
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

/**
 * Reads a plain CSV of blank results without a project (format in docs/blank-csv.md): columns
 * {@code sample_id}, {@code batch}, {@code position}, optional {@code preceding_id}, one column per analyte
 * named as in lab files ({@code Au_ppm}, {@code Cu (%)}), and for each analyte optionally
 * {@code preceding_<analyte column>} ({@code preceding_Au_ppm}) with the grade of the sample run before the
 * blank, and {@code dl_<analyte>} ({@code dl_Au}) with the detection limit. With a single analyte,
 * {@code preceding_grade} and {@code detection_limit} may be used instead. Cells that cannot be read are
 * listed as issues and their values left out; a file without the required columns is an input error.
 */
public final class BlankCsv {
    private BlankCsv() {
    }

    /**
     * @param samples the blanks as a sample table (every row a blank)
     * @param observations one per blank and analyte
     * @param issues cells that could not be used
     */
    public record Blanks(SampleTable samples, List<BlankObservation> observations, List<DataIssue> issues) {
        public Blanks {
            observations = List.copyOf(observations);
            issues = List.copyOf(issues);
        }
    }

    private record AnalyteColumns(AnalyteHeader header, int value, int preceding, AnalyteHeader precedingHeader,
                                  int limit) {
    }

    public static Blanks read(Path file) {
        RawTable raw = TableReader.read(file);
        int id = require(raw, "sample_id", "sample id", "sample");
        int batch = require(raw, "batch", "job", "batch_id");
        int position = require(raw, "position", "seq", "sequence");
        int precedingId = raw.column("preceding_id", "preceding sample");
        List<AnalyteColumns> analytes = analyteColumns(raw);
        ValueParser parser = ValueParser.forPlainTable();
        SampleTable.Builder table = SampleTable.builder();
        Map<String, Batch> batches = new HashMap<>();
        List<DataIssue> issues = new ArrayList<>(raw.issues());
        List<Object[]> pending = new ArrayList<>();
        for (RawRow row : raw.rows()) {
            String sid = row.cell(id).strip();
            if (sid.isEmpty() || table.contains(sid)) {
                issues.add(new DataIssue(DataIssue.Severity.EXCLUDED, raw.at(row, id), sid, sid,
                        sid.isEmpty() ? "empty sample ID" : "sample ID repeated", "a unique sample ID",
                        "give every blank its own ID"));
                continue;
            }
            int pos;
            try {
                pos = Integer.parseInt(row.cell(position).strip());
            } catch (NumberFormatException e) {
                issues.add(new DataIssue(DataIssue.Severity.EXCLUDED, raw.at(row, position), sid, row.cell(position),
                        "position is not a whole number", "the blank's position in the batch (1, 2, 3 ...)",
                        "write the run position as a whole number"));
                continue;
            }
            String b = row.cell(batch).strip();
            Batch bt = batches.computeIfAbsent(b, k -> new Batch(k, "", null, raw.file()));
            int r = table.add(sid, bt, pos, QcRole.BLANK, "", raw.at(row));
            pending.add(new Object[] {r, row});
        }
        SampleTable samples = table.build();
        List<BlankObservation> obs = new ArrayList<>();
        for (AnalyteColumns a : analytes) {
            List<BlankObservation> mine = new ArrayList<>();
            double smallestLimit = Double.POSITIVE_INFINITY;
            for (Object[] p : pending) {
                int r = (Integer) p[0];
                RawRow row = (RawRow) p[1];
                double dl = a.limit() < 0 ? Double.NaN : number(raw, row, a.limit(), a.header(), issues);
                AssayValue v = value(parser, raw, row, a.value(), dl, a.header(), issues);
                AssayValue prev = a.preceding() < 0 ? AssayValue.missing(MissingReason.NOT_ANALYSED)
                        : value(parser, raw, row, a.preceding(), Double.NaN, a.precedingHeader(), issues);
                if (!prev.isMissing() && a.precedingHeader().unit() != a.header().unit()) {
                    prev = prev.scaled(a.precedingHeader().unit().convert(1, a.header().unit()));
                }
                if (v.limit() > 0 && v.qualifier() != org.cupel.assay.Qualifier.ABOVE_UPPER_LIMIT) {
                    smallestLimit = Math.min(smallestLimit, v.limit());
                }
                mine.add(new BlankObservation(r, samples.id(r), samples.batch(r).id(), samples.position(r),
                        a.header().analyte(), a.header().unit().symbol(), v, dl,
                        precedingId < 0 ? "" : row.cell(precedingId).strip(), prev));
            }
            for (BlankObservation o : mine) {
                // As in a project: without a stated limit, the smallest limit reported for the analyte.
                boolean useOwn = o.value().limit() > 0 && o.value().qualifier() != org.cupel.assay.Qualifier.ABOVE_UPPER_LIMIT;
                double dl = o.detectionLimit() > 0 ? o.detectionLimit() : useOwn ? o.value().limit()
                        : Double.isInfinite(smallestLimit) ? Double.NaN : smallestLimit;
                obs.add(new BlankObservation(o.row(), o.sampleId(), o.batch(), o.position(), o.analyte(), o.unit(),
                        o.value(), dl, o.precedingId(), o.precedingGrade()));
            }
        }
        parser.checkDecimalMarks();
        return new Blanks(samples, order(samples, obs), issues);
    }

    /** Observations in batch, run and analyte order, as the project review lists them. */
    private static List<BlankObservation> order(SampleTable samples, List<BlankObservation> obs) {
        BatchSequence seq = BatchSequence.of(samples);
        List<BlankObservation> out = new ArrayList<>(obs);
        List<String> analyteOrder = obs.stream().map(BlankObservation::analyte).distinct().toList();
        out.sort(java.util.Comparator.comparingInt((BlankObservation o) -> analyteOrder.indexOf(o.analyte()))
                .thenComparingInt(o -> samples.batchIndex(o.row())).thenComparingInt(o -> seq.indexInBatch(o.row())));
        return out;
    }

    private static int require(RawTable raw, String... aliases) {
        int c = raw.column(aliases);
        if (c < 0) {
            throw new InputException(raw.file() + ":" + raw.headerLine() + ": no '" + aliases[0] + "' column (found "
                    + MessageText.list(raw.columns()) + "); a blank CSV needs sample_id, batch, position and one "
                    + "column per analyte (Au_ppm); see docs/blank-csv.md.");
        }
        return c;
    }

    private static List<AnalyteColumns> analyteColumns(RawTable raw) {
        HeaderParser headers = new HeaderParser();
        Map<String, Integer> valueCols = new LinkedHashMap<>();
        Map<String, AnalyteHeader> parsed = new HashMap<>();
        Map<String, Integer> precedingCols = new HashMap<>();
        Map<String, AnalyteHeader> precedingHeaders = new HashMap<>();
        Map<String, Integer> limitCols = new HashMap<>();
        for (int c = 0; c < raw.columns().size(); c++) {
            String h = raw.columns().get(c);
            String n = RawTable.normalise(h);
            if (n.startsWith("preceding ") && !n.equals("preceding id") && !n.equals("preceding grade")) {
                int col = c;
                headers.parse(h.substring("preceding".length() + 1)).ifPresent(a -> {
                    precedingCols.put(a.analyte(), col);
                    precedingHeaders.put(a.analyte(), a);
                });
            } else if (n.startsWith("dl ")) {
                limitCols.put(h.substring(3).strip(), c);
            } else if (!n.equals("position") && !n.equals("batch") && !n.equals("detection limit")) {
                int col = c;
                headers.parse(h).ifPresent(a -> {
                    valueCols.putIfAbsent(a.analyte(), col);
                    parsed.putIfAbsent(a.analyte(), a);
                });
            }
        }
        if (valueCols.isEmpty()) {
            throw new InputException(raw.file() + ":" + raw.headerLine() + ": no analyte column (found "
                    + MessageText.list(raw.columns()) + "); name analyte columns with the element and unit, "
                    + "such as Au_ppm or Cu (%); see docs/blank-csv.md.");
        }
        int singlePreceding = raw.column("preceding_grade");
        int singleLimit = raw.column("detection_limit", "dl");
        if (valueCols.size() > 1 && (singlePreceding >= 0 || singleLimit >= 0)) {
            throw new InputException(raw.file() + ":" + raw.headerLine() + ": preceding_grade and detection_limit "
                    + "are only for a file with one analyte, found " + String.join(", ", valueCols.keySet())
                    + "; name them per analyte (preceding_Au_ppm, dl_Au).");
        }
        List<AnalyteColumns> out = new ArrayList<>();
        for (Map.Entry<String, Integer> e : valueCols.entrySet()) {
            String an = e.getKey();
            AnalyteHeader h = parsed.get(an);
            int prev = precedingCols.getOrDefault(an, singlePreceding);
            AnalyteHeader prevHeader = precedingHeaders.getOrDefault(an, h);
            out.add(new AnalyteColumns(h, e.getValue(), prev, prevHeader, limitCols.getOrDefault(an, singleLimit)));
        }
        return out;
    }

    private static AssayValue value(ValueParser parser, RawTable raw, RawRow row, int col, double dl,
                                    AnalyteHeader header, List<DataIssue> issues) {
        ParsedValue p = parser.parse(row.cell(col), dl, raw.at(row, col), header.unit());
        if (p.issue() != null) {
            issues.add(p.issue());
        }
        return p.usable() ? p.value() : AssayValue.missing(MissingReason.OTHER_CODE);
    }

    /** A detection limit: a positive number at most 100 % in the analyte's unit, else NaN with a warning. */
    private static double number(RawTable raw, RawRow row, int col, AnalyteHeader header, List<DataIssue> issues) {
        String t = row.cell(col).strip();
        if (t.isEmpty()) {
            return Double.NaN;
        }
        try {
            double v = Double.parseDouble(t);
            if (v > 0 && v <= ValueParser.ceiling(header.unit())) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        issues.add(new DataIssue(DataIssue.Severity.WARNING, raw.at(row, col), row.cell(0), t,
                "detection limit is not a positive number of at most 100 %", "a positive number such as 0.005",
                "correct the limit or leave the cell empty"));
        return Double.NaN;
    }
}
