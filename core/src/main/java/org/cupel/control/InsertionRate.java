package org.cupel.control;

/**
 * How often one kind of QC sample was inserted.
 *
 * @param role QC role label ("CRM", "blank", "field duplicate")
 * @param count samples of that role
 * @param routine routine samples in the batch (or project), the denominator
 * @param rate count ÷ routine; {@code NaN} when there are no routine samples
 * @param target target rate; 0 when there is none
 * @param belowTarget rate below a positive target
 */
public record InsertionRate(String role, int count, int routine, double rate, double target, boolean belowTarget) {

    /** "1 in 20", or "none". */
    public String oneIn() {
        return count == 0 ? "none" : "1 in " + org.cupel.assay.Numbers.significant((double) routine / count, 3);
    }
}
