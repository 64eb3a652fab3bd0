package org.cupel.control;

/**
 * The judgement on one control sample (a CRM or blank result) for one analyte, in the common form the
 * batch verdicts and re-assay lists consume.
 *
 * @param row the sample's row in the project's {@link org.cupel.assay.SampleTable}
 * @param analyte analyte name
 * @param verdict pass / warn / fail / cannot judge
 * @param rule the rule or check that decided it ("1-3s", "2-2s", "blank > 5×DL", "probable swap with CRM X")
 * @param reason one plain sentence for the report ("AUR-12 Au 2.71 g/t is 3.4 SD above certified 2.50")
 * @param triggersReassay whether this outcome puts routine samples on the re-assay list
 */
public record ControlOutcome(int row, String analyte, Verdict verdict, String rule, String reason,
                             boolean triggersReassay) {
}
