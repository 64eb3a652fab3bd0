package org.cupel.control;

/**
 * The run of samples one failed control sends back.
 *
 * @param controlId the failed control sample
 * @param role "CRM", "blank", ...
 * @param batch its batch
 * @param analyte analyte
 * @param rule the rule it failed
 * @param fromPosition first position of the bracket (inclusive)
 * @param toPosition last position of the bracket (inclusive)
 * @param nSamples samples to re-assay in the bracket
 * @param note how the bracket was bounded ("passing CRM S-0040 before; end of batch after")
 */
public record ReassayBracket(String controlId, String role, String batch, String analyte, String rule,
                             int fromPosition, int toPosition, int nSamples, String note) {
}
