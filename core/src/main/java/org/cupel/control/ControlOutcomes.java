package org.cupel.control;

import java.util.AbstractList;
import java.util.List;
import java.util.Objects;
import java.util.RandomAccess;

/**
 * Control outcomes read from the results of the review that decided them: an unmodifiable list whose
 * {@link ControlOutcome}s are made when read, with each field also readable by index without one. A
 * million-sample project has a million control outcomes; keeping them as the reviews' own columns (row,
 * verdict, rule bits) rather than as a million objects takes them out of the live heap, and the batch
 * verdicts and re-assay list read the fields they need by index.
 */
public abstract class ControlOutcomes extends AbstractList<ControlOutcome> implements RandomAccess {

    /** The sample's row in the project's sample table. */
    public abstract int row(int i);

    public abstract String analyte(int i);

    public abstract Verdict verdict(int i);

    /** See {@link ControlOutcome#rule()}. */
    public abstract String rule(int i);

    /** See {@link ControlOutcome#reason()}. */
    public abstract String reason(int i);

    public abstract boolean triggersReassay(int i);

    @Override
    public ControlOutcome get(int i) {
        Objects.checkIndex(i, size());
        return ControlOutcome.described(row(i), analyte(i), verdict(i), rule(i), () -> reason(i),
                triggersReassay(i));
    }

    /** {@code outcomes} as they are when already this kind of list, else an unmodifiable copy. */
    public static ControlOutcomes of(List<ControlOutcome> outcomes) {
        return outcomes instanceof ControlOutcomes c ? c : new Listed(List.copyOf(outcomes));
    }

    /** The outcomes of {@code first} followed by those of {@code second}. */
    public static ControlOutcomes concat(ControlOutcomes first, ControlOutcomes second) {
        return new Joined(first, second);
    }

    /** Outcomes given as objects. */
    private static final class Listed extends ControlOutcomes {
        private final List<ControlOutcome> outcomes;

        Listed(List<ControlOutcome> outcomes) {
            this.outcomes = outcomes;
        }

        @Override
        public ControlOutcome get(int i) {
            return outcomes.get(i);
        }

        @Override
        public int size() {
            return outcomes.size();
        }

        @Override
        public int row(int i) {
            return outcomes.get(i).row();
        }

        @Override
        public String analyte(int i) {
            return outcomes.get(i).analyte();
        }

        @Override
        public Verdict verdict(int i) {
            return outcomes.get(i).verdict();
        }

        @Override
        public String rule(int i) {
            return outcomes.get(i).rule();
        }

        @Override
        public String reason(int i) {
            return outcomes.get(i).reason();
        }

        @Override
        public boolean triggersReassay(int i) {
            return outcomes.get(i).triggersReassay();
        }
    }

    /** Two lists one after the other. */
    private static final class Joined extends ControlOutcomes {
        private final ControlOutcomes first;
        private final ControlOutcomes second;
        private final int split;

        Joined(ControlOutcomes first, ControlOutcomes second) {
            this.first = first;
            this.second = second;
            this.split = first.size();
        }

        /** {@code read} of outcome {@code i}, in the list that holds it. */
        private <R> R at(int i, PartRead<R> read) {
            return i < split ? read.of(first, i) : read.of(second, i - split);
        }

        @Override
        public ControlOutcome get(int i) {
            return at(i, ControlOutcomes::get);
        }

        @Override
        public int size() {
            return split + second.size();
        }

        @Override
        public int row(int i) {
            return i < split ? first.row(i) : second.row(i - split);
        }

        @Override
        public String analyte(int i) {
            return at(i, ControlOutcomes::analyte);
        }

        @Override
        public Verdict verdict(int i) {
            return at(i, ControlOutcomes::verdict);
        }

        @Override
        public String rule(int i) {
            return at(i, ControlOutcomes::rule);
        }

        @Override
        public String reason(int i) {
            return at(i, ControlOutcomes::reason);
        }

        @Override
        public boolean triggersReassay(int i) {
            return i < split ? first.triggersReassay(i) : second.triggersReassay(i - split);
        }
    }

    /** A field of an outcome of one of the joined lists, by its index there. */
    private interface PartRead<R> {
        R of(ControlOutcomes part, int i);
    }
}
