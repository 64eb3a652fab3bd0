package org.cupel.duplicates;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.assay.Qualifier;

/**
 * Pairs stored in primitive columns (a pairs file of a million rows): each member's qualifier, value, limit,
 * missing reason and written decimals, the batch as an index into the distinct batch names, the type, and the
 * row label in one shared character buffer. A pair, its values and its label are created only when asked for
 * ({@link #get}); the analysis reads members by index ({@link #original}, {@link #duplicate}).
 */
public final class PairColumns extends PairList {
    private static final QcRole[] ROLES = QcRole.values();
    private static final Qualifier[] QUALIFIERS = Qualifier.values();
    private static final MissingReason[] REASONS = MissingReason.values();

    private final int size;
    private final Member original;
    private final Member duplicate;
    private final byte[] type;
    private final int[] batch;
    private final String[] batchNames;
    private final StringBuilder labels;
    private final int[] labelEnd;
    private final long[] line;

    /** Takes over the builder's arrays (not copied: a million pairs are tens of MB; the builder is spent). */
    private PairColumns(Builder b) {
        size = b.size;
        original = b.original;
        duplicate = b.duplicate;
        type = b.type;
        batch = b.batch;
        batchNames = b.batchNames.toArray(String[]::new);
        labels = b.labels;
        labelEnd = b.labelEnd;
        line = b.line;
    }

    @Override
    public int size() {
        return size;
    }

    @Override
    public DuplicatePair get(int i) {
        return new DuplicatePair(label(i), "", batch(i), ROLES[type[checked(i)]], original(i), duplicate(i));
    }

    private int checked(int i) {
        if (i < 0 || i >= size) {
            throw new IndexOutOfBoundsException("pair " + i + " of " + size);
        }
        return i;
    }

    @Override
    public AssayValue original(int i) {
        return original.value(i);
    }

    @Override
    public AssayValue duplicate(int i) {
        return duplicate.value(i);
    }

    @Override
    public QcRole type(int i) {
        return ROLES[type[i]];
    }

    @Override
    public String batch(int i) {
        return batchNames[batch[i]];
    }

    /** The pair's ID, or "line N" (its line in the file) when it has none. */
    private String label(int i) {
        int from = i == 0 ? 0 : labelEnd[i - 1];
        int to = labelEnd[i];
        return from == to ? "line " + line[i] : labels.substring(from, to);
    }

    /** One member of every pair, in columns. */
    private static final class Member {
        private byte[] qualifier;
        private double[] value;
        /** Null while every limit is the usual one ({@link #usualLimit}). */
        private double[] limit;
        private byte[] missing;
        private byte[] decimals;

        Member(int capacity) {
            qualifier = new byte[capacity];
            value = new double[capacity];
            missing = new byte[capacity];
            decimals = new byte[capacity];
        }

        void grow(int capacity) {
            qualifier = Arrays.copyOf(qualifier, capacity);
            value = Arrays.copyOf(value, capacity);
            limit = limit == null ? null : Arrays.copyOf(limit, capacity);
            missing = Arrays.copyOf(missing, capacity);
            decimals = Arrays.copyOf(decimals, capacity);
        }

        void set(int i, Qualifier q, double v, double l, MissingReason reason, int written) {
            qualifier[i] = (byte) q.ordinal();
            value[i] = v;
            // Limits are kept only once one differs from the usual one (a file without a dl column has none).
            if (limit == null && Double.compare(l, usualLimit(q, v)) != 0) {
                limit = new double[value.length];
                for (int k = 0; k < i; k++) {
                    limit[k] = usualLimit(QUALIFIERS[qualifier[k]], value[k]);
                }
            }
            if (limit != null) {
                limit[i] = l;
            }
            missing[i] = (byte) reason.ordinal();
            // Decimals beyond a byte are never written by a lab; kept as unknown rather than wrapped.
            decimals[i] = (byte) (written > Byte.MAX_VALUE ? -1 : written);
        }

        AssayValue value(int i) {
            Qualifier q = QUALIFIERS[qualifier[i]];
            return new AssayValue(q, value[i], limit == null ? usualLimit(q, value[i]) : limit[i],
                    REASONS[missing[i]], decimals[i]);
        }

        /**
         * The limit a value has without a stated one: a censored value is its limit ({@code <0.005}: 0.005), a
         * detected or missing one has none.
         */
        private static double usualLimit(Qualifier q, double value) {
            return q == Qualifier.BELOW_DETECTION || q == Qualifier.ABOVE_UPPER_LIMIT ? value : Double.NaN;
        }
    }

    /** Collects pairs row by row; each row is started by {@link #add}, then given its label and batch. */
    public static final class Builder {
        private int size;
        private final Member original;
        private final Member duplicate;
        private byte[] type;
        private int[] batch;
        private final List<String> batchNames = new ArrayList<>();
        private final Map<String, Integer> batchIndex = new HashMap<>();
        private final StringBuilder labels;
        private int[] labelEnd;
        private long[] line;
        private final int noBatch;
        private boolean built;

        /** @param expected the number of pairs expected (arrays grow beyond it) */
        public Builder(int expected) {
            int capacity = Math.max(16, expected);
            original = new Member(capacity);
            duplicate = new Member(capacity);
            type = new byte[capacity];
            batch = new int[capacity];
            labelEnd = new int[capacity];
            line = new long[capacity];
            // Sized for IDs of about ten characters, so that a million IDs are not copied as the buffer grows.
            labels = new StringBuilder((int) Math.min(capacity * 10L, 1 << 28));
            noBatch = batchNumber("");
        }

        /** Adds a pair of {@code role} from {@code fileLine}, without label (until {@link #endLabel}) or batch (""). */
        public void add(QcRole role, long fileLine) {
            if (built) {
                throw new IllegalStateException("the pairs were built; a builder makes one list");
            }
            if (size == type.length) {
                int capacity = size * 2;
                original.grow(capacity);
                duplicate.grow(capacity);
                type = Arrays.copyOf(type, capacity);
                batch = Arrays.copyOf(batch, capacity);
                labelEnd = Arrays.copyOf(labelEnd, capacity);
                line = Arrays.copyOf(line, capacity);
            }
            type[size] = (byte) role.ordinal();
            line[size] = fileLine;
            labelEnd[size] = labels.length();
            batch[size] = noBatch;
            size++;
        }

        /** Sets the last pair's members. */
        public void values(AssayValue a, AssayValue b) {
            setOriginal(a.qualifier(), a.value(), a.limit(), a.missingReason(), a.decimals());
            setDuplicate(b.qualifier(), b.value(), b.limit(), b.missingReason(), b.decimals());
        }

        /** Sets the last pair's original without an {@link AssayValue}. */
        public void setOriginal(Qualifier q, double v, double limit, MissingReason reason, int decimals) {
            original.set(size - 1, q, v, limit, reason, decimals);
        }

        /** Sets the last pair's duplicate without an {@link AssayValue}. */
        public void setDuplicate(Qualifier q, double v, double limit, MissingReason reason, int decimals) {
            duplicate.set(size - 1, q, v, limit, reason, decimals);
        }

        /** The buffer the last pair's label is appended to (nothing appended: "line N"). */
        public StringBuilder labelBuffer() {
            if (built) {
                throw new IllegalStateException("the pairs were built; their labels are fixed");
            }
            return labels;
        }

        /** Marks the end of the last pair's label, after appending it to {@link #labelBuffer}. */
        public void endLabel() {
            labelEnd[size - 1] = labels.length();
        }

        /** Whether the last pair's batch is the one the pair before it has. */
        public String previousBatch() {
            return size < 2 ? "" : batchNames.get(batch[size - 2]);
        }

        /** Gives the last pair the previous pair's batch. */
        public void sameBatchAsPrevious() {
            if (size > 1) {
                batch[size - 1] = batch[size - 2];
            }
        }

        /** Sets the last pair's batch. */
        public void batch(String name) {
            batch[size - 1] = batchNumber(name);
        }

        private int batchNumber(String name) {
            Integer known = batchIndex.get(name);
            if (known != null) {
                return known;
            }
            batchNames.add(name);
            batchIndex.put(name, batchNames.size() - 1);
            return batchNames.size() - 1;
        }

        /** The pairs added; the list takes over the arrays, so the builder takes no more pairs. */
        public PairColumns build() {
            built = true;
            return new PairColumns(this);
        }
    }
}
