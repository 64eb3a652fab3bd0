package org.cupel.ingest;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.cupel.assay.Analyte;
import org.cupel.assay.Batch;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.MethodSelector;
import org.cupel.assay.MissingReason;
import org.cupel.assay.Numbers;
import org.cupel.assay.QcRole;
import org.cupel.assay.Qualifier;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.cupel.project.CrmCatalog;
import org.cupel.project.DataIssue;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.FileAccount;
import org.cupel.units.GradeUnit;
import org.cupel.units.UnitChoice;

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
    private final SampleTable.Builder samples;
    private final Map<String, AnalyteColumn.Builder> columns = new LinkedHashMap<>();
    /** Per analyte, how many files and results were written in each unit word, in the order first read. */
    private final Map<String, Map<GradeUnit, Integer>> unitFiles = new LinkedHashMap<>();
    private final Map<String, Map<GradeUnit, Long>> unitResults = new LinkedHashMap<>();
    private final List<FileAccount> accounts = new ArrayList<>();
    private final Set<String> excludedLabIds = new HashSet<>();
    /** Register IDs that could not be used, or null when there are none (most projects: no look-up per row). */
    private final Set<String> rejectedIds;
    /** The register entry of the previous lab row, whose successor is tried first. */
    private int lastEntry = -1;

    /** @param register null when the project has none */
    SampleJoin(SampleRegister register, Map<String, GradeUnit> units, ExceptionRegister exceptions) {
        this.register = register;
        this.units = units;
        this.exceptions = exceptions;
        this.rejectedIds = register == null || register.rejectedIds().isEmpty() ? null : register.rejectedIds();
        // The table numbers register samples by their entry: a register ID is found once, in the register.
        this.samples = SampleTable.builder(expectedRows(), register == null ? null : register.ids());
    }

    void add(LabFile file) {
        file.issues().forEach(exceptions::add);
        excludedLabIds.addAll(file.excludedIds());
        long excluded = file.rowsExcluded();
        LabRows rows = file.table();
        FileColumns cols = new FileColumns(file.columns());
        // The sample row of each lab row, -1 for a row left out.
        int[] sampleRows = new int[rows.size()];
        for (int i = 0; i < rows.size(); i++) {
            String id = rows.sampleId(i);
            if (rejectedIds != null && rejectedIds.contains(id)) {
                exceptions.exclude(new SourceLocation(file.file(), rows.line(i), 0), id, id,
                        "the sample's register row could not be used (see the register), so its result is left out",
                        "a usable register row", "correct the sample's row in the register");
                excludedLabIds.add(id);
                excluded++;
                sampleRows[i] = -1;
                continue;
            }
            int entry = register == null ? -1 : register.indexOf(id, lastEntry + 1);
            int r;
            if (entry >= 0) {
                lastEntry = entry;
                r = samples.rowOfKnown(entry);
                if (r < 0) {
                    r = addSample(file, i, entry);
                }
            } else {
                r = samples.row(id);
                if (r < 0) {
                    r = addSample(file, i, -1);
                }
            }
            sampleRows[i] = r;
        }
        cols.addAll(rows, sampleRows, file.file());
        cols.countUnits();
        accounts.add(new FileAccount(file.file(), "lab results", file.rowsRead(), file.rowsRead() - excluded,
                excluded));
    }

    /** One file's analyte columns with the unit conversion of each; a column's builder is made at its first result. */
    private final class FileColumns {
        private final List<LabColumn> columns;
        private final AnalyteColumn.Builder[] builders;
        /** Per column, its builder's source for this file's results (made with the builder). */
        private final AnalyteColumn.Builder.Source[] sources;
        private final double[] factors;
        private final long[] results;

        FileColumns(List<LabColumn> columns) {
            this.columns = columns;
            this.builders = new AnalyteColumn.Builder[columns.size()];
            this.sources = new AnalyteColumn.Builder.Source[columns.size()];
            this.factors = new double[columns.size()];
            this.results = new long[columns.size()];
            for (int c = 0; c < columns.size(); c++) {
                AnalyteHeader a = columns.get(c).analyte();
                factors[c] = a.unit().convert(1.0, units.get(a.analyte()));
            }
        }

        /**
         * Adds every result of the file to the sample rows {@code sampleRows} gives its rows (-1: left out). The
         * results go column by column, each column's writes in sample order through its builder's arrays, where
         * row by row they went to every analyte's arrays at once (eight arrays an analyte: more streams than
         * the processor's prefetching follows). The order of what is numbered stays that of reading row by row:
         * the analytes' builders are made first in that order, and a file with two columns of one analyte (whose
         * first results and methods depend on the order within a row) is added row by row.
         */
        void addAll(LabRows rows, int[] sampleRows, String file) {
            if (!oneColumnPerAnalyte()) {
                for (int i = 0; i < rows.size(); i++) {
                    for (int c = 0; c < columns.size(); c++) {
                        if (sampleRows[i] >= 0 && rows.hasResult(i, c)) {
                            add(c, sampleRows[i], rows, i, file);
                        }
                    }
                }
                return;
            }
            makeBuilders(rows, sampleRows, file);
            for (int c = 0; c < columns.size(); c++) {
                for (int i = 0; i < rows.size(); i++) {
                    if (sampleRows[i] >= 0 && rows.hasResult(i, c)) {
                        add(c, sampleRows[i], rows, i, file);
                    }
                }
            }
        }

        private boolean oneColumnPerAnalyte() {
            Set<String> analytes = new HashSet<>();
            for (LabColumn c : columns) {
                if (!analytes.add(c.analyte().analyte())) {
                    return false;
                }
            }
            return true;
        }

        /** The builders of the columns with results, made in the order reading row by row meets their first. */
        private void makeBuilders(LabRows rows, int[] sampleRows, String file) {
            int missing = columns.size();
            for (int c = 0; c < columns.size(); c++) {
                missing -= builders[c] != null ? 1 : 0;
            }
            for (int i = 0; i < rows.size() && missing > 0; i++) {
                for (int c = 0; c < columns.size(); c++) {
                    if (builders[c] == null && sampleRows[i] >= 0 && rows.hasResult(i, c)) {
                        makeBuilder(c, file);
                        missing--;
                    }
                }
            }
        }

        private void makeBuilder(int c, String file) {
            AnalyteHeader a = columns.get(c).analyte();
            GradeUnit target = units.get(a.analyte());
            builders[c] = SampleJoin.this.columns.computeIfAbsent(a.analyte(),
                    k -> AnalyteColumn.builder(new Analyte(k, target), expectedRows()));
            sources[c] = builders[c].source(a.method(), file);
        }

        /** Adds this file's results to the count of each analyte's unit words; a file counts once per word. */
        void countUnits() {
            java.util.Set<String> seen = new HashSet<>();
            for (int c = 0; c < columns.size(); c++) {
                AnalyteHeader a = columns.get(c).analyte();
                unitResults.computeIfAbsent(a.analyte(), k -> new LinkedHashMap<>()).merge(a.unit(), results[c], Long::sum);
                if (seen.add(a.analyte() + "\u0000" + a.unit().name())) {
                    unitFiles.computeIfAbsent(a.analyte(), k -> new LinkedHashMap<>()).merge(a.unit(), 1, Integer::sum);
                }
            }
        }

        /** Adds the result of {@code row}, column {@code c}, to sample row {@code r}, in the reporting unit. */
        private void add(int c, int r, LabRows rows, int row, String file) {
            if (builders[c] == null) {
                makeBuilder(c, file);
            }
            Qualifier q = rows.qualifier(row, c);
            double value = rows.value(row, c);
            double limit = rows.limit(row, c);
            double factor = factors[c];
            int decimals = rows.decimals(row, c);
            results[c]++;
            if (factor != 1.0 && q != Qualifier.MISSING) {
                value *= factor;
                limit *= factor;
                decimals = Numbers.decimalsAfterScaling(decimals, factor);
                if (!Double.isFinite(value)) {
                    throw new IllegalArgumentException("a non-missing assay value must be finite: " + value);
                }
            }
            sources[c].add(r, q, value, limit, rows.missingReason(row, c), decimals, rows.line(row));
            // Only a missing result has a code (see LabRows#setCode).
            if (q == Qualifier.MISSING) {
                String code = rows.code(row, c);
                if (!code.isEmpty()) {
                    builders[c].missingCode(r, code);
                }
            }
        }
    }

    private int expectedRows() {
        // Lab repeats and umpire checks may add a few rows the register does not hold.
        return register == null ? 0 : register.size() + register.size() / 16;
    }

    /** @param e the sample's register entry, or -1 when the register does not hold it */
    private int addSample(LabFile file, int i, int e) {
        LabRows rows = file.table();
        String id = rows.sampleId(i);
        QcRole given = rows.role(i);
        QcRole role = given == null ? QcRole.ROUTINE : given;
        String reference = rows.reference(i);
        if (register != null) {
            if (e >= 0) {
                role = register.role(e);
                reference = register.reference(e);
            } else if (given != QcRole.LAB_REPEAT) {
                exceptions.warn(new SourceLocation(file.file(), rows.line(i), 0), id, id,
                        "the sample is not in the register; it is analysed as " + role.label(),
                        "every submitted sample in " + register.file(), "add the sample to the register");
            }
        }
        Batch batch = file.batches().get(rows.batch(i));
        return e >= 0 ? samples.addKnown(e, batch, rows.position(i), role, reference, file.file(), rows.line(i))
                : samples.add(id, batch, rows.position(i), role, reference, file.file(), rows.line(i));
    }

    /** Closes the register's accounting (entries without a lab result are "not received"). */
    void finishRegister() {
        if (register == null) {
            return;
        }
        register.issues().forEach(exceptions::add);
        long excluded = register.rowsExcluded();
        for (int i = 0; i < register.size(); i++) {
            if (samples.rowOfKnown(i) >= 0) {
                continue;
            }
            String id = register.sampleId(i);
            excluded++;
            if (excludedLabIds.contains(id)) {
                exceptions.exclude(register.source(i), id, id,
                        "registered, but its lab row was left out (see the lab file's exceptions)",
                        "a usable lab result", "correct the lab row listed for this sample");
            } else {
                exceptions.exclude(register.source(i), id, id,
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
            if (role.isDuplicate() && !ref.isEmpty() && table.row(ref, r - 1) < 0) {
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

    /**
     * The reporting unit of every analyte read: {@code configured} ({@code ingest.units}) where set, else the
     * unit word of most results (see {@link UnitChoice}).
     */
    Map<String, UnitChoice> unitChoices(Map<String, GradeUnit> configured) {
        Map<String, UnitChoice> out = new LinkedHashMap<>();
        unitResults.forEach((analyte, counts) -> out.put(analyte, UnitChoice.of(analyte, configured.get(analyte),
                unitFiles.getOrDefault(analyte, Map.of()), counts)));
        return out;
    }

    /** The analyte columns, each in the unit {@code choices} gives it (values read in another unit converted). */
    Map<String, AnalyteColumn> buildColumns(int rows, MethodSelector selector, Map<String, UnitChoice> choices) {
        Map<String, AnalyteColumn> out = new LinkedHashMap<>();
        columns.forEach((name, b) -> {
            UnitChoice choice = choices.get(name);
            if (choice != null) {
                b.convertTo(choice.unit());
            }
            out.put(name, b.build(rows, selector));
        });
        return out;
    }

    List<FileAccount> accounts() {
        return accounts;
    }

    /** A file that could not be used (see {@link DataIssue#fatal}). */
    static DataIssue fatal(String file, String message) {
        return DataIssue.fatal(file, message);
    }
}
