package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.cupel.ingest.ProjectLoader;
import org.cupel.project.Project;
import org.junit.jupiter.api.Test;

class AnalyteCensoringTest {

    @Test
    void messyProjectLimitsCountsAndMethods() {
        Project p = ProjectLoader.load(Path.of(System.getProperty("cupel.testdata", "../testdata"), "fixtures",
                "ingest", "messy-project"));
        List<AnalyteCensoring> all = AnalyteCensoring.of(p, CensoredSettings.DEFAULTS);
        AnalyteCensoring au = all.get(0);
        assertEquals("Au (g/t)", au.analyteLabel());
        // From the fixture's detection-limit row: 0.005 (FA-AAS) and 0.05 (FA-GRAV).
        assertEquals(List.of(0.005, 0.05), au.detectionLimits());
        // MX1004 ">10" by FA-AAS was superseded by its gravimetric 14.37, so no over-limit is reported.
        assertTrue(au.upperLimits().isEmpty());
        assertEquals(0, au.above());
        // FA-GRAV > FA-AAS (cupel.yaml): MX1001, MX1004, MX1005 have both, MX1016 only the gravimetric result.
        assertEquals(4, au.methodCounts().get("FA-GRAV"));
        assertEquals(au.values(), au.methodCounts().values().stream().mapToInt(Integer::intValue).sum());
        assertEquals(p.analyteNames().size(), all.size());
    }

    @Test
    void sampleReadFromTheColumnEqualsTheSampleOfItsValues() {
        Project p = ProjectLoader.load(Path.of(System.getProperty("cupel.testdata", "../testdata"), "fixtures",
                "ingest", "messy-project"));
        int[] rows = p.samples().rowsWithRole(org.cupel.assay.QcRole.ROUTINE);
        for (org.cupel.assay.AnalyteColumn column : p.analytes().values()) {
            List<org.cupel.assay.AssayValue> values = java.util.Arrays.stream(rows).mapToObj(column::value).toList();
            CensoredSample direct = CensoredSample.of(column, rows);
            CensoredSample viaValues = CensoredSample.of(values);
            assertEquals(viaValues.size(), direct.size());
            assertEquals(viaValues.missingCount(), direct.missingCount());
            for (int i = 0; i < direct.size(); i++) {
                assertEquals(viaValues.kind(i), direct.kind(i));
                assertEquals(viaValues.lower(i), direct.lower(i), 0);
                assertEquals(viaValues.upper(i), direct.upper(i), 0);
            }
        }
    }
}
