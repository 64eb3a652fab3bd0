package org.cupel.control;

import java.util.List;

/**
 * Insertion rates of one batch (or of the whole project).
 *
 * @param batch batch ID, or "all batches"
 * @param nSamples all samples
 * @param nRoutine routine samples
 * @param rates one per QC role, in role order
 * @param belowTarget some role is below its target
 */
public record BatchInsertion(String batch, int nSamples, int nRoutine, List<InsertionRate> rates,
                             boolean belowTarget) {
    public BatchInsertion {
        rates = List.copyOf(rates);
    }
}
