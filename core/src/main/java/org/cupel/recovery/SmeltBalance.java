package org.cupel.recovery;

import java.util.List;

/**
 * The reconciled metal balance of one smelt for one analyte: the metal in the charge and in each product,
 * adjusted by {@link Reconciliation} under the single constraint metal in charge = Σ metal in products, with
 * variances from the measurement uncertainties: u_r²(metal) = u_r²(mass) + u_r²(grade) (JCGM 100:2008 §5.1.6),
 * mass from the balance resolution, grade from the assay precision (a censored assay: rectangular over
 * [0, DL], u = DL/√12), the charge's grade from the head grade's standard error.
 *
 * @param testId the smelt
 * @param analyte the analyte
 * @param variables "charge" then the product names
 * @param reconciliation measured and adjusted metal (g), χ² closure test
 * @param reconciledRecovery 100 · adjusted collected / adjusted charge metal
 * @param note why it could not be reconciled, empty when it was
 */
public record SmeltBalance(String testId, String analyte, List<String> variables, Reconciliation reconciliation,
                           double reconciledRecovery, String note) {

    /** Variance, relative to the largest in the balance, given to a quantity known without error. */
    private static final double HELD_FIXED = 1e-24;

    /** Whether the χ² test rejects closure at α. */
    public boolean rejectsClosure(double alpha) {
        return reconciliation != null && reconciliation.p() < alpha;
    }

    static SmeltBalance of(SmeltRecovery s, RecoverySettings settings) {
        String id = s.smelt().testId();
        if (!s.usable()) {
            return new SmeltBalance(id, s.analyte(), List.of(), null, Double.NaN, s.note());
        }
        int k = s.products().size();
        double[] x = new double[k + 1];
        double[] v = new double[k + 1];
        double[][] a = new double[1][k + 1];
        double um = settings.massUncertaintyGrams();
        x[0] = s.metalInCharge();
        v[0] = x[0] * x[0] * (square(um / s.smelt().chargeGrams()) + square(s.head().relativeStandardError()));
        a[0][0] = 1;
        java.util.ArrayList<String> names = new java.util.ArrayList<>(List.of("charge"));
        for (int i = 0; i < k; i++) {
            ProductMetal p = s.products().get(i);
            names.add(p.product());
            x[i + 1] = p.metalGrams();
            double ug = p.censored() ? p.limitGpt() / Math.sqrt(12) : settings.assayUncertainty(p.product(),
                    p.role() == ProductRole.COLLECTED ? "collected" : "loss", p.gradeGpt());
            v[i + 1] = MetalContent.grams(p.massGrams(), ug) * MetalContent.grams(p.massGrams(), ug)
                    + square(MetalContent.grams(um, p.gradeGpt()));
            a[0][i + 1] = -1;
        }
        if (java.util.Arrays.stream(v).sum() <= 0 || java.util.Arrays.stream(v).anyMatch(d -> d < 0 || !Double.isFinite(d))) {
            return new SmeltBalance(id, s.analyte(), names, null, Double.NaN,
                    "no measurement uncertainty to weight the balance with: set recovery.assayRelativeSd");
        }
        double largest = java.util.Arrays.stream(v).max().orElse(0);
        for (int i = 0; i < v.length; i++) {
            // A product with no metal (a censored assay counted as zero) has no variance: it is held fixed,
            // which a variance negligible beside the others does. Relative, so that the balance of a charge
            // holding micrograms of metal is reconciled as one holding kilograms is.
            v[i] = Math.max(v[i], HELD_FIXED * largest);
        }
        Reconciliation r = Reconciliation.adjust(x, v, a);
        double collected = 0;
        for (int i = 0; i < k; i++) {
            if (s.products().get(i).role() == ProductRole.COLLECTED) {
                collected += r.adjusted()[i + 1];
            }
        }
        return new SmeltBalance(id, s.analyte(), names, r, 100 * collected / r.adjusted()[0], "");
    }

    private static double square(double d) {
        return d * d;
    }
}
