package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.MissingReason;
import org.cupel.project.Project;
import org.junit.jupiter.api.Test;

/**
 * The text a lab writes for a result it could not give ("IS", "NR") is kept beside the reason it maps to, so
 * that the re-submission list can quote the lab's own code. Expected values are the cells written here.
 */
class MissingCodeTest extends InFolderTest {

    @Test
    void theLabsCodeIsKeptAsWrittenForAMissingResult() {
        folder.write("lab/a.csv", "Sample ID,Batch,Au_ppm,Ag_ppm\n"
                + "S1,J1,0.5,1.2\n"
                + "S2,J1, IS ,I.S.\n"
                + "S3,J1,NR,4.5\n"
                + "S4,J1,,2.0\n"
                + "S5,J1,N/A,3.0\n");
        Project p = ProjectLoader.load(tmp);
        AnalyteColumn au = p.analytes().get("Au");
        AnalyteColumn ag = p.analytes().get("Ag");
        int s1 = row(p, "S1");
        int s2 = row(p, "S2");
        int s3 = row(p, "S3");
        assertEquals("", au.missingCode(s1), "a measured value has no code");
        // The cell " IS " is kept without its surrounding spaces, as the lab wrote it otherwise.
        assertEquals("IS", au.missingCode(s2));
        assertEquals(MissingReason.INSUFFICIENT_SAMPLE, au.value(s2).missingReason());
        assertEquals("I.S.", ag.missingCode(s2));
        assertEquals("NR", au.missingCode(s3));
        assertEquals(MissingReason.NOT_RECEIVED, au.value(s3).missingReason());
        assertEquals("", ag.missingCode(s3));
        assertEquals("", au.missingCode(row(p, "S4")), "a blank cell is no result and has no code");
        assertEquals("N/A", au.missingCode(row(p, "S5")));
    }

    @Test
    void aReassayThatGaveAValueDropsTheCodeOfTheFirstResult() {
        // S2 was reported IS by FA-AAS and re-assayed by FA-GRAV with a value: the value is reported, so there
        // is no missing code to quote.
        folder.write("lab/a.csv", "Sample ID,Batch,Au_ppm_FA-AAS\nS1,J1,0.5\nS2,J1,IS\n");
        folder.write("lab/b.csv", "Sample ID,Batch,Au_ppm_FA-GRAV\nS2,J2,0.61\n");
        Project p = ProjectLoader.load(tmp);
        AnalyteColumn au = p.analytes().get("Au");
        int s2 = row(p, "S2");
        assertEquals(0.61, au.number(s2), 0.0);
        assertEquals("", au.missingCode(s2));
    }

    private static int row(Project p, String id) {
        return p.samples().rowOf(id).orElseThrow();
    }
}
