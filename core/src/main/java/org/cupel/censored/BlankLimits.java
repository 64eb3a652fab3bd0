package org.cupel.censored;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.StatUtils;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Numbers;

/**
 * Detection limits estimated from replicate measurements of a blank (or a low-level spike), so that a lab's
 * stated limit can be checked against its own blanks: 3·s (the "three sigma of the blank" convention, common
 * practice, no single source), Currie's L_C and L_D in the t-based and z-based forms ({@link CurrieLimits}), and
 * the two US EPA method detection limits ({@link EpaMdl}): MDL_b from the blanks, which includes their mean, and
 * MDL_s = t·s, which applies to spiked samples.
 *
 * <p>Every value is used. When some replicates are censored, the mean and SD are those of the censored-data
 * summary recommended for the sample ({@link Recommendation}: Kaplan–Meier with divisor n − 1, ROS or maximum
 * likelihood, Helsel 2012), and the Student t quantiles keep n − 1 degrees of freedom, an approximation the note
 * states. When no
 * SD can be estimated (above 80 % censored, or every value censored), the limits built on s are not given and
 * say why; MDL_b, which ranks the blanks, still is.
 *
 * @param n replicates used (every non-missing value)
 * @param detected of which with a number
 * @param below of which below detection
 * @param above of which above range
 * @param missing blank cells and missing-value codes, not replicates
 * @param mean mean of the replicates (censored-data estimate when some are censored)
 * @param sd their SD (divisor n − 1 when none is censored)
 * @param spreadMethod where mean and SD come from: "ordinary" or the censored-data method
 * @param limits the estimates, in the order above
 */
public record BlankLimits(int n, int detected, int below, int above, int missing, Estimate mean, Estimate sd,
                          String spreadMethod, List<LimitEstimate> limits) {

    /** One estimated limit with the rule and source it follows. */
    public record LimitEstimate(String name, Estimate value, String rule, String source) {
    }

    public static final String ORDINARY = "ordinary (no value censored)";

    public BlankLimits {
        limits = List.copyOf(limits);
    }

    public static BlankLimits of(Iterable<AssayValue> replicates) {
        return of(CensoredSample.of(replicates), CensoredSettings.DEFAULTS);
    }

    public static BlankLimits of(CensoredSample s, CensoredSettings settings) {
        int n = s.size();
        Spread spread = spread(s, settings);
        Estimate sd = spread.sd().isAvailable() ? Estimate.of(spread.sd().value(), spread.limitNote())
                : Estimate.unavailable(spread.limitNote());
        Estimate three = sd.isAvailable() ? Estimate.of(3 * sd.value(), sd.note()) : sd;
        List<LimitEstimate> out = new ArrayList<>();
        out.add(new LimitEstimate("3·s", three, "3 × SD of the replicates, a net level above their mean",
                "common practice"));
        out.addAll(CurrieLimits.of(n, sd));
        out.add(EpaMdl.blanks(s));
        out.add(EpaMdl.spiked(n, sd));
        return new BlankLimits(n, s.count(Censoring.DETECTED), s.count(Censoring.BELOW), s.count(Censoring.ABOVE),
                s.missingCount(), spread.mean(), spread.sd(), spread.method(), out);
    }

    /** The limit named {@code name}, e.g. "EPA MDL_b". */
    public LimitEstimate limit(String name) {
        return limits.stream().filter(l -> l.name().equals(name)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no limit named " + name));
    }

    /** @param limitNote the short note each limit built on s carries (empty when nothing is censored) */
    private record Spread(Estimate mean, Estimate sd, String method, String limitNote) {
    }

    /** Mean and SD: ordinary when nothing is censored, else from the recommended censored-data summary. */
    private static Spread spread(CensoredSample s, CensoredSettings settings) {
        int n = s.size();
        if (s.censoredCount() == 0) {
            if (n < 2) {
                String why = "needs at least two replicates, found " + n;
                return new Spread(n == 1 ? Estimate.of(s.lower(0), "") : Estimate.unavailable(why),
                        Estimate.unavailable(why), ORDINARY, why);
            }
            double[] x = s.detects();
            return new Spread(Estimate.of(StatUtils.mean(x), ""), Estimate.of(Math.sqrt(StatUtils.variance(x)), ""),
                    ORDINARY, "");
        }
        CensoredAnalysis a = CensoredAnalysis.of(s, spreadSettings(settings));
        CensoredSummary chosen = a.recommended();
        String counts = s.censoredCount() + " of " + n + " values censored";
        if (chosen == null || !chosen.sd().isAvailable()) {
            String why = counts + ": no SD is estimated (" + a.recommendation().reason() + ")";
            return new Spread(Estimate.unavailable(why), Estimate.unavailable(why), Recommendation.NONE,
                    counts + ": no SD is estimated");
        }
        String note = counts + "; mean and SD by " + chosen.method() + " (" + a.recommendation().reason()
                + "); t quantiles on n − 1 = " + (n - 1) + " degrees of freedom, as if all were detected";
        return new Spread(Estimate.of(chosen.mean().value(), note), Estimate.of(chosen.sd().value(), note),
                chosen.method(), "s by " + chosen.method() + ", " + counts);
    }

    /**
     * The censored-data settings for s: the Kaplan–Meier SD with divisor n − 1 ({@link KaplanMeier.SdDivisor#SAMPLE},
     * the ordinary sample SD when nothing is censored, as the t quantiles on n − 1 degrees of freedom assume), and
     * no ROS bootstrap (only the point estimates are used).
     */
    static CensoredSettings spreadSettings(CensoredSettings settings) {
        return new CensoredSettings(settings.kmLowestMass(), KaplanMeier.SdDivisor.SAMPLE, 0, settings.bootstrapSeed(),
                settings.bootstrapMaxN());
    }

    /** The {@code p} quantile of Student's t with {@code df} degrees of freedom. */
    public static double tQuantile(int df, double p) {
        return new TDistribution(null, df).inverseCumulativeProbability(p);
    }

    /** A one-line account of the replicates: how many of each kind, and that missing values are not used. */
    public String accounting() {
        return n + " replicates used: " + detected + " with a number, " + below + " below detection"
                + (above > 0 ? ", " + above + " above range" : "") + "; " + missing
                + " missing (blank cells or missing-value codes) not used"
                + (spreadMethod.equals(ORDINARY) || spreadMethod.equals(Recommendation.NONE) ? ""
                : "; mean and SD by " + spreadMethod) + (mean.isAvailable() ? "; mean "
                + Numbers.significant(mean.value(), 4) : "") + (sd.isAvailable() ? ", s "
                + Numbers.significant(sd.value(), 4) : "");
    }
}
