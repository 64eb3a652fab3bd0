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

    @Test
    void theWrittenDecimalsAreKeptPerRow() {
        AnalyteColumn.Builder b = AnalyteColumn.builder(AU);
        b.add(0, new MethodValue("FA-AAS", AssayValue.detected(0.07).withDecimals(3), null));
        b.add(1, new MethodValue("FA-AAS", AssayValue.detected(0.07), null));
        AnalyteColumn col = b.build(3, MethodSelector.FIRST);
        assertEquals("0.070", col.value(0).display(), "as the lab wrote it");
        assertEquals(3, col.decimals(0));
        assertEquals("0.07", col.value(1).display(), "not known: the shortest form");
        assertEquals(-1, col.decimals(2), "a row without a result");
    }

    /**
     * Converting the collected results to another unit: ppb to g/t is a factor 1e-3, so 70 ppb written with
     * no decimals is 0.070 g/t written with three, and a candidate kept as an object converts the same way
     * (hand-worked: 70 × 0.001 = 0.07; 0 + 3 decimals).
     */
    @Test
    void convertingToAnotherUnitMovesValuesLimitsAndDecimals() {
        AnalyteColumn.Builder b = AnalyteColumn.builder(new Analyte("Au", GradeUnit.PPB));
        b.add(0, new MethodValue("FA-AAS", AssayValue.detected(70, 5).withDecimals(0), null));
        b.add(1, new MethodValue("FA-AAS", AssayValue.belowDetection(5).withDecimals(0), null));
        b.add(1, new MethodValue("FA-GRAV", AssayValue.detected(12.5).withDecimals(1), null));
        b.convertTo(GradeUnit.G_PER_T);
        AnalyteColumn col = b.build(2, MethodSelector.FIRST);
        assertEquals(GradeUnit.G_PER_T, col.analyte().unit());
        assertEquals(0.07, col.number(0), 1e-15);
        assertEquals(0.005, col.limit(0), 1e-15);
        assertEquals("0.070", col.value(0).display());
        assertEquals("<0.005", col.value(1).display());
        assertEquals("0.0125", col.candidates(1).get(1).value().display());
    }

    @Test
    void convertingBetweenEqualUnitsChangesOnlyTheLabel() {
        AnalyteColumn.Builder b = AnalyteColumn.builder(new Analyte("Au", GradeUnit.PPM));
        b.add(0, new MethodValue("FA-AAS", AssayValue.detected(0.07).withDecimals(3), null));
        b.convertTo(GradeUnit.G_PER_T);
        AnalyteColumn col = b.build(1, MethodSelector.FIRST);
        assertEquals("Au (g/t)", col.analyte().label());
        assertEquals(0.07, col.number(0), 0.0);
        assertEquals("0.070", col.value(0).display());
    }
}
