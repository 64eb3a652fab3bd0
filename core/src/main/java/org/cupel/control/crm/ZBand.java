package org.cupel.control.crm;

/**
 * The performance bands of ISO 13528 (Statistical methods for use in proficiency testing by
 * interlaboratory comparison) for a z-score: |z| ≤ 2 satisfactory, 2 &lt; |z| &lt; 3 questionable,
 * |z| ≥ 3 unsatisfactory. Note the bands put |z| = 3 in "unsatisfactory" while the 1₃s rule needs
 * |z| &gt; 3 ({@link CrmRule}).
 */
public enum ZBand {
    SATISFACTORY,
    QUESTIONABLE,
    UNSATISFACTORY;

    public static ZBand of(double z) {
        double a = Math.abs(z);
        if (a <= 2) {
            return SATISFACTORY;
        }
        return a < 3 ? QUESTIONABLE : UNSATISFACTORY;
    }
}
