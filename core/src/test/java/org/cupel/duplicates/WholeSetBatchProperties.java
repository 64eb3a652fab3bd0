package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.cupel.assay.QcRole;
import org.cupel.duplicates.SideBySideEquivalenceProperties.SetInput;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * The summary of a batch that holds the whole set, taken from the set's summary
 * ({@link PrecisionMeasures#summariseWholeSetAsBatch}), is the summary computed for the batch on its own
 * ({@link PrecisionMeasures#summariseBatch}), every field bit for bit ({@link Estimate} and the other records
 * compare their doubles by {@link Double#compare}).
 */
class WholeSetBatchProperties {

    /** No pair, one (no RMS CV: it needs two), and both sides of the bootstrap limit of 5,000 pairs. */
    private static final List<Gen<SetInput>> EDGES = List.of(r -> new SetInput(r.nextLong(), 0, true),
            r -> new SetInput(r.nextLong(), 1, false), r -> new SetInput(r.nextLong(), 2, false),
            r -> new SetInput(r.nextLong(), 5000, true), r -> new SetInput(r.nextLong(), 5001, false));

    @Test
    void theWholeSetAsABatchIsTheBatchSummarisedOnItsOwn() {
        Gen<Integer> n = Gen.oneOf(Gen.ints(0, 60), Gen.ints(60, 7000));
        SeededTries.forAll(60, EDGES, r -> new SetInput(r.nextLong(), n.next(r), r.nextBoolean()), in -> {
            QcRole type = QcRole.FIELD_DUPLICATE;
            DuplicateSettings settings = DuplicateSettings.DEFAULTS;
            ScreenedPairs set = PairScreen.decide(SideBySideEquivalenceProperties.pairs(in), settings).all();
            BatchRuleTest rule = PrecisionMeasures.batchRule(type, set, settings);
            assertEquals(PrecisionMeasures.summariseBatch(type, set, settings, rule),
                    PrecisionMeasures.summariseWholeSetAsBatch(PrecisionMeasures.summarise(type, set, settings), rule));
        });
    }
}
