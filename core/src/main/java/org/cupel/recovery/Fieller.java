package org.cupel.recovery;

/**
 * Fieller's (1954, "Some problems in interval estimation", J. R. Statist. Soc. B 16; first in Fieller
 * 1940) confidence set for a ratio θ = α/β of two estimated quantities a, b with variances v_a, v_b and
 * covariance c: the θ with (a − θb)² ≤ t²(v_a − 2θc + θ²v_b). With
 * A = b² − t²v_b, B = ab − t²c, C = a² − t²v_a and D = B² − AC:
 * <ul>
 *   <li>A &gt; 0: a bounded interval [(B − √D)/A, (B + √D)/A];</li>
 *   <li>A &lt; 0, D &gt; 0: two unbounded pieces (−∞, (B + √D)/A] ∪ [(B − √D)/A, ∞), excluding an interval
 *       around a/b (the denominator is not distinguishable from zero);</li>
 *   <li>A &lt; 0, D &lt; 0 (or A = 0): the whole line — the data say nothing about the ratio.</li>
 * </ul>
 */
public final class Fieller {
    private Fieller() {
    }

    /** Which kind of set the data give. */
    public enum Kind { BOUNDED, EXCLUSIVE, WHOLE_LINE }

    /**
     * A Fieller confidence set.
     *
     * @param kind its shape
     * @param estimate a/b
     * @param lower for {@code BOUNDED} the lower end; for {@code EXCLUSIVE} the upper end of the lower piece
     *     (−∞, lower]; {@code NaN} for the whole line
     * @param upper for {@code BOUNDED} the upper end; for {@code EXCLUSIVE} the lower end of the upper piece
     *     [upper, ∞); {@code NaN} for the whole line
     * @param note a sentence saying what the set means
     */
    public record Interval(Kind kind, double estimate, double lower, double upper, String note) {
        public boolean bounded() {
            return kind == Kind.BOUNDED;
        }
    }

    public static Interval ratio(double a, double b, double va, double vb, double cov, double t) {
        double t2 = t * t;
        double bigA = b * b - t2 * vb;
        double bigB = a * b - t2 * cov;
        double bigC = a * a - t2 * va;
        double bigD = bigB * bigB - bigA * bigC;
        double estimate = a / b;
        if (bigA > 0) {
            double root = Math.sqrt(Math.max(0, bigD));
            return new Interval(Kind.BOUNDED, estimate, (bigB - root) / bigA, (bigB + root) / bigA, "");
        }
        if (bigA < 0 && bigD > 0) {
            double root = Math.sqrt(bigD);
            return new Interval(Kind.EXCLUSIVE, estimate, (bigB + root) / bigA, (bigB - root) / bigA,
                    "the denominator is not significantly different from zero: the set is two unbounded pieces");
        }
        return new Interval(Kind.WHOLE_LINE, estimate, Double.NaN, Double.NaN,
                "the denominator is not significantly different from zero: the set is the whole line, "
                        + "the data do not bound the ratio");
    }
}
