package org.cupel.censored;

import org.cupel.config.CupelConfig;

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

    public CensoredSettings {
        if (kmLowestMass == null || kmSdDivisor == null || bootstrapReplicates < 0) {
            throw new IllegalArgumentException("censored settings: KM conventions are required and the number of "
                    + "bootstrap replicates must be 0 or more");
        }
    }

    public static CensoredSettings from(CupelConfig config) {
        return config.section("censored", CensoredSettings.class, DEFAULTS);
    }

    public KaplanMeier.Options kmOptions() {
        return new KaplanMeier.Options(kmLowestMass, kmSdDivisor);
    }

    public CensoredSettings withKmLowestMass(KaplanMeier.LowestMass m) {
        return new CensoredSettings(m, kmSdDivisor, bootstrapReplicates, bootstrapSeed, bootstrapMaxN);
    }
}
