package org.cupel.censored;

/** How much is known about one observation of a {@link CensoredSample}. */
public enum Censoring {
    /** Measured: the value is known. */
    DETECTED,
    /** Left-censored: the value lies below the stated limit ({@code <0.005}). */
    BELOW,
    /** Right-censored: the value lies above the stated limit ({@code >10}). */
    ABOVE,
    /** Interval-censored: the value lies between two stated bounds (used by maximum likelihood only). */
    INTERVAL
}
