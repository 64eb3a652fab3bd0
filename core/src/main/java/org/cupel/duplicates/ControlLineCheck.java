package org.cupel.duplicates;

import java.util.List;
import org.apache.commons.statistics.distribution.BinomialDistribution;

/**
 * Pairs above a percentile line |d| = q·σ_c of the fitted model, and whether that count is more (or fewer)
 * than the model allows: under the model each pair exceeds the line with probability 1 − p, so the count is
 * binomial(n, 1 − p); the p-value is the upper tail P(X ≥ count) (derived from the model; the check is
 * attributed to Garrett and Grunsky 2003, Computers &amp; Geosciences 29, a citation recalled from memory that a
 * search could not confirm).
 *
 * @param percentile 90 or 99
 * @param factor q, the multiple of σ_c (2.326174 or 3.642773)
 * @param n pairs tested
 * @param exceedances pairs with |d| above the line
 * @param expected n·(1 − p)
 * @param pValue upper-tail binomial p-value of the count, P(X ≥ count)
 * @param pValueLower lower-tail binomial p-value, P(X ≤ count): small when the model overstates σ_c
 */
public record ControlLineCheck(double percentile, double factor, int n, int exceedances, double expected,
                               double pValue, double pValueLower) {
    /** Each line's count is tested at this level; two tests, so the model is questioned at most at 2 %. */
    public static final double FIT_ALPHA = 0.01;

    /** Whether the count is improbably high under the model (p below {@link #FIT_ALPHA}). */
    public boolean tooMany() {
        return pValue < FIT_ALPHA;
    }

    /** Whether the count is improbably low under the model (lower-tail p below {@link #FIT_ALPHA}). */
    public boolean tooFew() {
        return pValueLower < FIT_ALPHA;
    }

    /** The check of {@code count} of {@code n} pairs above the line of {@code percentile} (q = {@code factor}). */
    public static ControlLineCheck of(double percentile, double factor, int n, int count) {
        double pExceed = 1.0 - percentile / 100.0;
        // The survival function, not 1 − F: a small upper p keeps its digits (1 − F loses them below ~1e-16).
        BinomialDistribution binomial = BinomialDistribution.of(n, pExceed);
        return new ControlLineCheck(percentile, factor, n, count, n * pExceed, binomial.survivalProbability(count - 1),
                binomial.cumulativeProbability(count));
    }

    /**
     * Empty when neither count is improbably high; otherwise a sentence for the reader: the model does not
     * describe these pairs (errors heavier-tailed than normal, or a σ_c that is wrong at some grades), so its
     * σ₀, k and flagged pairs are to be read with that in mind.
     */
    public static String fitNote(ControlLineCheck line90, ControlLineCheck line99) {
        List<String> parts = new java.util.ArrayList<>();
        boolean many = false;
        boolean few = false;
        for (ControlLineCheck c : List.of(line90, line99)) {
            if (c.tooMany() || c.tooFew()) {
                many |= c.tooMany();
                few |= c.tooFew();
                parts.add(c.exceedances() + " pairs above the " + (int) c.percentile() + " % line where "
                        + org.cupel.assay.Numbers.compact(Math.round(c.expected() * 10) / 10.0) + " are expected "
                        + "(binomial p = " + org.cupel.assay.Numbers.significant(c.tooMany() ? c.pValue()
                        : c.pValueLower(), 2) + ", " + (c.tooMany() ? "upper" : "lower") + " tail)");
            }
        }
        if (parts.isEmpty()) {
            return "";
        }
        String why = (many ? "the errors are heavier-tailed than normal or σ_c is understated at some grades, so "
                + "pairs above the 99 % line are not all outliers" : "")
                + (many && few ? "; " : "")
                + (few ? "σ_c is overstated at some grades, so pairs there that are too far apart are not flagged"
                : "");
        return "the model does not fit these pairs: " + String.join(" and ", parts) + " (each tail tested at p < "
                + org.cupel.assay.Numbers.compact(FIT_ALPHA) + "); " + why;
    }
}
