package org.cupel.recovery;

import java.util.List;
import org.cupel.assay.SourceLocation;

/**
 * One smelt (or fire-assay fusion): a charge of a feed under a condition, and its products.
 *
 * @param testId the test's identifier
 * @param condition the condition tested (flux recipe, collector, temperature...)
 * @param replicate replicate label within the condition
 * @param feed the feed the charge was taken from (its head assays are in {@link Testwork#heads()})
 * @param chargeGrams mass of feed charged, in grams
 * @param products the weighed products
 * @param where the first row it was read from
 */
public record Smelt(String testId, String condition, String replicate, String feed, double chargeGrams,
                    List<Product> products, SourceLocation where) {
    public Smelt {
        products = List.copyOf(products);
    }
}
