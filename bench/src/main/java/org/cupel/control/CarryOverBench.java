package org.cupel.control;

import java.util.ArrayList;
import java.util.List;
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
 * Spearman's ρ of blanks against the grade before them over n blanks (average ranks of both columns, many
 * ties at the detection limit), as the carry-over relation computes it for one analyte.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 3)
@Fork(1)
public class CarryOverBench {
    @Param({"1000", "50000"})
    public int n;

    private List<double[]> pairs;

    @Setup
    public void pairs() {
        SplittableRandom random = new SplittableRandom(20261202);
        pairs = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            double grade = Math.exp(random.nextGaussian() - 1);
            double blank = Math.max(0.005, 0.002 + 0.001 * grade + 0.003 * random.nextGaussian());
            pairs.add(new double[] {Math.rint(grade * 1000) / 1000, Math.rint(blank * 1000) / 1000});
        }
    }

    @Benchmark
    public double[] spearman() {
        return CarryOver.spearman(pairs, new ArrayList<>());
    }
}
