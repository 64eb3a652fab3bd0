package org.cupel.duplicates;

import java.util.AbstractList;
import java.util.List;
import java.util.RandomAccess;
import java.util.function.DoubleBinaryOperator;

/**
 * The flagged pairs of a set in the order they are listed, each {@link OutlierPair} made when it is read: ten
 * million pairs can flag more than a million, of which the JSON lists the first hundred, and holding a million
 * pairs with their IDs and values as objects until the output was written cost hundreds of MB of heap and the
 * collections that copied them. The list is unmodifiable; reading an element twice gives equal pairs.
 */
final class FlaggedPairList extends AbstractList<OutlierPair> implements RandomAccess {
    /** Bits of {@link #tests}: above the 99 % line of the Thompson–Howarth model, beyond the HARD limit. */
    static final byte ABOVE_LINE = 1;
    static final byte BEYOND_HARD = 2;

    private static final List<OutlierPair.Test> BOTH = List.of(OutlierPair.Test.ABOVE_99_PERCENT_LINE,
            OutlierPair.Test.OUTSIDE_HARD_LIMIT);
    private static final List<OutlierPair.Test> LINE_ONLY = List.of(OutlierPair.Test.ABOVE_99_PERCENT_LINE);
    private static final List<OutlierPair.Test> HARD_ONLY = List.of(OutlierPair.Test.OUTSIDE_HARD_LIMIT);

    private final List<DuplicatePair> pairs;
    private final int[] rows;
    private final byte[] tests;

    private FlaggedPairList(List<DuplicatePair> pairs, int[] rows, byte[] tests) {
        this.pairs = pairs;
        this.rows = rows;
        this.tests = tests;
    }

    /**
     * The pairs {@code rows} (ascending indices into {@code pairs}) ordered by {@code key} of their two values,
     * largest first, ties in row order (as a stable sort by the reversed key): a sort of the primitive keys with
     * the positions as tie-breaker, since a comparator sort of a hundred thousand flagged pairs cost more than
     * the rest of their analysis.
     *
     * @param tests per pair of {@code pairs}, the tests it failed as bits ({@link #ABOVE_LINE}, {@link #BEYOND_HARD})
     * @param key of the original's and the duplicate's value: HARD, or |d|
     */
    static FlaggedPairList descending(List<DuplicatePair> pairs, int[] rows, byte[] tests, DoubleBinaryOperator key) {
        int n = rows.length;
        double[] negated = new double[n];
        double[] position = new double[n];
        PairList list = PairList.of(pairs);
        for (int i = 0; i < n; i++) {
            negated[i] = -key.applyAsDouble(list.original(rows[i]).value(), list.duplicate(rows[i]).value());
            position[i] = i;
        }
        PairGroups.sortByMeanThenDiff(negated, position);
        int[] ordered = new int[n];
        for (int i = 0; i < n; i++) {
            ordered[i] = rows[(int) position[i]];
        }
        return new FlaggedPairList(list, ordered, tests);
    }

    @Override
    public OutlierPair get(int index) {
        int row = rows[index];
        DuplicatePair p = pairs.get(row);
        double a = p.original().value();
        double b = p.duplicate().value();
        return OutlierPair.of(p.id(), p.originalId(), p.batch(), p.original(), p.duplicate(),
                PairMeasures.hard(a, b), PairMeasures.absDifference(a, b), testsOf(tests[row]));
    }

    @Override
    public int size() {
        return rows.length;
    }

    /** The tests in the order they were listed before: the 99 % line first, then the HARD limit. */
    private static List<OutlierPair.Test> testsOf(byte bits) {
        if (bits == (ABOVE_LINE | BEYOND_HARD)) {
            return BOTH;
        }
        return bits == ABOVE_LINE ? LINE_ONLY : HARD_ONLY;
    }
}
