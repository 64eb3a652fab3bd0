package org.cupel.control.crm;

import org.cupel.assay.LimitComparison;

/**
 * The performance bands of ISO 13528 (Statistical methods for use in proficiency testing by
 * interlaboratory comparison) for a z-score: |z| ≤ 2 satisfactory, 2 &lt; |z| &lt; 3 questionable,
 * |z| ≥ 3 unsatisfactory. Note the bands put |z| = 3 in "unsatisfactory" while the 1₃s rule needs
 * |z| &gt; 3 ({@link CrmRule}). "= 2" and "= 3" are judged by {@link LimitComparison}: a result exactly
 * 3 SD from the certified value in its reported decimals is unsatisfactory even when the computed z is
 * 2.9999999999999996.
 */
public enum ZBand {
    SATISFACTORY,
    QUESTIONABLE,
    UNSATISFACTORY;

    public static ZBand of(double z) {
        double a = Math.abs(z);
        if (LimitComparison.atMost(a, 2)) {
            return SATISFACTORY;
        }
        return LimitComparison.below(a, 3) ? QUESTIONABLE : UNSATISFACTORY;
    }
}
