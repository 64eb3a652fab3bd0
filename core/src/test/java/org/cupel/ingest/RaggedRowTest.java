package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.cupel.assay.QcRole;
import org.cupel.config.CupelConfig;
import org.cupel.control.BlankCsv;
import org.cupel.control.crm.CrmResultsFile;
import org.cupel.duplicates.PairsFile;
import org.cupel.project.CrmCatalog;
import org.cupel.project.DataIssue;
import org.cupel.project.FileAccount;
import org.cupel.project.InputException;
import org.cupel.project.Project;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.Testwork;
import org.cupel.recovery.TestworkReader;
import org.junit.jupiter.api.Test;

/**
 * Issue 15, item 2: a row whose cell count differs from the header's is never read shifted or padded. It
 * is left out and listed with its line, both counts and the fix, by every delimited reader: lab files,
 * register, catalog, the plain tables of the analysis commands and testwork.
 */
class RaggedRowTest extends InFolderTest {
    /**
     * The issue's case: {@code R2,1,234.5,2.0} under {@code Sample ID,Au_ppm,Ag_ppm} read Ag = 234.5 with no
     * problem found. Now R2 is listed (4 cells, 3 columns) and none of its values is read.
     */
    @Test
    void anExtraCellIsListedNotShiftedIntoTheNextColumn() {
        folder.write("lab/a.csv", "Sample ID,Au_ppm,Ag_ppm\nR1,1.2,3.4\nR2,1,234.5,2.0\nR3,0.5,0.7\n");
        Project p = ProjectLoader.inspect(tmp);
        assertEquals(2, p.samples().size(), "R2 is not a sample");
        assertTrue(p.samples().rowOf("R2").isEmpty());
        DataIssue i = ProjectFolder.issues(p, "lab/a.csv", DataIssue.Severity.EXCLUDED).get(0);
        assertEquals(3, i.where().line());
        assertEquals(0, i.where().column(), "the whole row");
        assertEquals("R2", i.sampleId());
        assertTrue(i.problem().contains("4 cells, more than the 3 columns of the header on line 1"), i.problem());
        assertTrue(i.fix().contains("quote") && i.fix().contains("ingest.decimalComma"), i.fix());
        FileAccount a = p.files().get(0);
        assertEquals(List.of(3L, 2L, 1L), List.of(a.rowsRead(), a.rowsAnalysed(), a.rowsExcluded()));
    }

    /** A short row is ragged even when the missing cells are the last ones: a cell may have been lost anywhere. */
    @Test
    void aShortRowIsListedEvenWhenItsMissingCellsAreTrailing() {
        folder.write("lab/a.csv", "Sample ID,Au_ppm,Ag_ppm\nR1,1.2,3.4\nR2,1.5\n");
        Project p = ProjectLoader.inspect(tmp);
        DataIssue i = ProjectFolder.issues(p, "lab/a.csv", DataIssue.Severity.EXCLUDED).get(0);
        assertEquals(3, i.where().line());
        assertTrue(i.problem().contains("2 cells, fewer than the 3 columns"), i.problem());
        assertTrue(p.samples().rowOf("R2").isEmpty());
    }

    /**
     * Empty cells after the last column (a spreadsheet's trailing {@code ,,}) shift nothing and are accepted;
     * so are empty trailing header cells.
     */
    @Test
    void trailingEmptyCellsAreAccepted() {
        folder.write("lab/a.csv", "Sample ID,Au_ppm,Ag_ppm,,\nR1,1.2,3.4,,\nR2,1.5,2.5\nR3,0.7,0.8,,,,\n");
        Project p = ProjectLoader.inspect(tmp);
        assertEquals(3, p.samples().size());
        assertTrue(ProjectFolder.issues(p, "lab/a.csv", DataIssue.Severity.EXCLUDED).isEmpty(),
                p.exceptions().all().toString());
    }

    /** A ragged register row is left out with its sample's lab rows: its role cannot be read. */
    @Test
    void aRaggedRegisterRowLeavesItsSampleOutRatherThanMakeItRoutine() {
        folder.write("lab/a.csv", "Sample ID,Au_ppm\nS1,0.5\nC1,0.41\n");
        folder.write("register.csv", "sample_id,qc_role,reference\nS1,routine,\nC1,crm,KC-1,extra\n");
        Project p = ProjectLoader.inspect(tmp);
        DataIssue i = ProjectFolder.issues(p, "register.csv", DataIssue.Severity.EXCLUDED).get(0);
        assertEquals(3, i.where().line());
        assertTrue(i.problem().contains("4 cells, more than the 3 columns"), i.problem());
        assertTrue(p.samples().rowOf("C1").isEmpty(), "C1 is not analysed as a routine sample");
        assertTrue(p.files().stream().allMatch(FileAccount::balances), p.files().toString());
    }

    @Test
    void aRaggedCatalogRowIsCountedAndListed() {
        folder.write("lab/a.csv", "Sample ID,Au_ppm\nS1,0.5\n");
        folder.write("crm-catalog.csv", "crm,analyte,unit,certified_value,sd\nKC-1,Au,g/t,0.412,0.018\n"
                + "KC-2,Au,g/t,1,234,0.05\n");
        Project p = ProjectLoader.inspect(tmp);
        FileAccount catalog = p.files().stream().filter(f -> f.file().equals("crm-catalog.csv")).findFirst()
                .orElseThrow();
        assertEquals(List.of(2L, 1L, 1L), List.of(catalog.rowsRead(), catalog.rowsAnalysed(), catalog.rowsExcluded()));
        assertEquals(3, ProjectFolder.issues(p, "crm-catalog.csv", DataIssue.Severity.EXCLUDED).get(0).where().line());
        assertTrue(p.catalog().find("KC-2", "Au").isEmpty());
    }

    @Test
    void thePlainTablesOfTheAnalysisCommandsListRaggedRows() {
        Path pairs = folder.write("pairs.csv", "id,original,duplicate\nD1,0.5,0.52\nD2,1,234,1.3\n");
        PairsFile.Result r = PairsFile.read(pairs, QcRole.FIELD_DUPLICATE);
        assertEquals(1, r.pairs().size());
        assertEquals(3, r.issues().get(0).where().line());

        Path blanks = folder.write("blanks.csv", "sample_id,batch,position,Au_ppm\nB1,J1,5,<0.005\nB2,J1,9,0,007\n");
        BlankCsv.Blanks b = BlankCsv.read(blanks);
        assertEquals(1, b.samples().size());
        assertTrue(b.issues().stream().anyMatch(i -> i.where().line() == 3 && i.where().column() == 0), b.issues()
                .toString());

        Path crm = folder.write("crm.csv", "crm,batch,Au_ppm\nLOW,J1,0.51\nLOW,J1,0,49\n");
        Project p = CrmResultsFile.read(crm, CrmCatalog.empty(), CupelConfig.defaults());
        assertEquals(1, p.samples().size());
        assertEquals(3, p.exceptions().all().get(0).where().line());
    }

    /** A ragged smelt row would balance a smelt without one of its products: the file is refused. */
    @Test
    void aRaggedSmeltRowStopsTheTestworkAndARaggedHeadRowIsListed() {
        folder.write("testwork/heads.csv", "feed,replicate,Au_g/t\nF1,1,318.1\nF1,2,307,4\n");
        folder.write("testwork/smelts.csv", "test_id,condition,replicate,feed,charge_g,product,mass_g,Au_g/t\n"
                + "SM-01,A,1,F1,50,button,30.6,472.5\nSM-01,A,1,F1,50,slag,40,1,3.2\n");
        InputException e = assertThrows(InputException.class,
                () -> TestworkReader.read(tmp, RecoverySettings.DEFAULTS, ValueConventions.DEFAULTS));
        assertTrue(e.getMessage().contains("smelts.csv:3: the row has 9 cells"), e.getMessage());

        folder.write("testwork/smelts.csv", "test_id,condition,replicate,feed,charge_g,product,mass_g,Au_g/t\n"
                + "SM-01,A,1,F1,50,button,30.6,472.5\nSM-01,A,1,F1,50,slag,40.1,3.2\n");
        Testwork w = TestworkReader.read(tmp, RecoverySettings.DEFAULTS, ValueConventions.DEFAULTS);
        assertTrue(w.issues().stream().anyMatch(i -> i.where().file().endsWith("heads.csv")
                && i.where().line() == 3 && i.where().column() == 0), w.issues().toString());
    }

    /** A sheet stores each cell at its column and omits empty trailing cells: a short sheet row is not ragged. */
    @Test
    void aSheetRowShorterThanTheHeaderIsReadAndOneWithAValueBeyondItIsListed() throws IOException {
        Path xlsx = tmp.resolve("lab.xlsx");
        try (XSSFWorkbook wb = new XSSFWorkbook(); OutputStream out = Files.newOutputStream(xlsx)) {
            Sheet s = wb.createSheet("Assays");
            Row h = s.createRow(0);
            h.createCell(0).setCellValue("Sample ID");
            h.createCell(1).setCellValue("Au_ppm");
            h.createCell(2).setCellValue("Ag_ppm");
            Row short1 = s.createRow(1);
            short1.createCell(0).setCellValue("S1");
            short1.createCell(1).setCellValue(0.5);
            Row wide = s.createRow(2);
            wide.createCell(0).setCellValue("S2");
            wide.createCell(4).setCellValue(7);
            wb.write(out);
        }
        RawTable t = TableReader.read(xlsx);
        assertEquals(1, t.rows().size());
        assertEquals("", t.rows().get(0).cell(2));
        assertEquals(1, t.rowsLeftOut());
        assertEquals(3, t.issues().get(0).where().line());
        assertFalse(t.issues().get(0).problem().isEmpty());
    }
}
