package org.cupel.recovery;

import java.util.Locale;
import java.util.Optional;

/** What a smelt product is for the balance: the metal collected, or metal lost to a rejected product. */
public enum ProductRole {
    /** Button, bead, bullion, doré: the product that carries the recovered metal. */
    COLLECTED,
    /** Slag, matte, speiss and any other rejected product. */
    LOSS;

    /** {@code collected} or {@code loss}, case-insensitive. */
    public static Optional<ProductRole> parse(String text) {
        if (text == null) {
            return Optional.empty();
        }
        switch (text.strip().toLowerCase(Locale.ROOT)) {
            case "collected": return Optional.of(COLLECTED);
            case "loss": return Optional.of(LOSS);
            default: return Optional.empty();
        }
    }

    /** The role a product's name implies: button, bead, bullion and doré are collected; the rest are losses. */
    public static ProductRole byName(String productName) {
        String n = productName.strip().toLowerCase(Locale.ROOT);
        return n.startsWith("button") || n.startsWith("bead") || n.startsWith("bullion") || n.startsWith("dore")
                || n.startsWith("doré") ? COLLECTED : LOSS;
    }
}
