package org.cupel.control;

import org.cupel.assay.LimitComparison;

/**
 * The warning and failure levels in force for one blank result, in the analyte's unit. A result
 * exceeds a level only when it is strictly above it: a blank reported at exactly 5×DL passes the 5×DL
 * rule (common practice: "fail above 5× DL").
 *
 * @param warn warn above this value (equal to {@code fail} when there is no separate warning level)
 * @param fail fail above this value
 * @param failRule label of the failure rule ("5×DL", "absolute 0.05")
 * @param warnRule label of the warning rule
 */
public record BlankThreshold(double warn, double fail, String failRule, String warnRule) {

    /**
     * Whether {@code value} is above the failure level. Reported values are short decimals and 3 × 0.1 is
     * not the double nearest 0.3, so the comparison is {@link LimitComparison#above}: a value equal to the
     * level at printed precision is not above it.
     */
    public boolean aboveFail(double value) {
        return LimitComparison.above(value, fail);
    }

    /** Whether {@code value} is above the warning level, compared as {@link #aboveFail}. */
    public boolean aboveWarn(double value) {
        return LimitComparison.above(value, warn);
    }
}
