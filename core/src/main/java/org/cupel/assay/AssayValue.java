package org.cupel.assay;

/**
 * One reported assay value, never a bare double: statistics receive these and decide how to treat
 * censoring. Values are in the unit of their {@link Analyte}.
 *
 * @param qualifier what the number means
 * @param value the measured value when {@link Qualifier#DETECTED}; the censoring limit when censored
 *     (so {@code <0.005} has value 0.005); {@code NaN} when missing
 * @param limit the detection limit (for detected and below-detection values) or the upper limit (for
 *     above-limit values) when known, else {@code NaN}
 * @param missingReason why there is no value; {@link MissingReason#NONE} unless missing
 */
public record AssayValue(Qualifier qualifier, double value, double limit, MissingReason missingReason) {

    public AssayValue {
        if (qualifier == null || missingReason == null) {
            throw new IllegalArgumentException("qualifier and missingReason are required");
        }
        if (qualifier == Qualifier.MISSING) {
            value = Double.NaN;
        } else if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("a non-missing assay value must be finite: " + value);
        }
    }

    public static AssayValue detected(double value, double detectionLimit) {
        return new AssayValue(Qualifier.DETECTED, value, detectionLimit, MissingReason.NONE);
    }

    public static AssayValue detected(double value) {
        return detected(value, Double.NaN);
    }

    public static AssayValue belowDetection(double detectionLimit) {
        return new AssayValue(Qualifier.BELOW_DETECTION, detectionLimit, detectionLimit, MissingReason.NONE);
    }

    public static AssayValue aboveUpperLimit(double upperLimit) {
        return new AssayValue(Qualifier.ABOVE_UPPER_LIMIT, upperLimit, upperLimit, MissingReason.NONE);
    }

    public static AssayValue missing(MissingReason reason) {
        return new AssayValue(Qualifier.MISSING, Double.NaN, Double.NaN, reason);
    }

    public boolean isDetected() {
        return qualifier == Qualifier.DETECTED;
    }

    public boolean isCensored() {
        return qualifier.isCensored();
    }

    public boolean isMissing() {
        return qualifier == Qualifier.MISSING;
    }

    /** The same value expressed after multiplying value and limit by {@code factor} (unit change). */
    public AssayValue scaled(double factor) {
        if (isMissing()) {
            return this;
        }
        return new AssayValue(qualifier, value * factor, limit * factor, missingReason);
    }

    /** The value as a lab would print it: {@code 1.23}, {@code <0.005}, {@code >10}, or the reason. */
    public String display() {
        switch (qualifier) {
            case DETECTED: return Numbers.compact(value);
            case BELOW_DETECTION: return "<" + Numbers.compact(value);
            case ABOVE_UPPER_LIMIT: return ">" + Numbers.compact(value);
            default: return missingReason.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
        }
    }
}
