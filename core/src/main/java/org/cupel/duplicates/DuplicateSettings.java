package org.cupel.duplicates;

import java.util.List;
import org.cupel.assay.Numbers;
import org.cupel.assay.QcRole;
import org.cupel.config.SettingException;

/**
 * Settings of the duplicate analysis, bound from the {@code duplicates} section of {@code cupel.yaml}.
 * The defaults are common practice in the trade, not the result of a published study, and reports say so.
 *
 * @param limitMultipleOfDetection pairs whose mean is below this multiple of the detection limit are left
 *     out of relative measures (default 10, common practice)
 * @param censoredAtHalfLimit when true, a below-detection member enters ratio measures at half its limit
 *     instead of removing the pair (default false)
 * @param acceptancePercent the share of pairs that must lie within the type's HARD limit (default 90)
 * @param fieldHardLimitPercent HARD limit of field duplicates, % (default 30, common practice)
 * @param coarseHardLimitPercent HARD limit of coarse-reject duplicates, % (default 20, common practice)
 * @param pulpHardLimitPercent HARD limit of pulp duplicates, % (default 10, common practice)
 * @param labRepeatHardLimitPercent HARD limit of lab repeats (pulp repeats in the same lab), % (default 10)
 * @param umpireHardLimitPercent HARD limit of umpire checks (pulps sent to a second lab), % (default 10)
 * @param thGroupSize pairs per Thompson–Howarth group (default 11, the group size of Thompson and Howarth 1978;
 *     recalled from memory, not re-checked in the paper)
 * @param thMinimumPairs fewest usable pairs for a precision model (default 50, common practice)
 * @param bootstrapResamples bootstrap resamples for intervals (default 1000)
 * @param bootstrapSeed seed of every bootstrap, so reruns give the same intervals (default 20240601)
 * @param bootstrapMaxPairs largest number of pairs a statistic is bootstrapped over (default 5000, at least
 *     1000); above it the RMS CV, σ₀, k and P_c get large-sample normal intervals instead, because the
 *     bootstrap's cost grows with pairs × resamples while at that size both intervals agree within the
 *     bootstrap's own Monte Carlo error (checked in {@code LargeSampleAgreementTest})
 * @param precisionGrades grades at which to state precision; empty means the project's CRM grades
 * @param batchTestAlpha significance level of the test of a batch's RMS CV against its set's (default 0.01)
 * @param batchRuleAlpha a batch fails the acceptance rule only when the one-sided binomial test of its share
 *     within the HARD limit against {@code acceptancePercent} gives p below this (default 0.05,
 *     {@link BatchRuleTest})
 */
public record DuplicateSettings(double limitMultipleOfDetection, boolean censoredAtHalfLimit,
                                double acceptancePercent, double fieldHardLimitPercent,
                                double coarseHardLimitPercent, double pulpHardLimitPercent,
                                double labRepeatHardLimitPercent, double umpireHardLimitPercent, int thGroupSize,
                                int thMinimumPairs, int bootstrapResamples, long bootstrapSeed,
                                int bootstrapMaxPairs, List<Double> precisionGrades, double batchTestAlpha,
                                double batchRuleAlpha) {

    /** Smallest allowed {@link #bootstrapMaxPairs()}: below it the normal approximation is not relied on. */
    public static final int LARGE_SAMPLE_MINIMUM = 1000;

    public static final DuplicateSettings DEFAULTS = new DuplicateSettings(10, false, 90, 30, 20, 10, 10, 10, 11,
            50, 1000, 20240601L, 5000, List.of(), 0.01, 0.05);

    /**
     * Most resamples allowed: 100 times the default. A thousand resamples serve percentile intervals (common
     * practice); more only cost time and memory, and a mistyped extra digit must not end in an out-of-memory
     * failure.
     */
    public static final int MAX_BOOTSTRAP_RESAMPLES = 100_000;

    public DuplicateSettings {
        if (bootstrapResamples < 100 || bootstrapResamples > MAX_BOOTSTRAP_RESAMPLES) {
            throw new SettingException(bootstrapResamples + " is outside 100 to " + MAX_BOOTSTRAP_RESAMPLES
                    + " resamples; write a whole number in that range (the default is 1000)", "bootstrapResamples");
        }
        requireHardLimit(fieldHardLimitPercent, "fieldHardLimitPercent");
        requireHardLimit(coarseHardLimitPercent, "coarseHardLimitPercent");
        requireHardLimit(pulpHardLimitPercent, "pulpHardLimitPercent");
        requireHardLimit(labRepeatHardLimitPercent, "labRepeatHardLimitPercent");
        requireHardLimit(umpireHardLimitPercent, "umpireHardLimitPercent");
        precisionGrades = precisionGrades == null ? List.of() : List.copyOf(precisionGrades);
        for (int i = 0; i < precisionGrades.size(); i++) {
            double g = precisionGrades.get(i);
            if (!(g > 0) || Double.isInfinite(g)) {
                throw new SettingException(Numbers.compact(g) + " is not a grade: precision is stated at positive "
                        + "grades, in the analyte's unit; correct the list", "precisionGrades", Integer.toString(i));
            }
        }
        if (!(limitMultipleOfDetection >= 0) || !(acceptancePercent > 0 && acceptancePercent <= 100)
                || thGroupSize < 3 || thMinimumPairs < thGroupSize * 2L || bootstrapResamples < 100
                || bootstrapMaxPairs < LARGE_SAMPLE_MINIMUM || !(batchTestAlpha > 0 && batchTestAlpha < 1)
                || !(batchRuleAlpha > 0 && batchRuleAlpha < 1)) {
            throw new IllegalArgumentException("duplicates settings out of range: limitMultipleOfDetection >= 0, "
                    + "0 < acceptancePercent <= 100, thGroupSize >= 3, thMinimumPairs >= 2 groups, "
                    + "bootstrapResamples >= 100, bootstrapMaxPairs >= " + LARGE_SAMPLE_MINIMUM
                    + ", 0 < batchTestAlpha < 1, 0 < batchRuleAlpha < 1");
        }
    }

    /** HARD is at most 100 % for values of one sign, so a limit outside 0 < limit <= 100 judges nothing. */
    private static void requireHardLimit(double percent, String key) {
        if (!(percent > 0 && percent <= 100)) {
            throw new SettingException(Numbers.compact(percent) + " % is not a HARD limit: write a percentage above 0 "
                    + "and at most 100 (common practice: 30 field, 20 coarse, 10 pulp)", key);
        }
    }

    /** Whether a statistic over {@code pairs} pairs gets the bootstrap interval (else the large-sample one). */
    public boolean bootstraps(int pairs) {
        return pairs <= bootstrapMaxPairs;
    }

    /** The HARD limit of a duplicate type as a fraction (0.10 for 10 %). */
    public double hardLimit(QcRole type) {
        switch (type) {
            case FIELD_DUPLICATE: return fieldHardLimitPercent / 100.0;
            case COARSE_DUPLICATE: return coarseHardLimitPercent / 100.0;
            case PULP_DUPLICATE: return pulpHardLimitPercent / 100.0;
            case LAB_REPEAT: return labRepeatHardLimitPercent / 100.0;
            case UMPIRE: return umpireHardLimitPercent / 100.0;
            default: throw new IllegalArgumentException("not a duplicate type: " + type);
        }
    }

    /** The config key of a type's HARD limit, for "user setting" labels. */
    public static String hardLimitKey(QcRole type) {
        switch (type) {
            case FIELD_DUPLICATE: return "duplicates.fieldHardLimitPercent";
            case COARSE_DUPLICATE: return "duplicates.coarseHardLimitPercent";
            case PULP_DUPLICATE: return "duplicates.pulpHardLimitPercent";
            case LAB_REPEAT: return "duplicates.labRepeatHardLimitPercent";
            case UMPIRE: return "duplicates.umpireHardLimitPercent";
            default: throw new IllegalArgumentException("not a duplicate type: " + type);
        }
    }

    /** A builder holding {@link #DEFAULTS}: {@code DuplicateSettings.withDefaults().someSetting(value).build()}. */
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
        private double limitMultipleOfDetection;
        private boolean censoredAtHalfLimit;
        private double acceptancePercent;
        private double fieldHardLimitPercent;
        private double coarseHardLimitPercent;
        private double pulpHardLimitPercent;
        private double labRepeatHardLimitPercent;
        private double umpireHardLimitPercent;
        private int thGroupSize;
        private int thMinimumPairs;
        private int bootstrapResamples;
        private long bootstrapSeed;
        private int bootstrapMaxPairs;
        private List<Double> precisionGrades;
        private double batchTestAlpha;
        private double batchRuleAlpha;

        private Builder(DuplicateSettings s) {
            limitMultipleOfDetection = s.limitMultipleOfDetection();
            censoredAtHalfLimit = s.censoredAtHalfLimit();
            acceptancePercent = s.acceptancePercent();
            fieldHardLimitPercent = s.fieldHardLimitPercent();
            coarseHardLimitPercent = s.coarseHardLimitPercent();
            pulpHardLimitPercent = s.pulpHardLimitPercent();
            labRepeatHardLimitPercent = s.labRepeatHardLimitPercent();
            umpireHardLimitPercent = s.umpireHardLimitPercent();
            thGroupSize = s.thGroupSize();
            thMinimumPairs = s.thMinimumPairs();
            bootstrapResamples = s.bootstrapResamples();
            bootstrapSeed = s.bootstrapSeed();
            bootstrapMaxPairs = s.bootstrapMaxPairs();
            precisionGrades = s.precisionGrades();
            batchTestAlpha = s.batchTestAlpha();
            batchRuleAlpha = s.batchRuleAlpha();
        }

        public Builder limitMultipleOfDetection(double value) {
            limitMultipleOfDetection = value;
            return this;
        }

        public Builder censoredAtHalfLimit(boolean value) {
            censoredAtHalfLimit = value;
            return this;
        }

        public Builder acceptancePercent(double value) {
            acceptancePercent = value;
            return this;
        }

        public Builder fieldHardLimitPercent(double value) {
            fieldHardLimitPercent = value;
            return this;
        }

        public Builder coarseHardLimitPercent(double value) {
            coarseHardLimitPercent = value;
            return this;
        }

        public Builder pulpHardLimitPercent(double value) {
            pulpHardLimitPercent = value;
            return this;
        }

        public Builder labRepeatHardLimitPercent(double value) {
            labRepeatHardLimitPercent = value;
            return this;
        }

        public Builder umpireHardLimitPercent(double value) {
            umpireHardLimitPercent = value;
            return this;
        }

        public Builder thGroupSize(int value) {
            thGroupSize = value;
            return this;
        }

        public Builder thMinimumPairs(int value) {
            thMinimumPairs = value;
            return this;
        }

        public Builder bootstrapResamples(int value) {
            bootstrapResamples = value;
            return this;
        }

        public Builder bootstrapSeed(long value) {
            bootstrapSeed = value;
            return this;
        }

        public Builder bootstrapMaxPairs(int value) {
            bootstrapMaxPairs = value;
            return this;
        }

        public Builder precisionGrades(List<Double> value) {
            precisionGrades = value;
            return this;
        }

        public Builder batchTestAlpha(double value) {
            batchTestAlpha = value;
            return this;
        }

        public Builder batchRuleAlpha(double value) {
            batchRuleAlpha = value;
            return this;
        }

        /** @throws org.cupel.config.SettingException or IllegalArgumentException for a value out of range */
        public DuplicateSettings build() {
            return new DuplicateSettings(limitMultipleOfDetection, censoredAtHalfLimit, acceptancePercent,
                    fieldHardLimitPercent, coarseHardLimitPercent, pulpHardLimitPercent, labRepeatHardLimitPercent,
                    umpireHardLimitPercent, thGroupSize, thMinimumPairs, bootstrapResamples, bootstrapSeed,
                    bootstrapMaxPairs, precisionGrades, batchTestAlpha, batchRuleAlpha);
        }
    }
}
