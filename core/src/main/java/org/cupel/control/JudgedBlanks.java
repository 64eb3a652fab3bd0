package org.cupel.control;

import java.util.AbstractList;
import java.util.Arrays;
import java.util.List;
import java.util.RandomAccess;
import java.util.function.IntPredicate;
import java.util.stream.IntStream;
import org.cupel.assay.AssayValue;

/**
 * The judged blank results of a {@link BlankReport} as columns: per result the index of its observation, the
 * thresholds in force (kept once for each run of results they apply to) and the case of the blank rules that applied
 * with the carry-over flag, in one byte. A {@link BlankResult} with its observation, verdict, ratio and
 * outcome is made when read ({@link BlankReview#result}); the outcomes are read by index without one
 * ({@link #outcomes()}).
 */
final class JudgedBlanks extends AbstractList<BlankResult> implements RandomAccess {
    private static final int CARRY_OVER = 0x80;

    private final BlankObservations observations;
    private final int[] observation;
    /** Threshold {@code k} applies to the results from {@code thresholdFrom[k]} up to the next one's. */
    private final int[] thresholdFrom;
    private final List<BlankThreshold> thresholds;
    /** {@link BlankVerdict#decide} of each result, with {@link #CARRY_OVER} set for a probable carry-over. */
    private final byte[] decided;

    /**
     * @param thresholdFrom the first result each of {@code thresholds} applies to, ascending, the first 0
     * @param thresholds the thresholds in force over runs of results, {@code null} for "none could be set"
     */
    JudgedBlanks(BlankObservations observations, int[] observation, int[] thresholdFrom,
                 List<BlankThreshold> thresholds, byte[] decided) {
        this.observations = observations;
        this.observation = observation;
        this.thresholdFrom = thresholdFrom;
        this.thresholds = thresholds;
        this.decided = decided;
    }

    /** The column byte of a result: the case decided and whether it is a probable carry-over. */
    static byte code(int decided, boolean carryOver) {
        return (byte) (decided | (carryOver ? CARRY_OVER : 0));
    }

    @Override
    public BlankResult get(int i) {
        BlankObservation o = observations.get(observation[i]);
        BlankThreshold t = threshold(i);
        return BlankReview.result(o, t, BlankVerdict.of(decided(i), o.value(), t, o.unit()), carryOver(i));
    }

    @Override
    public int size() {
        return observation.length;
    }

    private BlankThreshold threshold(int i) {
        int k = Arrays.binarySearch(thresholdFrom, i);
        // No two thresholds start at the same result: an exact match is the run's start.
        return thresholds.get(k >= 0 ? k : -k - 2);
    }

    private int decided(int i) {
        return decided[i] & (CARRY_OVER - 1);
    }

    Verdict verdict(int i) {
        return BlankVerdict.verdictOf(decided(i));
    }

    boolean carryOver(int i) {
        return (decided[i] & CARRY_OVER) != 0;
    }

    String analyte(int i) {
        return observations.analyte(observation[i]);
    }

    /** The indices of the results that satisfy {@code test}, ascending. */
    int[] indicesWhere(IntPredicate test) {
        return IntStream.range(0, size()).filter(test).toArray();
    }

    /** The results at {@code indices}, made when read. */
    List<BlankResult> picked(int[] indices) {
        return new Picked(indices);
    }

    private final class Picked extends AbstractList<BlankResult> implements RandomAccess {
        private final int[] indices;

        Picked(int[] indices) {
            this.indices = indices;
        }

        @Override
        public BlankResult get(int k) {
            return JudgedBlanks.this.get(indices[k]);
        }

        @Override
        public int size() {
            return indices.length;
        }
    }

    AssayValue value(int i) {
        return observations.value(observation[i]);
    }

    AssayValue precedingGrade(int i) {
        return observations.precedingGrade(observation[i]);
    }

    /** The outcomes in the common form, read from these columns. */
    ControlOutcomes outcomes() {
        return new ControlOutcomes() {
            @Override
            public int size() {
                return observation.length;
            }

            @Override
            public int row(int i) {
                return observations.row(observation[i]);
            }

            @Override
            public String analyte(int i) {
                return JudgedBlanks.this.analyte(i);
            }

            @Override
            public Verdict verdict(int i) {
                return JudgedBlanks.this.verdict(i);
            }

            @Override
            public String rule(int i) {
                return BlankVerdict.ruleOf(decided(i), threshold(i));
            }

            @Override
            public String reason(int i) {
                return JudgedBlanks.this.get(i).outcome().reason();
            }

            @Override
            public boolean triggersReassay(int i) {
                return verdict(i) == Verdict.FAIL;
            }
        };
    }
}
