package org.cupel.control.crm;

import java.util.List;

/**
 * A rule violation named by sample, for tables and JSON.
 *
 * @param rule rule id
 * @param description what the rule looks for
 * @param source where it was published
 * @param action what it did to the result (warn or fail)
 * @param crm CRM code (for R₄s, the CRM of the signalling result)
 * @param analyte analyte name
 * @param sampleId the result that completes the pattern
 * @param batchId its batch
 * @param involved every sample ID of the pattern, in order
 */
public record RuleFinding(String rule, String description, String source, RuleAction action, String crm,
                          String analyte, String sampleId, String batchId, List<String> involved) {
    public RuleFinding {
        involved = List.copyOf(involved);
    }
}
