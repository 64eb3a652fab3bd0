package org.cupel.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Grade unit factors against the definitions of NIST Handbook 44 (2024), Appendix C, "General Tables of
 * Units of Measurement" (1 troy ounce = 31.103 476 8 g; 1 short ton = 2000 lb = 907.184 74 kg; 1 long ton
 * = 2240 lb = 1016.046 908 8 kg) and NIST SP 811 (2008), "Guide for the Use of the International System of
 * Units", Appendix B (the same factors; mass fractions: 1 ppm by mass = 1 mg/kg = 1 g/t).
 */
class GradeUnitTest {
    /** 1e-12 relative: the factors are exact ratios; only double rounding differs. */
    private static final double REL = 1e-12;

    @Test
    void massConstantsAreTheNistDefinitions() {
        assertEquals(31.1034768, GradeUnit.TROY_OUNCE_GRAMS, 0.0);
        assertEquals(907.18474, GradeUnit.SHORT_TON_KG, 0.0);
        assertEquals(1016.0469088, GradeUnit.LONG_TON_KG, 0.0);
        // NIST HB 44 App. C defines both tons from the avoirdupois pound, 0.45359237 kg.
        assertEquals(2000 * 0.45359237, GradeUnit.SHORT_TON_KG, 1e-12);
        assertEquals(2240 * 0.45359237, GradeUnit.LONG_TON_KG, 1e-12);
    }

    @Test
    void ouncePerShortTonIs240Over7GramsPerTonne() {
        double fromDefinitions = GradeUnit.TROY_OUNCE_GRAMS / (GradeUnit.SHORT_TON_KG / 1000.0);
        assertEquals(240.0 / 7.0, fromDefinitions, 240.0 / 7.0 * REL);
        assertEquals(240.0 / 7.0, GradeUnit.OZ_PER_SHORT_TON.convert(1.0, GradeUnit.G_PER_T), 0.0);
    }

    @Test
    void ouncePerLongTonIs1500Over49GramsPerTonne() {
        double fromDefinitions = GradeUnit.TROY_OUNCE_GRAMS / (GradeUnit.LONG_TON_KG / 1000.0);
        assertEquals(1500.0 / 49.0, fromDefinitions, 1500.0 / 49.0 * REL);
        assertEquals(1500.0 / 49.0, GradeUnit.OZ_PER_LONG_TON.convert(1.0, GradeUnit.G_PER_T), 0.0);
    }

    @ParameterizedTest(name = "1 {0} = {2} {1}")
    @CsvSource({
        // SP 811: ppm by mass is mg/kg; 1 t = 1000 kg so 1 g/t = 1 mg/kg.
        "PPM, G_PER_T, 1", "MG_PER_KG, G_PER_T, 1", "PPB, PPM, 0.001", "PERCENT, PPM, 10000",
        "G_PER_T, PPB, 1000", "PERCENT, G_PER_T, 10000",
        // 1 oz/st in ppb: 240/7 * 1000
        "OZ_PER_SHORT_TON, PPB, 34285.714285714286",
        // oz/lt over oz/st = short ton / long ton = 2000/2240
        "OZ_PER_LONG_TON, OZ_PER_SHORT_TON, 0.8928571428571429"})
    void conversions(GradeUnit from, GradeUnit to, double expected) {
        assertEquals(expected, from.convert(1.0, to), Math.abs(expected) * REL);
    }

    @Test
    void conversionRoundTripsAreIdentityToRounding() {
        for (GradeUnit a : GradeUnit.values()) {
            for (GradeUnit b : GradeUnit.values()) {
                double v = 3.7;
                assertEquals(v, b.convert(a.convert(v, b), a), v * REL, a + " -> " + b);
            }
        }
    }

    @ParameterizedTest(name = "''{0}''")
    @CsvSource({"ppb, PPB", "PPM, PPM", "g/t, G_PER_T", "gpt, G_PER_T", "g_t, G_PER_T", "mg/kg, MG_PER_KG",
        "%, PERCENT", "pct, PERCENT", "opt, OZ_PER_SHORT_TON", "oz/t, OZ_PER_SHORT_TON", "oz/st, OZ_PER_SHORT_TON",
        "oz/lt, OZ_PER_LONG_TON"})
    void parsesLabSpellings(String token, GradeUnit unit) {
        assertEquals(unit, GradeUnit.parse(token).orElseThrow());
    }

    @Test
    void unknownUnitIsEmpty() {
        assertTrue(GradeUnit.parse("kg").isEmpty());
        assertTrue(GradeUnit.parse(null).isEmpty());
    }
}
