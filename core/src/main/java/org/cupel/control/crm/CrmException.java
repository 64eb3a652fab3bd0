package org.cupel.control.crm;

/**
 * A CRM result that cannot be judged and is listed instead of passed: a censored value, an unknown CRM
 * code, or a result not received.
 *
 * @param row row in the sample table
 * @param sampleId submitted sample ID
 * @param batchId lab batch
 * @param crm the CRM code as given
 * @param analyte analyte name
 * @param found the value as reported
 * @param rule short label: "censored CRM result", "unknown CRM code", "no CRM result"
 * @param problem one sentence: why it cannot be judged and what to do
 */
public record CrmException(int row, String sampleId, String batchId, String crm, String analyte, String found,
                           String rule, String problem) {
}
