package org.cupel.control.crm;

import java.time.LocalDate;
import org.cupel.assay.AssayValue;

/**
 * One reported CRM result in series order.
 *
 * @param row row in the project's sample table
 * @param sampleId submitted sample ID
 * @param batchId lab batch
 * @param batchOrder rank of the batch in time order (date, then order read), from 0
 * @param date batch date, {@code null} when unknown
 * @param position position in the batch sequence
 * @param value the reported value, in the analyte's unit
 */
public record CrmPoint(int row, String sampleId, String batchId, int batchOrder, LocalDate date, int position,
                       AssayValue value) {
}
