package org.cupel.control;

import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.Objects;
import java.util.function.Supplier;

/**
 * The judgement on one control sample (a CRM or blank result) for one analyte, in the common form the
 * batch verdicts and re-assay lists consume.
 *
 * <p>A value class rather than a record so that the reason can be written when it is read: a
 * million-sample project has a million control outcomes, and only the few that do not pass ever reach a
 * table. The reason is the same text whenever it is asked for; equality, hash and JSON read it like the
 * other fields.
 */
@JsonPropertyOrder({"row", "analyte", "verdict", "rule", "reason", "triggersReassay"})
public final class ControlOutcome {
    private final int row;
    private final String analyte;
    private final Verdict verdict;
    private final String rule;
    private final Supplier<String> reason;
    private final boolean triggersReassay;

    /**
     * @param row the sample's row in the project's {@link org.cupel.assay.SampleTable}
     * @param analyte analyte name
     * @param verdict pass / warn / fail / cannot judge
     * @param rule the rule or check that decided it ("1-3s", "2-2s", "blank > 5×DL", "probable swap with CRM X")
     * @param reason one plain sentence for the report ("AUR-12 Au 2.71 g/t is 3.4 SD above certified 2.50")
     * @param triggersReassay whether this outcome puts routine samples on the re-assay list
     */
    public ControlOutcome(int row, String analyte, Verdict verdict, String rule, String reason,
                          boolean triggersReassay) {
        this(row, analyte, verdict, rule, () -> reason, triggersReassay);
    }

    private ControlOutcome(int row, String analyte, Verdict verdict, String rule, Supplier<String> reason,
                   boolean triggersReassay) {
        this.row = row;
        this.analyte = analyte;
        this.verdict = verdict;
        this.rule = rule;
        this.reason = reason;
        this.triggersReassay = triggersReassay;
    }

    /** An outcome whose reason {@code reason} writes on demand (it must give the same text each time). */
    public static ControlOutcome described(int row, String analyte, Verdict verdict, String rule,
                                           Supplier<String> reason, boolean triggersReassay) {
        return new ControlOutcome(row, analyte, verdict, rule, reason, triggersReassay);
    }

    @JsonProperty
    public int row() {
        return row;
    }

    @JsonProperty
    public String analyte() {
        return analyte;
    }

    @JsonProperty
    public Verdict verdict() {
        return verdict;
    }

    @JsonProperty
    public String rule() {
        return rule;
    }

    @JsonProperty
    public String reason() {
        return reason.get();
    }

    @JsonProperty
    public boolean triggersReassay() {
        return triggersReassay;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ControlOutcome c && row == c.row && triggersReassay == c.triggersReassay
                && analyte.equals(c.analyte) && verdict == c.verdict && rule.equals(c.rule)
                && reason().equals(c.reason());
    }

    @Override
    public int hashCode() {
        return Objects.hash(row, analyte, verdict, rule, reason(), triggersReassay);
    }

    @Override
    public String toString() {
        return "ControlOutcome[row=" + row + ", analyte=" + analyte + ", verdict=" + verdict + ", rule=" + rule
                + ", reason=" + reason() + ", triggersReassay=" + triggersReassay + "]";
    }
}
