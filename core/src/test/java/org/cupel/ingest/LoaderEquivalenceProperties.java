package org.cupel.ingest;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.MethodValue;
import org.cupel.assay.SampleTable;
import org.cupel.project.DataIssue;
import org.cupel.project.FileAccount;
import org.cupel.project.Project;
import org.cupel.testing.Gen;
import org.cupel.testing.GoldenText;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Messy generated projects load exactly as they did before the faster ingest (issue 19: lab files parsed
 * while the register is read, the register's ID probes, the tokenizer's fast paths). Each project holds a
 * register (sometimes none) and up to five lab files with header blocks, units in the headers, optional
 * batch, date, position, role and reference columns, and cells a lab writes: numbers with their decimals,
 * censored values ({@code <0.005}, {@code -0.005}, {@code >10}), text codes ({@code BDL}, {@code IS},
 * {@code NR}), decimal commas and thousands separators, typos ({@code O.256}), quoted cells with delimiters
 * and line breaks, invisible and non-breaking spaces, duplicate and blank IDs, lab repeats, ragged rows;
 * written with a comma, semicolon or tab, LF, CRLF or CR, in UTF-8 with or without byte-order mark, UTF-16
 * or (invalid as UTF-8) Latin-1; some lab files are larger than the 64 kB read whole, so the streaming
 * reader is used too.
 *
 * <p>{@link #messyProjectsLoadAsAtEc82e5c} compares a digest of everything loaded ({@link #dump}: accounts,
 * every exception in full, every sample, every cell with its decimals, code and candidates) for 120 fixed
 * seeds with testdata/golden/ingest-messy-projects.txt, written by the loader of commit ec82e5c (this test
 * file run on that commit's sources). A differing seed is reproduced by {@link #project} with
 * {@code new Random(seed)}.
 */
class LoaderEquivalenceProperties {
    private static final long GOLDEN_SEED = 20_261_203_019L;
    private static final int GOLDEN_PROJECTS = 120;
    private static final List<String> ROLES = List.of("routine", "routine", "routine", "CRM", "STD", "blank", "BLK",
            "FD", "field dup", "PD", "CD", "LR", "UMP", "bogus", "", " Routine ");
    private static final List<String> ANALYTES = List.of("Au_ppm_FA-AAS", "Au (g/t)", "Ag ppm", "Cu %", "Cu_%_AR-ICP",
            "As_ppb", "Au_ppm_FA-GRAV", "Pb ppm", "Zn_ppm", "S_%");
    private static final List<String> OTHER_COLUMNS = List.of("Batch", "Date", "Position", "QC Role", "Reference",
            "Comment");
    private static final List<String> CELLS = List.of("<0.005", "< 0.01", "-0.005", "-0", ">10", "> 100", "BDL",
            "bdl", "<DL", "IS", "NR", "N/A", "n.a.", "-", "", "", "O.256", "1e308", "1e-400", "7e-2", " 0.5 ",
            "\u00a00.3", "0.07\u200b", "\ufeff0.2", "2000000", "150", "abc", "0.070", "1.", ".5", "+0.3", "1.5E3",
            "x\"y");
    /** Cells read with a thousands separator or the other decimal mark: two kinds in one file refuse it. */
    private static final List<String> MARKS = List.of("0,512", "1,234", "1,234.5", "12 345,6", "1.234,5");
    private static final List<String> DATES = List.of("2025-03-14", "14/03/2025", "2025-3-4", "not a date", "");

    @TempDir
    Path dir;

    @Test
    void messyProjectsLoadAsAtEc82e5c() {
        StringBuilder digests = new StringBuilder();
        for (int i = 0; i < GOLDEN_PROJECTS; i++) {
            long seed = SeededTries.trySeed(GOLDEN_SEED, i);
            Path folder = dir.resolve("p" + i);
            write(folder, project(new Random(seed)));
            digests.append("seed ").append(seed).append(' ')
                    .append(GoldenText.sha256(dump(ProjectLoader.inspect(folder)))).append('\n');
        }
        GoldenText.assertMatches("ingest-messy-projects.txt", digests.toString());
    }

    /** The files of one messy project, by path inside the project folder. */
    static Map<String, byte[]> project(Random r) {
        Map<String, byte[]> files = new LinkedHashMap<>();
        boolean decimalComma = r.nextInt(5) == 0;
        if (decimalComma) {
            files.put("cupel.yaml", "ingest:\n  decimalComma: true\n".getBytes(StandardCharsets.UTF_8));
        }
        List<String> ids = new ArrayList<>();
        int n = 3 + r.nextInt(60);
        for (int i = 0; i < n; i++) {
            ids.add(r.nextInt(40) == 0 ? "" : String.format("S%04d", i + 1));
        }
        if (r.nextInt(6) != 0) {
            files.put("register.csv", register(r, ids));
        }
        int labs = 1 + r.nextInt(5);
        for (int f = 0; f < labs; f++) {
            boolean big = r.nextInt(8) == 0;
            String name = "lab/B" + (f + 1) + (r.nextInt(4) == 0 ? "-GRAV" : "") + (r.nextInt(6) == 0 ? ".tsv" : ".csv");
            files.put(name, labFile(r, ids, big, decimalComma));
        }
        return files;
    }

    private static byte[] register(Random r, List<String> ids) {
        List<List<String>> rows = new ArrayList<>();
        rows.add(List.of("sample_id", "qc_role", "reference", "hole_id", "from_m", "to_m"));
        double depth = 0;
        for (String id : ids) {
            String role = pick(r, ROLES);
            String ref = role.isEmpty() || role.startsWith("r") || r.nextInt(8) == 0 ? ""
                    : r.nextBoolean() ? pick(r, ids) : "OREAS " + r.nextInt(5);
            List<String> row = new ArrayList<>(List.of(id, role, ref, "H" + r.nextInt(3), number(r, depth),
                    number(r, depth + 1)));
            depth += 1;
            if (r.nextInt(25) == 0) {
                row.set(4, pick(r, List.of("1,5", "abc", "", " 2 ")));
            }
            rows.add(ragged(r, row));
            if (r.nextInt(20) == 0) {
                rows.add(new ArrayList<>(row));
            }
        }
        return encode(r, rows, ',');
    }

    private static byte[] labFile(Random r, List<String> ids, boolean big, boolean decimalComma) {
        List<List<String>> rows = new ArrayList<>();
        if (r.nextBoolean()) {
            rows.add(List.of("Lab: Test Lab"));
            rows.add(List.of("Job: J" + r.nextInt(100)));
            rows.add(List.of("Date reported: " + pick(r, DATES)));
        }
        List<String> header = new ArrayList<>(List.of(r.nextBoolean() ? "Sample ID" : "sample_id"));
        for (String c : OTHER_COLUMNS) {
            if (r.nextInt(4) == 0) {
                header.add(c);
            }
        }
        int analytes = 1 + r.nextInt(5);
        List<String> names = new ArrayList<>(ANALYTES);
        for (int a = 0; a < analytes; a++) {
            header.add(names.remove(r.nextInt(names.size())));
        }
        rows.add(header);
        int n = big ? 2500 + r.nextInt(500) : r.nextInt(80);
        for (int i = 0; i < n; i++) {
            List<String> row = new ArrayList<>();
            String id = pick(r, ids);
            row.add(r.nextInt(15) == 0 ? id + pick(r, List.of(" R", "-RPT", "_dup", " r")) : r.nextInt(30) == 0
                    ? "X" + r.nextInt(1000) : big ? "S" + i : id);
            for (int c = 1; c < header.size(); c++) {
                row.add(cell(r, header.get(c), decimalComma, ids, !big));
            }
            rows.add(ragged(r, row));
        }
        char delimiter = decimalComma || r.nextInt(4) == 0 ? (r.nextBoolean() ? ';' : '\t') : ',';
        return encode(r, rows, delimiter);
    }

    private static String cell(Random r, String column, boolean decimalComma, List<String> ids, boolean marks) {
        switch (column) {
            case "Batch":
                return r.nextInt(10) == 0 ? "" : "J" + r.nextInt(3);
            case "Date":
                return pick(r, DATES);
            case "Position":
                return pick(r, List.of("1", "2", "17", "0", "x", ""));
            case "QC Role":
                return pick(r, ROLES);
            case "Reference":
                return r.nextInt(3) == 0 ? pick(r, ids) : "";
            case "Comment":
                return pick(r, List.of("", "ok", "re-split", "wet, lumpy"));
            default:
                break;
        }
        if (marks && r.nextInt(300) == 0) {
            return pick(r, MARKS);
        }
        if (r.nextInt(6) == 0) {
            return pick(r, CELLS);
        }
        String v = number(r, Math.pow(10, r.nextInt(6) - 3) * r.nextDouble() * 10);
        return decimalComma ? v.replace('.', ',') : v;
    }

    /** A number with 0 to 4 decimals, as labs write them. */
    private static String number(Random r, double v) {
        return new java.math.BigDecimal(v).setScale(r.nextInt(5), java.math.RoundingMode.HALF_UP).toPlainString();
    }

    /** Now and then a cell too many or too few. */
    private static List<String> ragged(Random r, List<String> row) {
        int k = r.nextInt(40);
        if (k == 0) {
            row.add("extra");
        } else if (k == 1 && row.size() > 1) {
            row.remove(row.size() - 1);
        }
        return row;
    }

    /** Cells quoted when needed (or at random), a delimiter, a line ending and an encoding drawn per file. */
    private static byte[] encode(Random r, List<List<String>> rows, char delimiter) {
        String eol = pick(r, List.of("\n", "\n", "\r\n", "\r\n", "\r"));
        StringBuilder sb = new StringBuilder();
        for (List<String> row : rows) {
            for (int c = 0; c < row.size(); c++) {
                if (c > 0) {
                    sb.append(delimiter);
                }
                String cell = row.get(c);
                if (r.nextInt(50) == 0) {
                    cell = cell + "\nsecond line";
                }
                boolean quote = cell.indexOf(delimiter) >= 0 || cell.indexOf('"') >= 0 || cell.indexOf('\n') >= 0
                        || r.nextInt(20) == 0;
                sb.append(quote ? '"' + cell.replace("\"", "\"\"") + '"' : cell);
            }
            if (r.nextInt(60) == 0) {
                sb.append(eol);
            }
            sb.append(eol);
        }
        String text = sb.toString();
        switch (r.nextInt(20)) {
            case 0:
            case 3:
                return concat(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, text.getBytes(StandardCharsets.UTF_8));
            case 1:
            case 4:
                return concat(new byte[] {(byte) 0xFF, (byte) 0xFE}, text.getBytes(StandardCharsets.UTF_16LE));
            case 2:
                return (text + "caf\u00e9").getBytes(StandardCharsets.ISO_8859_1);
            default:
                return text.getBytes(StandardCharsets.UTF_8);
        }
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] out = new byte[a.length + b.length];
        System.arraycopy(a, 0, out, 0, a.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    private static <T> T pick(Random r, List<T> from) {
        return from.get(r.nextInt(from.size()));
    }

    private static void write(Path folder, Map<String, byte[]> files) {
        try {
            Files.createDirectories(folder.resolve("lab"));
            for (Map.Entry<String, byte[]> f : files.entrySet()) {
                Files.write(folder.resolve(f.getKey()), f.getValue());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Everything a load puts into a project, as text: {@link ProjectDump#dump} with, per cell, the decimals
     * written, the lab's code of a missing value and the value as shown, and each sample's source.
     */
    static String dump(Project p) {
        StringBuilder sb = new StringBuilder();
        for (FileAccount a : p.files()) {
            sb.append("account ").append(a).append('\n');
        }
        for (DataIssue i : p.exceptions().all()) {
            sb.append("issue ").append(i).append(" | ").append(i.message()).append('\n');
        }
        SampleTable t = p.samples();
        for (int r = 0; r < t.size(); r++) {
            sb.append("sample ").append(r).append(' ').append(t.sample(r)).append(' ').append(t.source(r)).append('\n');
        }
        for (AnalyteColumn c : p.analytes().values()) {
            sb.append("analyte ").append(c.analyte()).append(' ').append(c.reportedMethodCounts()).append('\n');
            for (int r = 0; r < c.size(); r++) {
                sb.append(r).append(' ').append(c.qualifier(r)).append(' ').append(Double.toHexString(c.number(r)))
                        .append(' ').append(Double.toHexString(c.limit(r))).append(' ')
                        .append(c.value(r).missingReason()).append(' ').append(c.method(r)).append(' ')
                        .append(c.selectionReason(r)).append(' ').append(c.decimals(r)).append(" [")
                        .append(c.missingCode(r)).append("] ").append(c.value(r));
                for (MethodValue m : c.candidates(r).size() > 1 ? c.candidates(r) : List.<MethodValue>of()) {
                    sb.append(" | ").append(m);
                }
                sb.append('\n');
            }
        }
        return sb.toString();
    }
}
