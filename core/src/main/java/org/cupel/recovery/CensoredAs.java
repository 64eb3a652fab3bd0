package org.cupel.recovery;

import org.cupel.assay.AssayValue;

/**
 * Which value a below-detection product assay takes in a calculation. The analysis runs both and says
 * whether the conclusion changes: the true metal lies between the two.
 */
public enum CensoredAs {
    /** The censored assay counts as its detection limit: the most metal it can hold. */
    LIMIT,
    /** The censored assay counts as zero: the least metal it can hold. */
    ZERO;

    /** The number to use for {@code v} (not missing); above-limit values count as their limit either way. */
    public double valueOf(AssayValue v) {
        if (v.qualifier() == org.cupel.assay.Qualifier.BELOW_DETECTION) {
            return this == LIMIT ? v.value() : 0;
        }
        return v.value();
    }
}
