package org.cupel.control;

/** The judgement on one control result, and on a batch as the worst of its control results. */
public enum Verdict {
    PASS,
    WARN,
    FAIL,
    /** The data cannot support a judgement (a blank whose detection limit is above the failure threshold). */
    CANNOT_JUDGE;

    /** The more severe of two verdicts: FAIL over WARN over CANNOT_JUDGE over PASS. */
    public Verdict worst(Verdict other) {
        return severity(this) >= severity(other) ? this : other;
    }

    private static int severity(Verdict v) {
        switch (v) {
            case FAIL: return 3;
            case WARN: return 2;
            case CANNOT_JUDGE: return 1;
            default: return 0;
        }
    }
}
