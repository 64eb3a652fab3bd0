package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.cupel.assay.Analyte;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MethodSelector.Selection;
import org.cupel.assay.MethodValue;
import org.cupel.assay.MissingReason;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;

/**
 * The selection rules (Cupel's documented rules; that an over-limit fire-assay AAS result is replaced by
 * a gravimetric finish, and a below-detection one by a lower-limit finish, is common practice).
 */
class MethodPriorityTest {
    private static final Analyte AU = new Analyte("Au", GradeUnit.G_PER_T);
    private final MethodPriority rules = new MethodPriority(Map.of("Au", List.of("FA-GRAV", "FA-AAS", "FA-ICP")));

    @Test
    void overLimitTakesTheOverLimitMethod() {
        Selection s = rules.select(AU, List.of(mv("FA-AAS", AssayValue.aboveUpperLimit(10)),
                mv("FA-GRAV", AssayValue.detected(14.4))));
        assertEquals(1, s.index());
        assertEquals("in range beats censored: over-limit >10 (FA-AAS) replaced by the over-limit method FA-GRAV",
                s.reason());
    }

    @Test
    void belowLimitTakesTheLowerLimitMethodEvenAgainstPriority() {
        // FA-GRAV ranks first, but its result is censored; the in-range FA-ICP result is reported.
        Selection s = new MethodPriority(Map.of()).select(AU, List.of(mv("FA-GRAV", AssayValue.belowDetection(0.05)),
                mv("FA-ICP", AssayValue.detected(0.012))));
        assertEquals(1, s.index());
        assertTrue(s.reason().contains("below-detection <0.05 (FA-GRAV) replaced by the lower-limit method FA-ICP"));
        assertEquals(1, rules.select(AU, List.of(mv("FA-GRAV", AssayValue.belowDetection(0.05)),
                mv("FA-ICP", AssayValue.detected(0.012)))).index());
    }

    @Test
    void tiesOfInRangeResultsGoByConfiguredPriority() {
        Selection s = rules.select(AU, List.of(mv("FA-AAS", AssayValue.detected(1.2)), mv("FA-ICP", AssayValue.detected(1.1)),
                mv("FA-GRAV", AssayValue.detected(1.25))));
        assertEquals(2, s.index());
        assertEquals("method priority for Au: FA-GRAV > FA-AAS > FA-ICP (reported FA-GRAV)", s.reason());
    }

    @Test
    void unlistedMethodsComeAfterListedOnes() {
        assertEquals(1, rules.select(AU, List.of(mv("XRF", AssayValue.detected(1)), mv("FA-ICP", AssayValue.detected(2))))
                .index());
    }

    @Test
    void equalPriorityKeepsTheFirstRead() {
        Selection s = rules.select(AU, List.of(mv("FA-AAS", AssayValue.detected(1.2)), mv("FA-AAS", AssayValue.detected(1.3))));
        assertEquals(0, s.index());
        assertTrue(s.reason().startsWith("first result read"));
    }

    @Test
    void allCensoredTakesTheMostInformativeBound() {
        assertEquals(1, rules.select(AU, List.of(mv("FA-AAS", AssayValue.aboveUpperLimit(10)),
                mv("FA-GRAV", AssayValue.aboveUpperLimit(1000)))).index());
        Selection s = rules.select(AU, List.of(mv("FA-AAS", AssayValue.belowDetection(0.01)),
                mv("FA-ICP", AssayValue.belowDetection(0.002))));
        assertEquals(1, s.index());
        assertTrue(s.reason().contains("lowest detection limit (<0.002)"));
    }

    @Test
    void aValueBeatsAMissingResult() {
        Selection s = rules.select(AU, List.of(mv("FA-GRAV", AssayValue.missing(MissingReason.INSUFFICIENT_SAMPLE)),
                mv("FA-AAS", AssayValue.detected(0.4))));
        assertEquals(1, s.index());
        assertEquals("the only result with a value (FA-AAS)", s.reason());
        assertEquals(0, rules.select(AU, List.of(mv("FA-GRAV", AssayValue.missing(MissingReason.NOT_RECEIVED)),
                mv("FA-AAS", AssayValue.missing(MissingReason.NOT_ANALYSED)))).index());
    }

    private static MethodValue mv(String method, AssayValue v) {
        return new MethodValue(method, v, null);
    }
}
