package org.cupel.control.crm;

import java.util.List;
import java.util.Optional;
import org.cupel.assay.AssayValue;
import org.cupel.assay.LimitComparison;
import org.cupel.project.CrmCertificate;

/**
 * Whether a failing CRM result is better explained by a mix-up than by the lab: it lies within
 * {@code withinSd} SD of another CRM's certified value (that CRM's SD), or at blank level (at or below
 * {@code blankMultiple} × its detection limit). The idea of reading a wild CRM result as a mislabelled
 * material follows Smee, Bloom, Arne &amp; Heberlein 2024 (Geochemistry: Exploration, Environment,
 * Analysis 24). When several CRMs match, the closest in SD units is named.
 */
final class SwapCheck {
    /** The label used in {@link CrmResult#swapWith()} for a blank-level value. */
    public static final String BLANK = "blank";

    private SwapCheck() {
    }

    /** The matching CRM code, {@link #BLANK}, or empty. */
    public static Optional<String> match(AssayValue value, CrmCertificate own, List<CrmCertificate> others,
                                         double withinSd, double blankMultiple) {
        String best = null;
        double bestZ = Double.POSITIVE_INFINITY;
        for (CrmCertificate c : others) {
            if (c.code().equals(own.code())) {
                continue;
            }
            double z = Math.abs(value.value() - c.certifiedValue()) / c.sd();
            if (LimitComparison.atMost(z, withinSd) && z < bestZ) {
                best = c.code();
                bestZ = z;
            }
        }
        if (best != null) {
            return Optional.of(best);
        }
        boolean blankLevel = Double.isFinite(value.limit()) && blankMultiple > 0
                && LimitComparison.atMost(value.value(), blankMultiple * value.limit())
                && LimitComparison.above(own.certifiedValue(), blankMultiple * value.limit());
        return blankLevel ? Optional.of(BLANK) : Optional.empty();
    }
}
