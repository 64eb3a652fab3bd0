package org.cupel.control.crm;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.cupel.assay.Analyte;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodSelector;
import org.cupel.assay.MethodValue;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.config.CupelConfig;
import org.cupel.ingest.AnalyteHeader;
import org.cupel.ingest.HeaderParser;
import org.cupel.ingest.ParsedValue;
import org.cupel.ingest.RawRow;
import org.cupel.ingest.RawTable;
import org.cupel.ingest.TableReader;
import org.cupel.ingest.ValueConventions;
import org.cupel.ingest.ValueParser;
import org.cupel.project.CrmCatalog;
import org.cupel.project.CrmCertificate;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;
import org.cupel.project.Project;

/**
 * Reads a plain table of CRM results, without a project folder, into an in-memory {@link Project}:
 * columns {@code crm} (required), {@code batch}, {@code position}, {@code date} (ISO {@code YYYY-MM-DD}),
 * an optional sample ID, and analyte columns in the header grammar of docs/input-formats.md
 * ({@code Au_ppm}, {@code Cu %}). Without a batch column every row is one batch; without a position the
 * row order counts. Certificates are converted to the unit of each analyte column.
 */
public final class CrmResultsFile {
    private static final String[] CRM = {"crm", "crm code", "standard", "std", "reference"};
    private static final String[] BATCH = {"batch", "job", "batch id", "certificate"};
    private static final String[] POSITION = {"position", "seq", "sequence", "order"};
    private static final String[] DATE = {"date", "date reported", "reported"};

    private CrmResultsFile() {
    }

    public static Project read(Path file, CrmCatalog catalog, CupelConfig config) {
        RawTable t = TableReader.read(file, cells -> cells.stream()
                .anyMatch(c -> List.of(CRM).contains(RawTable.normalise(c))));
        int crm = t.column(CRM);
        if (crm < 0) {
            throw new InputException(t.file() + ": no CRM column in the header row (expected one of crm, standard, "
                    + "reference); add a 'crm' column holding the CRM code of each result.");
        }
        int batchCol = t.column(BATCH);
        int posCol = t.column(POSITION);
        int dateCol = t.column(DATE);
        int idCol = t.column(TableReader.SAMPLE_ID_ALIASES.toArray(new String[0]));
        HeaderParser headers = new HeaderParser();
        Map<Integer, AnalyteHeader> analyteCols = new LinkedHashMap<>();
        for (int c = 0; c < t.columns().size(); c++) {
            Optional<AnalyteHeader> h = headers.parse(t.columns().get(c));
            if (h.isPresent() && c != crm && c != batchCol && c != posCol && c != dateCol && c != idCol) {
                analyteCols.put(c, h.get());
            }
        }
        if (analyteCols.isEmpty()) {
            throw new InputException(t.file() + ":" + t.headerLine() + ": no analyte column (expected headers such "
                    + "as Au_ppm or Cu %); name each result column by element and unit.");
        }
        ValueConventions conv = ValueConventions.from(config);
        ValueParser parser = new ValueParser(conv);
        ExceptionRegister register = new ExceptionRegister();
        t.issues().forEach(register::add);
        Map<String, LocalDate> batchDates = batchDates(t, batchCol, dateCol);
        Map<String, Batch> batches = new LinkedHashMap<>();
        SampleTable.Builder table = SampleTable.builder();
        Map<Integer, AnalyteColumn.Builder> cols = new LinkedHashMap<>();
        analyteCols.forEach((c, h) -> cols.put(c, AnalyteColumn.builder(new Analyte(h.analyte(), h.unit()))));
        int rowNo = 0;
        for (RawRow r : t.rows()) {
            rowNo++;
            String batchId = batchCol < 0 || r.cell(batchCol).isEmpty() ? "(one batch)" : r.cell(batchCol);
            Batch b = batches.computeIfAbsent(batchId, k -> new Batch(k, "", batchDates.get(k), t.file()));
            String id = idCol >= 0 && !r.cell(idCol).isEmpty() ? r.cell(idCol) : "line " + r.line();
            if (table.contains(id)) {
                throw new InputException(t.at(r, idCol) + ": sample ID '" + MessageText.clip(id) + "' appears twice; give each CRM "
                        + "result its own ID.");
            }
            int row = table.add(id, b, position(t, r, posCol, rowNo), QcRole.CRM, r.cell(crm), t.at(r));
            for (Map.Entry<Integer, AnalyteHeader> e : analyteCols.entrySet()) {
                ParsedValue v = parser.parse(r.cell(e.getKey()), conv.detectionLimit(e.getValue().analyte()),
                        t.at(r, e.getKey()), e.getValue().unit());
                if (v.issue() != null) {
                    register.add(v.issue());
                }
                AssayValue value = v.usable() ? v.value()
                        : AssayValue.missing(org.cupel.assay.MissingReason.NOT_ANALYSED);
                cols.get(e.getKey()).add(row, new MethodValue(e.getValue().method(), value, t.at(r, e.getKey())));
            }
        }
        parser.checkDecimalMarks();
        SampleTable samples = table.build();
        Map<String, AnalyteColumn> built = new LinkedHashMap<>();
        cols.values().forEach(b -> built.put(b.analyte().name(), b.build(samples.size(), MethodSelector.FIRST)));
        List<CrmCertificate> certs = new ArrayList<>();
        for (CrmCertificate c : catalog.all()) {
            AnalyteColumn col = built.get(c.analyte());
            certs.add(col == null ? c : c.in(col.analyte().unit()));
        }
        return new Project(file.getFileName().toString(), null, config, samples, built, new CrmCatalog(certs), register,
                List.of());
    }

    private static int position(RawTable t, RawRow r, int posCol, int rowNo) {
        if (posCol < 0 || r.cell(posCol).isEmpty()) {
            return rowNo;
        }
        try {
            return Integer.parseInt(r.cell(posCol).strip());
        } catch (NumberFormatException e) {
            throw new InputException(t.at(r, posCol) + ": position '" + MessageText.clip(r.cell(posCol)) + "' is not a whole number; "
                    + "give the position of the result in its batch (1, 2, 3 ...).");
        }
    }

    /** The earliest date given for each batch. */
    private static Map<String, LocalDate> batchDates(RawTable t, int batchCol, int dateCol) {
        Map<String, LocalDate> out = new LinkedHashMap<>();
        if (dateCol < 0) {
            return out;
        }
        for (RawRow r : t.rows()) {
            String text = r.cell(dateCol);
            if (text.isEmpty()) {
                continue;
            }
            LocalDate d;
            try {
                d = LocalDate.parse(text.strip());
            } catch (DateTimeParseException e) {
                throw new InputException(t.at(r, dateCol) + ": date '" + MessageText.clip(text) + "' is not an ISO date (expected "
                        + "YYYY-MM-DD, e.g. 2025-03-14); rewrite the date column in that form.");
            }
            String batchId = batchCol < 0 || r.cell(batchCol).isEmpty() ? "(one batch)" : r.cell(batchCol);
            out.merge(batchId, d, (a, b) -> a.isBefore(b) ? a : b);
        }
        return out;
    }
}
