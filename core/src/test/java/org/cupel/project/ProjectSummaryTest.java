package org.cupel.project;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.cupel.assay.QcRole;
import org.junit.jupiter.api.Test;

/** Expected figures are counted by hand from {@link SmallProject} (seven samples, three batches). */
class ProjectSummaryTest {
    private final ProjectSummary s = ProjectSummary.of(SmallProject.build());

    @Test
    void periodSkipsUndatedBatches() {
        assertEquals(Optional.of(LocalDate.of(2025, 3, 3)), s.firstReported());
        assertEquals(Optional.of(LocalDate.of(2025, 3, 10)), s.lastReported());
        assertEquals(1, s.undatedBatches());
    }

    @Test
    void countsSamplesByRoleOverallAndPerBatch() {
        assertEquals(7, s.samples());
        assertEquals(3, s.samplesByRole().get(QcRole.ROUTINE));
        assertEquals(2, s.samplesByRole().get(QcRole.BLANK));
        assertEquals(1, s.samplesByRole().get(QcRole.CRM));
        assertEquals(1, s.samplesByRole().get(QcRole.PULP_DUPLICATE));
        assertEquals(0, s.samplesByRole().get(QcRole.UMPIRE));
        assertEquals(QcRole.values().length, s.samplesByRole().size());
        assertEquals(List.of(3, 2, 2), s.batches().stream().map(ProjectSummary.BatchCount::samples).toList());
        assertEquals(1, s.batches().get(1).samplesByRole().get(QcRole.PULP_DUPLICATE));
        int sum = s.batches().stream().mapToInt(ProjectSummary.BatchCount::samples).sum();
        assertEquals(s.samples(), sum);
    }

    @Test
    void labsAreDistinctAndSorted() {
        assertEquals(List.of("North Lab", "South Lab"), s.labs());
    }

    @Test
    void methodsAndDetectionLimitsOfReportedValues() {
        ProjectSummary.AnalyteSummary au = s.analytes().get(0);
        assertEquals("g/t", au.unit());
        // S4's reported value is the gravimetric one; the over-range FA-AAS candidate is not reported.
        assertEquals(Map.of("FA-AAS", 3, "FA-GRAV", 2), au.reportedByMethod());
        assertEquals(List.of(0.005), au.detectionLimitsByMethod().get("FA-AAS"));
        assertEquals(List.of(0.05), au.detectionLimitsByMethod().get("FA-GRAV"));
        assertEquals(1, au.belowDetection());
        assertEquals(2, au.missing());
    }
}
