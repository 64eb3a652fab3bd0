package org.cupel.duplicates;

import java.util.AbstractList;
import java.util.List;
import java.util.RandomAccess;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;

/**
 * An immutable list of pairs whose members and batch can be read without creating the pair: the analysis reads
 * a set of a million pairs several times, and a list stored in columns ({@link PairColumns}) then creates no
 * pair, ID or batch text for it. Any other list is copied once ({@link #of}).
 */
public abstract class PairList extends AbstractList<DuplicatePair> implements RandomAccess {
    PairList() {
    }

    /** {@code pairs} itself when it is a pair list, otherwise an immutable copy. */
    public static PairList of(List<DuplicatePair> pairs) {
        return pairs instanceof PairList p ? p : new Copy(List.copyOf(pairs));
    }

    /** The original's value of pair {@code i}. */
    public AssayValue original(int i) {
        return get(i).original();
    }

    /** The duplicate's value of pair {@code i}. */
    public AssayValue duplicate(int i) {
        return get(i).duplicate();
    }

    /** The type of pair {@code i}. */
    public QcRole type(int i) {
        return get(i).type();
    }

    /** The batch of pair {@code i}. */
    public String batch(int i) {
        return get(i).batch();
    }

    /** The pairs of {@code type}, in order, as a view. */
    public PairList ofType(QcRole type) {
        int[] indices = new int[size()];
        int k = 0;
        for (int i = 0; i < indices.length; i++) {
            if (type(i) == type) {
                indices[k++] = i;
            }
        }
        return k == indices.length ? this : new Selection(this, java.util.Arrays.copyOf(indices, k));
    }

    /** The pairs at {@code indices} (into this list), in that order, as a view. */
    PairList select(int[] indices) {
        return new Selection(this, indices.clone());
    }

    private static final class Copy extends PairList {
        private final List<DuplicatePair> pairs;

        Copy(List<DuplicatePair> pairs) {
            this.pairs = pairs;
        }

        @Override
        public DuplicatePair get(int index) {
            return pairs.get(index);
        }

        @Override
        public int size() {
            return pairs.size();
        }
    }

    private static final class Selection extends PairList {
        private final PairList base;
        private final int[] indices;

        Selection(PairList base, int[] indices) {
            this.base = base;
            this.indices = indices;
        }

        @Override
        public DuplicatePair get(int index) {
            return base.get(indices[index]);
        }

        @Override
        public AssayValue original(int i) {
            return base.original(indices[i]);
        }

        @Override
        public AssayValue duplicate(int i) {
            return base.duplicate(indices[i]);
        }

        @Override
        public QcRole type(int i) {
            return base.type(indices[i]);
        }

        @Override
        public String batch(int i) {
            return base.batch(indices[i]);
        }

        @Override
        public int size() {
            return indices.length;
        }
    }
}
