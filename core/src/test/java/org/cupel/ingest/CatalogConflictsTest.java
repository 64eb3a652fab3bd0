package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.cupel.project.DataIssue;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A later catalog row for the same CRM and analyte no longer loses silently (issue 15, item 11): a different
 * value gets a warning on the row in use and the later row is listed as left out, both naming both rows; a
 * plain repeat is listed as such.
 */
class CatalogConflictsTest {
    private static final String HEADER = "crm,analyte,unit,certified_value,sd,method\n";

    private static CatalogReader.Result read(Path dir, String body) throws IOException {
        Path f = Files.writeString(dir.resolve("crm-catalog.csv"), HEADER + body);
        return CatalogReader.read(f, "crm-catalog.csv", Map.of("Au", GradeUnit.parse("g/t").orElseThrow()));
    }

    @Test
    void aConflictingLaterCertificateIsWarnedAboutAndTheFirstIsUsed(@TempDir Path dir) throws IOException {
        CatalogReader.Result r = read(dir, "VHC-11,Au,g/t,0.412,0.018,FA-AAS\nVHC-23,Au,g/t,1.236,0.047,FA-AAS\n"
                + "VHC-11,Au,g/t,4.12,0.18,FA-AAS\n");
        assertEquals(0.412, r.catalog().find("VHC-11", "Au").orElseThrow().certifiedValue(), 0.0);
        assertEquals(1, r.rowsExcluded());
        List<DataIssue> issues = r.issues();
        assertEquals(2, issues.size(), issues.toString());
        String both = "crm-catalog.csv:2 gives 0.412 g/t (SD 0.018, FA-AAS) and crm-catalog.csv:4 gives 4.12 g/t "
                + "(SD 0.18, FA-AAS), 10× the first";
        DataIssue left = issues.get(0);
        assertEquals(DataIssue.Severity.EXCLUDED, left.severity());
        assertEquals("crm-catalog.csv:4", left.where().toString());
        assertEquals("VHC-11 Au is certified twice with different values: " + both + "; line 2 is used and this "
                + "row is left out", left.problem());
        DataIssue used = issues.get(1);
        assertEquals(DataIssue.Severity.WARNING, used.severity());
        assertEquals("crm-catalog.csv:2", used.where().toString());
        assertEquals("the certificate used for VHC-11 Au is in doubt: " + both + "; the VHC-11 results are judged "
                + "against line 2 until the catalog is corrected", used.problem());
        assertEquals("check the certificate and delete the wrong row of the catalog, or give the two materials "
                + "different CRM codes", used.fix());
    }

    @Test
    void theSameCertificateInAnotherUnitIsAPlainRepeat(@TempDir Path dir) throws IOException {
        // 0.412 g/t = 412 ppb and 0.018 g/t = 18 ppb (1 g/t = 1 ppm = 1000 ppb).
        CatalogReader.Result r = read(dir, "VHC-11,Au,g/t,0.412,0.018,FA-AAS\nVHC-11,Au,ppb,412,18,FA-AAS\n");
        assertEquals(1, r.issues().size());
        assertEquals(DataIssue.Severity.EXCLUDED, r.issues().get(0).severity());
        assertEquals("VHC-11 Au repeats the certificate on line 2; the repeat is left out",
                r.issues().get(0).problem());
    }
}
