package org.cupel.recovery;

/** The caution printed with every recovery output. */
final class SafetyCaution {
    /**
     * Hazards of fire assay and smelting; the regulations named are examples (US), not a complete list.
     */
    public static final String TEXT = "Caution: fire assay and smelting are hazardous. Litharge and other lead "
            + "compounds are toxic and lead fume is given off, especially at cupellation; molten metal and slag "
            + "burn, and explode into steam when poured into wet or damp moulds; furnaces radiate intense heat; "
            + "fluxes raise silica dust; parting uses nitric acid; some ores release arsenic, antimony, selenium "
            + "or mercury. In the US, lead exposure is regulated by 29 CFR 1910.1025 and respirable crystalline "
            + "silica by 29 CFR 1910.1053, as examples. Always follow local regulations and licensed, supervised "
            + "laboratory practice; this software gives no safety advice.";

    private SafetyCaution() {
    }
}
