package org.cupel.censored;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Regression on order statistics over n values, 40 % of them below one of three detection limits: one normal
 * quantile per value (the plain fit, as the censored path runs it above {@code censored.bootstrapMaxN}) and
 * the 1,000-resample bootstrap of the mean at n = 5,000 (at the default {@code bootstrapMaxN}, the most the
 * censored path bootstraps).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 3)
@Fork(1)
public class RosBench {
    private static final double[] LIMITS = {0.005, 0.01, 0.02};

    @Param({"5000", "1000000"})
    public int n;

    private CensoredSample sample;

    @Setup
    public void sample() {
        SplittableRandom random = new SplittableRandom(20261202);
        CensoredSample.Builder b = CensoredSample.builder();
        for (int i = 0; i < n; i++) {
            double x = Math.exp(-4.2 + 1.3 * random.nextGaussian());
            double limit = LIMITS[random.nextInt(LIMITS.length)];
            if (x < limit) {
                b.below(limit);
            } else {
                b.detected(x);
            }
        }
        sample = b.build();
    }

    @Benchmark
    public Ros.Result fit() {
        return Ros.fit(sample);
    }

    /** The bootstrap is run only at n = 5,000: above {@code bootstrapMaxN} the censored path skips it. */
    @Benchmark
    public Ros.Result fitWithBootstrap() {
        CensoredSettings s = CensoredSettings.DEFAULTS;
        return Ros.fit(sample, n <= s.bootstrapMaxN() ? s.bootstrapReplicates() : 0, s.bootstrapSeed(),
                s.bootstrapMaxN());
    }
}
