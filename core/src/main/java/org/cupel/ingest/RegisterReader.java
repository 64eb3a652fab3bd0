package org.cupel.ingest;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.cupel.assay.QcRole;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;

/**
 * Reads the sample register ({@code register.csv}): sample ID, QC role, reference, and optionally hole
 * and interval. A row without an ID, a second row for an ID, or an unknown role code is excluded; a CRM or
 * duplicate without a reference is kept with a warning, since the analyses then cannot pair it.
 */
public final class RegisterReader {
    private static final String[] HOLE = {"hole id", "hole", "holeid", "bhid", "drillhole"};
    private static final String[] FROM = {"from m", "from", "depth from"};
    private static final String[] TO = {"to m", "to", "depth to"};

    private RegisterReader() {
    }

    public static SampleRegister read(Path path, String displayName) {
        RawTable t = TableReader.read(path, displayName, TableReader::hasSampleIdColumn, null);
        int id = t.column(LabColumns.sampleId());
        if (id < 0) {
            throw new InputException(displayName + ":" + t.headerLine() + ": no sample ID column among " + t.columns()
                    + " (expected 'sample_id'); rename the column holding the submitted sample IDs.");
        }
        int role = t.column(LabColumns.ROLE);
        int ref = t.column(LabColumns.REFERENCE);
        int hole = t.column(HOLE);
        int from = t.column(FROM);
        int to = t.column(TO);
        Map<String, RegisterEntry> entries = new LinkedHashMap<>();
        Set<String> rejected = new HashSet<>();
        List<DataIssue> issues = new ArrayList<>(t.warnings());
        long excluded = 0;
        for (RawRow row : t.rows()) {
            String sampleId = row.cell(id);
            SourceLocation where = t.at(row);
            if (sampleId.isEmpty()) {
                issues.add(excluded(where, "", String.join(",", row.cells()), "the register row has no sample ID",
                        "a sample ID", "fill in the sample ID or delete the row"));
                excluded++;
                continue;
            }
            if (entries.containsKey(sampleId)) {
                issues.add(excluded(where, sampleId, sampleId, "sample ID already registered on line "
                                + entries.get(sampleId).source().line() + "; this row is left out",
                        "each sample ID once", "give the sample a unique ID or delete the repeated row"));
                excluded++;
                continue;
            }
            Optional<QcRole> qc = QcRole.parse(row.cell(role));
            if (qc.isEmpty()) {
                issues.add(excluded(where, sampleId, row.cell(role), "unknown QC role '" + row.cell(role) + "'; the sample is "
                                + "left out of the analyses",
                        "routine, CRM/STD, blank/BLK, field dup/FD, coarse dup/CD, pulp dup/PD, lab repeat/LR, umpire/UMP",
                        "correct the role code"));
                rejected.add(sampleId);
                excluded++;
                continue;
            }
            String reference = row.cell(ref);
            if (reference.isEmpty() && (qc.get() == QcRole.CRM || qc.get().isDuplicate())) {
                issues.add(new DataIssue(DataIssue.Severity.WARNING, where, sampleId, "",
                        "a " + qc.get().label() + " without a reference cannot be paired or checked",
                        qc.get() == QcRole.CRM ? "the CRM code in 'reference'" : "the original sample ID in 'reference'",
                        "fill in the reference column"));
            }
            entries.put(sampleId, new RegisterEntry(sampleId, qc.get(), reference, row.cell(hole),
                    metres(row.cell(from)), metres(row.cell(to)), where));
        }
        return new SampleRegister(displayName, Collections.unmodifiableMap(entries), Set.copyOf(rejected),
                List.copyOf(issues), t.rows().size(), excluded);
    }

    private static double metres(String text) {
        try {
            return text.isEmpty() ? Double.NaN : Double.parseDouble(text);
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    private static DataIssue excluded(SourceLocation where, String id, String found, String problem, String expected,
                                      String fix) {
        return new DataIssue(DataIssue.Severity.EXCLUDED, where, id, found, problem, expected, fix);
    }
}
