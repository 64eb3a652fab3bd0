package org.cupel.control;

import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.Objects;
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
 * <p>A value class rather than a record so that the explanation is written when it is read (a
 * million-sample project has half a million blank results, and only those that do not pass reach a table);
 * equality, hash and JSON read it like the other fields.
 */
@JsonPropertyOrder({"verdict", "rule", "explanation"})
public final class BlankVerdict {
    /** Which case of the rules applied; decides the explanation. */
    private enum Case {
        NO_THRESHOLD, DL_ABOVE_FAIL, BELOW_DETECTION, ABOVE_UPPER_FAIL, UPPER_BELOW_FAIL, FAIL, WARN, PASS
    }

    private final Verdict verdict;
    private final String rule;
    private final Case kind;
    private final AssayValue value;
    private final BlankThreshold threshold;
    private final String unit;

    private BlankVerdict(Verdict verdict, String rule, Case kind, AssayValue value, BlankThreshold threshold,
                         String unit) {
        this.verdict = verdict;
        this.rule = rule;
        this.kind = kind;
        this.value = value;
        this.threshold = threshold;
        this.unit = unit;
    }

    public static BlankVerdict judge(AssayValue value, BlankThreshold t, String unit) {
        if (t == null) {
            return new BlankVerdict(Verdict.CANNOT_JUDGE, "no blank threshold", Case.NO_THRESHOLD, value, null, unit);
        }
        switch (value.qualifier()) {
            case BELOW_DETECTION:
                if (t.aboveFail(value.value())) {
                    return new BlankVerdict(Verdict.CANNOT_JUDGE, "DL above blank threshold", Case.DL_ABOVE_FAIL,
                            value, t, unit);
                }
                return new BlankVerdict(Verdict.PASS, "blank ≤ " + t.failRule(), Case.BELOW_DETECTION, value, t, unit);
            case ABOVE_UPPER_LIMIT:
                if (t.aboveFail(value.value())) {
                    return new BlankVerdict(Verdict.FAIL, "blank > " + t.failRule(), Case.ABOVE_UPPER_FAIL, value, t,
                            unit);
                }
                return new BlankVerdict(Verdict.CANNOT_JUDGE, "blank above upper limit", Case.UPPER_BELOW_FAIL, value,
                        t, unit);
            case DETECTED:
                if (t.aboveFail(value.value())) {
                    return new BlankVerdict(Verdict.FAIL, "blank > " + t.failRule(), Case.FAIL, value, t, unit);
                }
                if (t.aboveWarn(value.value())) {
                    return new BlankVerdict(Verdict.WARN, "blank > " + t.warnRule(), Case.WARN, value, t, unit);
                }
                return new BlankVerdict(Verdict.PASS, "blank ≤ " + t.warnRule(), Case.PASS, value, t, unit);
            default:
                throw new IllegalArgumentException("a missing blank result cannot be judged; filter it first");
        }
    }

    /** The judgement. */
    @JsonProperty
    public Verdict verdict() {
        return verdict;
    }

    /** The rule that decided it ("blank > 5×DL"). */
    @JsonProperty
    public String rule() {
        return rule;
    }

    /** Why, in words, without the sample ID. */
    @JsonProperty
    public String explanation() {
        switch (kind) {
            case NO_THRESHOLD:
                return "detection limit unknown and no absolute threshold set (blanks.absolute)";
            case DL_ABOVE_FAIL:
                return "reported " + value.display() + ": detection limit above the failure threshold " + fail();
            case BELOW_DETECTION:
                return "below detection (" + value.display() + "), at most its limit";
            case ABOVE_UPPER_FAIL:
                return "reported " + value.display() + ", above the failure threshold " + fail();
            case UPPER_BELOW_FAIL:
                return "reported " + value.display() + ": the upper limit is below the failure threshold " + fail();
            case FAIL:
                return value.display() + " " + unit + " is above the failure threshold " + fail();
            case WARN:
                return value.display() + " " + unit + " is above the warning threshold "
                        + Numbers.compact(threshold.warn()) + " " + unit;
            default:
                return value.display() + " " + unit + " is within the warning threshold "
                        + Numbers.compact(threshold.warn()) + " " + unit;
        }
    }

    private String fail() {
        return Numbers.compact(threshold.fail()) + " " + unit;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof BlankVerdict b && verdict == b.verdict && rule.equals(b.rule)
                && explanation().equals(b.explanation());
    }

    @Override
    public int hashCode() {
        return Objects.hash(verdict, rule, explanation());
    }

    @Override
    public String toString() {
        return "BlankVerdict[verdict=" + verdict + ", rule=" + rule + ", explanation=" + explanation() + "]";
    }
}
