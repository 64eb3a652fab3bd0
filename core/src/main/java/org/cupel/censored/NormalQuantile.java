package org.cupel.censored;

/**
 * The standard normal quantile Φ⁻¹(p) by Wichura (1988), "Algorithm AS 241: The percentage points of the
 * normal distribution", Applied Statistics 37(3), 477–484, routine PPND16 (accurate to about 1 part in
 * 10¹⁶): for {@code |p − ½| ≤ 0.425} a rational function of degree 7 in {@code 0.180625 − (p − ½)²};
 * otherwise, with {@code r = √(−ln min(p, 1 − p))}, a rational function of degree 7 in {@code r − 1.6}
 * ({@code r ≤ 5}) or {@code r − 5}. ROS needs one quantile per observation; this costs a fraction of
 * Commons Math's {@code NormalDistribution.inverseCumulativeProbability}, which goes through
 * {@code erfInv(2p − 1)} and so also loses relative accuracy for small p (about 1e-12 at p = 4e-6).
 * Checked against scipy's {@code norm.ppf} (testdata/reference/censored/normal_quantile.csv).
 */
final class NormalQuantile {
    private static final double CENTRAL = 0.425;
    private static final double CENTRAL_SQ = 0.180625;
    private static final double NEAR_TAIL = 5;

    private NormalQuantile() {
    }

    /** Φ⁻¹(p); −∞ at p = 0, ∞ at p = 1, NaN outside [0, 1]. */
    static double of(double p) {
        if (!(p >= 0 && p <= 1)) {
            return Double.NaN;
        }
        double q = p - 0.5;
        if (Math.abs(q) <= CENTRAL) {
            return q * central(CENTRAL_SQ - q * q);
        }
        double tail = q < 0 ? p : 1 - p;
        if (tail == 0) {
            return q < 0 ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY;
        }
        double r = Math.sqrt(-Math.log(tail));
        double z = r <= NEAR_TAIL ? nearTail(r - 1.6) : farTail(r - NEAR_TAIL);
        return q < 0 ? -z : z;
    }

    private static double central(double r) {
        double num = ((((((2509.0809287301226727 * r + 33430.575583588128105) * r + 67265.770927008700853) * r
                + 45921.953931549871457) * r + 13731.693765509461125) * r + 1971.5909503065514427) * r
                + 133.14166789178437745) * r + 3.387132872796366608;
        double den = ((((((5226.495278852545925 * r + 28729.085735721942674) * r + 39307.89580009271061) * r
                + 21213.794301586595867) * r + 5394.1960214247511077) * r + 687.1870074920579083) * r
                + 42.313330701600911252) * r + 1.0;
        return num / den;
    }

    private static double nearTail(double r) {
        double num = ((((((7.7454501427834140764e-4 * r + 0.0227238449892691845833) * r
                + 0.24178072517745061177) * r + 1.27045825245236838258) * r + 3.64784832476320460504) * r
                + 5.7694972214606914055) * r + 4.6303378461565452959) * r + 1.42343711074968357734;
        double den = ((((((1.05075007164441684324e-9 * r + 5.475938084995344946e-4) * r
                + 0.0151986665636164571966) * r + 0.14810397642748007459) * r + 0.68976733498510000455) * r
                + 1.6763848301838038494) * r + 2.05319162663775882187) * r + 1.0;
        return num / den;
    }

    private static double farTail(double r) {
        double num = ((((((2.01033439929228813265e-7 * r + 2.71155556874348757815e-5) * r
                + 0.0012426609473880784386) * r + 0.026532189526576123093) * r + 0.29656057182850489123) * r
                + 1.7848265399172913358) * r + 5.4637849111641143699) * r + 6.6579046435011037772;
        double den = ((((((2.04426310338993978564e-15 * r + 1.4215117583164458887e-7) * r
                + 1.8463183175100546818e-5) * r + 7.868691311456132591e-4) * r + 0.0148753612908506148525) * r
                + 0.13692988092273580531) * r + 0.59983220655588793769) * r + 1.0;
        return num / den;
    }
}
