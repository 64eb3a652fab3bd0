package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import java.util.function.ToDoubleFunction;
import org.cupel.duplicates.SideBySideEquivalenceProperties.SetInput;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * The flagged pairs made when read ({@link FlaggedPairList}) are the list the analysis built before: every
 * flagged pair as an {@link OutlierPair}, in row order, then sorted by a stable sort on the key, largest first
 * (the replaced code, written here with {@link List#sort}). Values are on a 0.001 grid, so equal keys (the case
 * the row order decides) are common.
 */
class FlaggedPairListProperties {

    @Test
    void theListMadeWhenReadIsTheStableSortOfThePairs() {
        List<Gen<SetInput>> edges = List.of(r -> new SetInput(r.nextLong(), 0, false),
                r -> new SetInput(r.nextLong(), 1, true), r -> new SetInput(r.nextLong(), 5000, true));
        SeededTries.forAll(100, edges, r -> new SetInput(r.nextLong(), r.nextInt(5000), r.nextBoolean()), in -> {
            List<DuplicatePair> pairs = SideBySideEquivalenceProperties.pairs(in);
            Random pick = new Random(in.seed());
            byte[] tests = new byte[pairs.size()];
            List<Integer> rows = new ArrayList<>();
            for (int i = 0; i < pairs.size(); i++) {
                tests[i] = (byte) (pick.nextInt(4) == 0 ? 1 + pick.nextInt(3) : 0);
                // Only pairs with two values are flagged (screening leaves out missing ones).
                boolean twoValues = !pairs.get(i).original().isMissing() && !pairs.get(i).duplicate().isMissing();
                if (tests[i] != 0 && twoValues && pick.nextBoolean()) {
                    rows.add(i);
                }
            }
            int[] chosen = rows.stream().mapToInt(Integer::intValue).toArray();
            assertEquals(replaced(pairs, rows, tests, OutlierPair::hard),
                    new ArrayList<>(FlaggedPairList.descending(pairs, chosen, tests, PairMeasures::hard)));
            assertEquals(replaced(pairs, rows, tests, OutlierPair::absDifference),
                    new ArrayList<>(FlaggedPairList.descending(pairs, chosen, tests, PairMeasures::absDifference)));
        });
    }

    @Test
    void theListCannotBeChanged() {
        List<DuplicatePair> pairs = SideBySideEquivalenceProperties.pairs(new SetInput(7, 3, false));
        List<OutlierPair> list = FlaggedPairList.descending(pairs, new int[] {0, 2}, new byte[] {1, 0, 2},
                PairMeasures::hard);
        assertThrows(UnsupportedOperationException.class, () -> list.set(0, list.get(1)));
        assertThrows(UnsupportedOperationException.class, () -> list.remove(0));
        assertEquals(list.get(0), list.get(0), "a pair read twice is the same pair");
    }

    /** The replaced code: each flagged pair made at once, then a stable sort by the key, largest first. */
    private static List<OutlierPair> replaced(List<DuplicatePair> pairs, List<Integer> rows, byte[] tests,
                                              ToDoubleFunction<OutlierPair> key) {
        List<OutlierPair> out = new ArrayList<>();
        for (int row : rows) {
            DuplicatePair p = pairs.get(row);
            double a = p.original().value();
            double b = p.duplicate().value();
            List<OutlierPair.Test> t = switch (tests[row]) {
                case 1 -> List.of(OutlierPair.Test.ABOVE_99_PERCENT_LINE);
                case 2 -> List.of(OutlierPair.Test.OUTSIDE_HARD_LIMIT);
                default -> List.of(OutlierPair.Test.ABOVE_99_PERCENT_LINE, OutlierPair.Test.OUTSIDE_HARD_LIMIT);
            };
            out.add(OutlierPair.of(p.id(), p.originalId(), p.batch(), p.original(), p.duplicate(),
                    PairMeasures.hard(a, b), PairMeasures.absDifference(a, b), t));
        }
        out.sort(Comparator.comparingDouble(key).reversed());
        return out;
    }
}
