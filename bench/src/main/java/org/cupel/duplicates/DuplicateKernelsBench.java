package org.cupel.duplicates;

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
 * The duplicate statistics over n pairs: HARD and CV (single passes), Thompson–Howarth grouping of
 * sorted pairs, the bootstrap of the RMS CV, and the whole Thompson–Howarth fit with its bootstrap.
 * In this package because the grouping kernel is package-private.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 3)
@Fork(1)
public class DuplicateKernelsBench {
    @Param({"1000", "10000", "50000"})
    public int pairs;

    private double[] a;
    private double[] b;
    private double[] sortedMeans;
    private double[] sortedAbsDiff;

    @Setup
    public void pairs() {
        SplittableRandom random = new SplittableRandom(20240601);
        a = new double[pairs];
        b = new double[pairs];
        for (int i = 0; i < pairs; i++) {
            double grade = Math.exp(random.nextGaussian() - 1);
            double sd = 0.005 + 0.08 * grade;
            a[i] = Math.abs(grade + sd * random.nextGaussian());
            b[i] = Math.abs(grade + sd * random.nextGaussian());
        }
        sortedMeans = new double[pairs];
        sortedAbsDiff = new double[pairs];
        for (int i = 0; i < pairs; i++) {
            sortedMeans[i] = PairMeasures.mean(a[i], b[i]);
            sortedAbsDiff[i] = PairMeasures.absDifference(a[i], b[i]);
        }
        PairGroups.sortByMean(sortedMeans, sortedAbsDiff);
    }

    @Benchmark
    public Estimate medianHard() {
        return PrecisionMeasures.medianHard(a, b);
    }

    @Benchmark
    public Estimate meanCv() {
        return PrecisionMeasures.meanCv(a, b);
    }

    @Benchmark
    public PairGroups thGrouping() {
        return PairGroups.ofSorted(sortedMeans, sortedAbsDiff, DuplicateSettings.DEFAULTS.thGroupSize());
    }

    @Benchmark
    public Estimate rmsCvBootstrap() {
        return PrecisionMeasures.rmsCv(a, b, DuplicateSettings.DEFAULTS.bootstrapResamples(),
                DuplicateSettings.DEFAULTS.bootstrapSeed());
    }

    /** Bootstrap intervals up to duplicates.bootstrapMaxPairs pairs, large-sample (HC3) intervals above. */
    @Benchmark
    public PrecisionModelResult thompsonHowarth() {
        return ThompsonHowarth.fit(a, b, new double[] {0.1, 1.0}, DuplicateSettings.DEFAULTS);
    }

    @Benchmark
    public Estimate rmsCvLargeSample() {
        return PrecisionMeasures.rmsCvLargeSample(a, b, DuplicateSettings.DEFAULTS.bootstrapMaxPairs());
    }

    /** Wilcoxon's signed-rank test of the n differences (mid-ranks of the rounded magnitudes). */
    @Benchmark
    public TestResult wilcoxon() {
        return PairedTests.wilcoxon(a, b);
    }

    /** The acceptance rule's binomial test of a batch of 20 pairs, 15 within the limit. */
    @Benchmark
    public BatchRuleTest batchRule() {
        return BatchRuleTest.of(15, 20, 90, 0.05);
    }
}
