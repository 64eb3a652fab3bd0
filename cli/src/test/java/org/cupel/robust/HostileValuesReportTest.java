package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.cupel.cli.CliRun;
import org.cupel.cli.CupelCommand;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Guarantees 3 (inputs never modified) and 4 (nothing hostile leaks into outputs) on one full
 * {@code cupel report} run over a project whose IDs, CRM code and batch are hostile. The CSV rule is
 * OWASP's "CSV Injection" guidance (OWASP Foundation, owasp.org/www-community/attacks/CSV_Injection):
 * a cell beginning with =, +, -, @, tab or carriage return is prefixed with a single quote so that a
 * spreadsheet shows it as text.
 */
class HostileValuesReportTest {
    static final List<String> HOSTILE = List.of("<script>alert(1)</script>", "../../x", "CON",
            "=HYPERLINK(\"http://example.invalid\",\"click\")", "+1+1", "@SUM(A1)", "-2+3", "a&b\"c'd");
    private static final Pattern SAFE_NAME = Pattern.compile("[A-Za-z0-9._-]{1,80}");

    @TempDir
    static Path dir;
    static Path project;
    static Path out;
    static Map<String, String> hashesBefore;
    static int code;
    static String err;

    @BeforeAll
    static void runReport() throws IOException {
        project = dir.resolve("hostile");
        out = dir.resolve("qc");
        writeProject(project);
        hashesBefore = hashes(project);
        CliRun r = CliRun.run("report", project.toString(), "--out", out.toString(), "--quiet", "--screen");
        code = r.code();
        err = r.err();
    }

    /** Routine, duplicate and CRM rows whose IDs are the hostile values (quoted where CSV needs it). */
    static void writeProject(Path p) throws IOException {
        Files.createDirectories(p.resolve("lab"));
        StringBuilder lab = new StringBuilder("Lab: <b>Lab</b>\nJob: =JOB(1)\nDate reported: 2025-03-03\n"
                + "Sample ID,Au_ppm_FA-AAS\n");
        StringBuilder reg = new StringBuilder("sample_id,qc_role,reference\n");
        int i = 0;
        for (String id : HOSTILE) {
            double v = 0.1 + 0.37 * i++;
            lab.append(csv(id)).append(',').append(v).append('\n');
            lab.append(csv(id + "D")).append(',').append(v * 1.05).append('\n');
            reg.append(csv(id)).append(",routine,\n");
            reg.append(csv(id + "D")).append(",field_duplicate,").append(csv(id)).append('\n');
        }
        // Rows with unreadable values are listed in the data exceptions with their IDs, so the IDs must show.
        lab.append("\"<script>alert(1)</script>\",n.a.\n\"=HYPERLINK(\"\"http://example.invalid\"\")\",n.a.\n");
        lab.append("\"\tTAB1\",0.3\n\"\rCR1\",0.4\nK1,0.41\nK2,0.40\n");
        reg.append("\"\tTAB1\",routine,\n\"\rCR1\",routine,\nK1,crm,=CRM+1\nK2,crm,=CRM+1\n");
        Files.writeString(p.resolve("lab/=cmd.csv"), lab, StandardCharsets.UTF_8);
        Files.writeString(p.resolve("register.csv"), reg, StandardCharsets.UTF_8);
        Files.writeString(p.resolve("crm-catalog.csv"), "crm,analyte,unit,certified_value,sd\n"
                + "=CRM+1,Au,g/t,0.40,0.02\n", StandardCharsets.UTF_8);
        Files.writeString(p.resolve("cupel.yaml"), "project: \"<img src=x onerror=alert(1)> =1+1\"\n",
                StandardCharsets.UTF_8);
    }

    private static String csv(String cell) {
        return '"' + cell.replace("\"", "\"\"") + '"';
    }

    @Test
    void theReportIsWritten() {
        assertEquals(0, code, err);
    }

    @Test
    void inputsAreNeverModified() throws IOException {
        assertEquals(hashesBefore, hashes(project));
    }

    @Test
    void hostileValuesAreEscapedTextInTheHtml() throws IOException {
        String html = Files.readString(out.resolve("index.html"));
        assertFalse(html.contains("<script>alert(1)</script>"), "raw script tag in index.html");
        assertFalse(html.contains("<img src=x"), "raw img tag from the config");
        assertFalse(html.contains("<b>Lab</b>"), "raw markup from the lab header");
        assertTrue(html.contains("&lt;script&gt;alert(1)&lt;/script&gt;"), "the ID is shown as text");
        assertTrue(html.contains("&lt;img src=x"), "the project name is shown as text");
    }

    @Test
    void everyCsvCellThatASpreadsheetWouldRunIsNeutralised() throws IOException {
        List<String> cells = new ArrayList<>();
        try (Stream<Path> s = Files.list(out.resolve("tables"))) {
            for (Path t : s.toList()) {
                cells.addAll(cells(Files.readString(t, StandardCharsets.UTF_8)));
            }
        }
        for (String c : cells) {
            if (!c.isEmpty() && "=+-@\t\r".indexOf(c.charAt(0)) >= 0) {
                assertTrue(c.matches("-(\\d+|\\d{1,3}(,\\d{3})+)(\\.\\d+)?([eE][+-]?\\d+)?%?"),
                        "a formula-like cell left as is: [" + c + "]");
            }
        }
        assertTrue(cells.stream().anyMatch(c -> c.startsWith("'=HYPERLINK")), "the ID is kept, neutralised");
        assertTrue(cells.stream().anyMatch(c -> c.startsWith("'=JOB(1)")), "the batch is kept, neutralised");
    }

    /** Guarantee 6 on summary.json: the project is also degenerate (8 pairs, too few for Thompson–Howarth; 2 CRM results). */
    @Test
    void summaryJsonHoldsNoUnexplainedNaN() throws IOException {
        List<String> unexplained = new ArrayList<>();
        DegenerateNumbersTest.collect("summary", com.fasterxml.jackson.databind.json.JsonMapper.builder()
                .enable(com.fasterxml.jackson.core.json.JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS).build()
                .readTree(out.resolve("summary.json").toFile()), false, unexplained);
        assertEquals(List.of(), unexplained);
    }

    @Test
    void noHostileValueReachesAFileName() throws IOException {
        try (Stream<Path> s = Files.walk(out)) {
            for (Path p : s.filter(x -> !x.equals(out)).toList()) {
                String name = p.getFileName().toString();
                assertTrue(name.equals(".cupel-report") || SAFE_NAME.matcher(name).matches(), name);
                assertFalse(name.contains(".."), name);
                assertFalse(name.matches("(?i)(con|prn|aux|nul|com[1-9]|lpt[1-9])(\\..*)?"), name);
                assertTrue(p.toRealPath().startsWith(out.toRealPath()), p.toString());
            }
        }
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(List.of(".qc.cupel-lock", "hostile", "qc"),
                    s.map(p -> p.getFileName().toString()).sorted().toList(),
                    "nothing written beside the output folder but its empty lock file (issue 15)");
        }
    }

    /** RFC 4180 cells of a whole file. */
    static List<String> cells(String text) {
        List<String> out = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            if (quoted) {
                if (ch == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
                    cell.append('"');
                    i++;
                } else if (ch == '"') {
                    quoted = false;
                } else {
                    cell.append(ch);
                }
            } else if (ch == '"') {
                quoted = true;
            } else if (ch == ',' || ch == '\n') {
                out.add(cell.toString());
                cell.setLength(0);
            } else if (ch != '\r' || i + 1 >= text.length() || text.charAt(i + 1) != '\n') {
                cell.append(ch);
            }
        }
        out.add(cell.toString());
        return out;
    }

    static Map<String, String> hashes(Path root) throws IOException {
        Map<String, String> h = new TreeMap<>();
        try (Stream<Path> s = Files.walk(root)) {
            for (Path p : s.filter(Files::isRegularFile).toList()) {
                h.put(root.relativize(p).toString(), sha256(p) + " " + Files.getLastModifiedTime(p));
            }
        }
        return h;
    }

    private static String sha256(Path p) throws IOException {
        try (InputStream in = Files.newInputStream(p)) {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            md.update(in.readAllBytes());
            return HexFormat.of().formatHex(md.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
