package org.cupel.censored;

import org.cupel.config.CupelConfig;
import org.cupel.config.SettingException;

/**
 * The {@code censored} section of {@code cupel.yaml}.
 *
 * @param kmLowestMass where Kaplan–Meier puts the probability below the lowest detect
 * @param kmSdDivisor the Kaplan–Meier SD convention
 * @param bootstrapReplicates resamples for the ROS mean's standard error and interval; 0 for none
 * @param bootstrapSeed seed of the resampling, so that reruns give the same interval
 * @param bootstrapMaxN above this many observations the bootstrap is skipped (run time grows with n times
 *     the replicates, and the interval is then narrow anyway)
 */
public record CensoredSettings(KaplanMeier.LowestMass kmLowestMass, KaplanMeier.SdDivisor kmSdDivisor,
                               int bootstrapReplicates, long bootstrapSeed, int bootstrapMaxN) {

    public static final CensoredSettings DEFAULTS = new CensoredSettings(KaplanMeier.LowestMass.AT_LOWEST_LIMIT,
            KaplanMeier.SdDivisor.DISTRIBUTION, 1000, 20_260_101L, 5000);

    /**
     * Most resamples allowed: 100 times the default. Percentile intervals need about a thousand resamples
     * (common practice); a larger count only costs time and memory (one value kept per resample), and a
     * mistyped extra digit or two must not end in an out-of-memory failure.
     */
    public static final int MAX_BOOTSTRAP_REPLICATES = 100_000;

    public CensoredSettings {
        if (kmLowestMass == null || kmSdDivisor == null) {
            throw new IllegalArgumentException("censored settings: kmLowestMass and kmSdDivisor are required");
        }
        if (bootstrapReplicates < 0 || bootstrapReplicates > MAX_BOOTSTRAP_REPLICATES) {
            throw new SettingException(bootstrapReplicates + " is outside 0 to " + MAX_BOOTSTRAP_REPLICATES
                    + " resamples; write a whole number in that range (the default is 1000; 0 for no bootstrap)",
                    "bootstrapReplicates");
        }
        if (bootstrapMaxN < 0) {
            throw new SettingException(bootstrapMaxN + " is negative; write the largest number of values to "
                    + "bootstrap (the default is 5000; 0 skips the bootstrap)", "bootstrapMaxN");
        }
    }

    public static CensoredSettings from(CupelConfig config) {
        return config.section("censored", CensoredSettings.class, DEFAULTS);
    }

    public KaplanMeier.Options kmOptions() {
        return new KaplanMeier.Options(kmLowestMass, kmSdDivisor);
    }

    /** A builder holding {@link #DEFAULTS}: {@code CensoredSettings.withDefaults().someSetting(value).build()}. */
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
        private KaplanMeier.LowestMass kmLowestMass;
        private KaplanMeier.SdDivisor kmSdDivisor;
        private int bootstrapReplicates;
        private long bootstrapSeed;
        private int bootstrapMaxN;

        private Builder(CensoredSettings s) {
            kmLowestMass = s.kmLowestMass();
            kmSdDivisor = s.kmSdDivisor();
            bootstrapReplicates = s.bootstrapReplicates();
            bootstrapSeed = s.bootstrapSeed();
            bootstrapMaxN = s.bootstrapMaxN();
        }

        public Builder kmLowestMass(KaplanMeier.LowestMass value) {
            kmLowestMass = value;
            return this;
        }

        public Builder kmSdDivisor(KaplanMeier.SdDivisor value) {
            kmSdDivisor = value;
            return this;
        }

        public Builder bootstrapReplicates(int value) {
            bootstrapReplicates = value;
            return this;
        }

        public Builder bootstrapSeed(long value) {
            bootstrapSeed = value;
            return this;
        }

        public Builder bootstrapMaxN(int value) {
            bootstrapMaxN = value;
            return this;
        }

        /** @throws org.cupel.config.SettingException or IllegalArgumentException for a value out of range */
        public CensoredSettings build() {
            return new CensoredSettings(kmLowestMass, kmSdDivisor, bootstrapReplicates, bootstrapSeed, bootstrapMaxN);
        }
    }
}
