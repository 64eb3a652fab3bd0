package org.cupel.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Mass units against NIST SP 811 (2008), Appendix B.8 (kilogram, gram, milligram, metric ton = 1000 kg). */
class MassUnitTest {

    @Test
    void siMultiples() {
        assertEquals(1e-3, MassUnit.MILLIGRAM.toGrams(1), 0.0);
        assertEquals(1.0, MassUnit.GRAM.toGrams(1), 0.0);
        assertEquals(1000.0, MassUnit.KILOGRAM.toGrams(1), 0.0);
        assertEquals(1e6, MassUnit.TONNE.toGrams(1), 0.0);
    }

    /**
     * The assay ton is defined so that 1 mg of bead from 1 AT of ore reads as 1 troy oz per short ton:
     * 1 AT = 1 short ton / 1 troy oz * 1 mg = 907184.74 g / 31.1034768 g * 1 mg = 29.1667 g (to the 4
     * decimals in use). Tolerance 5e-5 g: the constant is given to 4 decimals.
     */
    @Test
    void assayTonFollowsFromTheTroyOunceAndShortTonOfNistHandbook44() {
        double exact = GradeUnit.SHORT_TON_KG * 1000.0 / GradeUnit.TROY_OUNCE_GRAMS * 1e-3;
        assertEquals(exact, MassUnit.ASSAY_TON.toGrams(1), 5e-5);
    }
}
