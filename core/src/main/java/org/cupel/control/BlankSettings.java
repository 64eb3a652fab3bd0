package org.cupel.control;

import java.util.Map;

/**
 * How blanks are judged, bound from the config section {@code blanks}. A blank fails above
 * {@code failMultiple} × the method's detection limit and warns above {@code warnMultiple} × (defaults 5
 * and 3: common practice; some use 10 for failure). An absolute threshold per analyte replaces the
 * multiples for that analyte. A failing blank counts as probable carry-over when the sample before it
 * in the batch assayed at least {@code highGradeMultiple} × the failure threshold.
 *
 * <pre>
 * blanks:
 *   failMultiple: 5
 *   warnMultiple: 3
 *   highGradeMultiple: 10
 *   absolute:
 *     Cu: {fail: 50, warn: 30}
 * </pre>
 *
 * @param failMultiple failure threshold as a multiple of the detection limit
 * @param warnMultiple warning threshold as a multiple of the detection limit
 * @param highGradeMultiple preceding grade, as a multiple of the failure threshold, that makes a failing
 *     blank a probable carry-over case
 * @param absolute absolute thresholds in the analyte's unit, by analyte name
 */
public record BlankSettings(double failMultiple, double warnMultiple, double highGradeMultiple,
                            Map<String, AbsoluteLimits> absolute) {

    public static final BlankSettings DEFAULTS = new BlankSettings(5, 3, 10, Map.of());

    public BlankSettings {
        if (!(failMultiple > 0) || !(warnMultiple > 0) || warnMultiple > failMultiple) {
            throw new IllegalArgumentException("blanks: need 0 < warnMultiple <= failMultiple, got warnMultiple "
                    + warnMultiple + " and failMultiple " + failMultiple);
        }
        if (!(highGradeMultiple > 0)) {
            throw new IllegalArgumentException("blanks: highGradeMultiple must be positive, got " + highGradeMultiple);
        }
        absolute = absolute == null ? Map.of() : Map.copyOf(absolute);
    }

    /**
     * An absolute blank threshold for one analyte.
     *
     * @param fail fail above this value
     * @param warn warn above this value; {@code null} for no warning level
     */
    public record AbsoluteLimits(double fail, Double warn) {
        public AbsoluteLimits {
            if (!(fail > 0) || (warn != null && !(warn > 0 && warn <= fail))) {
                throw new IllegalArgumentException("blanks.absolute: need 0 < warn <= fail, got fail " + fail
                        + " and warn " + warn);
            }
        }
    }

    /**
     * The thresholds for one blank result.
     *
     * @param analyte analyte name
     * @param detectionLimit the method's detection limit, {@code NaN} when unknown
     * @return the thresholds, or empty when they cannot be set (no absolute value and no detection limit)
     */
    public java.util.Optional<BlankThreshold> thresholdFor(String analyte, double detectionLimit) {
        AbsoluteLimits abs = absolute.get(analyte);
        if (abs != null) {
            double warn = abs.warn() == null ? abs.fail() : abs.warn();
            return java.util.Optional.of(new BlankThreshold(warn, abs.fail(), "absolute " + org.cupel.assay.Numbers
                    .compact(abs.fail()), "absolute " + org.cupel.assay.Numbers.compact(warn)));
        }
        if (!(detectionLimit > 0)) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(new BlankThreshold(warnMultiple * detectionLimit, failMultiple * detectionLimit,
                org.cupel.assay.Numbers.compact(failMultiple) + "×DL",
                org.cupel.assay.Numbers.compact(warnMultiple) + "×DL"));
    }

    /** A builder holding {@link #DEFAULTS}: {@code BlankSettings.withDefaults().someSetting(value).build()}. */
    public static Builder withDefaults() {
        return DEFAULTS.toBuilder();
    }

    /** A builder holding these settings, to change some of them. */
    public Builder toBuilder() {
        return new Builder(this);
    }

    /**
     * Sets any of the settings, each named as its record component; {@link #build} checks them together, as the
     * config does, so the order of the calls does not matter.
     */
    public static final class Builder {
        private double failMultiple;
        private double warnMultiple;
        private double highGradeMultiple;
        private Map<String, AbsoluteLimits> absolute;

        private Builder(BlankSettings s) {
            failMultiple = s.failMultiple();
            warnMultiple = s.warnMultiple();
            highGradeMultiple = s.highGradeMultiple();
            absolute = s.absolute();
        }

        public Builder failMultiple(double value) {
            failMultiple = value;
            return this;
        }

        public Builder warnMultiple(double value) {
            warnMultiple = value;
            return this;
        }

        public Builder highGradeMultiple(double value) {
            highGradeMultiple = value;
            return this;
        }

        public Builder absolute(Map<String, AbsoluteLimits> value) {
            absolute = value;
            return this;
        }

        /** @throws org.cupel.config.SettingException or IllegalArgumentException for a value out of range */
        public BlankSettings build() {
            return new BlankSettings(failMultiple, warnMultiple, highGradeMultiple, absolute);
        }
    }
}
