package org.cupel.censored;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

/**
 * Maximum likelihood for a censored normal or lognormal sample with values below detection, above range
 * and in intervals (Helsel 2012, "Statistics for Censored Environmental Data Using Minitab and R", 2nd
 * ed., ch. 6; Cohen 1959, Technometrics 1): the log-likelihood of {@link CensoredLikelihood} is maximised
 * by Newton–Raphson with analytic derivatives and step halving, in θ = (μ, ln σ). Standard errors come
 * from the inverse of the observed information matrix −H(θ̂), other quantities' by the delta method.
 * For the lognormal, mean {@code exp(μ + σ²/2)}, SD {@code mean·√(exp σ² − 1)}, median {@code exp μ};
 * the 95 % interval for the mean is the profile-likelihood interval
 * {@code {m : 2(ℓ̂ − max_σ ℓ(ln m − σ²/2, σ)) ≤ χ²₁(0.95)}} (Cox and Hinkley 1974, "Theoretical
 * Statistics", ch. 9), which, unlike the Wald interval, respects the skew of the mean's distribution.
 *
 * <p><b>When the maximum exists.</b> Write each observation as the closed set of values it allows on the
 * analysis scale: a detect {y}, a value below a limit (−∞, L], above a limit [U, ∞), in an interval [a, b].
 * A finite maximum of the likelihood exists if and only if
 * <ol>
 * <li>no single value c is allowed by every observation (every detect equals c and c lies in every censored
 *     set), and</li>
 * <li>some observation is bounded: a detect, or an interval with both ends finite.</li>
 * </ol>
 * Derived here: if c exists, the likelihood grows without bound (or towards 1) as μ → c and σ → 0; if every
 * observation is a half-line and no c exists, it grows towards its supremum as σ → ∞. When both conditions
 * hold the log-likelihood tends to −∞ at every edge of the parameter space (σ → 0 puts some observation's
 * probability to 0; σ → ∞ or |μ| → ∞ does so for the bounded observation), so a maximum is attained, and it
 * is unique because the censored normal log-likelihood is concave in (μ/σ, 1/σ) (Xia, Mi and Zhou 2009, "On
 * the existence and uniqueness of the maximum likelihood estimators of normal and lognormal population
 * parameters with grouped data", Journal of Probability and Statistics, 310575). Two different detected values
 * satisfy both conditions; so does a single detected value with one limit below it or one interval that
 * excludes it, as in data reported in concentration classes (R's {@code survreg} fits these too).
 */
public final class CensoredMle {
    /** The fitted model. */
    public enum Distribution { NORMAL, LOGNORMAL }

    /**
     * @param distribution normal or lognormal
     * @param mu location on the analysis scale (x or ln x)
     * @param sigma scale on that scale
     * @param seMu standard error of μ
     * @param seLogSigma standard error of ln σ
     * @param covMuLogSigma covariance of μ and ln σ
     * @param logLikelihood maximised log-likelihood of the original data
     * @param iterations Newton–Raphson iterations used
     * @param summary mean, SD, median and percentiles of the fitted distribution
     */
    public record Result(Distribution distribution, double mu, double sigma, double seMu, double seLogSigma,
                         double covMuLogSigma, double logLikelihood, int iterations, CensoredSummary summary) {
    }

    private static final int MAX_ITERATIONS = 200;
    private static final double STEP_TOLERANCE = 1e-11;
    private static final double Z95 = 1.959963984540054;
    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);

    private CensoredMle() {
    }

    public static String method(Distribution d) {
        return d == Distribution.NORMAL ? "MLE normal" : "MLE lognormal";
    }

    public static Result fit(CensoredSample sample, Distribution distribution) {
        String method = method(distribution);
        int n = sample.size();
        int nCens = sample.censoredCount();
        String why = notApplicable(sample, distribution);
        if (why != null) {
            return failed(distribution, CensoredSummary.notApplicable(method, n, nCens, why));
        }
        boolean log = distribution == Distribution.LOGNORMAL;
        CensoredLikelihood lik = CensoredLikelihood.of(sample, log);
        double[] theta = start(lik);
        int it = 0;
        CensoredLikelihood.Evaluation e = lik.evaluate(theta[0], theta[1]);
        boolean converged = false;
        while (it < MAX_ITERATIONS && !converged) {
            it++;
            double[] step = newtonStep(e);
            double scale = 1;
            CensoredLikelihood.Evaluation next = lik.evaluate(theta[0] + step[0], theta[1] + step[1]);
            while (!(next.value() >= e.value()) && scale > 1e-12) {
                scale /= 2;
                next = lik.evaluate(theta[0] + scale * step[0], theta[1] + scale * step[1]);
            }
            double moved = Math.abs(scale * step[0]) + Math.abs(scale * step[1]);
            theta[0] += scale * step[0];
            theta[1] += scale * step[1];
            e = next;
            converged = moved < STEP_TOLERANCE * (1 + Math.abs(theta[0]));
        }
        double det = e.hMuMu() * e.hTauTau() - e.hMuTau() * e.hMuTau();
        if (!converged || !(e.hMuMu() < 0 && det > 0) || !(theta[1] > -30 && theta[1] < 30)) {
            return failed(distribution, CensoredSummary.notApplicable(method, n, nCens,
                    "not available: the likelihood has no finite maximum for these data (too little detected "
                    + "information)"));
        }
        double varMu = -e.hTauTau() / det;
        double varTau = -e.hMuMu() / det;
        double cov = e.hMuTau() / det;
        double mu = theta[0];
        double sigma = Math.exp(theta[1]);
        CensoredSummary summary = log
                ? lognormalSummary(lik, e.value(), mu, sigma, varMu, varTau, cov, n, nCens)
                : normalSummary(mu, sigma, varMu, varTau, cov, n, nCens);
        return new Result(distribution, mu, sigma, Math.sqrt(varMu), Math.sqrt(varTau), cov, e.value(), it, summary);
    }

    private static Result failed(Distribution d, CensoredSummary summary) {
        return new Result(d, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, 0, summary);
    }

    private static String notApplicable(CensoredSample sample, Distribution d) {
        if (sample.size() == 0) {
            return "no values";
        }
        Tally detects = sample.detectTally();
        if (d == Distribution.LOGNORMAL && detects.distinct() > 0 && detects.value(0) <= 0) {
            return "not applicable: a lognormal needs positive values and a detect is zero or negative";
        }
        return unidentified(sample);
    }

    /**
     * Null when the likelihood has a finite maximum (the two conditions of the class comment), else why not.
     * The set of values allowed by every observation is an interval [lo, hi] (empty when lo &gt; hi); the
     * conditions do not depend on the scale, so they are checked on the original one.
     */
    static String unidentified(CensoredSample sample) {
        Tally detects = sample.detectTally();
        if (detects.distinct() >= 2) {
            return null;
        }
        double lo = Double.NEGATIVE_INFINITY;
        double hi = Double.POSITIVE_INFINITY;
        if (detects.distinct() == 1) {
            lo = detects.value(0);
            hi = lo;
        }
        Tally below = sample.belowTally();
        if (below.distinct() > 0) {
            hi = Math.min(hi, below.value(0));
        }
        Tally above = sample.aboveTally();
        if (above.distinct() > 0) {
            lo = Math.max(lo, above.value(above.distinct() - 1));
        }
        CensoredSample.IntervalGroups intervals = sample.intervalGroups();
        for (int i = 0; i < intervals.distinct(); i++) {
            lo = Math.max(lo, intervals.low()[i]);
            hi = Math.min(hi, intervals.high()[i]);
        }
        if (lo <= hi) {
            return detects.distinct() == 1
                    ? "not applicable: one detected value (" + org.cupel.assay.Numbers.compact(lo) + ") and every "
                            + "censored value is consistent with it, so the spread cannot be estimated (the "
                            + "likelihood grows without bound as the SD shrinks to 0)"
                    : "not applicable: no detected value, and any one value " + range(lo, hi) + " is consistent "
                            + "with every censored value, so the spread cannot be estimated";
        }
        if (detects.distinct() == 0 && intervals.distinct() == 0) {
            return "not applicable: no detected value and no interval with two finite ends, so the likelihood "
                    + "keeps growing as the SD grows (values below and above limits alone do not bound it)";
        }
        return null;
    }

    private static String range(double lo, double hi) {
        String l = org.cupel.assay.Numbers.compact(lo);
        String h = org.cupel.assay.Numbers.compact(hi);
        if (Double.isInfinite(lo)) {
            return Double.isInfinite(hi) ? "at all" : "at or below " + h;
        }
        return Double.isInfinite(hi) ? "at or above " + l : lo == hi ? "of " + l : "between " + l + " and " + h;
    }

    /**
     * Mean and SD of the detects when they hold two different values; otherwise of one point per observation
     * (see {@link CensoredLikelihood#pointMoments()}). Close enough for Newton–Raphson with step halving.
     */
    private static double[] start(CensoredLikelihood lik) {
        double[] m = lik.detectVariance() > 0 ? new double[] {lik.detectMean(), lik.detectVariance()}
                : lik.pointMoments();
        double var = Math.max(m[1], 1e-12);
        return new double[] {m[0], 0.5 * Math.log(var)};
    }

    /** −H⁻¹g when H is negative definite; otherwise a scaled gradient step uphill. */
    private static double[] newtonStep(CensoredLikelihood.Evaluation e) {
        double det = e.hMuMu() * e.hTauTau() - e.hMuTau() * e.hMuTau();
        if (e.hMuMu() < 0 && det > 0) {
            return new double[] {-(e.hTauTau() * e.gMu() - e.hMuTau() * e.gTau()) / det,
                -(-e.hMuTau() * e.gMu() + e.hMuMu() * e.gTau()) / det};
        }
        double norm = Math.hypot(e.gMu(), e.gTau());
        return new double[] {e.gMu() / Math.max(norm, 1), e.gTau() / Math.max(norm, 1)};
    }

    private static CensoredSummary normalSummary(double mu, double sigma, double varMu, double varTau, double cov,
                                                 int n, int nCens) {
        double seMu = Math.sqrt(varMu);
        Estimate mean = Estimate.withError(mu, seMu).withInterval(mu - Z95 * seMu, mu + Z95 * seMu, "95 % Wald interval");
        Estimate sd = Estimate.withError(sigma, sigma * Math.sqrt(varTau));
        List<Quantile> qs = new ArrayList<>();
        for (double p : CensoredSummary.PROBABILITIES) {
            double z = STANDARD_NORMAL.inverseCumulativeProbability(p);
            double var = varMu + z * z * sigma * sigma * varTau + 2 * z * sigma * cov;
            qs.add(new Quantile(p, Estimate.withError(mu + sigma * z, Math.sqrt(var))));
        }
        return new CensoredSummary(method(Distribution.NORMAL), n, nCens, mean, sd, Estimate.withError(mu, seMu), qs,
                List.of("normal distribution fitted by maximum likelihood; values below detection treated as "
                        + "lying anywhere below their limit"));
    }

    private static CensoredSummary lognormalSummary(CensoredLikelihood lik, double maxLogLik, double mu, double sigma,
                                                    double varMu, double varTau, double cov, int n, int nCens) {
        double s2 = sigma * sigma;
        double m = Math.exp(mu + s2 / 2);
        double seMean = m * Math.sqrt(varMu + s2 * s2 * varTau + 2 * s2 * cov);
        Estimate mean = profileInterval(Estimate.withError(m, seMean), lik, maxLogLik, mu, sigma);
        double sd = m * Math.sqrt(Math.expm1(s2));
        double dTau = s2 * (1 + Math.exp(s2) / Math.expm1(s2));
        double seSd = sd * Math.sqrt(varMu + dTau * dTau * varTau + 2 * dTau * cov);
        List<Quantile> qs = new ArrayList<>();
        for (double p : CensoredSummary.PROBABILITIES) {
            double z = STANDARD_NORMAL.inverseCumulativeProbability(p);
            double q = Math.exp(mu + sigma * z);
            double var = varMu + z * z * s2 * varTau + 2 * z * sigma * cov;
            qs.add(new Quantile(p, Estimate.withError(q, q * Math.sqrt(var))));
        }
        double median = Math.exp(mu);
        return new CensoredSummary(method(Distribution.LOGNORMAL), n, nCens, mean, Estimate.withError(sd, seSd),
                Estimate.withError(median, median * Math.sqrt(varMu)), qs,
                List.of("lognormal distribution fitted by maximum likelihood; standard errors by the delta method"));
    }

    /** Adds the 95 % profile-likelihood interval for the lognormal mean, or says why it could not be found. */
    private static Estimate profileInterval(Estimate mean, CensoredLikelihood lik, double maxLogLik, double mu,
                                            double sigma) {
        double drop = new ChiSquaredDistribution(null, 1).inverseCumulativeProbability(0.95) / 2;
        double logM = mu + sigma * sigma / 2;
        double tauHat = Math.log(sigma);
        java.util.function.DoubleUnaryOperator deficit = lm -> maxLogLik - profile(lik, lm, tauHat) - drop;
        double lo = root(deficit, logM, -1);
        double hi = root(deficit, logM, +1);
        if (Double.isNaN(lo) || Double.isNaN(hi)) {
            return new Estimate(mean.value(), mean.standardError(), Double.NaN, Double.NaN,
                    "profile-likelihood interval not found (the likelihood is too flat)");
        }
        return mean.withInterval(Math.exp(lo), Math.exp(hi), "95 % profile-likelihood interval");
    }

    /** max over τ of ℓ(ln m − σ²/2, τ). */
    private static double profile(CensoredLikelihood lik, double logM, double tauHat) {
        UnivariateObjectiveFunction f = new UnivariateObjectiveFunction(t -> {
            double s = Math.exp(t);
            double v = lik.evaluate(logM - s * s / 2, t).value();
            return Double.isNaN(v) ? Double.NEGATIVE_INFINITY : v;
        });
        return new BrentOptimizer(1e-12, 1e-14).optimize(new MaxEval(500), f, GoalType.MAXIMIZE,
                new SearchInterval(tauHat - 6, tauHat + 3, tauHat)).getValue();
    }

    /** The root of {@code f} on one side of {@code from} (where f < 0), on the log-mean scale. */
    private static double root(java.util.function.DoubleUnaryOperator f, double from, int direction) {
        double step = 0.25;
        double inner = from;
        for (int k = 0; k < 12; k++) {
            double outer = from + direction * step;
            if (f.applyAsDouble(outer) > 0) {
                double a = Math.min(inner, outer);
                double b = Math.max(inner, outer);
                return new BrentSolver(1e-13).solve(200, f::applyAsDouble, a, b);
            }
            inner = outer;
            step *= 2;
        }
        return Double.NaN;
    }
}
