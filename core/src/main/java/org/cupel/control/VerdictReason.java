package org.cupel.control;

/**
 * Why a batch is not a plain pass: one control result that warned, failed or could not be judged.
 *
 * @param sampleId the control sample
 * @param position its position in the batch
 * @param role "CRM", "blank", ...
 * @param analyte analyte name
 * @param verdict that result's verdict
 * @param rule the rule that decided it
 * @param reason one sentence
 */
public record VerdictReason(String sampleId, int position, String role, String analyte, Verdict verdict,
                            String rule, String reason) {
}
