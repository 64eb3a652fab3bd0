package org.cupel.censored;

import org.cupel.assay.Numbers;

/**
 * Which estimate a summary reports, from n and the censored fraction, following Helsel (2012),
 * "Statistics for Censored Environmental Data Using Minitab and R", 2nd ed., ch. 8 (summary of methods
 * for computing descriptive statistics; the chapter number and these cut-offs are recalled from memory,
 * check the source): below 50 % censored, Kaplan–Meier (nonparametric, no distribution assumed); 50 to
 * 80 % censored, ROS for n below 50 and maximum likelihood (lognormal) for larger n, because there the
 * distribution must carry the estimate and MLE is efficient once n is large; above 80 % censored, no
 * mean is estimated, only the detection frequency and upper percentiles. Values above range or in
 * intervals need maximum likelihood whatever the fraction, because Kaplan–Meier by flipping and ROS
 * handle values below detection only. Substitution is never recommended.
 *
 * @param method the {@link CensoredSummary#method()} whose estimates the report uses, or {@link #NONE}
 * @param reason one sentence: why, with the source
 */
public record Recommendation(String method, String reason) {
    public static final String NONE = "none";
    /** Sample size from which maximum likelihood is preferred to ROS at 50–80 % censored. */
    public static final int LARGE_N = 50;
    public static final double HALF = 0.50;

    private static final String SOURCE = " (Helsel 2012, ch. 8)";

    public static Recommendation choose(CensoredSample s, CensoredSummary km, CensoredSummary ros,
                                        CensoredSummary mleLognormal, CensoredSummary mleNormal) {
        int n = s.size();
        double f = s.censoredFraction();
        String pct = Numbers.compact(Math.round(1000 * f) / 10.0) + " % censored, n = " + n;
        if (n == 0) {
            return new Recommendation(NONE, "no values to summarise");
        }
        if (s.count(Censoring.DETECTED) == 0) {
            return new Recommendation(NONE, "every value is censored: no estimate of the mean or spread is possible; "
                    + "report the limits");
        }
        if (!s.isLeftCensoredOnly()) {
            return firstApplicable(pct + "; values above range or in intervals need maximum likelihood, which "
                    + "handles every kind of censoring" + SOURCE, mleLognormal, mleNormal);
        }
        if (f > Ros.HEAVY_CENSORING) {
            return new Recommendation(NONE, pct + ": above 80 % censored, no mean is estimated; report the detection "
                    + "frequency and upper percentiles" + SOURCE);
        }
        if (f < HALF) {
            return firstApplicable(pct + ": below 50 % censored, Kaplan–Meier needs no distributional assumption"
                    + SOURCE, km, ros, mleLognormal);
        }
        if (n < LARGE_N) {
            return firstApplicable(pct + ": 50–80 % censored with n below " + LARGE_N + ", ROS is the most robust"
                    + SOURCE, ros, mleLognormal, km);
        }
        return firstApplicable(pct + ": 50–80 % censored with n of " + LARGE_N + " or more, lognormal maximum "
                + "likelihood is efficient" + SOURCE, mleLognormal, ros, km);
    }

    private static Recommendation firstApplicable(String reason, CensoredSummary... inOrder) {
        for (int i = 0; i < inOrder.length; i++) {
            if (inOrder[i].isApplicable()) {
                String fallback = i == 0 ? "" : "; " + inOrder[0].method() + " is not applicable here ("
                        + inOrder[0].notes().get(0) + "), so " + inOrder[i].method() + " is used";
                return new Recommendation(inOrder[i].method(), reason + fallback);
            }
        }
        return new Recommendation(NONE, reason + "; no method is applicable to these data");
    }
}
