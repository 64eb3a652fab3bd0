package org.cupel.censored;

import org.apache.commons.math3.special.Erf;
import org.apache.commons.math3.stat.descriptive.moment.Mean;

/**
 * Log-likelihood of a normal model for censored observations on the analysis scale y (x itself for the
 * normal model, ln x for the lognormal), with gradient and Hessian in θ = (μ, τ = ln σ):
 * <pre>  ln L = Σ_detects [ln φ(z_i) − τ − J_i] + Σ_censored ln(Φ(z_{b,i}) − Φ(z_{a,i})),   z = (y − μ)/σ,</pre>
 * where a censored observation lies in (a, b] (a = −∞ below a limit, b = ∞ above one) and J_i = y_i is
 * the Jacobian of the log transform for the lognormal model (0 for the normal), so that the value is the
 * likelihood of the original data, as R's {@code survreg} reports it. The derivatives are analytic
 * (with φ'(z) = −zφ(z)); the Hessian gives the observed information matrix.
 */
final class CensoredLikelihood {
    private static final double LOG_SQRT_2PI = 0.5 * Math.log(2 * Math.PI);

    private final double exactCount;
    private final double exactMean;
    private final double exactSumSquares;
    private final double jacobian;
    private final double[] low;
    private final double[] high;
    private final double[] censoredWeight;

    /** Value, gradient (∂/∂μ, ∂/∂τ) and Hessian (μμ, μτ, ττ) at one θ. */
    record Evaluation(double value, double gMu, double gTau, double hMuMu, double hMuTau, double hTauTau) {
    }

    /**
     * The detects enter through their count W, mean ȳ and sum of squared deviations
     * {@code S = Σ (y_i − ȳ)²} only: {@code Σ z_i = W(ȳ − μ)/σ} and {@code Σ z_i² = (S + W(ȳ − μ)²)/σ²}, so
     * an evaluation costs nothing per detect. Identical censored observations enter once with their count
     * as weight (assay limits repeat).
     *
     * @param jacobian {@code Σ y_i} over the detects for the lognormal model, 0 for the normal
     */
    private CensoredLikelihood(double exactCount, double exactMean, double exactSumSquares, double jacobian, double[] low,
                       double[] high, double[] censoredWeight) {
        this.exactCount = exactCount;
        this.exactMean = exactMean;
        this.exactSumSquares = exactSumSquares;
        this.jacobian = jacobian;
        this.low = low;
        this.high = high;
        this.censoredWeight = censoredWeight;
    }

    /** The likelihood of {@code s} on the scale y = x, or y = ln x when {@code logScale}. */
    static CensoredLikelihood of(CensoredSample s, boolean logScale) {
        Tally detects = s.detectTally();
        double[] y = new double[detects.distinct()];
        for (int i = 0; i < y.length; i++) {
            y[i] = scale(detects.value(i), logScale);
        }
        double[] w = detects.weights();
        double mean = y.length == 0 ? Double.NaN : new Mean().evaluate(y, w);
        double sumSquares = 0;
        double sum = 0;
        for (int i = 0; i < y.length; i++) {
            sumSquares += w[i] * (y[i] - mean) * (y[i] - mean);
            sum += w[i] * y[i];
        }
        Tally below = s.belowTally();
        Tally above = s.aboveTally();
        CensoredSample.IntervalGroups intervals = s.intervalGroups();
        int groups = below.distinct() + above.distinct() + intervals.distinct();
        double[] lo = new double[groups];
        double[] hi = new double[groups];
        double[] cw = new double[groups];
        int g = 0;
        for (int i = 0; i < below.distinct(); i++, g++) {
            lo[g] = Double.NEGATIVE_INFINITY;
            hi[g] = scale(below.value(i), logScale);
            cw[g] = below.count(i);
        }
        for (int i = 0; i < above.distinct(); i++, g++) {
            lo[g] = scale(above.value(i), logScale);
            hi[g] = Double.POSITIVE_INFINITY;
            cw[g] = above.count(i);
        }
        for (int i = 0; i < intervals.distinct(); i++, g++) {
            lo[g] = scale(intervals.low()[i], logScale);
            hi[g] = scale(intervals.high()[i], logScale);
            cw[g] = intervals.counts()[i];
        }
        return new CensoredLikelihood(detects.size(), mean, sumSquares, logScale ? sum : 0, lo, hi, cw);
    }

    /** Mean of the detects on the analysis scale. */
    double detectMean() {
        return exactMean;
    }

    /** Variance (divisor W − 1) of the detects on the analysis scale. */
    double detectVariance() {
        return exactSumSquares / (exactCount - 1);
    }

    /**
     * Mean and variance (divisor count − 1; 1 when that is not positive) of one point per observation: the
     * detect, the finite end of a half-line, the midpoint of an interval. A starting value only.
     */
    double[] pointMoments() {
        double w = exactCount;
        double sum = exactCount > 0 ? exactCount * exactMean : 0;
        double sumSquares = exactCount > 0 ? exactSumSquares + exactCount * exactMean * exactMean : 0;
        for (int i = 0; i < low.length; i++) {
            double y = Double.isInfinite(low[i]) ? high[i] : Double.isInfinite(high[i]) ? low[i]
                    : 0.5 * (low[i] + high[i]);
            w += censoredWeight[i];
            sum += censoredWeight[i] * y;
            sumSquares += censoredWeight[i] * y * y;
        }
        double mean = sum / w;
        double var = w > 1 ? (sumSquares - w * mean * mean) / (w - 1) : 1;
        return new double[] {mean, var > 0 ? var : 1};
    }

    Evaluation evaluate(double mu, double tau) {
        double sigma = Math.exp(tau);
        double v = 0;
        double gm = 0;
        double gt = 0;
        double hmm = 0;
        double hmt = 0;
        double htt = 0;
        if (exactCount > 0) {
            double w = exactCount;
            double sumZ = w * (exactMean - mu) / sigma;
            double sumZ2 = (exactSumSquares + w * (exactMean - mu) * (exactMean - mu)) / (sigma * sigma);
            v = w * (-LOG_SQRT_2PI - tau) - 0.5 * sumZ2 - jacobian;
            gm = sumZ / sigma;
            gt = sumZ2 - w;
            hmm = -w / (sigma * sigma);
            hmt = -2 * sumZ / sigma;
            htt = -2 * sumZ2;
        }
        double[] da = new double[5];
        double[] db = new double[5];
        for (int i = 0; i < low.length; i++) {
            double za = (low[i] - mu) / sigma;
            double zb = (high[i] - mu) / sigma;
            double p = probabilityBetween(za, zb);
            if (!(p > 0)) {
                return new Evaluation(Double.NEGATIVE_INFINITY, 0, 0, 0, 0, 0);
            }
            derivatives(za, sigma, da);
            derivatives(zb, sigma, db);
            double pm = db[0] - da[0];
            double pt = db[1] - da[1];
            double w = censoredWeight[i];
            v += w * Math.log(p);
            gm += w * pm / p;
            gt += w * pt / p;
            hmm += w * ((db[2] - da[2]) / p - pm * pm / (p * p));
            hmt += w * ((db[3] - da[3]) / p - pm * pt / (p * p));
            htt += w * ((db[4] - da[4]) / p - pt * pt / (p * p));
        }
        return new Evaluation(v, gm, gt, hmm, hmt, htt);
    }

    private static double scale(double x, boolean log) {
        return log && Double.isFinite(x) ? Math.log(x) : x;
    }

    /** Φ(zb) − Φ(za), computed on the side of the distribution where it does not lose digits. */
    private static double probabilityBetween(double za, double zb) {
        if (za > 0) {
            return upperTail(za) - upperTail(zb);
        }
        return upperTail(-zb) - upperTail(-za);
    }

    /** 1 − Φ(z), accurate in the far upper tail. */
    private static double upperTail(double z) {
        if (z == Double.POSITIVE_INFINITY) {
            return 0;
        }
        if (z == Double.NEGATIVE_INFINITY) {
            return 1;
        }
        return 0.5 * Erf.erfc(z / Math.sqrt(2));
    }

    /** Derivatives of Φ(z(θ)): μ, τ, μμ, μτ, ττ; all zero at an infinite bound. */
    private static void derivatives(double z, double sigma, double[] out) {
        if (Double.isInfinite(z)) {
            java.util.Arrays.fill(out, 0);
            return;
        }
        double phi = Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
        out[0] = -phi / sigma;
        out[1] = -z * phi;
        out[2] = -z * phi / (sigma * sigma);
        out[3] = phi * (1 - z * z) / sigma;
        out[4] = z * phi * (1 - z * z);
    }
}
