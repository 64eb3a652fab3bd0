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
 * <p>A value class rather than a record so that the rule and explanation are written when they are read (a
 * million-sample project has half a million blank results, and only those that do not pass reach a table);
 * equality, hash and JSON read them like the verdict. The case that applied is a small number
 * ({@link #decide}), which a column of blank results keeps instead of the verdict.
 */
@JsonPropertyOrder({"verdict", "rule", "explanation"})
public final class BlankVerdict {
    /** Which case of the rules applied; decides the verdict, the rule and the explanation. */
    private enum Case {
        NO_THRESHOLD(Verdict.CANNOT_JUDGE), DL_ABOVE_FAIL(Verdict.CANNOT_JUDGE), BELOW_DETECTION(Verdict.PASS),
        ABOVE_UPPER_FAIL(Verdict.FAIL), UPPER_BELOW_FAIL(Verdict.CANNOT_JUDGE), FAIL(Verdict.FAIL),
        WARN(Verdict.WARN), PASS(Verdict.PASS);

        private final Verdict verdict;

        Case(Verdict verdict) {
            this.verdict = verdict;
        }
    }

    private static final Case[] CASES = Case.values();

    private final Case kind;
    private final AssayValue value;
    private final BlankThreshold threshold;
    private final String unit;

    private BlankVerdict(Case kind, AssayValue value, BlankThreshold threshold, String unit) {
        this.kind = kind;
        this.value = value;
        this.threshold = threshold;
        this.unit = unit;
    }

    public static BlankVerdict judge(AssayValue value, BlankThreshold t, String unit) {
        return new BlankVerdict(CASES[decide(value, t)], value, t, unit);
    }

    /**
     * Which case of the rules applies to {@code value} under {@code t}, as a small number for a column of
     * results; {@link #of} makes the verdict from it again.
     */
    static int decide(AssayValue value, BlankThreshold t) {
        if (t == null) {
            return Case.NO_THRESHOLD.ordinal();
        }
        switch (value.qualifier()) {
            case BELOW_DETECTION:
                return (t.aboveFail(value.value()) ? Case.DL_ABOVE_FAIL : Case.BELOW_DETECTION).ordinal();
            case ABOVE_UPPER_LIMIT:
                return (t.aboveFail(value.value()) ? Case.ABOVE_UPPER_FAIL : Case.UPPER_BELOW_FAIL).ordinal();
            case DETECTED:
                if (t.aboveFail(value.value())) {
                    return Case.FAIL.ordinal();
                }
                return (t.aboveWarn(value.value()) ? Case.WARN : Case.PASS).ordinal();
            default:
                throw new IllegalArgumentException("a missing blank result cannot be judged; filter it first");
        }
    }

    /** The verdict of case {@code decided} ({@link #decide}) on {@code value} under {@code t}. */
    static BlankVerdict of(int decided, AssayValue value, BlankThreshold t, String unit) {
        return new BlankVerdict(CASES[decided], value, t, unit);
    }

    /** The verdict of case {@code decided} ({@link #decide}). */
    static Verdict verdictOf(int decided) {
        return CASES[decided].verdict;
    }

    /** The rule of case {@code decided} ({@link #decide}) under {@code t}. */
    static String ruleOf(int decided, BlankThreshold t) {
        switch (CASES[decided]) {
            case NO_THRESHOLD: return "no blank threshold";
            case DL_ABOVE_FAIL: return "DL above blank threshold";
            case BELOW_DETECTION: return "blank ≤ " + t.failRule();
            case ABOVE_UPPER_FAIL: case FAIL: return "blank > " + t.failRule();
            case UPPER_BELOW_FAIL: return "blank above upper limit";
            case WARN: return "blank > " + t.warnRule();
            default: return "blank ≤ " + t.warnRule();
        }
    }

    /** The judgement. */
    @JsonProperty
    public Verdict verdict() {
        return kind.verdict;
    }

    /** The rule that decided it ("blank > 5×DL"). */
    @JsonProperty
    public String rule() {
        return ruleOf(kind.ordinal(), threshold);
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
        return o instanceof BlankVerdict b && verdict() == b.verdict() && rule().equals(b.rule())
                && explanation().equals(b.explanation());
    }

    @Override
    public int hashCode() {
        return Objects.hash(verdict(), rule(), explanation());
    }

    @Override
    public String toString() {
        return "BlankVerdict[verdict=" + verdict() + ", rule=" + rule() + ", explanation=" + explanation() + "]";
    }
}
