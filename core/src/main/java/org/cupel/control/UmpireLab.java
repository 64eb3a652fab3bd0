package org.cupel.control;

import java.util.List;

/**
 * The batches of one umpire lab: check assays of samples that the primary lab assayed first. They are
 * judged by comparing the two labs' results (the umpire duplicate set), not as batches of the drilling
 * programme, so they are counted apart from the primary batches.
 *
 * @param lab the umpire lab's name (may be empty when the files do not name it)
 * @param batches the verdicts of its batches, from their own control samples if they hold any, in table order
 * @param checkAssays umpire checks in those batches
 */
public record UmpireLab(String lab, List<BatchVerdict> batches, int checkAssays) {
    public UmpireLab {
        batches = List.copyOf(batches);
    }
}
