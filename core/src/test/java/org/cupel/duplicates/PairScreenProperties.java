package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * Screening a batch from the set's decisions must give exactly what screening the batch's pairs on their
 * own gives: the per-batch precision is computed from the decisions, so that each pair is judged once.
 */
class PairScreenProperties {

    /** A set of pairs, the censored-at-half-limit setting, and a seed that picks the batch's subset. */
    record Screening(List<DuplicatePair> pairs, boolean halfLimit, long seed) {
    }

    @Test
    void aSubsetAssembledFromDecisionsEqualsScreeningItAlone() {
        List<Gen<Screening>> empty = List.of(r -> new Screening(List.of(), r.nextBoolean(), r.nextLong()));
        SeededTries.forAll(300, empty, r -> new Screening(PAIRS.next(r), r.nextBoolean(), r.nextLong()), in -> {
            List<DuplicatePair> pairs = in.pairs();
            DuplicateSettings settings = in.halfLimit() ? DuplicateSettings.withDefaults().censoredAtHalfLimit(true).build()
                    : DuplicateSettings.DEFAULTS;
            PairScreen.Decisions decisions = PairScreen.decide(pairs, settings);
            assertEquals(PairScreen.screen(pairs, settings), decisions.all());
            Random pick = new Random(in.seed());
            List<DuplicatePair> subset = new ArrayList<>();
            int[] indices = new int[pairs.size()];
            for (int i = 0; i < pairs.size(); i++) {
                if (pick.nextBoolean()) {
                    indices[subset.size()] = i;
                    subset.add(pairs.get(i));
                }
            }
            assertEquals(PairScreen.screen(subset, settings), decisions.of(Arrays.copyOf(indices, subset.size())));
        });
    }

    private static final Gen<AssayValue> VALUE = Gen.oneOf(
            Gen.doubles(0.001, 50, 4).map(v -> AssayValue.detected(v, 0.01)),
            Gen.doubles(0.001, 50, 4).map(AssayValue::detected),
            // near the limit, where the detection-limit multiple decides
            Gen.doubles(0.001, 0.3, 4).map(v -> AssayValue.detected(v, 0.01)),
            Gen.of(0.01, 0.05).map(AssayValue::belowDetection),
            Gen.constant(AssayValue.aboveUpperLimit(100)),
            Gen.constant(AssayValue.missing(MissingReason.INSUFFICIENT_SAMPLE)),
            Gen.constant(AssayValue.detected(0.0, 0.01)));

    private static final Gen<DuplicatePair> PAIR = r -> new DuplicatePair("D", "S", "B", QcRole.FIELD_DUPLICATE,
            VALUE.next(r), VALUE.next(r));

    /** Up to 40 field duplicate pairs of any kind of result. */
    private static final Gen<List<DuplicatePair>> PAIRS = PAIR.list(0, 40);
}
