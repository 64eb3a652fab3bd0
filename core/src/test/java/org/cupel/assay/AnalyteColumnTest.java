package org.cupel.assay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;

class AnalyteColumnTest {
    private static final Analyte AU = new Analyte("Au", GradeUnit.G_PER_T);

    @Test
    void rowsWithoutResultAreMissingNotAnalysed() {
        AnalyteColumn.Builder b = AnalyteColumn.builder(AU);
        b.add(1, new MethodValue("FA-AAS", AssayValue.detected(0.5), null));
        AnalyteColumn col = b.build(3, MethodSelector.FIRST);
        assertEquals(Qualifier.MISSING, col.qualifier(0));
        assertEquals(MissingReason.NOT_ANALYSED, col.value(2).missingReason());
        assertEquals(0.5, col.number(1));
        assertEquals("FA-AAS", col.method(1));
    }

    @Test
    void severalResultsKeepEveryCandidateWithTheChosenFirst() {
        AnalyteColumn.Builder b = AnalyteColumn.builder(AU);
        MethodValue aas = new MethodValue("FA-AAS", AssayValue.aboveUpperLimit(10), null);
        MethodValue grav = new MethodValue("FA-GRAV", AssayValue.detected(14.2), null);
        b.add(0, aas);
        b.add(0, grav);
        MethodSelector preferDetected = (a, c) -> new MethodSelector.Selection(
                c.get(0).value().isDetected() ? 0 : 1, "in range beats censored");
        AnalyteColumn col = b.build(1, preferDetected);
        assertEquals(14.2, col.number(0));
        assertEquals(List.of(grav, aas), col.candidates(0));
        assertEquals("in range beats censored", col.selectionReason(0));
        assertEquals(Map.of("FA-GRAV", 1), col.reportedMethodCounts());
        assertTrue(col.rowsWithSeveralResults().length == 1);
    }
}
