package org.cupel.duplicates;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import org.cupel.assay.AssayValue;

/**
 * A pair flagged for a look: its IDs, batch, values and the test that flagged it. Read it original first:
 * {@code originalId} with {@code original}, then {@code id} with {@code duplicate}.
 *
 * <p>The values' text ({@link #original()}, {@link #duplicate()}) is written when asked for, not when the pair is
 * flagged: a set of a million pairs can flag a hundred thousand, of which the JSON lists the first hundred.
 *
 * @param id duplicate sample ID
 * @param originalId original sample ID
 * @param batch the duplicate's batch
 * @param hard HARD of the pair as a fraction (for a pair below the detection-limit multiple it is shown for
 *     reference only: such pairs are neither judged nor ranked by HARD)
 * @param absDifference |original − duplicate| in the analyte's unit
 * @param tests which tests flagged it
 * @param originalValue the original's value (the JSON has {@link #original()}, the value as the lab wrote it)
 * @param duplicateValue the duplicate's value, likewise
 */
@JsonPropertyOrder({"id", "originalId", "batch", "original", "duplicate", "hard", "absDifference", "tests"})
public record OutlierPair(String id, String originalId, String batch, double hard, double absDifference, java.util.List<Test> tests,
                          @JsonIgnore AssayValue originalValue, @JsonIgnore AssayValue duplicateValue) {

    public OutlierPair {
        tests = java.util.List.copyOf(tests);
    }

    /** A flagged pair of the two values, each written as the lab wrote it. */
    public static OutlierPair of(String id, String originalId, String batch, AssayValue original,
                                 AssayValue duplicate, double hard, double absDifference,
                                 java.util.List<Test> tests) {
        return new OutlierPair(id, originalId, batch, hard, absDifference, tests, original, duplicate);
    }

    /** The original as the lab wrote it. */
    @JsonProperty("original")
    public String original() {
        return originalValue.display();
    }

    /** The duplicate as the lab wrote it. */
    @JsonProperty("duplicate")
    public String duplicate() {
        return duplicateValue.display();
    }

    /** "original ID / duplicate ID", the order in which the values are given; the duplicate ID alone without one. */
    public String idsOriginalFirst() {
        return originalId.isEmpty() ? id : originalId + " / " + id;
    }

    /** The tests' labels joined for a table cell. */
    public String testLabels() {
        return String.join("; ", tests.stream().map(Test::label).toList());
    }

    /** The tests that flag a pair. */
    public enum Test {
        /** |d| above the 99 % control line 3.642773·σ_c of the Thompson–Howarth model. */
        ABOVE_99_PERCENT_LINE("|d| above the 99 % line of the Thompson–Howarth model"),
        /** HARD above the type's acceptance limit. */
        OUTSIDE_HARD_LIMIT("HARD above the type's limit");

        private final String label;

        Test(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }
}
