package org.cupel.control.crm;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The SD multiple in a CRM result's sentence: a result beyond a limit never reads as on it. */
class ResultWordingTest {

    /**
     * Demo VH0002450, VHC-23 Au 1.378 on 1.236 ± 0.047 (hand-worked): z = 0.142 / 0.047 = 3.0213, beyond the
     * 3 SD limit, so a 1-3s failure; it once read "3 SD above", as if on the limit.
     */
    @Test
    void justBeyondALimitShowsTwoDecimals() {
        assertEquals("3.02", ResultWording.sdMultiple((1.378 - 1.236) / 0.047));
    }

    /** 1.100 on 1.000 ± 0.050 gives z = 2.0000000000000018 in binary: on the limit, and read as such. */
    @Test
    void onALimitReadsAsTheLimit() {
        assertEquals("2.00", ResultWording.sdMultiple((1.100 - 1.000) / 0.050));
        assertEquals("3.00", ResultWording.sdMultiple(3.0));
    }

    /** Far beyond the limits (a swapped CRM), three significant digits. */
    @Test
    void farOutThreeSignificantDigits() {
        assertEquals("82.3", ResultWording.sdMultiple(82.34));
        assertEquals("170", ResultWording.sdMultiple(170.4));
    }
}
