package org.cupel.assay;

/** What a reported number means: a measurement, a censoring bound, or no value at all. */
public enum Qualifier {
    /** A measured value at or above the detection limit. */
    DETECTED,
    /** Below detection: the true value lies between 0 and the stated limit ({@code <0.005}). */
    BELOW_DETECTION,
    /** Above the method's upper range: the true value exceeds the stated limit ({@code >10}). */
    ABOVE_UPPER_LIMIT,
    /** No value: not received, insufficient sample, not analysed, or a blank cell. */
    MISSING;

    public boolean isCensored() {
        return this == BELOW_DETECTION || this == ABOVE_UPPER_LIMIT;
    }
}
