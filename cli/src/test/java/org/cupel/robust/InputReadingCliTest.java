package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.cupel.cli.CliRun;
import org.cupel.cli.CupelCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15 ("nothing lost, nothing misread") where the user meets it: the command line. Each test runs the
 * commands in-process on a small invented project holding one of the defects found, and checks what the
 * user is told. The process-level checks (nothing but JSON on stdout, no stack trace from the workbook
 * library) are in {@link WorkbookOutputProcessTest}.
 */
class InputReadingCliTest {
    private static final JsonMapper JSON = JsonMapper.builder().enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
            .build();
    static final String REGISTER = "sample_id,qc_role,reference\nR1,routine,\nR2,routine,\nR3,routine,\n";

    @TempDir
    Path dir;

    private Path write(String relative, String text) throws IOException {
        return write(relative, text.getBytes(StandardCharsets.UTF_8));
    }

    private Path write(String relative, byte[] bytes) throws IOException {
        Path p = dir.resolve(relative);
        Files.createDirectories(p.getParent());
        return Files.write(p, bytes);
    }

    private JsonNode checkJson() throws IOException {
        CliRun r = CliRun.run("check", dir.toString(), "--json");
        return JSON.readTree(r.out());
    }

    private static List<JsonNode> exceptionsAt(JsonNode check, String file, long line) {
        List<JsonNode> out = new ArrayList<>();
        check.get("exceptions").forEach(e -> {
            if (e.get("where").get("file").asText().equals(file) && e.get("where").get("line").asLong() == line) {
                out.add(e);
            }
        });
        return out;
    }

    // Item 2: ragged rows.

    /** {@code R2,1,234.5,2.0} under three columns read Ag = 234.5 with "No input problems found". */
    @Test
    void checkListsARaggedRowInsteadOfReadingItShifted() throws IOException {
        write("lab/a.csv", "Sample ID,Au_ppm,Ag_ppm\nR1,1.2,3.4\nR2,1,234.5,2.0\nR3,0.5,0.7\n");
        write("register.csv", REGISTER);
        CliRun text = CliRun.run("check", dir.toString());
        assertFalse(text.out().contains("No input problems found"), text.out());
        JsonNode check = checkJson();
        List<JsonNode> r2 = exceptionsAt(check, "lab/a.csv", 3);
        assertEquals(1, r2.size(), check.get("exceptions").toString());
        assertEquals("EXCLUDED", r2.get(0).get("severity").asText());
        assertTrue(r2.get(0).get("problem").asText().contains("4 cells, more than the 3 columns"));
        assertTrue(r2.get(0).get("fix").asText().contains("ingest.decimalComma"));
        assertEquals(2, check.get("summary").get("samples").asInt(), "R2 is not analysed");
    }

    @Test
    void aPlainTableListsARaggedRow() throws IOException {
        Path f = write("assays.csv", "Sample ID,Au_ppm\nS1,0.5\nS2,1,234\nS3,0.7\nS4,<0.01\n");
        CliRun r = CliRun.run("censored", f.toString(), "--column", "Au_ppm", "--wide");
        assertEquals(CupelCommand.OK, r.code(), r.err());
        assertTrue(r.out().contains("assays.csv:3: the row has 3 cells, more than the 2 columns"), r.out());
    }

    // Item 3: decimal comma.

    /** {@code 0,512;1,234;0,7} gave 1234 for the middle cell while its neighbours were flagged. */
    @Test
    void aLabFileMixingDecimalMarksStopsTheAnalysesAndNamesTheSetting() throws IOException {
        write("lab/a.csv", "Sample ID;Au_ppm;Ag_ppm;Cu_ppm\nR1;0,512;1,234;0,7\nR2;0.4;2;0.3\n");
        write("register.csv", REGISTER);
        CliRun r = CliRun.run("duplicates", dir.toString());
        assertTrue(r.oneLineInputError(), r.err());
        assertTrue(r.err().contains("lab/a.csv: the numbers mix two readings of ','")
                && r.err().contains("set ingest.decimalComma: true"), r.err());
        assertEquals(CupelCommand.INPUT_ERROR, CliRun.run("check", dir.toString()).code());
        write("cupel.yaml", "ingest:\n  decimalComma: true\n");
        CliRun fixed = CliRun.run("check", dir.toString(), "--json");
        assertEquals(CupelCommand.OK, fixed.code(), fixed.out());
    }

    @Test
    void aPlainTableMixingDecimalMarksIsRefused() throws IOException {
        Path f = write("assays.csv", "Sample ID;Au_ppm\nS1;0,512\nS2;1,234\nS3;0,7\n");
        CliRun r = CliRun.run("censored", f.toString(), "--column", "Au_ppm");
        assertTrue(r.oneLineInputError(), r.err());
        assertTrue(r.err().contains("read with decimal points"), r.err());
    }

    // Item 4: the register, and checks with nothing to judge.

    @Test
    void aMisnamedRegisterStopsTheAnalysesNamingTheFile() throws IOException {
        write("lab/a.csv", "Sample ID,Au_ppm\nR1,0.5\nC1,0.41\nB1,<0.005\n");
        write("Register.csv", "sample_id,qc_role,reference\nR1,routine,\nC1,crm,KC-1\nB1,blank,\n");
        CliRun r = CliRun.run("duplicates", dir.toString());
        assertTrue(r.oneLineInputError(), r.err());
        assertTrue(r.err().contains("register.csv: not found, but the project folder holds [Register.csv]"), r.err());
        CliRun check = CliRun.run("check", dir.toString());
        assertEquals(CupelCommand.INPUT_ERROR, check.code(), check.out());
        assertTrue(check.out().contains("Register.csv"), check.out());
    }

    /** Without a register and without controls in the lab files, nothing can be judged; nothing says "pass". */
    @Test
    void aProjectWithoutControlSamplesIsNeverPass() throws IOException {
        write("lab/a.csv", "Sample ID,Au_ppm\nR1,0.5\nR2,0.6\nR3,0.7\n");
        CliRun check = CliRun.run("check", dir.toString());
        assertTrue(check.out().contains("the project has no sample register"), check.out());
        CliRun batches = CliRun.run("batches", dir.toString());
        assertEquals(CupelCommand.OK, batches.code(), batches.err());
        assertFalse(batches.out().contains("every control result passed") || batches.out().contains("Every blank passed"),
                batches.out());
        assertTrue(batches.out().contains("no batch can be judged") && batches.out().contains("blanks cannot be judged"),
                batches.out());
        assertNoPassCallout(report());
    }

    /** Files with headers and no rows: a header-only project gives no "Pass" headline either. */
    @Test
    void aHeaderOnlyProjectHasNoPassHeadline() throws IOException {
        write("lab/a.csv", "Sample ID,Au_ppm\n");
        write("register.csv", "sample_id,qc_role,reference\n");
        write("crm-catalog.csv", "crm,analyte,unit,certified_value,sd\n");
        CliRun check = CliRun.run("check", dir.toString());
        assertTrue(check.out().contains("but no data rows"), check.out());
        CliRun batches = CliRun.run("batches", dir.toString());
        assertFalse(batches.out().contains("passed"), batches.out());
        assertNoPassCallout(report());
    }

    private String report() throws IOException {
        Path out = dir.resolve("qc-out");
        CliRun r = CliRun.run("report", dir.toString(), "--out", out.toString(), "--quiet");
        assertEquals(CupelCommand.OK, r.code(), r.err());
        return Files.readString(out.resolve("index.html"));
    }

    private static void assertNoPassCallout(String html) {
        assertFalse(html.contains("class=\"callout pass\""), "a Pass callout with no control sample");
        assertTrue(html.contains("class=\"callout cannot_judge\"><strong>Cannot judge.</strong>"), html);
    }

    // Item 5: workbooks.

    @Test
    void aFormulaWithoutACalculatedValueIsListedWithItsCell() throws IOException {
        write("lab/a.xlsx", WorkbookOutputProcessTest.withoutCachedValues(WorkbookOutputProcessTest.labWorkbook(true)));
        write("register.csv", REGISTER);
        JsonNode check = checkJson();
        List<JsonNode> c = exceptionsAt(check, "lab/a.xlsx", 4);
        assertEquals(1, c.size(), check.toString());
        assertTrue(c.get(0).get("problem").asText().contains("Sheet1!B4"), c.toString());
    }

    // Item 7: numbers.

    /**
     * 1e308 made analyse, report and censored exit 3; 1e160 gave an SD of "Infinity" with no note; 1e-400 was
     * read as 0. Each is now an exception for its cell, and the outputs hold no unexplained non-finite number.
     */
    @Test
    void hugeAndTinyValuesAreListedAndTheAnalysesRun() throws IOException {
        StringBuilder lab = new StringBuilder("Sample ID,Au_ppm\n");
        for (int i = 1; i <= 30; i++) {
            lab.append("R").append(i).append(',').append(i == 3 ? "1e308" : i == 7 ? "1e160" : i == 9 ? "1e-400"
                    : String.valueOf(0.1 * i)).append('\n');
        }
        write("lab/a.csv", lab.toString());
        JsonNode check = checkJson();
        for (int line : new int[] {4, 8, 10}) {
            assertEquals(1, exceptionsAt(check, "lab/a.csv", line).stream()
                    .filter(e -> e.get("where").get("column").asInt() == 2).count(), "line " + line);
        }
        CliRun analyse = CliRun.run("analyse", dir.toString(), "--json");
        assertEquals(CupelCommand.OK, analyse.code(), analyse.err());
        List<String> unexplained = new ArrayList<>();
        DegenerateNumbersTest.collect("analyse", JSON.readTree(analyse.out()), false, unexplained);
        String html = report();
        assertFalse(html.contains("Infinity"), "no infinite estimate in the report");
        Path plain = write("plain.csv", lab.toString());
        CliRun censored = CliRun.run("censored", plain.toString(), "--column", "Au_ppm", "--json");
        assertEquals(CupelCommand.OK, censored.code(), censored.err());
        DegenerateNumbersTest.collect("censored", JSON.readTree(censored.out()), false, unexplained);
        assertEquals(List.of(), unexplained);
    }

    // Item 9: links.

    @Test
    void aLinkToNothingIsNamedAndALinkOutsideIsRefusedWithoutEchoingTheFile() throws IOException {
        write("lab/a.csv", "Sample ID,Au_ppm\nR1,0.5\n");
        write("register.csv", REGISTER);
        Path outside = Files.createDirectories(dir.resolveSibling(dir.getFileName() + "-outside"));
        Path system = Files.writeString(outside.resolve("passwd"), "root:x:0:0:root:/root:/bin/bash\n");
        Files.createSymbolicLink(dir.resolve("lab/gone.csv"), dir.resolve("lab/missing.csv"));
        Files.createSymbolicLink(dir.resolve("lab/system.csv"), system);
        // --wide: the register's columns take the width of the (temporary) paths it shows.
        CliRun check = CliRun.run("check", dir.toString(), "--wide");
        assertEquals(CupelCommand.INPUT_ERROR, check.code());
        assertTrue(check.out().contains("lab/gone.csv") && check.out().contains("a link to a file that does not exist"),
                check.out());
        assertTrue(check.out().contains("lab/system.csv") && check.out().contains("leads outside the project folder"),
                check.out());
        assertFalse(check.out().contains("/bin/bash"), check.out());
        CliRun duplicates = CliRun.run("duplicates", dir.toString());
        assertTrue(duplicates.oneLineInputError(), duplicates.err());
        assertFalse(duplicates.err().contains("/bin/bash"), duplicates.err());
    }

    /**
     * Found by the long fuzz run (a huge field pasted into a catalog row): a certificate for an analyte that
     * no result column holds made {@code cupel crm --results} exit 3 with a NullPointerException.
     */
    @Test
    void aCertificateOfAnAnalyteWithoutResultsIsNoCrash() throws IOException {
        Path catalog = write("cat.csv", "crm,analyte,unit,certified_value,sd\nLOW,Au,g/t,0.50,0.03\n"
                + "MID,Pd,g/t,2.50,0.10\n");
        Path results = write("crm.csv", "crm,batch,position,Au_ppm\nLOW,J1,5,0.51\nMID,J1,15,2.52\n");
        CliRun r = CliRun.run("crm", "--results", results.toString(), "--catalog", catalog.toString());
        assertEquals(CupelCommand.OK, r.code(), r.err());
    }

    // Item 10: messages.

    /** A Latin-1 byte on line 5000 was reported at line 4761. */
    @Test
    void anInvalidByteIsReportedAtItsLine() throws IOException {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        b.writeBytes("Sample ID,Au_ppm\n".getBytes(StandardCharsets.US_ASCII));
        for (int line = 2; line <= 6000; line++) {
            b.writeBytes(String.format("S%05d,0.5%s%n", line, line == 5000 ? "\u00b5" : "")
                    .getBytes(StandardCharsets.ISO_8859_1));
        }
        write("lab/a.csv", b.toByteArray());
        CliRun r = CliRun.run("duplicates", dir.toString());
        assertTrue(r.oneLineInputError(), r.err());
        assertTrue(r.err().startsWith("cupel: lab/a.csv:5000:11: the text is not valid UTF-8 at byte(s) 0xB5"), r.err());
    }

    /** A 10,001-column header gave a 129 KB message. */
    @Test
    void aTenThousandColumnHeaderGivesAShortMessage() throws IOException {
        StringBuilder h = new StringBuilder("Sample");
        for (int i = 0; i < 10_000; i++) {
            h.append(",X").append(i);
        }
        write("lab/a.csv", h + "\nS1" + ",".repeat(10_000) + "\n");
        CliRun r = CliRun.run("duplicates", dir.toString());
        assertTrue(r.oneLineInputError(), r.err());
        assertTrue(r.err().length() < 700 && r.err().contains("and 9,9"), r.err().length() + ": " + r.err());
    }

    /** A file saved twice with a byte-order mark left an invisible character in its quoted first header. */
    @Test
    void aDoubledByteOrderMarkIsRead() throws IOException {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        b.writeBytes(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF, (byte) 0xEF, (byte) 0xBB, (byte) 0xBF});
        b.writeBytes("\"Sample ID\",Au_ppm\nR1,0.5\nR2,0.6\n".getBytes(StandardCharsets.UTF_8));
        write("lab/a.csv", b.toByteArray());
        write("register.csv", REGISTER.replace("R3,routine,\n", ""));
        CliRun r = CliRun.run("check", dir.toString(), "--json");
        assertEquals(CupelCommand.OK, r.code(), r.out() + r.err());
        assertEquals(2, JSON.readTree(r.out()).get("summary").get("samples").asInt());
    }
}
