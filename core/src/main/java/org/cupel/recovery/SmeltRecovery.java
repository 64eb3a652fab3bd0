package org.cupel.recovery;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.AssayValue;

/**
 * Recovery of one analyte in one smelt by each definition, in percent (common practice):
 * <pre>
 *   M = charge mass × head grade                     metal in charge
 *   by loss:  R = 100 (1 − Σ_loss m_p g_p / M)
 *   direct:   R = 100 Σ_collected m_p g_p / M
 *   by calculated head: R = 100 Σ_collected / Σ_all products,  calculated head = Σ_all / charge mass
 *   accountability = calculated head / assayed head
 * </pre>
 * A below-detection loss assay bounds the recovery by loss: R ∈ [100(1 − (D + Σ m_p·DL_p)/M), 100(1 − D/M)]
 * with D the metal in the detected losses (derived here; for one slag it is [1 − m_slag·DL/M, 1]).
 *
 * @param smelt the smelt
 * @param analyte the analyte
 * @param censoredAs how censored product assays were counted
 * @param head the feed's head grade
 * @param metalInCharge M in grams
 * @param products metal per product
 * @param collectedMetal grams in collected products
 * @param lossMetal grams in loss products
 * @param byLoss recovery by loss (%)
 * @param direct direct recovery (%)
 * @param calculated recovery against the calculated head (%)
 * @param calculatedHeadGpt Σ products / charge mass in g/t
 * @param accountability calculated head / assayed head
 * @param balanceCloses |accountability − 1| within the tolerance
 * @param lowerBound lower bound of the recovery by loss when a loss assay is censored, else {@link #byLoss}
 * @param upperBound upper bound likewise
 * @param note why values are missing, empty when all were computed
 */
public record SmeltRecovery(Smelt smelt, String analyte, CensoredAs censoredAs, HeadGrade head, double metalInCharge,
                            List<ProductMetal> products, double collectedMetal, double lossMetal, double byLoss,
                            double direct, double calculated, double calculatedHeadGpt, double accountability,
                            boolean balanceCloses, double lowerBound, double upperBound, String note) {

    public SmeltRecovery {
        products = List.copyOf(products);
    }

    public boolean usable() {
        return note.isEmpty();
    }

    /** Whether any loss assay was below detection. */
    public boolean lossCensored() {
        return products.stream().anyMatch(p -> p.censored() && p.role() == ProductRole.LOSS);
    }

    public double value(RecoveryDefinition definition) {
        switch (definition) {
            case LOSS: return byLoss;
            case DIRECT: return direct;
            default: return calculated;
        }
    }

    static SmeltRecovery compute(Smelt smelt, String analyte, HeadGrade head, CensoredAs censoredAs,
                                 double balanceTolerance) {
        List<ProductMetal> metals = new ArrayList<>();
        for (Product p : smelt.products()) {
            AssayValue g = p.grade(analyte);
            if (g.isMissing()) {
                return unusable(smelt, analyte, censoredAs, head, metals, "product '" + p.name() + "' has no "
                        + analyte + " assay (" + g.display() + ") at " + p.where() + ": the balance cannot be made");
            }
            double grade = censoredAs.valueOf(g);
            boolean censored = g.qualifier() == org.cupel.assay.Qualifier.BELOW_DETECTION;
            metals.add(new ProductMetal(p.name(), p.role(), p.massGrams(), grade,
                    MetalContent.grams(p.massGrams(), grade), censored, censored ? g.value() : Double.NaN));
        }
        if (!head.usable()) {
            return unusable(smelt, analyte, censoredAs, head, metals, head.note());
        }
        double charge = MetalContent.grams(smelt.chargeGrams(), head.meanGpt());
        double collected = sum(metals, ProductRole.COLLECTED);
        double loss = sum(metals, ProductRole.LOSS);
        double total = collected + loss;
        double calcHead = MetalContent.gradeGpt(total, smelt.chargeGrams());
        double accountability = calcHead / head.meanGpt();
        double detectedLoss = metals.stream().filter(m -> m.role() == ProductRole.LOSS && !m.censored())
                .mapToDouble(ProductMetal::metalGrams).sum();
        double censoredAtLimit = metals.stream().filter(m -> m.role() == ProductRole.LOSS && m.censored())
                .mapToDouble(m -> MetalContent.grams(m.massGrams(), m.limitGpt())).sum();
        double byLoss = 100 * (1 - loss / charge);
        return new SmeltRecovery(smelt, analyte, censoredAs, head, charge, metals, collected, loss, byLoss,
                100 * collected / charge, total > 0 ? 100 * collected / total : Double.NaN, calcHead, accountability,
                Math.abs(accountability - 1) <= balanceTolerance,
                100 * (1 - (detectedLoss + censoredAtLimit) / charge), 100 * (1 - detectedLoss / charge), "");
    }

    private static double sum(List<ProductMetal> metals, ProductRole role) {
        return metals.stream().filter(m -> m.role() == role).mapToDouble(ProductMetal::metalGrams).sum();
    }

    private static SmeltRecovery unusable(Smelt smelt, String analyte, CensoredAs censoredAs, HeadGrade head,
                                          List<ProductMetal> metals, String why) {
        double nan = Double.NaN;
        return new SmeltRecovery(smelt, analyte, censoredAs, head, nan, metals, nan, nan, nan, nan, nan, nan, nan,
                false, nan, nan, why);
    }
}
