package org.cupel.recovery;

import java.util.Locale;

/** The three ways to state a smelt's recovery (common practice). */
public enum RecoveryDefinition {
    /** R = 1 − Σ metal in rejected products / metal in charge. */
    LOSS("by loss"),
    /** R = metal in collected products / metal in charge. */
    DIRECT("direct"),
    /** R = metal in collected products / metal in all products (against the calculated head). */
    CALCULATED("by calculated head");

    private final String label;

    RecoveryDefinition(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    public static RecoveryDefinition parse(String text) {
        switch (text == null ? "" : text.strip().toLowerCase(Locale.ROOT)) {
            case "loss": return LOSS;
            case "direct": return DIRECT;
            case "calculated": return CALCULATED;
            default: throw new IllegalArgumentException("recovery.definition must be loss, direct or calculated, not '"
                    + text + "'");
        }
    }
}
