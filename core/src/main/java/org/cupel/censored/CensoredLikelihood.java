package org.cupel.censored;

import org.apache.commons.math3.special.Erf;

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

    private final double[] exact;
    private final double[] exactWeight;
    private final double[] low;
    private final double[] high;
    private final double[] censoredWeight;
    private final boolean logScale;

    /** Value, gradient (∂/∂μ, ∂/∂τ) and Hessian (μμ, μτ, ττ) at one θ. */
    record Evaluation(double value, double gMu, double gTau, double hMuMu, double hMuTau, double hTauTau) {
    }

    /**
     * Identical observations enter once with a weight (their count): assay values are rounded, so a large
     * sample has far fewer distinct values than rows, and each evaluation costs only the distinct ones.
     */
    CensoredLikelihood(double[] exact, double[] exactWeight, double[] low, double[] high, double[] censoredWeight,
                       boolean logScale) {
        this.exact = exact;
        this.exactWeight = exactWeight;
        this.low = low;
        this.high = high;
        this.censoredWeight = censoredWeight;
        this.logScale = logScale;
    }

    Evaluation evaluate(double mu, double tau) {
        double sigma = Math.exp(tau);
        double v = 0;
        double gm = 0;
        double gt = 0;
        double hmm = 0;
        double hmt = 0;
        double htt = 0;
        for (int i = 0; i < exact.length; i++) {
            double y = exact[i];
            double w = exactWeight[i];
            double z = (y - mu) / sigma;
            v += w * (-LOG_SQRT_2PI - 0.5 * z * z - tau - (logScale ? y : 0));
            gm += w * z / sigma;
            gt += w * (z * z - 1);
            hmm += -w / (sigma * sigma);
            hmt += -2 * w * z / sigma;
            htt += -2 * w * z * z;
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
