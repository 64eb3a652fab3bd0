package org.cupel.recovery;

/** What a pairwise comparison of two conditions allows one to say. */
public enum ComparisonVerdict {
    /** The Holm-adjusted Welch test rejects equal means at α and the TOST does not show equivalence. */
    DIFFERENT("different"),
    /** The TOST shows the difference lies within ± the margin. */
    EQUIVALENT("equivalent"),
    /** Neither: the replicates are too few or too scattered to decide. */
    CANNOT_TELL("cannot tell with this many replicates");

    private final String label;

    ComparisonVerdict(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
