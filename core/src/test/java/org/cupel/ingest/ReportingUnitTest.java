package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import org.cupel.assay.AnalyteColumn;
import org.cupel.project.Project;
import org.cupel.units.GradeUnit;
import org.cupel.units.UnitChoice;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The reporting unit of an analyte is the unit word its lab files use; when they disagree, the unit of most
 * results (issue 17: gold in g/t when the files say g/t). Values in another unit are converted, their
 * written decimals moving with a power of ten, and the catalog follows. Hand-made files, hand-worked values.
 */
class ReportingUnitTest {

    @Test
    void theUnitOfMostResultsIsReportedAndTheOthersConverted(@TempDir Path dir) {
        ProjectFolder p = new ProjectFolder(dir);
        // Read first (name order): one result in ppm. Then three results in ppb.
        p.write("lab/A-1.csv", "Sample ID,Au_ppm_FA-AAS\nS1,0.070\n");
        p.write("lab/A-2.csv", "Sample ID,Au_ppb_FA-AAS\nS2,70\nS3,<5\nS4,1250\n");
        p.write("crm-catalog.csv", "crm,analyte,unit,certified_value,sd\nC1,Au,g/t,1.236,0.047\n");
        Project project = ProjectLoader.load(dir);
        AnalyteColumn au = project.analyte("Au").orElseThrow();
        assertEquals(GradeUnit.PPB, au.analyte().unit(), "three results in ppb against one in ppm");
        assertEquals(UnitChoice.Basis.MAJORITY, project.units().get("Au").basis());
        int s1 = project.samples().row("S1", 0);
        // 0.070 ppm = 70 ppb: the three decimals move by three places to none.
        assertEquals(70, au.number(s1), 1e-12);
        assertEquals("70", au.value(s1).display());
        assertEquals("<5", au.value(project.samples().row("S3", 0)).display());
        // 1.236 g/t = 1236 ppb, SD 0.047 g/t = 47 ppb.
        assertEquals("1236", project.catalog().find("C1", "Au").orElseThrow().valueText());
        assertEquals("47", project.catalog().find("C1", "Au").orElseThrow().sdText());
    }

    @Test
    void gramsPerTonneAndPpmDifferOnlyInTheLabel(@TempDir Path dir) {
        ProjectFolder p = new ProjectFolder(dir);
        p.write("lab/A-1.csv", "Sample ID,Au_ppm_FA-AAS\nS1,0.100\n");
        p.write("lab/A-2.csv", "Sample ID,Au_g/t_FA-AAS\nS2,0.317\nS3,1.20\n");
        Project project = ProjectLoader.load(dir);
        AnalyteColumn au = project.analyte("Au").orElseThrow();
        assertEquals("Au (g/t)", au.analyte().label());
        assertEquals("0.100", au.value(project.samples().row("S1", 0)).display());
        assertEquals("1.20", au.value(project.samples().row("S3", 0)).display());
    }

    @Test
    void theConfiguredUnitOverridesTheFiles(@TempDir Path dir) {
        ProjectFolder p = new ProjectFolder(dir);
        p.write("lab/A-1.csv", "Sample ID,Au_g/t_FA-AAS\nS1,0.100\nS2,0.2\n");
        p.write("cupel.yaml", "ingest:\n  units: {Au: ppm}\n");
        Project project = ProjectLoader.load(dir);
        assertEquals("Au (ppm)", project.analyte("Au").orElseThrow().analyte().label());
        assertEquals(UnitChoice.Basis.CONFIGURED, project.units().get("Au").basis());
    }
}
