package org.cupel.units;

import java.util.Locale;
import java.util.Optional;

/**
 * Units of grade (mass fraction) that assay labs report, with exact conversion to grams per tonne.
 *
 * <p>Factors: 1 g/t = 1 ppm by mass = 1 mg/kg = 1 µg/g; 1 ppb = 0.001 g/t; 1 % = 10 000 g/t.
 * Ounces are troy ounces of 31.1034768 g, tons are the short ton of 907.18474 kg and the long ton of
 * 1016.0469088 kg (NIST Handbook 44, 2024, Appendix C, "General Tables of Units of Measurement"), so
 * 1 oz/short ton = 31.1034768 g / 0.90718474 t = 240/7 g/t exactly and 1 oz/long ton = 1500/49 g/t.
 */
public enum GradeUnit {
    PPB("ppb", 1e-3),
    PPM("ppm", 1.0),
    G_PER_T("g/t", 1.0),
    MG_PER_KG("mg/kg", 1.0),
    PERCENT("%", 1e4),
    OZ_PER_SHORT_TON("oz/st", 240.0 / 7.0),
    OZ_PER_LONG_TON("oz/lt", 1500.0 / 49.0);

    /** Mass of one troy ounce in grams (NIST Handbook 44, Appendix C). */
    public static final double TROY_OUNCE_GRAMS = 31.1034768;
    /** Mass of one short ton in kilograms (NIST Handbook 44, Appendix C). */
    public static final double SHORT_TON_KG = 907.18474;
    /** Mass of one long ton in kilograms (NIST Handbook 44, Appendix C). */
    public static final double LONG_TON_KG = 1016.0469088;

    private final String symbol;
    private final double gramsPerTonne;

    GradeUnit(String symbol, double gramsPerTonne) {
        this.symbol = symbol;
        this.gramsPerTonne = gramsPerTonne;
    }

    /** The short symbol used in tables and on chart axes. */
    public String symbol() {
        return symbol;
    }

    /** How many g/t one unit of this grade is. */
    public double gramsPerTonne() {
        return gramsPerTonne;
    }

    /** Converts {@code value} expressed in this unit into {@code target}. */
    public double convert(double value, GradeUnit target) {
        if (target == this) {
            return value;
        }
        return value * (gramsPerTonne / target.gramsPerTonne);
    }

    /**
     * Recognises the spellings labs put in column headers: {@code ppb}, {@code ppm}, {@code g/t},
     * {@code gpt}, {@code g_t}, {@code mg/kg}, {@code %}, {@code pct}, {@code opt}, {@code oz/t},
     * {@code oz/st}, {@code oz/ton}, {@code oz/lt}. Case-insensitive.
     */
    public static Optional<GradeUnit> parse(String token) {
        if (token == null) {
            return Optional.empty();
        }
        String t = token.strip().toLowerCase(Locale.ROOT).replace(" ", "");
        switch (t) {
            case "ppb": case "µg/kg": case "ug/kg": case "ng/g":
                return Optional.of(PPB);
            case "ppm": case "µg/g": case "ug/g":
                return Optional.of(PPM);
            case "g/t": case "gpt": case "g_t": case "gt": case "g/tonne": case "g/mt":
                return Optional.of(G_PER_T);
            case "mg/kg": case "mgkg": case "mg_kg":
                return Optional.of(MG_PER_KG);
            case "%": case "pct": case "percent": case "wt%":
                return Optional.of(PERCENT);
            case "opt": case "oz/t": case "oz/st": case "oz/ton": case "oz/shortton": case "ozpt":
                return Optional.of(OZ_PER_SHORT_TON);
            case "oz/lt": case "oz/longton":
                return Optional.of(OZ_PER_LONG_TON);
            default:
                return Optional.empty();
        }
    }
}
