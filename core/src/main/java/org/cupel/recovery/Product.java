package org.cupel.recovery;

import java.util.Map;
import org.cupel.assay.AssayValue;
import org.cupel.assay.SourceLocation;

/**
 * One weighed and assayed product of a smelt.
 *
 * @param name as the user named it (button, slag, matte...)
 * @param role collected or loss
 * @param massGrams mass in grams
 * @param grades assay per analyte, in g/t
 * @param where the row it was read from
 */
public record Product(String name, ProductRole role, double massGrams, Map<String, AssayValue> grades,
                      SourceLocation where) {
    public Product {
        grades = Map.copyOf(grades);
    }

    /** The assay of {@code analyte}, missing (not analysed) when the product was not assayed for it. */
    public AssayValue grade(String analyte) {
        AssayValue v = grades.get(analyte);
        return v == null ? AssayValue.missing(org.cupel.assay.MissingReason.NOT_ANALYSED) : v;
    }
}
