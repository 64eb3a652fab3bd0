package org.cupel.units;

import java.util.Locale;
import java.util.Optional;

/** Units of mass for charges and smelt products, with exact factors to grams. */
public enum MassUnit {
    MILLIGRAM("mg", 1e-3),
    GRAM("g", 1.0),
    KILOGRAM("kg", 1e3),
    TONNE("t", 1e6),
    /** The assay ton, 29.1667 g, chosen so that mg of bead per assay ton reads as oz per short ton. */
    ASSAY_TON("AT", 29.1667);

    private final String symbol;
    private final double grams;

    MassUnit(String symbol, double grams) {
        this.symbol = symbol;
        this.grams = grams;
    }

    public String symbol() {
        return symbol;
    }

    /** Converts {@code value} in this unit to grams. */
    public double toGrams(double value) {
        return value * grams;
    }

    public static Optional<MassUnit> parse(String token) {
        if (token == null) {
            return Optional.empty();
        }
        switch (token.strip().toLowerCase(Locale.ROOT)) {
            case "mg": return Optional.of(MILLIGRAM);
            case "g": case "gram": case "grams": return Optional.of(GRAM);
            case "kg": return Optional.of(KILOGRAM);
            case "t": case "tonne": case "tonnes": return Optional.of(TONNE);
            case "at": case "assay ton": return Optional.of(ASSAY_TON);
            default: return Optional.empty();
        }
    }
}
