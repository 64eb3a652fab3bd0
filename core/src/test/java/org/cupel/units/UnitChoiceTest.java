package org.cupel.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The reporting unit follows the lab files' own unit word: the configured unit, else the only one, else the
 * unit of most results (first read wins a tie). Counts are hand-made.
 */
class UnitChoiceTest {

    private static <K, V> Map<K, V> ordered(K k1, V v1, K k2, V v2) {
        Map<K, V> m = new LinkedHashMap<>();
        m.put(k1, v1);
        m.put(k2, v2);
        return m;
    }

    @Test
    void theMajorityOfResultsDecides() {
        UnitChoice c = UnitChoice.of("Au", null, ordered(GradeUnit.PPM, 24, GradeUnit.G_PER_T, 10),
                ordered(GradeUnit.PPM, 100L, GradeUnit.G_PER_T, 800L));
        assertEquals(GradeUnit.G_PER_T, c.unit(), "10 files with 800 results outweigh 24 files with 100");
        assertEquals(UnitChoice.Basis.MAJORITY, c.basis());
        assertEquals("Au is reported in g/t, the unit most results are written in: 24 files (100 results) ppm, "
                + "10 files (800 results) g/t; the numbers are equal in these units (1 g/t = 1 ppm), only the label "
                + "differs. Set ingest.units in cupel.yaml to choose another.", c.sentence());
    }

    @Test
    void aTieGoesToTheUnitReadFirst() {
        UnitChoice c = UnitChoice.of("Ag", null, ordered(GradeUnit.PPM, 1, GradeUnit.G_PER_T, 1),
                ordered(GradeUnit.PPM, 5L, GradeUnit.G_PER_T, 5L));
        assertEquals(GradeUnit.PPM, c.unit());
    }

    @Test
    void theConfiguredUnitWins() {
        UnitChoice c = UnitChoice.of("Au", GradeUnit.PPB, Map.of(GradeUnit.G_PER_T, 3), Map.of(GradeUnit.G_PER_T, 90L));
        assertEquals(GradeUnit.PPB, c.unit());
        assertEquals(UnitChoice.Basis.CONFIGURED, c.basis());
        assertTrue(c.sentence().contains("values in other units are converted to ppb"), c.sentence());
    }

    @Test
    void oneUnitNeedsNoExplanation() {
        UnitChoice c = UnitChoice.of("Cu", null, Map.of(GradeUnit.PERCENT, 4), Map.of(GradeUnit.PERCENT, 400L));
        assertEquals(UnitChoice.Basis.ONLY_UNIT, c.basis());
        assertEquals("Cu is reported in %, the unit of every lab file.", c.sentence());
    }
}
