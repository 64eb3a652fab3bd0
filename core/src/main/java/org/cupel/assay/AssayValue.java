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
 * @param decimals how many decimals the lab wrote for {@code value} ({@code 0.070}: 3), so that the value
 *     is shown as written; {@link Numbers#UNKNOWN_DECIMALS} when not known (a computed value, a code, a
 *     number in exponent notation, a conversion by a factor other than a power of ten)
 */
public record AssayValue(Qualifier qualifier, double value, double limit, MissingReason missingReason,
                         int decimals) {

    public AssayValue {
        if (qualifier == null || missingReason == null) {
            throw new IllegalArgumentException("qualifier and missingReason are required");
        }
        if (qualifier == Qualifier.MISSING) {
            value = Double.NaN;
            decimals = Numbers.UNKNOWN_DECIMALS;
        } else if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("a non-missing assay value must be finite: " + value);
        }
        if (decimals < Numbers.UNKNOWN_DECIMALS) {
            throw new IllegalArgumentException("decimals must be 0 or more, or unknown (-1): " + decimals);
        }
    }

    /** A value whose written decimals are not known. */
    public AssayValue(Qualifier qualifier, double value, double limit, MissingReason missingReason) {
        this(qualifier, value, limit, missingReason, Numbers.UNKNOWN_DECIMALS);
    }

    public static AssayValue detected(double value, double detectionLimit) {
        return new AssayValue(Qualifier.DETECTED, value, detectionLimit, MissingReason.NONE);
    }

    /** The same value as written with {@code decimals} decimals. */
    public AssayValue withDecimals(int decimals) {
        return decimals == this.decimals ? this : new AssayValue(qualifier, value, limit, missingReason, decimals);
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

    /**
     * The same value expressed after multiplying value and limit by {@code factor} (unit change); the
     * written decimals move with a power of ten and become unknown with any other factor.
     */
    public AssayValue scaled(double factor) {
        if (isMissing()) {
            return this;
        }
        return new AssayValue(qualifier, value * factor, limit * factor, missingReason,
                Numbers.decimalsAfterScaling(decimals, factor));
    }

    /**
     * The value as the lab wrote it: {@code 0.070} (with the lab's decimals when known, else the shortest
     * form {@code 0.07}), {@code <0.005}, {@code >10}, or the reason.
     */
    public String display() {
        switch (qualifier) {
            case DETECTED: return number();
            case BELOW_DETECTION: return "<" + number();
            case ABOVE_UPPER_LIMIT: return ">" + number();
            default: return missingReason.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
        }
    }

    /** The number alone (value, or the censoring limit) as the lab wrote it; empty when missing. */
    public String number() {
        return isMissing() ? "" : Numbers.fixed(value, decimals);
    }
}
