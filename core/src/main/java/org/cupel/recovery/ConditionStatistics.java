package org.cupel.recovery;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.util.CombinatoricsUtils;

/**
 * The mean recovery of one condition and its intervals:
 * <ul>
 *   <li><b>t on replicates</b>: R̄ ± t_{1−α/2, n−1} s/√n.</li>
 *   <li><b>GUM</b> (JCGM 100:2008 §5.1.2, eq. 10, and §5.1.6 for quotients, where relative variances add):
 *       u_c² = s²/n + (c_h · u_r(h))², with ν = n − 1 for the replicate term and the head's ν for the head
 *       term, combined by Welch–Satterthwaite (Annex G.4.1), interval R̄ ± t_{ν_eff} u_c. The head grade is
 *       common to every replicate, so its uncertainty does not average down with n and is added on top of
 *       the replicate scatter, which already holds the product weighing and assay errors. Sensitivity
 *       c_h = ∂R/∂ln h: (100 − R̄) by loss, R̄ direct, 0 against the calculated head.</li>
 *   <li><b>Fieller</b> ({@link Fieller}): by loss and direct, the ratio of the mean metal per gram of charge
 *       (loss or collected, variance s²/n) to the mean head (variance SE²), with ν_eff as above; against the
 *       calculated head, the ratio of mean collected to mean total metal with their covariance, ν = n − 1.</li>
 * </ul>
 * When R̄ reaches {@link RecoverySettings#nearComplete()} or an interval would pass 100%, the t and GUM
 * intervals are computed on ln(100 − R) and transformed back, so they stay below 100% (common practice);
 * a Fieller bound above 100% is capped and the note says by how much.
 */
final class ConditionStatistics {
    private ConditionStatistics() {
    }

    static ConditionRecovery summarise(String condition, String analyte, List<SmeltRecovery> smelts,
                                       RecoveryDefinition definition, CensoredAs censoredAs,
                                       RecoverySettings settings) {
        List<SmeltRecovery> used = new ArrayList<>();
        List<String> excluded = new ArrayList<>();
        for (SmeltRecovery s : smelts) {
            if (s.usable() && Double.isFinite(s.value(definition))) {
                used.add(s);
            } else {
                excluded.add(s.smelt().testId() + ": " + (s.usable() ? "recovery " + definition.label()
                        + " not defined (no metal in the products)" : s.note()));
            }
        }
        double[] r = used.stream().mapToDouble(s -> s.value(definition)).toArray();
        SampleSummary summary = SampleSummary.of(r);
        String feeds = String.join(", ", used.stream().map(s -> s.smelt().feed()).distinct().toList());
        double lower = used.stream().mapToDouble(s -> definition == RecoveryDefinition.LOSS ? s.lowerBound()
                : s.value(definition)).average().orElse(Double.NaN);
        double upper = used.stream().mapToDouble(s -> definition == RecoveryDefinition.LOSS ? s.upperBound()
                : s.value(definition)).average().orElse(Double.NaN);
        return new ConditionRecovery(condition, feeds, analyte, definition, censoredAs, summary.n(), r,
                summary.mean(), summary.sd(), tInterval(summary, r, settings), gum(summary, used, definition, settings),
                fieller(used, definition, settings), bootstrapNote(summary.n()), lower, upper, excluded);
    }

    static String bootstrapNote(int n) {
        if (n <= 3 && n >= 1) {
            long distinct = CombinatoricsUtils.binomialCoefficient(2 * n - 1, n);
            return "no bootstrap interval: with n = " + n + " smelts there are only " + distinct
                    + " distinct resamples, too few for percentile limits (Efron & Tibshirani 1993); "
                    + "the t, GUM and Fieller intervals are given instead";
        }
        return "no bootstrap interval: the t, GUM and Fieller intervals are given instead";
    }

    static RecoveryInterval tInterval(SampleSummary s, double[] r, RecoverySettings settings) {
        String method = "t on replicates";
        if (s.n() < 2) {
            return RecoveryInterval.missing(method, "needs at least 2 smelts (have " + s.n() + ")");
        }
        double df = s.n() - 1.0;
        double tq = quantile(df, settings);
        double half = tq * s.standardError();
        boolean nearComplete = s.mean() >= settings.nearComplete() || s.mean() + half > 100;
        if (!nearComplete) {
            return new RecoveryInterval(method, s.mean() - half, s.mean() + half, df, "recovery", "");
        }
        double[] logLoss = new double[r.length];
        for (int i = 0; i < r.length; i++) {
            if (!(r[i] < 100)) {
                return new RecoveryInterval(method, s.mean() - half, Math.min(100, s.mean() + half), df, "recovery",
                        "a smelt shows no loss, so the log-loss scale cannot be used; upper end capped at 100%");
            }
            logLoss[i] = Math.log(100 - r[i]);
        }
        SampleSummary l = SampleSummary.of(logLoss);
        double h = tq * l.standardError();
        return new RecoveryInterval(method, 100 - Math.exp(l.mean() + h), 100 - Math.exp(l.mean() - h), df,
                "log loss", "");
    }

    static RecoveryInterval gum(SampleSummary s, List<SmeltRecovery> used, RecoveryDefinition definition,
                                RecoverySettings settings) {
        String method = "GUM";
        if (s.n() < 2) {
            return RecoveryInterval.missing(method, "needs at least 2 smelts for the replicate term (have " + s.n()
                    + ")");
        }
        double headTerm = used.stream().mapToDouble(x -> sensitivity(x.value(definition), definition)
                * x.head().relativeStandardError()).average().orElse(0);
        double headDf = used.stream().mapToDouble(x -> x.head().df()).min().orElse(Double.POSITIVE_INFINITY);
        double vA = s.varianceOfMean();
        double vH = headTerm * headTerm;
        double uc = Math.sqrt(vA + vH);
        double df = WelchSatterthwaite.effectiveDf(new double[] {vA, vH}, new double[] {s.n() - 1.0, headDf});
        double k = quantile(df, settings);
        if (s.mean() >= settings.nearComplete() || s.mean() + k * uc > 100) {
            double loss = 100 - s.mean();
            if (loss > 0) {
                return new RecoveryInterval(method, 100 - loss * Math.exp(k * uc / loss),
                        100 - loss * Math.exp(-k * uc / loss), df, "log loss", "");
            }
        }
        return new RecoveryInterval(method, s.mean() - k * uc, s.mean() + k * uc, df, "recovery", "");
    }

    private static double sensitivity(double recovery, RecoveryDefinition definition) {
        switch (definition) {
            case LOSS: return 100 - recovery;
            case DIRECT: return recovery;
            default: return 0;
        }
    }

    static RecoveryInterval fieller(List<SmeltRecovery> used, RecoveryDefinition definition, RecoverySettings settings) {
        String method = "Fieller";
        int n = used.size();
        if (n < 2) {
            return RecoveryInterval.missing(method, "needs at least 2 smelts (have " + n + ")");
        }
        if (definition == RecoveryDefinition.CALCULATED) {
            return fiellerCalculated(used, settings);
        }
        if (used.stream().map(s -> s.smelt().feed()).distinct().count() > 1) {
            return RecoveryInterval.missing(method, "the condition mixes feeds with different heads: no single ratio");
        }
        double[] perCharge = used.stream().mapToDouble(s -> MetalContent.gradeGpt(definition == RecoveryDefinition.LOSS
                ? s.lossMetal() : s.collectedMetal(), s.smelt().chargeGrams())).toArray();
        SampleSummary a = SampleSummary.of(perCharge);
        HeadGrade head = used.get(0).head();
        double b = head.meanGpt();
        double vb = head.standardError() * head.standardError();
        double theta = a.mean() / b;
        double df = WelchSatterthwaite.effectiveDf(new double[] {a.varianceOfMean() / (b * b), theta * theta * vb
            / (b * b)}, new double[] {n - 1.0, head.df()});
        Fieller.Interval f = Fieller.ratio(a.mean(), b, a.varianceOfMean(), vb, 0, quantile(df, settings));
        return toRecovery(f, definition == RecoveryDefinition.LOSS, df);
    }

    private static RecoveryInterval fiellerCalculated(List<SmeltRecovery> used, RecoverySettings settings) {
        double[] c = used.stream().mapToDouble(SmeltRecovery::collectedMetal).toArray();
        double[] t = used.stream().mapToDouble(s -> s.collectedMetal() + s.lossMetal()).toArray();
        SampleSummary sc = SampleSummary.of(c);
        SampleSummary st = SampleSummary.of(t);
        int n = c.length;
        double cov = new org.apache.commons.math3.stat.correlation.Covariance().covariance(c, t) / n;
        double df = n - 1.0;
        Fieller.Interval f = Fieller.ratio(sc.mean(), st.mean(), sc.varianceOfMean(), st.varianceOfMean(), cov,
                quantile(df, settings));
        return toRecovery(f, false, df);
    }

    private static RecoveryInterval toRecovery(Fieller.Interval f, boolean ofLoss, double df) {
        String method = "Fieller";
        if (!f.bounded()) {
            String pieces = f.kind() == Fieller.Kind.EXCLUSIVE ? String.format(java.util.Locale.ROOT,
                    " (ratio ≤ %.6g or ≥ %.6g)", f.lower(), f.upper()) : "";
            return new RecoveryInterval(method, Double.NaN, Double.NaN, df, "recovery", f.note() + pieces);
        }
        double lo = ofLoss ? 100 * (1 - f.upper()) : 100 * f.lower();
        double hi = ofLoss ? 100 * (1 - f.lower()) : 100 * f.upper();
        if (hi > 100) {
            return new RecoveryInterval(method, lo, 100, df, "recovery", String.format(java.util.Locale.ROOT,
                    "Fieller's upper limit %.4f%% is above 100%% and is capped there", hi));
        }
        return new RecoveryInterval(method, lo, hi, df, "recovery", "");
    }

    private static double quantile(double df, RecoverySettings settings) {
        double p = 1 - (1 - settings.confidence()) / 2;
        return Double.isInfinite(df) ? new NormalDistribution(null, 0, 1).inverseCumulativeProbability(p)
                : new TDistribution(null, df).inverseCumulativeProbability(p);
    }
}
