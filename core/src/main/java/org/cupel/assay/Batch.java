package org.cupel.assay;

import java.time.LocalDate;

/**
 * A lab batch (job, certificate): the unit the lab returns and the QA geologist judges.
 *
 * @param id the lab's job or certificate number
 * @param lab the lab's name (may be empty when unknown)
 * @param reported the date the results were reported or received; {@code null} when unknown
 * @param file the file the batch was read from
 */
public record Batch(String id, String lab, LocalDate reported, String file) {
    public Batch {
        lab = lab == null ? "" : lab;
    }
}
