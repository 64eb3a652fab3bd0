package org.cupel.control.crm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.cupel.config.CupelConfig;
import org.cupel.project.CrmCatalog;
import org.cupel.project.CrmCertificate;
import org.cupel.project.InputException;
import org.cupel.project.Project;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CrmResultsFileTest {
    private static final CrmCatalog CATALOG = new CrmCatalog(List.of(
            new CrmCertificate("MID", "Au", GradeUnit.G_PER_T, 2.50, 0.10, Double.NaN, Double.NaN, "")));

    @Test
    void readsResultsInDateOrderAndConvertsTheCertificateToTheColumnUnit(@TempDir Path dir) throws IOException {
        Path f = Files.writeString(dir.resolve("r.csv"), "crm,batch,position,date,Au_ppb\n"
                + "MID,J2,3,2025-03-10,2610\nMID,J1,7,2025-03-03,2480\n");
        Project p = CrmResultsFile.read(f, CATALOG, CupelConfig.defaults());
        SeriesReview s = CrmReview.of(p).series("MID", "Au").orElseThrow();
        assertEquals(List.of("J1", "J2"), s.results().stream().map(r -> r.point().batchId()).toList());
        // 2.50 g/t = 2500 ppb exactly (GradeUnit: 1 ppb = 0.001 g/t); z = (2610 − 2500)/100 = 1.1.
        assertEquals(2500, s.limits().certified(), 1e-9);
        assertEquals(1.1, s.results().get(1).z(), 1e-9);
    }

    @Test
    void badInputNamesFileLineAndColumn(@TempDir Path dir) throws IOException {
        Path noCrm = Files.writeString(dir.resolve("a.csv"), "sample,Au_ppm\nS1,1.0\n");
        InputException e = assertThrows(InputException.class,
                () -> CrmResultsFile.read(noCrm, CATALOG, CupelConfig.defaults()));
        assertTrue(e.getMessage().contains("no CRM column"), e.getMessage());
        Path badPos = Files.writeString(dir.resolve("b.csv"), "crm,position,Au_ppm\nMID,first,2.5\n");
        e = assertThrows(InputException.class, () -> CrmResultsFile.read(badPos, CATALOG, CupelConfig.defaults()));
        assertTrue(e.getMessage().contains("b.csv:2:2: position 'first' is not a whole number"), e.getMessage());
    }
}
