package org.cupel.duplicates;

/** Why a pair is left out of a measure. Counts of each are always reported. */
public enum ExclusionReason {
    MISSING_VALUE("a member has no value"),
    BELOW_DETECTION("a member is below detection"),
    ABOVE_UPPER_LIMIT("a member is above the method's upper limit"),
    NOT_POSITIVE("a member is zero or negative"),
    BELOW_LIMIT_MULTIPLE("pair mean below the detection-limit multiple (relative measures only)");

    private final String label;

    ExclusionReason(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
