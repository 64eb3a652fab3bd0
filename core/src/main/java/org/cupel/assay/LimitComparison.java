package org.cupel.assay;

/**
 * How every QC decision compares a value with a limit: a z-score with ±1, ±2 and ±3 SD (the ISO 13528
 * bands and every Westgard, Western Electric and Nelson rule), a blank with k × its detection limit, a
 * pair's HARD with its type's limit, a duplicate difference with a Thompson–Howarth control line. A value
 * <em>on</em> a limit is neither beyond it nor within it; "on" is decided with a relative tolerance, not
 * by the last bit of a binary double.
 *
 * <p>Why a tolerance is needed: reported results are short decimals, and decimals are not binary
 * fractions. 1.100 on a CRM certified at 1.000 with SD 0.050 is exactly +2 SD, yet the double
 * (1.1 − 1.0)/0.05 is 2.0000000000000018, while the symmetric 0.900 gives −1.9999999999999996; the pair
 * 1.1 / 0.9 has HARD |1.1 − 0.9|/(1.1 + 0.9) = 0.10000000000000003 although 11 / 9 gives exactly 0.1.
 * Compared bit for bit, one of two results that are equally far from the certified value fails and the
 * other passes. Here {@code v} is on the limit {@code L} when |v − L| ≤ {@value #RELATIVE_TOLERANCE} ·
 * max(|v|, |L|).
 *
 * <p>Why 1e-9 relative: the arithmetic of z, HARD, k × DL and of a control line is a few operations on
 * decimals of at most about 7 significant digits. Each operation is correctly rounded (IEEE 754, relative
 * error at most 2⁻⁵³ ≈ 1.1e-16); the one subtraction x − certified magnifies the representation error of x
 * by |x|/|x − certified|, which at a 2 or 3 SD limit is |x| / (2 or 3 SD). For a CRM whose SD is 10⁻⁶ of
 * its value (real certificates have 0.5–15 %) this stays below 1e-9, so every exact decimal tie is caught.
 * On the other side, the smallest real difference a lab can report is one unit in the last printed digit:
 * on a z-score that is 10^(−digits) / SD, and for it to fall inside 1e-9 · |z| the SD would have to exceed
 * the reporting resolution by about nine orders of magnitude; for HARD and k × DL it is about 1e-7
 * relative or more. So a value a real hair beyond a limit is still beyond it (2.002 SD is beyond 2 SD;
 * a blank of 0.0251 is above 5 × 0.005). Exact equality is kept where the limit is zero: only a value of
 * exactly zero is on it (the centre line of a run rule, a control line clipped at zero).
 */
public final class LimitComparison {
    /** Relative tolerance within which a value counts as on its limit. */
    public static final double RELATIVE_TOLERANCE = 1e-9;

    private LimitComparison() {
    }

    /** Whether {@code value} equals {@code limit} within the tolerance: |v − L| ≤ 1e-9 · max(|v|, |L|). */
    public static boolean onLimit(double value, double limit) {
        return Math.abs(value - limit) <= RELATIVE_TOLERANCE * Math.max(Math.abs(value), Math.abs(limit));
    }

    /** Strictly above the limit: {@code value > limit} and not on it. False for NaN. */
    public static boolean above(double value, double limit) {
        return value > limit && !onLimit(value, limit);
    }

    /** Strictly below the limit: {@code value < limit} and not on it. False for NaN. */
    public static boolean below(double value, double limit) {
        return value < limit && !onLimit(value, limit);
    }

    /** At or below the limit (not above it). False for NaN. */
    public static boolean atMost(double value, double limit) {
        return value <= limit || onLimit(value, limit);
    }

    /** At or above the limit (not below it). False for NaN. */
    public static boolean atLeast(double value, double limit) {
        return value >= limit || onLimit(value, limit);
    }

    /** "Beyond k SD": |z| strictly above {@code k} (k ≥ 0). */
    public static boolean beyond(double z, double k) {
        return above(Math.abs(z), k);
    }

    /** "Within k SD": |z| strictly below {@code k} (k ≥ 0). */
    public static boolean within(double z, double k) {
        return below(Math.abs(z), k);
    }
}
