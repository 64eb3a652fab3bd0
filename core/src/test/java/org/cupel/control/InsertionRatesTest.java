package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.cupel.assay.SampleTable;
import org.junit.jupiter.api.Test;

/**
 * Insertion-rate arithmetic. Targets: about 1 in 20 each for CRMs, blanks and duplicates (common
 * practice).
 */
class InsertionRatesTest {

    @Test
    void ratesPerBatchAndOverall() {
        // J: 40 samples = 34 routine + 2 CRM + 2 blank + 1 field dup + 1 pulp dup.
        String j = "R".repeat(9) + "C" + "R".repeat(9) + "B" + "R".repeat(8) + "F" + "P" + "C" + "R".repeat(8) + "B";
        SampleTable t = new Sequences().batch("J", j).batch("K", "R".repeat(19) + "C").table();
        InsertionRates r = InsertionRates.compute(t, InsertionSettings.DEFAULTS);
        BatchInsertion bj = r.batches().get(0);
        assertEquals(40, bj.nSamples());
        assertEquals(34, bj.nRoutine());
        InsertionRate crm = bj.rates().get(0);
        // 2 / 40 = 0.05 exactly: at target, not below it.
        assertEquals(0.05, crm.rate(), 0);
        assertFalse(crm.belowTarget());
        assertEquals("1 in 20", crm.oneIn());
        InsertionRate field = bj.rates().get(2);
        assertEquals(0.025, field.rate(), 0);
        assertTrue(field.belowTarget());
        assertEquals(0, bj.rates().get(3).count());
        assertTrue(bj.rates().get(3).belowTarget());
        assertFalse(bj.rates().get(5).belowTarget()); // lab repeats: no target by default

        BatchInsertion all = r.overall();
        assertEquals(60, all.nSamples());
        assertEquals(3.0 / 60, all.rates().get(0).rate(), 1e-15);
        assertEquals(2, r.belowTarget().size());
    }

    @Test
    void zeroTargetsFlagNothing() {
        SampleTable t = new Sequences().batch("J", "RRRR").table();
        InsertionRates r = InsertionRates.compute(t, new InsertionSettings(0, 0, 0, 0, 0, 0, 0));
        assertFalse(r.batches().get(0).belowTarget());
    }
}
