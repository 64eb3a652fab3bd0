package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.assay.Qualifier;
import org.cupel.assay.SampleTable;
import org.cupel.project.CrmCertificate;
import org.cupel.project.DataIssue;
import org.cupel.project.FileAccount;
import org.cupel.project.InputException;
import org.cupel.project.Project;
import org.cupel.units.GradeUnit;
import org.cupel.units.UnitChoice;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The messy project fixture (testdata/fixtures/ingest/messy-project, described in testdata/README.md):
 * no row silently dropped, every planted problem listed with its line and reason.
 */
class ProjectLoaderTest {
    private static Project project;

    @TempDir
    Path dir;

    @BeforeAll
    static void load() {
        project = ProjectLoader.load(fixture());
    }

    static Path fixture() {
        return Path.of(System.getProperty("cupel.testdata"), "fixtures", "ingest", "messy-project");
    }

    @Test
    void everyFileBalancesAndEveryExcludedRowIsListedWithLineAndReason() {
        assertEquals(List.of("lab/batch-A.csv", "lab/batch-B.tsv", "register.csv", "crm-catalog.csv"),
                project.files().stream().map(FileAccount::file).toList());
        for (FileAccount f : project.files()) {
            assertTrue(f.balances(), f.toString());
            List<DataIssue> rowExclusions = project.exceptions().withSeverity(DataIssue.Severity.EXCLUDED).stream()
                    .filter(i -> i.where().file().equals(f.file()) && i.where().column() == 0).toList();
            assertEquals(f.rowsExcluded(), rowExclusions.size(), f.file() + ": " + rowExclusions);
            Set<Long> lines = rowExclusions.stream().map(i -> i.where().line()).collect(Collectors.toSet());
            assertEquals(f.rowsExcluded(), lines.size(), "one listing per excluded row");
            rowExclusions.forEach(i -> {
                assertTrue(i.where().line() > 0);
                assertFalse(i.problem().isEmpty());
                assertFalse(i.fix().isEmpty());
            });
        }
    }

    @Test
    void rowCountsOfThePlantedProblems() {
        assertEquals(new FileAccount("lab/batch-A.csv", "lab results", 21, 16, 5), account("lab/batch-A.csv"));
        assertEquals(new FileAccount("lab/batch-B.tsv", "lab results", 4, 4, 0), account("lab/batch-B.tsv"));
        assertEquals(new FileAccount("register.csv", "sample register", 22, 16, 6), account("register.csv"));
        assertEquals(new FileAccount("crm-catalog.csv", "CRM catalog", 4, 3, 1), account("crm-catalog.csv"));
        // 16 kept from batch A, 2 new IDs in batch B (the other 2 are re-assays)
        assertEquals(18, project.samples().size());
        assertFalse(project.exceptions().hasFatal());
    }

    @Test
    void rolesComeFromTheRegisterAndRepeatMarkers() {
        SampleTable s = project.samples();
        assertEquals(QcRole.CRM, s.role(row("MX1011")));
        assertEquals("KRM-14", s.reference(row("MX1011")));
        assertEquals(QcRole.BLANK, s.role(row("MX1012")));
        assertEquals(QcRole.FIELD_DUPLICATE, s.role(row("MX1013")));
        assertEquals("MX1003", s.reference(row("MX1013")));
        assertEquals(QcRole.LAB_REPEAT, s.role(row("MX1003 R")));
        assertEquals("MX1003", s.reference(row("MX1003 R")));
        assertEquals(QcRole.ROUTINE, s.role(row("MX2001")));
    }

    @Test
    void batchesTakeTheHeaderBlockOrTheBatchColumn() {
        SampleTable s = project.samples();
        assertEquals("QF-25-0311", s.batch(row("MX1011")).id());
        assertEquals("Quartzfield Assay Lab", s.batch(row("MX1011")).lab());
        assertEquals("2025-03-14", s.batch(row("MX1011")).reported().toString());
        assertEquals("QF-25-0340", s.batch(row("MX1016")).id());
        assertEquals("2025-03-21", s.batch(row("MX1016")).reported().toString(), "latest date of the batch's rows");
        assertEquals(1, s.position(row("MX1001")));
        assertEquals(2, s.position(row("MX1019")));
    }

    @Test
    void valuesFollowEveryConventionInTheReportingUnit() {
        AnalyteColumn au = project.analyte("Au").orElseThrow();
        AnalyteColumn ag = project.analyte("Ag").orElseThrow();
        assertEquals(GradeUnit.G_PER_T, au.analyte().unit());
        assertEquals(GradeUnit.PPM, ag.analyte().unit());
        assertEquals(AssayValue.belowDetection(0.005).withDecimals(3), au.value(row("MX1002")));
        assertEquals(AssayValue.belowDetection(0.005).withDecimals(3), au.value(row("MX1003")), "-0.005 means <0.005");
        assertEquals(AssayValue.belowDetection(0.5), ag.value(row("MX1003")),
                "BDL at the detection-limit row (a code: its decimals are not written)");
        assertEquals(AssayValue.belowDetection(0.5).withDecimals(1), ag.value(row("MX1002")));
        assertEquals(MissingReason.NOT_RECEIVED, au.value(row("MX1007")).missingReason());
        assertEquals(MissingReason.INSUFFICIENT_SAMPLE, ag.value(row("MX1008")).missingReason());
        assertTrue(au.value(row("MX1006")).isMissing(), "blank cell");
        assertTrue(au.value(row("MX1009")).isMissing(), "unreadable cell left out");
        assertEquals(4.4, ag.number(row("MX1009")), 0.0, "the rest of the row is kept");
        assertEquals(0.005, au.limit(row("MX1013")), 0.0, "the column's stated limit");
    }

    @Test
    void valuesKeepTheDecimalsTheLabWrote() {
        AnalyteColumn au = project.analyte("Au").orElseThrow();
        AnalyteColumn ag = project.analyte("Ag").orElseThrow();
        assertEquals("1.498", au.value(row("MX1011")).display());
        assertEquals("0.49", au.value(row("MX1001")).display(), "the FA-GRAV result the priority picks");
        assertEquals("0.71", au.value(row("MX1013")).display());
        assertEquals("0.4", au.value(row("MX1015")).display());
        assertEquals("0.006", au.value(row("MX1012")).display());
        assertEquals("<0.005", au.value(row("MX1002")).display(), "-0.005 is shown as the limit it means");
        assertEquals("3", ag.value(row("MX1015")).display());
        assertEquals(0, ag.decimals(row("MX1015")));
        assertEquals(1, ag.decimals(row("MX1013")));
        assertEquals("14.37", au.value(row("MX1004")).display(), "the FA-GRAV re-assay, as written");
    }

    @Test
    void certificatesKeepTheirPrecisionThroughAUnitChange() {
        // KRM-14 Au is certified as 1520 ppb (SD 45 ppb); Au is reported in g/t (ingest.units), so the
        // factor is 1e-3 and the three decimals move with it: 1.520 g/t, SD 0.045 g/t.
        CrmCertificate krm14 = project.catalog().find("KRM-14", "Au").orElseThrow();
        assertEquals("1.520", krm14.valueText());
        assertEquals("0.045", krm14.sdText());
        CrmCertificate ag = project.catalog().find("KRM-14", "Ag").orElseThrow();
        assertEquals("12.4", ag.valueText());
        assertEquals("0.6", ag.sdText());
    }

    @Test
    void theReportingUnitAndWhyAreKept() {
        UnitChoice au = project.units().get("Au");
        assertEquals(GradeUnit.G_PER_T, au.unit());
        assertEquals(UnitChoice.Basis.CONFIGURED, au.basis());
        assertEquals(Map.of(GradeUnit.PPM, 1, GradeUnit.G_PER_T, 1), au.files());
        UnitChoice ag = project.units().get("Ag");
        assertEquals(GradeUnit.PPM, ag.unit());
        assertEquals(UnitChoice.Basis.ONLY_UNIT, ag.basis());
    }

    @Test
    void methodPriorityPicksTheReportedValueAndSaysWhy() {
        AnalyteColumn au = project.analyte("Au").orElseThrow();
        int over = row("MX1004");
        assertEquals(14.37, au.number(over), 0.0);
        assertEquals("FA-GRAV", au.method(over));
        assertTrue(au.selectionReason(over).startsWith("in range beats censored: over-limit >10"),
                au.selectionReason(over));
        int reassayed = row("MX1005");
        assertEquals(1.19, au.number(reassayed), 0.0, "re-assay in a later file, preferred method");
        assertEquals(2, au.candidates(reassayed).size());
        assertTrue(au.selectionReason(reassayed).startsWith("method priority for Au"));
    }

    @Test
    void crmCatalogIsConvertedToTheReportingUnit() {
        var krm14 = project.catalog().find("KRM-14", "Au").orElseThrow();
        assertEquals(GradeUnit.G_PER_T, krm14.unit());
        assertEquals(1.52, krm14.certifiedValue(), 1e-12, "1520 ppb = 1.52 g/t (NIST SP 811: 1 ppb = 1e-3 ppm)");
        assertEquals(0.045, krm14.sd(), 1e-12);
        assertTrue(project.catalog().find("KRM-22", "Ag").isEmpty(), "negative SD row left out");
    }

    @Test
    void plantedProblemsAreListed() {
        assertListed(DataIssue.Severity.EXCLUDED, "lab/batch-A.csv", 22, "MX1001", "already on line 7");
        assertListed(DataIssue.Severity.EXCLUDED, "lab/batch-A.csv", 23, "", "no sample ID");
        assertListed(DataIssue.Severity.EXCLUDED, "lab/batch-A.csv", 24, "MX1018", "no analyte value");
        assertListed(DataIssue.Severity.EXCLUDED, "lab/batch-A.csv", 25, "MX1017", "register row could not be used");
        assertListed(DataIssue.Severity.EXCLUDED, "lab/batch-A.csv", 15, "MX1009", "not a number");
        assertListed(DataIssue.Severity.EXCLUDED, "lab/batch-A.csv", 16, "MX1010", "decimal comma");
        assertListed(DataIssue.Severity.EXCLUDED, "lab/batch-A.csv", 16, "MX1010", "no analyte value");
        assertListed(DataIssue.Severity.WARNING, "lab/batch-A.csv", 27, "MX2001", "not in the register");
        assertListed(DataIssue.Severity.WARNING, "lab/batch-A.csv", 20, "MX1014", "original sample MX9999");
        assertListed(DataIssue.Severity.WARNING, "lab/batch-A.csv", 21, "MX1015", "KRM-99 is not in the CRM catalog");
        assertListed(DataIssue.Severity.EXCLUDED, "register.csv", 18, "MX1016", "already registered on line 17");
        assertListed(DataIssue.Severity.EXCLUDED, "register.csv", 19, "MX1017", "unknown QC role");
        assertListed(DataIssue.Severity.EXCLUDED, "register.csv", 22, "", "no sample ID");
        assertListed(DataIssue.Severity.EXCLUDED, "register.csv", 23, "MX1020", "not received");
        assertListed(DataIssue.Severity.EXCLUDED, "register.csv", 20, "MX1018", "lab row was left out");
        assertListed(DataIssue.Severity.EXCLUDED, "crm-catalog.csv", 5, "KRM-22", "not a positive number");
    }

    @Test
    void aFolderWithJustLabCsvFilesWorks() throws IOException {
        Files.writeString(dir.resolve("job1.csv"), "sample_id,Au_ppb\nA1,12\nA2,<5\n");
        Project p = ProjectLoader.load(dir);
        assertEquals(2, p.samples().size());
        assertEquals(Qualifier.BELOW_DETECTION, p.analyte("Au").orElseThrow().qualifier(1));
        assertEquals("job1", p.samples().batch(0).id());
    }

    @Test
    void strictLoadStopsAtAFileWithoutIdColumnAndInspectListsIt() throws IOException {
        Files.createDirectories(dir.resolve("lab"));
        Files.writeString(dir.resolve("lab/a.csv"), "sample_id,Au_ppm\nA1,1\n");
        Files.writeString(dir.resolve("lab/b.csv"), "hole,Au_ppm\nA2,1\n");
        InputException e = assertThrows(InputException.class, () -> ProjectLoader.load(dir));
        assertTrue(e.getMessage().startsWith("lab/b.csv:1:"), e.getMessage());
        Project p = ProjectLoader.inspect(dir);
        assertTrue(p.exceptions().hasFatal());
        assertEquals(1, p.samples().size());
        DataIssue fatal = p.exceptions().withSeverity(DataIssue.Severity.FATAL).get(0);
        assertEquals("lab/b.csv", fatal.where().file());
        assertEquals(1, fatal.where().line());
    }

    @Test
    void aFolderWithoutLabFilesIsAnInputError() {
        assertThrows(InputException.class, () -> ProjectLoader.load(dir));
        assertThrows(InputException.class, () -> ProjectLoader.load(dir.resolve("missing")));
    }

    @Test
    void configuredUnitConvertsValues() throws IOException {
        Files.writeString(dir.resolve("cupel.yaml"), "ingest:\n  units: {Au: ppb}\n");
        Files.writeString(dir.resolve("j.csv"), "sample_id,Au (g/t)\nA1,1.5\nA2,<0.01\n");
        Project p = ProjectLoader.load(dir);
        AnalyteColumn au = p.analyte("Au").orElseThrow();
        assertEquals(GradeUnit.PPB, au.analyte().unit());
        assertEquals(1500.0, au.number(0), 1e-9, "1 g/t = 1000 ppb (NIST SP 811); 1e-9: one multiplication");
        assertEquals(10.0, au.limit(1), 1e-12);
    }

    @Test
    void aBrokenConfigStopsTheLoadAndIsListedByInspect() throws IOException {
        Files.writeString(dir.resolve("cupel.yaml"), "ingest: [unclosed\n");
        Files.writeString(dir.resolve("j.csv"), "sample_id,Au_ppm\nA1,1\n");
        assertThrows(org.cupel.config.ConfigException.class, () -> ProjectLoader.load(dir));
        Project p = ProjectLoader.inspect(dir);
        DataIssue fatal = p.exceptions().withSeverity(DataIssue.Severity.FATAL).get(0);
        assertEquals("cupel.yaml", fatal.where().file());
        assertEquals(1, p.samples().size(), "the lab files are still read with the defaults");
    }

    @Test
    void anXlsxLabFileGivesTheSameProjectAsItsCsv() throws IOException {
        Path csvProject = Files.createDirectories(dir.resolve("csv/lab"));
        Path xlsxProject = Files.createDirectories(dir.resolve("xlsx/lab"));
        String[][] table = {{"Job: K-1"}, {"Sample ID", "Au_ppm_FA-AAS", "Au_ppm_FA-GRAV", "Ag ppm"},
            {"A1", "0.5", "", "3"}, {"A2", ">10", "12.5", "<0.5"}, {"A3", "NR", "", "IS"}, {"A4", "-0.005", "", "2.25"}};
        StringBuilder csv = new StringBuilder();
        for (String[] r : table) {
            csv.append(String.join(",", r)).append('\n');
        }
        Files.writeString(csvProject.resolve("k1.csv"), csv);
        try (var wb = new org.apache.poi.xssf.usermodel.XSSFWorkbook();
             var out = Files.newOutputStream(xlsxProject.resolve("k1.xlsx"))) {
            var sheet = wb.createSheet("results");
            for (int r = 0; r < table.length; r++) {
                var row = sheet.createRow(r);
                for (int c = 0; c < table[r].length; c++) {
                    String v = table[r][c];
                    if (r > 1 && c > 0 && !v.isEmpty() && Character.isDigit(v.charAt(0))) {
                        row.createCell(c).setCellValue(Double.parseDouble(v));
                    } else if (!v.isEmpty()) {
                        row.createCell(c).setCellValue(v);
                    }
                }
            }
            wb.write(out);
        }
        Project a = ProjectLoader.load(dir.resolve("csv"));
        Project b = ProjectLoader.load(dir.resolve("xlsx"));
        assertEquals(a.analyteNames(), b.analyteNames());
        for (String analyte : a.analyteNames()) {
            AnalyteColumn ca = a.analyte(analyte).orElseThrow();
            AnalyteColumn cb = b.analyte(analyte).orElseThrow();
            for (int r = 0; r < a.samples().size(); r++) {
                assertEquals(a.samples().id(r), b.samples().id(r));
                assertEquals(ca.value(r), cb.value(r), analyte + " row " + r);
                assertEquals(ca.method(r), cb.method(r));
                assertEquals(ca.selectionReason(r), cb.selectionReason(r));
            }
        }
        assertEquals(a.samples().batch(0).id(), b.samples().batch(0).id());
        assertEquals(a.files().get(0).rowsRead(), b.files().get(0).rowsRead());
    }

    @Test
    void aBatchFileIsReadBeforeItsReassayFileSoPositionsAreTheBatchs() throws IOException {
        Files.createDirectories(dir.resolve("lab"));
        Files.writeString(dir.resolve("lab/J-1.csv"), "Job: J-1\nsample_id,Au_ppm_FA-AAS\nA1,0.2\nA2,>10\n");
        Files.writeString(dir.resolve("lab/J-1-GRAV.csv"), "Job: J-1\nsample_id,Au_ppm_FA-GRAV\nA2,12.2\n");
        Project p = ProjectLoader.load(dir);
        assertEquals(List.of("lab/J-1.csv", "lab/J-1-GRAV.csv"), p.files().stream().map(FileAccount::file).toList());
        int a2 = p.samples().rowOf("A2").orElseThrow();
        assertEquals(2, p.samples().position(a2));
        assertEquals("lab/J-1.csv", p.samples().batch(a2).file());
        assertEquals(12.2, p.analyte("Au").orElseThrow().number(a2), 0.0);
    }

    private static void assertListed(DataIssue.Severity severity, String file, long line, String sample, String text) {
        boolean found = project.exceptions().all().stream().anyMatch(i -> i.severity() == severity
                && i.where().file().equals(file) && i.where().line() == line && i.sampleId().equals(sample)
                && i.problem().contains(text));
        assertTrue(found, () -> "no " + severity + " at " + file + ":" + line + " for '" + sample + "' with '" + text
                + "' among:\n" + project.exceptions().all().stream().map(DataIssue::message)
                .collect(Collectors.joining("\n")));
    }

    private static FileAccount account(String file) {
        return project.files().stream().filter(f -> f.file().equals(file)).findFirst().orElseThrow();
    }

    private static int row(String id) {
        return project.samples().rowOf(id).orElseThrow();
    }

    @SuppressWarnings("unused")
    private static Map<String, Integer> methods(String analyte) {
        return project.analyte(analyte).orElseThrow().reportedMethodCounts();
    }
}
