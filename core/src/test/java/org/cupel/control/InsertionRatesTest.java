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
        // 2 CRMs per 34 routine samples = 0.0588 (1 in 17): above the 0.05 target.
        assertEquals(2.0 / 34, crm.rate(), 1e-15);
        assertFalse(crm.belowTarget());
        assertEquals("1 in 17", crm.oneIn());
        InsertionRate field = bj.rates().get(2);
        assertEquals(1.0 / 34, field.rate(), 1e-15);
        assertTrue(field.belowTarget());
        assertEquals(0, bj.rates().get(3).count());
        assertTrue(bj.rates().get(3).belowTarget());
        assertFalse(bj.rates().get(5).belowTarget()); // lab repeats: no target by default

        // K: 1 CRM per 19 routine samples = 0.0526: not below; no blank: below.
        BatchInsertion bk = r.batches().get(1);
        assertFalse(bk.rates().get(0).belowTarget());
        assertTrue(bk.rates().get(1).belowTarget());

        BatchInsertion all = r.overall();
        assertEquals(60, all.nSamples());
        assertEquals(53, all.nRoutine());
        assertEquals(3.0 / 53, all.rates().get(0).rate(), 1e-15);
        assertEquals(2, r.belowTarget().size());
    }

    @Test
    void exactlyOneInTwentyIsOnTarget() {
        // 1 CRM per 20 routine samples: 1.0 / 20 rounds to the same double as the 0.05 target, so it is on
        // target, not below it (common practice: "about 1 in 20").
        SampleTable t = new Sequences().batch("J", "R".repeat(20) + "C").table();
        InsertionRate crm = InsertionRates.compute(t, InsertionSettings.DEFAULTS).batches().get(0).rates().get(0);
        assertFalse(crm.belowTarget());
        assertEquals("1 in 20", crm.oneIn());
    }

    @Test
    void batchWithoutRoutineSamplesHasNoRate() {
        SampleTable t = new Sequences().batch("J", "CB").table();
        InsertionRate crm = InsertionRates.compute(t, InsertionSettings.DEFAULTS).batches().get(0).rates().get(0);
        assertTrue(Double.isNaN(crm.rate()));
        assertFalse(crm.belowTarget());
    }

    @Test
    void zeroTargetsFlagNothing() {
        SampleTable t = new Sequences().batch("J", "RRRR").table();
        InsertionRates r = InsertionRates.compute(t, InsertionSettings.withDefaults().crm(0).blank(0)
                .fieldDuplicate(0).coarseDuplicate(0).pulpDuplicate(0).labRepeat(0).umpire(0).build());
        assertFalse(r.batches().get(0).belowTarget());
    }
}
