package org.cupel.control;

import org.cupel.assay.AssayValue;
import org.cupel.assay.Numbers;

/**
 * The threshold rules for one blank result (common practice for blanks in assay QC):
 * <ul>
 *   <li>detected value above the failure level: FAIL; above the warning level: WARN; else PASS. A value
 *       exactly at a level is not above it;</li>
 *   <li>below detection ({@code <L}): the true value is below L, so it is a PASS at its limit when L is at
 *       or below the failure level, and CANNOT_JUDGE when L is above the failure level (a pass cannot be
 *       claimed for a blank whose detection limit exceeds the threshold);</li>
 *   <li>above the upper limit ({@code >U}): FAIL when U is above the failure level, else CANNOT_JUDGE;</li>
 *   <li>no threshold (no detection limit and no absolute value): CANNOT_JUDGE.</li>
 * </ul>
 *
 * @param verdict the judgement
 * @param rule the rule that decided it ("blank > 5×DL")
 * @param explanation why, in words, without the sample ID
 */
public record BlankVerdict(Verdict verdict, String rule, String explanation) {

    public static BlankVerdict judge(AssayValue value, BlankThreshold t, String unit) {
        if (t == null) {
            return new BlankVerdict(Verdict.CANNOT_JUDGE, "no blank threshold",
                    "detection limit unknown and no absolute threshold set (blanks.absolute)");
        }
        String fail = Numbers.compact(t.fail()) + " " + unit;
        switch (value.qualifier()) {
            case BELOW_DETECTION:
                if (t.aboveFail(value.value())) {
                    return new BlankVerdict(Verdict.CANNOT_JUDGE, "DL above blank threshold",
                            "reported " + value.display() + ": detection limit above the failure threshold " + fail);
                }
                return new BlankVerdict(Verdict.PASS, "blank ≤ " + t.failRule(),
                        "below detection (" + value.display() + "), at most its limit");
            case ABOVE_UPPER_LIMIT:
                if (t.aboveFail(value.value())) {
                    return new BlankVerdict(Verdict.FAIL, "blank > " + t.failRule(),
                            "reported " + value.display() + ", above the failure threshold " + fail);
                }
                return new BlankVerdict(Verdict.CANNOT_JUDGE, "blank above upper limit",
                        "reported " + value.display() + ": the upper limit is below the failure threshold " + fail);
            case DETECTED:
                if (t.aboveFail(value.value())) {
                    return new BlankVerdict(Verdict.FAIL, "blank > " + t.failRule(),
                            value.display() + " " + unit + " is above the failure threshold " + fail);
                }
                if (t.aboveWarn(value.value())) {
                    return new BlankVerdict(Verdict.WARN, "blank > " + t.warnRule(),
                            value.display() + " " + unit + " is above the warning threshold "
                                    + Numbers.compact(t.warn()) + " " + unit);
                }
                return new BlankVerdict(Verdict.PASS, "blank ≤ " + t.warnRule(),
                        value.display() + " " + unit + " is within the warning threshold "
                                + Numbers.compact(t.warn()) + " " + unit);
            default:
                throw new IllegalArgumentException("a missing blank result cannot be judged; filter it first");
        }
    }
}
