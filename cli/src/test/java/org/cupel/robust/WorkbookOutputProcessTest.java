package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.cupel.cli.CupelCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15, item 5, in a process of its own, as a user runs Cupel: with a workbook in the project, standard
 * output of a {@code --json} command is the JSON document and nothing else (the Log4j API, through which
 * the workbook library logs, printed "could not find a logging provider" there), standard error is empty,
 * and a workbook the library refuses gives one {@code cupel:} line, not the library's stack trace.
 */
class WorkbookOutputProcessTest {
    @TempDir
    Path dir;

    private record Outcome(int code, String out, String err) {
    }

    private static Outcome cupel(Path dir, String... args) throws IOException, InterruptedException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> cmd = new ArrayList<>(List.of(java, "-Djava.awt.headless=true", "-cp",
                System.getProperty("java.class.path"), CupelCommand.class.getName()));
        cmd.addAll(List.of(args));
        Path out = dir.resolve("stdout.txt");
        Path err = dir.resolve("stderr.txt");
        Process p = new ProcessBuilder(cmd).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        int code = p.waitFor();
        return new Outcome(code, Files.readString(out), Files.readString(err));
    }

    /** A small lab workbook: Sample ID, Au_ppm; rows R1..R3, R3's value a formula when {@code formula}. */
    static byte[] labWorkbook(boolean formula) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (XSSFWorkbook wb = new XSSFWorkbook()) {
            Sheet s = wb.createSheet("Sheet1");
            Row h = s.createRow(0);
            h.createCell(0).setCellValue("Sample ID");
            h.createCell(1).setCellValue("Au_ppm");
            for (int r = 1; r <= 3; r++) {
                Row row = s.createRow(r);
                row.createCell(0).setCellValue("R" + r);
                row.createCell(1).setCellValue(0.25 * r);
            }
            if (formula) {
                s.getRow(3).getCell(1).setCellFormula("B2*3");
            }
            wb.write(bytes);
        }
        return bytes.toByteArray();
    }

    /** The workbook with every part named {@code part} rewritten by {@code edit}. */
    static byte[] rewrite(byte[] workbook, String part, UnaryOperator<String> edit) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(workbook));
             ZipOutputStream zip = new ZipOutputStream(out)) {
            for (ZipEntry e = in.getNextEntry(); e != null; e = in.getNextEntry()) {
                byte[] content = in.readAllBytes();
                if (e.getName().equals(part)) {
                    content = edit.apply(new String(content, StandardCharsets.UTF_8)).getBytes(StandardCharsets.UTF_8);
                }
                zip.putNextEntry(new ZipEntry(e.getName()));
                zip.write(content);
                zip.closeEntry();
            }
        }
        return out.toByteArray();
    }

    /** The workbook with the cached values of its first sheet's formulas removed. */
    static byte[] withoutCachedValues(byte[] workbook) throws IOException {
        return rewrite(workbook, "xl/worksheets/sheet1.xml", xml -> xml.replaceAll("(<f>[^<]*</f>)<v>[^<]*</v>", "$1"));
    }

    @Test
    void aJsonCommandOnAWorkbookProjectPrintsOnlyTheJson() throws Exception {
        Path project = dir.resolve("p");
        Files.createDirectories(project.resolve("lab"));
        Files.write(project.resolve("lab/a.xlsx"), labWorkbook(false));
        Files.writeString(project.resolve("register.csv"), InputReadingCliTest.REGISTER);
        Outcome o = cupel(dir, "check", project.toString(), "--json");
        assertEquals(CupelCommand.OK, o.code, o.err);
        JsonNode json = new ObjectMapper().enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS).readTree(o.out);
        assertEquals(3, json.get("summary").get("samples").asInt());
        assertEquals("", o.err, "nothing on standard error");
    }

    /** A DOCTYPE in the package's content types printed a 35-line stack trace before Cupel's message. */
    @Test
    void aRefusedWorkbookGivesOneLineAndNoStackTrace() throws Exception {
        Path project = dir.resolve("p");
        Files.createDirectories(project.resolve("lab"));
        Files.write(project.resolve("lab/a.xlsx"), rewrite(labWorkbook(false), "[Content_Types].xml",
                xml -> xml.replaceFirst("\\?>", "?><!DOCTYPE x>")));
        Outcome o = cupel(dir, "duplicates", project.toString(), "--json");
        assertEquals(CupelCommand.INPUT_ERROR, o.code, o.err);
        assertEquals("", o.out);
        assertEquals(1, o.err.strip().lines().count(), o.err);
        assertTrue(o.err.startsWith("cupel: lab/a.xlsx: the workbook contains an XML document type declaration"),
                o.err);
    }
}
