package org.cupel.control.crm;

import org.cupel.assay.LimitComparison;

/**
 * The results of one CRM series that are single outliers rather than part of a drift: a result beyond ±3 SD
 * (what 1-3s flags) whose neighbours in the series — the results just before and just after it — are not
 * beyond 2 SD on the same side. Such a point says one measurement went wrong (a weighing, a dilution, a
 * transcription), not that the lab's level moved: Westgard, Barry, Hunt &amp; Groth (1981, Clin. Chem. 27(3))
 * assign 1₃s to random error and the run rules 2₂s, 4₁s and 10ₓ to systematic error (recalled from memory).
 *
 * <p>The drift statistics are built for the other case. The EWMA of the NIST/SEMATECH e-Handbook (6.3.2.4)
 * with λ = 0.2 moves by 0.2·z on one result, so a single 5 SD result takes it to about 1.0 against an
 * asymptotic limit of 3·√(0.2/1.8) = 1.0; a least-squares trend is pulled by one point at the end of a short
 * series. Control-chart practice removes points with an assignable cause before judging what remains
 * (Montgomery, Introduction to Statistical Quality Control, the Phase I use of control charts; recalled from
 * memory); here the assignable cause is the single outlier, already failed by 1-3s, and the drift statistics
 * are computed without it. A step shift or a trend of several SD is kept whole: each of its results has a
 * neighbour beyond 2 SD on its side.
 */
final class IsolatedOutliers {
    private IsolatedOutliers() {
    }

    /** For each z of a series in series order, whether it is an isolated outlier. */
    static boolean[] of(double[] z) {
        boolean[] out = new boolean[z.length];
        for (int i = 0; i < z.length; i++) {
            if (!LimitComparison.beyond(z[i], 3)) {
                continue;
            }
            double side = Math.signum(z[i]);
            boolean before = i > 0 && LimitComparison.above(side * z[i - 1], 2);
            boolean after = i + 1 < z.length && LimitComparison.above(side * z[i + 1], 2);
            out[i] = !before && !after;
        }
        return out;
    }
}
