package org.cupel.recovery;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The distribution functions of the testwork comparisons, one call each, at the sizes of a testwork pair
 * (4 conditions of 3 smelts, Satterthwaite ν ≈ 3.7): the studentized range (Games–Howell p-value and
 * critical value), the noncentral t (power), Welch's test, and a whole Games–Howell comparison.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 3)
@Fork(1)
public class DistributionKernelsBench {
    private static final double[] A = {96.1, 95.4, 96.8};
    private static final double[] B = {94.0, 95.1, 93.2};

    @Benchmark
    public double studentizedRangeCdf() {
        return StudentizedRange.cdf(3.5, 4, 3.7);
    }

    @Benchmark
    public double studentizedRangeQuantile() {
        return StudentizedRange.quantile(0.95, 4, 3.7);
    }

    @Benchmark
    public double noncentralTCdf() {
        return NoncentralT.cdf(2.4, 3.7, 1.8);
    }

    @Benchmark
    public WelchTest.Result welch() {
        return WelchTest.test(A, B, 0.95);
    }

    @Benchmark
    public GamesHowell gamesHowell() {
        return GamesHowell.of(WelchTest.test(A, B, 0.95), 4);
    }
}
