package org.cupel.censored;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.Numbers;

/**
 * Kaplan–Meier estimate of the distribution function of left-censored data with any number of
 * detection limits, by flipping (Nelson 1972, "Theory and application of hazard plotting for censored
 * failure data", Technometrics 14; Helsel 2012, "Statistics for Censored Environmental Data Using
 * Minitab and R", 2nd ed., ch. 6). Written directly on the original scale, which is the same as flipping
 * {@code y = M − x}: at each distinct detect {@code x_j} the risk set holds the {@code r_j} observations
 * known to be at or below it (detects {@code ≤ x_j} and nondetects with limit {@code ≤ x_j}), {@code d_j}
 * of which are detects at {@code x_j}, and
 * <pre>  F(x_j−) = F(x_j) · (1 − d_j / r_j),   F(x_max) = 1.</pre>
 * The mass {@code F₀} left below the lowest detect cannot be placed by the data; by default it sits at
 * the lowest detection limit, which reproduces the worked example of USEPA (2009) "Statistical Analysis
 * of Groundwater Monitoring Data at RCRA Facilities, Unified Guidance", Example 15-1, and R's
 * {@code survfit} restricted mean on flipped data; the option puts it at the lowest detect instead.
 * Mean {@code μ = Σ p_j x_j + F₀ L}; the SD is that of the estimated distribution
 * {@code √(Σ p_j (x_j − μ)² + F₀ (L − μ)²)} (the Unified Guidance convention), optionally times
 * {@code √(n/(n−1))} so that it equals the ordinary sample SD when nothing is censored. The standard error
 * of the mean is the Greenwood-type formula for the area under a Kaplan–Meier curve (Kaplan and Meier
 * 1958, J. Am. Stat. Assoc. 53), {@code Var μ = Σ A_j² d_j / (r_j (r_j − d_j))} with
 * {@code A_j = ∫_L^{x_j} F(x) dx}, as R's {@code survfit} reports {@code se(rmean)}. A percentile
 * {@code x_p} is the smallest detect with {@code F(x_p) ≥ p}; a percentile inside the censored mass
 * below the lowest detect is not estimated.
 */
public final class KaplanMeier {
    /** Tolerance when comparing a product of survival fractions with a requested probability. */
    private static final double PROBABILITY_TOLERANCE = 1e-10;

    /** Where the probability mass below the lowest detect is put for the mean and SD. */
    public enum LowestMass { AT_LOWEST_LIMIT, AT_LOWEST_DETECT }

    /** Divisor of the KM variance. */
    public enum SdDivisor {
        /** The SD of the estimated distribution (weights sum to 1), as in USEPA (2009) Example 15-1. */
        DISTRIBUTION,
        /** The distribution variance times n/(n − 1): the ordinary sample SD when nothing is censored. */
        SAMPLE
    }

    /** The two conventions; {@link #DEFAULTS} reproduce USEPA (2009) Example 15-1. */
    public record Options(LowestMass lowestMass, SdDivisor sdDivisor) {
        public static final Options DEFAULTS = new Options(LowestMass.AT_LOWEST_LIMIT, SdDivisor.DISTRIBUTION);
    }

    /** One step of the estimated distribution function. */
    public record Step(double value, int atRisk, int detects, double cdf) {
    }

    /**
     * The fit: steps at each distinct detect, ascending, and the mass left below the lowest detect.
     *
     * @param steps {@code F(x_j)} at each distinct detect
     * @param remainingMass {@code F₀}, the probability below the lowest detect
     * @param remainingAt where that mass was put for the mean and SD
     * @param summary mean, SD, median and percentiles
     */
    public record Result(List<Step> steps, double remainingMass, double remainingAt, CensoredSummary summary) {
        public Result {
            steps = List.copyOf(steps);
        }
    }

    public static final String METHOD = "Kaplan–Meier";

    private KaplanMeier() {
    }

    public static Result fit(CensoredSample sample, Options options) {
        int n = sample.size();
        int nCens = sample.censoredCount();
        String why = notApplicable(sample);
        if (why != null) {
            return new Result(List.of(), Double.NaN, Double.NaN, CensoredSummary.notApplicable(METHOD, n, nCens, why));
        }
        Tally detects = sample.detectTally();
        Tally limits = sample.belowTally();
        List<Step> descending = new ArrayList<>();
        double f = 1;
        int g = detects.distinct() - 1;
        while (g >= 0) {
            double x = detects.value(g);
            int d = 0;
            // == rather than the tally's bitwise distinctness: −0.0 and 0.0 are one step.
            while (g >= 0 && detects.value(g) == x) {
                d += detects.count(g);
                g--;
            }
            int r = detects.before(g + 1) + d + limits.countAtOrBelow(x);
            descending.add(new Step(x, r, d, f));
            f *= 1 - d / (double) r;
        }
        List<Step> steps = new ArrayList<>(descending);
        java.util.Collections.reverse(steps);
        double lowestDetect = detects.value(0);
        double at = options.lowestMass() == LowestMass.AT_LOWEST_LIMIT && limits.size() > 0
                ? Math.min(limits.value(0), lowestDetect) : lowestDetect;
        return new Result(steps, f, at, summarise(steps, f, at, n, nCens, options));
    }

    private static String notApplicable(CensoredSample sample) {
        if (sample.size() == 0) {
            return "no values";
        }
        if (!sample.isLeftCensoredOnly()) {
            return "not applicable: Kaplan–Meier by flipping handles values below detection only, and this sample "
                    + "has values above range or in intervals (use maximum likelihood)";
        }
        if (sample.count(Censoring.DETECTED) == 0) {
            return "not applicable: every value is below detection";
        }
        return null;
    }

    private static CensoredSummary summarise(List<Step> steps, double f0, double at, int n, int nCens,
                                             Options options) {
        double mean = f0 * at;
        double prev = f0;
        for (Step s : steps) {
            mean += (s.cdf() - prev) * s.value();
            prev = s.cdf();
        }
        double var = f0 * sq(at - mean);
        prev = f0;
        for (Step s : steps) {
            var += (s.cdf() - prev) * sq(s.value() - mean);
            prev = s.cdf();
        }
        List<String> notes = new ArrayList<>();
        notes.add(f0 > 0
                ? "probability " + Numbers.significant(f0, 4) + " below the lowest detect placed at "
                  + (options.lowestMass() == LowestMass.AT_LOWEST_LIMIT ? "the lowest detection limit " : "the lowest detect ")
                  + Numbers.compact(at)
                : "no probability left below the lowest detect");
        if (options.sdDivisor() == SdDivisor.SAMPLE) {
            if (n < 2) {
                return withSd(steps, f0, at, n, nCens, mean, Estimate.unavailable("a single value has no sample SD"),
                        notes);
            }
            var *= n / (n - 1.0);
            notes.add("SD with divisor n − 1 (sample convention)");
        } else {
            notes.add("SD of the estimated distribution (divisor n when nothing is censored)");
        }
        return withSd(steps, f0, at, n, nCens, mean, Estimate.of(Math.sqrt(var), "no closed-form standard error"),
                notes);
    }

    private static CensoredSummary withSd(List<Step> steps, double f0, double at, int n, int nCens, double mean,
                                          Estimate sd, List<String> notes) {
        Estimate meanEst = Estimate.withError(mean, meanStandardError(steps, f0, at));
        List<Quantile> qs = new ArrayList<>();
        for (double p : CensoredSummary.PROBABILITIES) {
            qs.add(new Quantile(p, percentile(steps, f0, p)));
        }
        return new CensoredSummary(METHOD, n, nCens, meanEst, sd, percentile(steps, f0, 0.5), qs, notes);
    }

    private static double meanStandardError(List<Step> steps, double f0, double at) {
        double area = 0;
        double var = 0;
        double x = at;
        double level = f0;
        for (Step s : steps) {
            area += level * (s.value() - x);
            if (s.atRisk() > s.detects()) {
                var += area * area * s.detects() / (s.atRisk() * (double) (s.atRisk() - s.detects()));
            }
            x = s.value();
            level = s.cdf();
        }
        return Math.sqrt(var);
    }

    /** The smallest detect with {@code F ≥ p}; unavailable when {@code p} falls in the mass below the lowest detect. */
    static Estimate percentile(List<Step> steps, double f0, double p) {
        if (f0 >= p - PROBABILITY_TOLERANCE) {
            return Estimate.unavailable("below the lowest detect (" + Numbers.compact(steps.get(0).value())
                    + "): Kaplan–Meier cannot place it");
        }
        for (Step s : steps) {
            if (s.cdf() >= p - PROBABILITY_TOLERANCE) {
                return Estimate.of(s.value(), "");
            }
        }
        return Estimate.of(steps.get(steps.size() - 1).value(), "");
    }

    private static double sq(double v) {
        return v * v;
    }
}
