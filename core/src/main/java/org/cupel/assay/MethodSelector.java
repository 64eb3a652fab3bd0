package org.cupel.assay;

import java.util.List;

/**
 * Picks the reported value when a sample has several results for one analyte (re-assays, other
 * finishes). Every candidate stays in the data; only the choice is made here.
 */
@FunctionalInterface
public interface MethodSelector {

    /** The choice and the reason shown to the user ("in range beats censored", ...). */
    record Selection(int index, String reason) {
    }

    Selection select(Analyte analyte, List<MethodValue> candidates);

    /** Keeps the first result read; used when no rule is configured and in tests. */
    MethodSelector FIRST = (analyte, candidates) -> new Selection(0, "first result read");
}
