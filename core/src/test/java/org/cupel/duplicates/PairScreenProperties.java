package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;

/**
 * Screening a batch from the set's decisions must give exactly what screening the batch's pairs on their
 * own gives: the per-batch precision is computed from the decisions, so that each pair is judged once.
 */
class PairScreenProperties {

    @Property(tries = 300)
    void aSubsetAssembledFromDecisionsEqualsScreeningItAlone(@ForAll("pairs") List<DuplicatePair> pairs,
                                                            @ForAll boolean halfLimit, @ForAll long seed) {
        DuplicateSettings settings = halfLimit ? DuplicateSettings.DEFAULTS.withCensoredAtHalfLimit(true)
                : DuplicateSettings.DEFAULTS;
        PairScreen.Decisions decisions = PairScreen.decide(pairs, settings);
        assertEquals(PairScreen.screen(pairs, settings), decisions.all());
        java.util.Random pick = new java.util.Random(seed);
        List<DuplicatePair> subset = new ArrayList<>();
        int[] indices = new int[pairs.size()];
        for (int i = 0; i < pairs.size(); i++) {
            if (pick.nextBoolean()) {
                indices[subset.size()] = i;
                subset.add(pairs.get(i));
            }
        }
        assertEquals(PairScreen.screen(subset, settings),
                decisions.of(java.util.Arrays.copyOf(indices, subset.size())));
    }

    @Provide
    Arbitrary<List<DuplicatePair>> pairs() {
        Arbitrary<AssayValue> value = Arbitraries.oneOf(
                Arbitraries.doubles().between(0.001, 50).ofScale(4).map(v -> AssayValue.detected(v, 0.01)),
                Arbitraries.doubles().between(0.001, 50).ofScale(4).map(AssayValue::detected),
                // near the limit, where the detection-limit multiple decides
                Arbitraries.doubles().between(0.001, 0.3).ofScale(4).map(v -> AssayValue.detected(v, 0.01)),
                Arbitraries.of(0.01, 0.05).map(AssayValue::belowDetection),
                Arbitraries.just(AssayValue.aboveUpperLimit(100)),
                Arbitraries.just(AssayValue.missing(MissingReason.INSUFFICIENT_SAMPLE)),
                Arbitraries.just(AssayValue.detected(0.0, 0.01)));
        Arbitrary<DuplicatePair> pair = Combinators.combine(value, value)
                .as((a, b) -> new DuplicatePair("D", "S", "B", QcRole.FIELD_DUPLICATE, a, b));
        return pair.list().ofMaxSize(40);
    }
}
