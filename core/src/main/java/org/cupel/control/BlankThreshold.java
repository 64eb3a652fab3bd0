package org.cupel.control;

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
     * Relative slack in the comparison: reported values are short decimals, and 5 × 0.01 need not equal
     * the double nearest 0.05, so a value equal to a level at printed precision is not "above" it.
     */
    static final double RELATIVE_SLACK = 1e-9;

    public boolean aboveFail(double value) {
        return value > fail * (1 + RELATIVE_SLACK);
    }

    public boolean aboveWarn(double value) {
        return value > warn * (1 + RELATIVE_SLACK);
    }
}
