package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;
import org.cupel.ingest.ParsedValue;
import org.cupel.ingest.RawRow;
import org.cupel.ingest.RawTable;
import org.cupel.ingest.TableReader;
import org.cupel.ingest.ValueParser;
import org.cupel.project.DataIssue;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The columnar pairs reader ({@link PairsFile#read}: plain numbers read in place, {@link PairColumns}) gives the
 * same pairs, in the same order, and the same issues, in the same order, as the reader it replaced, which read
 * the whole table into rows of Strings and parsed every cell ({@link #previousReader}, kept here verbatim as the
 * oracle). Cells are drawn from plain numbers, written decimals (0.070), censored values, codes, negative and
 * blank values, text, thousands separators and numbers too large to be a grade, with optional type, batch, id
 * and dl columns, so that every branch of both readers (the in-place number and the full parse) is taken.
 */
class PairsFileEquivalenceProperties {
    private static final String[] ORIGINAL = {"original", "orig", "primary", "original value", "a"};
    private static final String[] DUPLICATE = {"duplicate", "dup", "duplicate value", "check", "umpire", "b"};

    @TempDir
    Path dir;

    record Table(List<String> header, List<List<String>> rows) {
        String csv() {
            StringBuilder sb = new StringBuilder(String.join(",", header)).append('\n');
            for (List<String> r : rows) {
                sb.append(String.join(",", r)).append('\n');
            }
            return sb.toString();
        }
    }

    private static final Gen<String> VALUE = Gen.frequency(
            Gen.weight(6, Gen.doubles(0, 50, 3).map(v -> String.format(java.util.Locale.ROOT, "%.3f", v))),
            Gen.weight(2, Gen.of("0.070", "1", "0", "12.5", "0.0", "3e-2", "1.5E3", "007.10")),
            Gen.weight(2, Gen.of("<0.005", "<0.01", ">10", "BDL", "ND", "NR", "IS", "-0.005", "-1", "")),
            Gen.weight(1, Gen.of("abc", "1,234.5", "\"1,234\"", "2000000000", "1.2.3", " 0.5 ", "+0.3", ".5",
                    "1e999")));
    private static final Gen<String> TYPE = Gen.of("pulp", "field", "umpire", "crm", "", "coarse", "repeat");
    private static final Gen<String> BATCH = Gen.of("J1", "J1", "J2", "", "J3");
    private static final Gen<String> DL = Gen.of("", "0.005", "0.01", "abc", "<0.005", "0", "-1");

    private static final Gen<Table> TABLES = random -> {
        boolean type = random.nextBoolean();
        boolean batch = random.nextBoolean();
        boolean id = random.nextBoolean();
        boolean dl = random.nextInt(3) == 0;
        List<String> header = new ArrayList<>(List.of("original", "duplicate"));
        if (type) {
            header.add("type");
        }
        if (batch) {
            header.add("batch");
        }
        if (id) {
            header.add(0, "id");
        }
        if (dl) {
            header.add("dl");
        }
        int n = random.nextInt(40);
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            List<String> row = new ArrayList<>();
            for (String h : header) {
                row.add(switch (h) {
                    case "original", "duplicate" -> VALUE.next(random);
                    case "type" -> TYPE.next(random);
                    case "batch" -> BATCH.next(random);
                    case "id" -> random.nextInt(5) == 0 ? "" : "S" + i;
                    default -> DL.next(random);
                });
            }
            if (random.nextInt(30) == 0) {
                row.add("extra");
            }
            rows.add(row);
        }
        return new Table(header, rows);
    };

    @Test
    void columnarReaderGivesThePairsAndIssuesOfTheRowReader() {
        SeededTries.forAll(300, TABLES, t -> {
            Path f = dir.resolve("pairs.csv");
            try {
                Files.writeString(f, t.csv());
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            PairsFile.Result expected = previousReader(f, QcRole.PULP_DUPLICATE);
            PairsFile.Result actual = PairsFile.read(f, QcRole.PULP_DUPLICATE);
            assertEquals(expected.pairs(), new ArrayList<>(actual.pairs()), t.csv());
            assertEquals(expected.issues().stream().map(DataIssue::message).toList(),
                    actual.issues().stream().map(DataIssue::message).toList(), t.csv());
        });
    }

    /** PairsFile.read as it was before the columnar reader (commit 0ebde8b), the oracle. */
    static PairsFile.Result previousReader(Path file, QcRole defaultType) {
        RawTable table = TableReader.read(file, cells -> hasColumn(cells, ORIGINAL) && hasColumn(cells, DUPLICATE));
        int orig = table.column(ORIGINAL);
        int dup = table.column(DUPLICATE);
        int type = table.column("type", "duplicate type", "qc type", "role");
        int batch = table.column("batch", "job", "certificate", "batch id");
        int id = table.column("id", "sample id", "duplicate id", "sample");
        int dl = table.column("dl", "detection limit", "lod", "ldl");
        ValueParser parser = ValueParser.forPlainTable();
        List<DuplicatePair> pairs = new ArrayList<>();
        List<DataIssue> issues = new ArrayList<>(table.issues());
        for (RawRow row : table.rows()) {
            double limit = Double.NaN;
            if (dl >= 0 && !row.cell(dl).isEmpty()) {
                ParsedValue l = parser.parse(row.cell(dl), Double.NaN, table.at(row, dl));
                if (!l.usable() || !l.value().isDetected()) {
                    issues.add(issue(table, row, dl, row.cell(dl), "the detection limit is not a plain number",
                            "a number such as 0.005", "write the limit as a number in the unit of the values"));
                    continue;
                }
                limit = l.value().value();
            }
            ParsedValue a = parser.parse(row.cell(orig), limit, table.at(row, orig));
            ParsedValue b = parser.parse(row.cell(dup), limit, table.at(row, dup));
            if (!a.usable() || !b.usable()) {
                issues.add(!a.usable() ? a.issue() : b.issue());
                continue;
            }
            Optional<QcRole> role = type < 0 || row.cell(type).isEmpty() ? Optional.of(defaultType)
                    : QcRole.parse(row.cell(type)).filter(QcRole::isDuplicate);
            if (role.isEmpty()) {
                issues.add(issue(table, row, type, row.cell(type), "the duplicate type is not recognised",
                        "field, coarse, pulp, repeat or umpire", "correct the type or leave the cell empty"));
                continue;
            }
            String label = id >= 0 && !row.cell(id).isEmpty() ? row.cell(id) : "line " + row.line();
            pairs.add(new DuplicatePair(label, "", batch >= 0 ? row.cell(batch) : "", role.get(), withLimit(a.value(),
                    limit), withLimit(b.value(), limit)));
        }
        parser.checkDecimalMarks();
        return new PairsFile.Result(pairs, issues);
    }

    private static AssayValue withLimit(AssayValue v, double limit) {
        if (Double.isNaN(limit) || !Double.isNaN(v.limit()) || v.isMissing()) {
            return v;
        }
        return new AssayValue(v.qualifier(), v.value(), limit, v.missingReason(), v.decimals());
    }

    private static boolean hasColumn(List<String> cells, String[] aliases) {
        for (String c : cells) {
            for (String a : aliases) {
                if (RawTable.normalise(c).equals(RawTable.normalise(a))) {
                    return true;
                }
            }
        }
        return false;
    }

    private static DataIssue issue(RawTable table, RawRow row, int column, String found, String problem,
                                   String expected, String fix) {
        return new DataIssue(DataIssue.Severity.EXCLUDED, table.at(row, column), "", found, problem, expected, fix);
    }
}
