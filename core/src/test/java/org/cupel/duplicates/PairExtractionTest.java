package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.cupel.assay.Analyte;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodSelector;
import org.cupel.assay.MethodValue;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.cupel.config.CupelConfig;
import org.cupel.project.CrmCatalog;
import org.cupel.project.CrmCertificate;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.Project;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;

class PairExtractionTest {
    private static final Analyte AU = new Analyte("Au", GradeUnit.G_PER_T);

    static Project project() {
        Batch job = new Batch("J1", "Lab", null, "lab.csv");
        SampleTable.Builder t = SampleTable.builder();
        SourceLocation src = new SourceLocation("lab.csv", 2, 0);
        AnalyteColumn.Builder au = AnalyteColumn.builder(AU);
        int s1 = t.add("S1", job, 1, QcRole.ROUTINE, "", src);
        int d1 = t.add("D1", job, 2, QcRole.PULP_DUPLICATE, "S1", src);
        int s2 = t.add("S2", job, 3, QcRole.ROUTINE, "", src);
        int u2 = t.add("U2", job, 4, QcRole.UMPIRE, "S2", src);
        int d9 = t.add("D9", job, 5, QcRole.FIELD_DUPLICATE, "S99", src);
        int dx = t.add("DX", job, 6, QcRole.COARSE_DUPLICATE, "", src);
        au.add(s1, new MethodValue("FA", AssayValue.detected(1.00, 0.01), null));
        au.add(d1, new MethodValue("FA", AssayValue.detected(1.10, 0.01), null));
        au.add(s2, new MethodValue("FA", AssayValue.detected(2.00, 0.01), null));
        au.add(u2, new MethodValue("FA", AssayValue.belowDetection(0.01), null));
        au.add(d9, new MethodValue("FA", AssayValue.detected(0.5, 0.01), null));
        au.add(dx, new MethodValue("FA", AssayValue.detected(0.5, 0.01), null));
        SampleTable samples = t.build();
        return new Project("test", null, CupelConfig.defaults(), samples,
                Map.of("Au", au.build(samples.size(), MethodSelector.FIRST)),
                new CrmCatalog(List.of(new CrmCertificate("C1", "Au", GradeUnit.G_PER_T, 2.5, 0.1, Double.NaN,
                        Double.NaN, ""))), new ExceptionRegister(), List.of());
    }

    @Test
    void pairsDuplicatesWithTheirOriginalsAndReportsOrphans() {
        PairExtraction.Extracted e = PairExtraction.extract(project(), project().analyte("Au").orElseThrow());
        assertEquals(2, e.pairs().size());
        DuplicatePair pulp = e.pairs().get(0);
        assertEquals("D1", pulp.id());
        assertEquals("S1", pulp.originalId());
        assertEquals(1.0, pulp.original().value());
        assertEquals(1.1, pulp.duplicate().value());
        assertEquals(QcRole.UMPIRE, e.pairs().get(1).type());
        assertEquals(2, e.orphans().size());
        assertTrue(e.orphans().get(0).reason().contains("S99"));
        assertTrue(e.orphans().get(1).reason().contains("no original"));
    }

    @Test
    void precisionGradesDefaultToCrmGrades() {
        assertEquals(2.5, PairExtraction.grades(project(), "Au", DuplicateSettings.DEFAULTS)[0]);
        List<DuplicateReport> reports = PairExtraction.analyse(project(), DuplicateSettings.DEFAULTS);
        assertEquals(1, reports.size());
        assertEquals(2, reports.get(0).sets().size());
        assertEquals(2, reports.get(0).orphans().size());
    }

    @Test
    void settingsBindFromTheConfigSection() {
        CupelConfig c = CupelConfig.fromYaml("duplicates:\n  pulpHardLimitPercent: 15\n  limitMultipleOfDetection: 5\n",
                "cupel.yaml");
        DuplicateSettings s = c.section("duplicates", DuplicateSettings.class, DuplicateSettings.DEFAULTS);
        assertEquals(0.15, s.hardLimit(QcRole.PULP_DUPLICATE), 1e-15);
        assertEquals(5, s.limitMultipleOfDetection());
        assertEquals(0.30, s.hardLimit(QcRole.FIELD_DUPLICATE), 1e-15);
    }

    @Test
    void limitsMissingOnDetectedValuesComeFromTheLabsBelowDetectionValues() {
        Project p = project();
        AnalyteColumn.Builder au = AnalyteColumn.builder(AU);
        // Detected values without a stated limit; two <0.01 and one <0.02 by the same method: the mode is 0.01.
        au.add(0, new MethodValue("FA", AssayValue.detected(1.00), null));
        au.add(1, new MethodValue("FA", AssayValue.detected(1.10), null));
        au.add(2, new MethodValue("FA", AssayValue.belowDetection(0.01), null));
        au.add(3, new MethodValue("FA", AssayValue.belowDetection(0.01), null));
        au.add(4, new MethodValue("FA", AssayValue.belowDetection(0.02), null));
        AnalyteColumn col = au.build(p.samples().size(), MethodSelector.FIRST);
        DetectionLimits limits = DetectionLimits.of(col);
        PairExtraction.Extracted e = PairExtraction.extract(p, col, limits);
        assertEquals(0.01, e.pairs().get(0).original().limit());
        assertEquals(0.01, e.pairs().get(0).duplicate().limit());
        assertTrue(limits.describe().contains("FA 0.01"), limits.describe());
    }
}
