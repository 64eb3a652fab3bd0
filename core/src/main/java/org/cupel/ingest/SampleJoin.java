package org.cupel.ingest;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;
import java.util.Set;
import org.cupel.assay.Analyte;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.MethodSelector;
import org.cupel.assay.MethodValue;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.cupel.project.CrmCatalog;
import org.cupel.project.DataIssue;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.FileAccount;
import org.cupel.units.GradeUnit;

/**
 * Joins the lab rows of every file with the register into one {@link SampleTable} and one
 * {@link AnalyteColumn} per analyte, converting values to each analyte's reporting unit. A sample ID seen
 * in a later file adds candidate results to the first row (a re-assay). Keeps the row accounting of every
 * file and lists each problem in the exceptions register.
 */
final class SampleJoin {
    private final SampleRegister register;
    private final Map<String, GradeUnit> units;
    private final ExceptionRegister exceptions;
    private final SampleTable.Builder samples = SampleTable.builder();
    private final Map<String, AnalyteColumn.Builder> columns = new LinkedHashMap<>();
    private final List<FileAccount> accounts = new ArrayList<>();
    private final Set<String> excludedLabIds = new HashSet<>();

    /** @param register null when the project has none */
    SampleJoin(SampleRegister register, Map<String, GradeUnit> units, ExceptionRegister exceptions) {
        this.register = register;
        this.units = units;
        this.exceptions = exceptions;
    }

    void add(LabFile file) {
        file.issues().forEach(exceptions::add);
        excludedLabIds.addAll(file.excludedIds());
        long excluded = file.rowsExcluded();
        for (LabRow row : file.rows()) {
            if (register != null && register.rejectedIds().contains(row.sampleId())) {
                exceptions.exclude(row.source(), row.sampleId(), row.sampleId(),
                        "the sample's register row could not be used (see the register), so its result is left out",
                        "a usable register row", "correct the sample's row in the register");
                excludedLabIds.add(row.sampleId());
                excluded++;
                continue;
            }
            OptionalInt prior = samples.rowOf(row.sampleId());
            int r = prior.isPresent() ? prior.getAsInt() : addSample(row);
            for (LabRow.Result result : row.results()) {
                GradeUnit target = units.get(result.analyte());
                MethodValue v = result.value();
                double factor = result.unit().convert(1.0, target);
                MethodValue converted = factor == 1.0 ? v
                        : new MethodValue(v.method(), v.value().scaled(factor), v.source());
                columns.computeIfAbsent(result.analyte(), a -> AnalyteColumn.builder(new Analyte(a, target)))
                        .add(r, converted);
            }
        }
        accounts.add(new FileAccount(file.file(), "lab results", file.rowsRead(), file.rowsRead() - excluded,
                excluded));
    }

    private int addSample(LabRow row) {
        QcRole role = row.role() == null ? QcRole.ROUTINE : row.role();
        String reference = row.reference();
        if (register != null) {
            var entry = register.entry(row.sampleId());
            if (entry.isPresent()) {
                role = entry.get().role();
                reference = entry.get().reference();
            } else if (row.role() != QcRole.LAB_REPEAT) {
                exceptions.warn(row.source(), row.sampleId(), row.sampleId(),
                        "the sample is not in the register; it is analysed as " + role.label(),
                        "every submitted sample in " + register.file(), "add the sample to the register");
            }
        }
        return samples.add(row.sampleId(), row.batch(), row.position(), role, reference, row.source());
    }

    /** Closes the register's accounting (entries without a lab result are "not received"). */
    void finishRegister() {
        if (register == null) {
            return;
        }
        register.issues().forEach(exceptions::add);
        long excluded = register.rowsExcluded();
        for (RegisterEntry e : register.entries().values()) {
            if (samples.contains(e.sampleId())) {
                continue;
            }
            excluded++;
            if (excludedLabIds.contains(e.sampleId())) {
                exceptions.exclude(e.source(), e.sampleId(), e.sampleId(),
                        "registered, but its lab row was left out (see the lab file's exceptions)",
                        "a usable lab result", "correct the lab row listed for this sample");
            } else {
                exceptions.exclude(e.source(), e.sampleId(), e.sampleId(),
                        "registered but no lab result was found (not received)",
                        "a result for the sample in one of the lab files",
                        "check that every lab file is in lab/, or ask the lab for the missing result");
            }
        }
        accounts.add(new FileAccount(register.file(), "sample register", register.rowsRead(),
                register.rowsRead() - excluded, excluded));
    }

    /** Warnings about references: duplicates whose original is absent, CRM codes not in the catalog. */
    void checkReferences(SampleTable table, CrmCatalog catalog, boolean hasCatalog) {
        Set<String> missingCodes = new HashSet<>();
        for (int r = 0; r < table.size(); r++) {
            QcRole role = table.role(r);
            String ref = table.reference(r);
            if (role.isDuplicate() && !ref.isEmpty() && table.rowOf(ref).isEmpty()) {
                exceptions.warn(table.source(r), table.id(r), ref, "the original sample " + ref + " of this "
                                + role.label() + " has no lab result, so the pair cannot be compared",
                        "a result for " + ref, "check the reference, or add the original's result");
            }
            if (role == QcRole.CRM && hasCatalog && !ref.isEmpty() && !catalog.contains(ref) && missingCodes.add(ref)) {
                exceptions.warn(table.source(r), table.id(r), ref, "CRM code " + ref + " is not in the CRM catalog; "
                                + "its results cannot be judged", "a row for " + ref + " in crm-catalog.csv",
                        "add the CRM's certified values to the catalog, or correct the code");
            }
        }
    }

    SampleTable buildSamples() {
        return samples.build();
    }

    Map<String, AnalyteColumn> buildColumns(int rows, MethodSelector selector) {
        Map<String, AnalyteColumn> out = new LinkedHashMap<>();
        columns.forEach((name, b) -> out.put(name, b.build(rows, selector)));
        return out;
    }

    List<FileAccount> accounts() {
        return accounts;
    }

    /** A file that could not be used; the message's own {@code file:line:col:} prefix becomes the location. */
    static DataIssue fatal(String file, String message) {
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
        return new DataIssue(DataIssue.Severity.FATAL, where, "", "", text, "", "");
    }

    private static long digits(String s) {
        try {
            return Long.parseLong(s.strip());
        } catch (NumberFormatException e) {
            return -1;
        }
    }
}
