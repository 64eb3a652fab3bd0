package org.cupel.control;

/**
 * How often one kind of QC sample was inserted.
 *
 * @param role QC role label ("CRM", "blank", "field duplicate")
 * @param count samples of that role
 * @param total all samples in the batch (or project), the denominator
 * @param rate count ÷ total; {@code NaN} when total is 0
 * @param target target rate; 0 when there is none
 * @param belowTarget rate below a positive target
 */
public record InsertionRate(String role, int count, int total, double rate, double target, boolean belowTarget) {

    /** "1 in 20", or "none". */
    public String oneIn() {
        return count == 0 ? "none" : "1 in " + org.cupel.assay.Numbers.significant((double) total / count, 3);
    }
}
