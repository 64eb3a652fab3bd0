package org.cupel.assay;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;

/**
 * The samples of a project, stored column-wise so that a million rows cost a few arrays rather than
 * a million objects. Row {@code i} here is row {@code i} of every {@link AnalyteColumn}. Immutable once
 * built.
 */
public final class SampleTable {
    private static final QcRole[] ROLES = QcRole.values();
    private final String[] ids;
    private final int[] batchIndex;
    private final int[] positions;
    private final byte[] roles;
    private final String[] references;
    private final int[] fileIndex;
    private final long[] lines;
    /** The rows; the arrays, handed over by the builder, may be longer. */
    private final int size;
    private final List<Batch> batches;
    private final List<String> files;
    private final RowIndex rowById;
    /** Rows of each role, by {@link QcRole#ordinal()}; made on first use ({@link #rowsByRole()}). */
    private volatile int[][] rowsByRole;

    /**
     * Takes the builder's arrays as they are: copying a million rows' arrays to their exact length would leave
     * the originals (about 40 MB, already in the old generation) as garbage for a full collection.
     */
    private SampleTable(Builder b) {
        this.size = b.size;
        this.ids = b.ids;
        this.batchIndex = b.batchIndex;
        this.positions = b.positions;
        this.roles = b.roles;
        this.references = b.references;
        this.fileIndex = b.fileIndex;
        this.lines = b.lines;
        this.batches = List.copyOf(b.batches);
        this.files = List.copyOf(b.files);
        this.rowById = b.rowById;
    }

    public int size() {
        return size;
    }

    public String id(int row) {
        return ids[row];
    }

    public Batch batch(int row) {
        return batches.get(batchIndex[row]);
    }

    public int batchIndex(int row) {
        return batchIndex[row];
    }

    /** Batches in the order they were first read; index them with {@link #batchIndex(int)}. */
    public List<Batch> batches() {
        return batches;
    }

    public int position(int row) {
        return positions[row];
    }

    public QcRole role(int row) {
        return ROLES[roles[row]];
    }

    /** CRM code, original sample ID, or the empty string. */
    public String reference(int row) {
        return references[row];
    }

    public SourceLocation source(int row) {
        return new SourceLocation(files.get(fileIndex[row]), lines[row], 0);
    }

    public OptionalInt rowOf(String sampleId) {
        int row = rowById.row(sampleId);
        return row < 0 ? OptionalInt.empty() : OptionalInt.of(row);
    }

    /**
     * The row of {@code sampleId}, or -1, trying row {@code guess} first: a duplicate's original mostly
     * sits just before it, and comparing one ID spares a hash probe into a table of a million IDs.
     */
    public int row(String sampleId, int guess) {
        if (guess >= 0 && guess < size && ids[guess].equals(sampleId)) {
            return guess;
        }
        return rowById.row(sampleId);
    }

    public Sample sample(int row) {
        return new Sample(ids[row], batch(row), positions[row], role(row), references[row], source(row));
    }

    /** The rows of {@code role} in row order; a fresh array the caller may reorder. */
    public int[] rowsWithRole(QcRole role) {
        return rowsByRole()[role.ordinal()].clone();
    }

    /**
     * Every role's rows, found in one pass the first time they are asked for: the analyses ask for them per
     * analyte, and a pass over a million rows per question cost more than the copy.
     */
    private int[][] rowsByRole() {
        int[][] byRole = rowsByRole;
        if (byRole == null) {
            int[] counts = new int[ROLES.length];
            for (int i = 0; i < size; i++) {
                counts[roles[i]]++;
            }
            byRole = new int[ROLES.length][];
            for (int r = 0; r < ROLES.length; r++) {
                byRole[r] = new int[counts[r]];
            }
            int[] filled = new int[ROLES.length];
            for (int i = 0; i < size; i++) {
                byRole[roles[i]][filled[roles[i]]++] = i;
            }
            rowsByRole = byRole; // a race computes the same arrays twice, no worse
        }
        return byRole;
    }

    public static Builder builder() {
        return new Builder(1024, null);
    }

    /**
     * @param expectedRows rows expected (a hint that spares regrowing the arrays)
     * @param knownIds IDs already numbered (the register's), added by number with {@link Builder#addKnown};
     *                 the table shares the index and the ID strings instead of building its own; null for none
     */
    public static Builder builder(int expectedRows, IdIndex knownIds) {
        return new Builder(Math.max(16, expectedRows), knownIds);
    }

    /** Collects rows one at a time; sample IDs must be unique. The builder is spent by {@link #build()}. */
    public static final class Builder {
        private boolean built;
        private String[] ids;
        private int[] batchIndex;
        private int[] positions;
        private byte[] roles;
        private String[] references;
        private int[] fileIndex;
        private long[] lines;
        private int size;
        private final List<Batch> batches = new ArrayList<>();
        private final Map<Batch, Integer> batchIndexOf = new HashMap<>();
        private final List<String> files = new ArrayList<>();
        private final Map<String, Integer> fileIndexOf = new HashMap<>();
        private final RowIndex rowById;
        private Batch lastBatch;
        private int lastBatchIndex;
        private String lastFile;
        private int lastFileIndex;

        private Builder(int capacity, IdIndex knownIds) {
            ids = new String[capacity];
            batchIndex = new int[capacity];
            positions = new int[capacity];
            roles = new byte[capacity];
            references = new String[capacity];
            fileIndex = new int[capacity];
            lines = new long[capacity];
            rowById = new RowIndex(knownIds);
        }

        /** Adds a sample and returns its row; throws if the ID is already present. */
        public int add(String id, Batch batch, int position, QcRole role, String reference, SourceLocation source) {
            return add(id, batch, position, role, reference, source.file(), source.line());
        }

        /** As {@link #add(String, Batch, int, QcRole, String, SourceLocation)} with the source's file and line. */
        public int add(String id, Batch batch, int position, QcRole role, String reference, String file, long line) {
            requireOpen();
            if (!rowById.put(id, size)) {
                throw new IllegalArgumentException("sample ID already present: " + id);
            }
            return append(id, batch, position, role, reference, file, line);
        }

        /**
         * Adds the sample whose ID is numbered {@code known} in the index given to {@link #builder(int, IdIndex)}
         * and returns its row; throws if that ID already has a row.
         */
        public int addKnown(int known, Batch batch, int position, QcRole role, String reference, String file,
                            long line) {
            requireOpen();
            if (!rowById.putKnown(known, size)) {
                throw new IllegalArgumentException("sample ID already present: " + rowById.knownId(known));
            }
            return append(rowById.knownId(known), batch, position, role, reference, file, line);
        }

        /** The row of the ID numbered {@code known} in the shared index, or -1 when it has none yet. */
        public int rowOfKnown(int known) {
            return rowById.rowOfKnown(known);
        }

        private int append(String id, Batch batch, int position, QcRole role, String reference, String file,
                           long line) {
            requireOpen();
            ensureCapacity(size + 1);
            ids[size] = id;
            batchIndex[size] = batchIndex(batch);
            positions[size] = position;
            roles[size] = (byte) role.ordinal();
            references[size] = reference == null ? "" : reference;
            fileIndex[size] = fileIndex(file);
            lines[size] = line;
            return size++;
        }

        /** Consecutive rows mostly share batch and file: the last one is looked up without hashing. */
        private int batchIndex(Batch batch) {
            if (batch != lastBatch) {
                lastBatchIndex = batchIndexOf.computeIfAbsent(batch, k -> {
                    batches.add(k);
                    return batches.size() - 1;
                });
                lastBatch = batch;
            }
            return lastBatchIndex;
        }

        private int fileIndex(String file) {
            if (!file.equals(lastFile)) {
                lastFileIndex = fileIndexOf.computeIfAbsent(file, k -> {
                    files.add(k);
                    return files.size() - 1;
                });
                lastFile = file;
            }
            return lastFileIndex;
        }

        public boolean contains(String id) {
            return rowById.row(id) >= 0;
        }

        public OptionalInt rowOf(String id) {
            int row = rowById.row(id);
            return row < 0 ? OptionalInt.empty() : OptionalInt.of(row);
        }

        /** The row of {@code id}, or -1. */
        public int row(String id) {
            return rowById.row(id);
        }

        /** Sets role and reference after the register has been joined to the lab rows. */
        public void setRole(int row, QcRole role, String reference) {
            requireOpen();
            roles[row] = (byte) role.ordinal();
            references[row] = reference == null ? "" : reference;
        }

        public int size() {
            return size;
        }

        /** The table; the builder hands its arrays over, so it takes no more rows or changes. */
        public SampleTable build() {
            requireOpen();
            built = true;
            return new SampleTable(this);
        }

        private void requireOpen() {
            if (built) {
                throw new IllegalStateException("the sample table has already been built");
            }
        }

        private void ensureCapacity(int needed) {
            if (needed <= positions.length) {
                return;
            }
            int cap = Math.max(needed, positions.length * 2);
            ids = Arrays.copyOf(ids, cap);
            batchIndex = Arrays.copyOf(batchIndex, cap);
            positions = Arrays.copyOf(positions, cap);
            roles = Arrays.copyOf(roles, cap);
            references = Arrays.copyOf(references, cap);
            fileIndex = Arrays.copyOf(fileIndex, cap);
            lines = Arrays.copyOf(lines, cap);
        }
    }
}
