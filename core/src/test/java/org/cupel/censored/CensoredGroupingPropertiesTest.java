package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.StatUtils;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * Every estimator works on the sample's distinct values with counts; these properties check that this
 * is the same as working observation by observation: the grouped log-likelihood (detects by count, mean
 * and sum of squares; censored values by distinct interval and count) equals the sum of the one-
 * observation log-likelihoods; ROS and substitution equal a direct per-observation computation (sort,
 * plotting positions, least squares, Commons Math statistics); and every result is exactly the same for
 * any order of the input.
 */
class CensoredGroupingPropertiesTest {
    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);
    private static final Obs DETECT = new Obs(Censoring.DETECTED, 2.5, 2.5);
    private static final Obs BELOW = new Obs(Censoring.BELOW, 0, 1.0);
    private static final Obs ABOVE = new Obs(Censoring.ABOVE, 30, Double.POSITIVE_INFINITY);
    private static final Obs INTERVAL = new Obs(Censoring.INTERVAL, 1, 2);

    /** Rounded lab-like values (many ties) with detects, values below one of three limits, above 30, in (1, 2]. */
    private static final Gen<Obs> OBSERVATION = Gen.frequency(
            Gen.weight(8, Gen.doubles(0.1, 40, 1).map(v -> new Obs(Censoring.DETECTED, v, v))),
            Gen.weight(3, Gen.of(0.5, 1.0, 2.0).map(l -> new Obs(Censoring.BELOW, 0, l))),
            Gen.weight(1, Gen.constant(ABOVE)),
            Gen.weight(1, Gen.constant(INTERVAL)));
    private static final Gen<List<Obs>> OBSERVATIONS = OBSERVATION.list(1, 150);

    /** Detects and values below a limit only, with at least two distinct detects and enough for ROS. */
    private static final Gen<List<Obs>> LEFT_CENSORED = OBSERVATIONS
            .map(l -> l.stream().filter(o -> o.kind() == Censoring.DETECTED || o.kind() == Censoring.BELOW).toList())
            .filter(l -> l.stream().filter(o -> o.kind() == Censoring.DETECTED).map(Obs::low).distinct().count() >= 2
                    && l.stream().filter(o -> o.kind() == Censoring.DETECTED).count() >= Ros.MIN_DETECTS);

    /** A sample, a parameter point (μ, divided by 10 on the log scale; τ = ln σ) and the scale. */
    record LikelihoodInput(List<Obs> obs, double mu, double tau, boolean log) {
    }

    private static Gen<LikelihoodInput> likelihoodInput(Gen<List<Obs>> obs, Gen<Boolean> log) {
        Gen<Double> mu = Gen.doubles(-3, 20);
        Gen<Double> tau = Gen.doubles(-2, 3);
        return r -> new LikelihoodInput(obs.next(r), mu.next(r), tau.next(r), log.next(r));
    }

    @Test
    void groupedLikelihoodEqualsTheSumOverObservations() {
        // One observation of each kind on both scales: the grouped form must reduce to the single term.
        List<Gen<LikelihoodInput>> edges = new ArrayList<>();
        for (Obs o : List.of(DETECT, BELOW, ABOVE, INTERVAL)) {
            edges.add(likelihoodInput(Gen.constant(List.of(o)), Gen.constant(false)));
            edges.add(likelihoodInput(Gen.constant(List.of(o)), Gen.constant(true)));
        }
        SeededTries.forAll(1000, edges, likelihoodInput(OBSERVATIONS, Gen.booleans()), in -> {
            List<Obs> obs = in.obs();
            boolean log = in.log();
            double tau = in.tau();
            double mu = log ? in.mu() / 10 : in.mu();
            CensoredLikelihood.Evaluation grouped = CensoredLikelihood.of(sample(obs), log).evaluate(mu, tau);
            double[] sum = new double[6];
            double[] magnitude = new double[6];
            for (Obs o : obs) {
                CensoredLikelihood.Evaluation one = CensoredLikelihood.of(sample(List.of(o)), log).evaluate(mu, tau);
                double[] e = parts(one);
                for (int k = 0; k < 6; k++) {
                    sum[k] += e[k];
                    magnitude[k] += Math.abs(e[k]);
                }
                if (o.kind() == Censoring.DETECTED) {
                    // The one-detect term is ln φ(z) − τ − J (Jacobian J = y on the log scale).
                    double y = log ? Math.log(o.low()) : o.low();
                    double sigma = Math.exp(tau);
                    double expected = STANDARD_NORMAL.logDensity((y - mu) / sigma) - tau - (log ? y : 0);
                    assertEquals(expected, one.value(), 1e-12 * Math.max(1, Math.abs(expected)));
                }
            }
            double[] g = parts(grouped);
            if (sum[0] == Double.NEGATIVE_INFINITY) {
                assertEquals(Double.NEGATIVE_INFINITY, g[0]);
                return;
            }
            // Far in a tail, (∂P)²/P² under- or overflows observation by observation: nothing to compare.
            SeededTries.assume(Arrays.stream(magnitude).allMatch(Double::isFinite));
            for (int k = 0; k < 6; k++) {
                // Floating-point sums of the same terms in another grouping: error below n·ε·Σ|term|.
                assertEquals(sum[k], g[k], 1e-12 * (1 + magnitude[k]), "component " + k);
            }
        });
    }

    record Shuffled(List<Obs> obs, long seed) {
    }

    @Test
    void resultsDoNotDependOnTheOrderOfTheInput() {
        SeededTries.forAll(200, r -> new Shuffled(OBSERVATIONS.next(r), r.nextLong()), in -> {
            List<Obs> shuffled = new ArrayList<>(in.obs());
            Collections.shuffle(shuffled, new Random(in.seed()));
            CensoredSettings settings = CensoredSettings.withDefaults().bootstrapReplicates(0)
                    .bootstrapSeed(1).bootstrapMaxN(0).build();
            CensoredAnalysis a = CensoredAnalysis.of(sample(in.obs()), settings);
            CensoredAnalysis b = CensoredAnalysis.of(sample(shuffled), settings);
            // Exactly equal: every method works on the sorted distinct values, never on the input order.
            assertEquals(a.summaries(), b.summaries());
            assertEquals(a.recommendation(), b.recommendation());
            assertEquals(a.mleNormal(), b.mleNormal());
            assertEquals(a.mleLognormal(), b.mleLognormal());
            assertEquals(a.kaplanMeier().steps(), b.kaplanMeier().steps());
            assertEquals(a.ros().points(), b.ros().points());
        });
    }

    @Test
    void rosEqualsTheDirectPerObservationComputation() {
        SeededTries.forAll(300, LEFT_CENSORED, obs -> {
            Ros.Result fast = Ros.fit(sample(obs));
            Direct direct = directRos(obs, fast.limits(), fast.exceedance());
            if (!fast.summary().isApplicable()) {
                return;
            }
            // Plotting positions are the same expressions (exact); quantiles differ by at most 2e-12 (Commons
            // Math's erfInv route loses that much for small p, see NormalQuantileTest); 1e-9 relative on what
            // is computed from them.
            assertEquals(direct.points.size(), fast.points().size());
            for (int i = 0; i < direct.points.size(); i++) {
                Ros.Point d = direct.points.get(i);
                Ros.Point f = fast.points().get(i);
                assertEquals(d.plottingPosition(), f.plottingPosition(), 0);
                assertEquals(d.detected(), f.detected());
                assertEquals(d.limit(), f.limit(), 0);
                assertEquals(d.normalQuantile(), f.normalQuantile(), 2e-12);
                assertEquals(d.value(), f.value(), 1e-9 * Math.abs(d.value()));
            }
            assertEquals(direct.intercept, fast.intercept(), 1e-9 * Math.max(1, Math.abs(direct.intercept)));
            assertEquals(direct.slope, fast.slope(), 1e-9 * Math.max(1, Math.abs(direct.slope)));
            assertSummary(direct.summary, fast.summary(), 1e-9);
        });
    }

    /**
     * Walking the points (copying or streaming the list) gives each point exactly as {@code get(i)} does: the
     * walk carries a detect's rank and value from point to point where {@code get} searches for them.
     */
    @Test
    void walkingThePointsGivesWhatGetGives() {
        SeededTries.forAll(300, LEFT_CENSORED, obs -> {
            List<Ros.Point> points = Ros.fit(sample(obs)).points();
            List<Ros.Point> byIndex = new ArrayList<>();
            for (int i = 0; i < points.size(); i++) {
                byIndex.add(points.get(i));
            }
            assertEquals(byIndex, new ArrayList<>(points));
            assertEquals(byIndex, points.stream().toList());
        });
    }

    @Test
    void substitutionEqualsTheDirectPerObservationComputation() {
        SeededTries.forAll(300, OBSERVATIONS, obs -> {
            for (Substitution.Rule rule : Substitution.Rule.values()) {
                double[] v = new double[obs.size()];
                for (int i = 0; i < v.length; i++) {
                    Obs o = obs.get(i);
                    v[i] = switch (o.kind()) {
                        case DETECTED, ABOVE -> o.low();
                        case BELOW -> rule.fraction() * o.high();
                        case INTERVAL -> (o.low() + o.high()) / 2;
                    };
                }
                // Percentiles are order statistics: exact. Mean and SD: summation order only, 1e-12.
                assertSummary(commons(v), Substitution.summarise(sample(obs), rule), 1e-12);
            }
        });
    }

    private static double[] parts(CensoredLikelihood.Evaluation e) {
        return new double[] {e.value(), e.gMu(), e.gTau(), e.hMuMu(), e.hMuTau(), e.hTauTau()};
    }

    /** The values of a summary that Commons Math gives for the expanded numbers. */
    private static double[] commons(double[] v) {
        Percentile p = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
        p.setData(v);
        double[] out = new double[3 + CensoredSummary.PROBABILITIES.length];
        out[0] = StatUtils.mean(v);
        out[1] = v.length > 1 ? Math.sqrt(StatUtils.variance(v)) : Double.NaN;
        out[2] = p.evaluate(50);
        for (int k = 0; k < CensoredSummary.PROBABILITIES.length; k++) {
            out[3 + k] = p.evaluate(100 * CensoredSummary.PROBABILITIES[k]);
        }
        return out;
    }

    private static void assertSummary(double[] expected, CensoredSummary s, double rel) {
        double[] actual = new double[expected.length];
        actual[0] = s.mean().value();
        actual[1] = s.sd().value();
        actual[2] = s.median().value();
        for (int k = 0; k < CensoredSummary.PROBABILITIES.length; k++) {
            actual[3 + k] = s.percentiles().get(k).estimate().value();
        }
        for (int k = 0; k < expected.length; k++) {
            if (Double.isNaN(expected[k])) {
                assertEquals(expected[k], actual[k], "statistic " + k);
                continue;
            }
            assertEquals(expected[k], actual[k], rel * Math.max(1, Math.abs(expected[k])), "statistic " + k);
        }
    }

    private record Direct(List<Ros.Point> points, double intercept, double slope, double[] summary) {
    }

    /**
     * ROS observation by observation (Helsel and Cohn 1988), on sorted arrays, with Commons Math's normal
     * quantile and SimpleRegression, given the limits and exceedance probabilities of the fit (their
     * counts are checked by RosTest against a hand count).
     */
    private static Direct directRos(List<Obs> obs, double[] limits, double[] pe) {
        double[] detects = obs.stream().filter(o -> o.kind() == Censoring.DETECTED).mapToDouble(Obs::low).sorted().toArray();
        double[] nd = obs.stream().filter(o -> o.kind() == Censoring.BELOW).mapToDouble(Obs::high).sorted().toArray();
        int m = limits.length;
        List<Ros.Point> points = new ArrayList<>();
        SimpleRegression reg = new SimpleRegression(true);
        double[] exceed = Arrays.copyOf(pe, m + 1);
        for (int j = 0; j < m; j++) {
            double lo = limits[j];
            double hi = j + 1 < m ? limits[j + 1] : Double.POSITIVE_INFINITY;
            double[] in = Arrays.stream(detects).filter(x -> x >= lo && x < hi).toArray();
            for (int r = 1; r <= in.length; r++) {
                double p = (1 - exceed[j]) + (exceed[j] - exceed[j + 1]) * r / (in.length + 1.0);
                double z = STANDARD_NORMAL.inverseCumulativeProbability(p);
                reg.addData(z, Math.log(in[r - 1]));
                points.add(new Ros.Point(p, z, in[r - 1], true, lo));
            }
        }
        List<Double> values = new ArrayList<>();
        for (Ros.Point p : points) {
            values.add(p.value());
        }
        for (int j = 0; j < m; j++) {
            double lim = limits[j];
            long c = Arrays.stream(nd).filter(x -> x == lim).count();
            for (int r = 1; r <= c; r++) {
                double p = (1 - exceed[j]) * r / (c + 1.0);
                double z = STANDARD_NORMAL.inverseCumulativeProbability(p);
                double v = Math.exp(reg.getIntercept() + reg.getSlope() * z);
                points.add(new Ros.Point(p, z, v, false, lim));
                values.add(v);
            }
        }
        double[] all = values.stream().mapToDouble(Double::doubleValue).toArray();
        return new Direct(points, reg.getIntercept(), reg.getSlope(), commons(all));
    }

    private static CensoredSample sample(List<Obs> obs) {
        CensoredSample.Builder b = CensoredSample.builder();
        for (Obs o : obs) {
            switch (o.kind()) {
                case DETECTED -> b.detected(o.low());
                case BELOW -> b.below(o.high());
                case ABOVE -> b.above(o.low());
                case INTERVAL -> b.between(o.low(), o.high());
            }
        }
        return b.build();
    }

    /** One observation as in {@link CensoredSample}: kind, lower and upper end. */
    record Obs(Censoring kind, double low, double high) {
    }
}
