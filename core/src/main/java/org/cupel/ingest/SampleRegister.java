package org.cupel.ingest;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.cupel.assay.IdIndex;
import org.cupel.assay.QcRole;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;

/**
 * The sample register as read: its usable entries column-wise, in file order, found by sample ID.
 * Built by {@link RegisterReader}.
 */
final class SampleRegister {
    private static final QcRole[] ROLES = QcRole.values();

    private final String file;
    private final IdIndex ids;
    private final byte[] roles;
    private final String[] references;
    private final String[] holes;
    private final double[] from;
    private final double[] to;
    private final long[] lines;
    private final Set<String> rejectedIds;
    private final List<DataIssue> issues;
    private final long rowsRead;
    private final long rowsExcluded;

    /**
     * Takes the builder's arrays as they are (sized from the file's length, so mostly longer than needed):
     * copies of a million entries would leave the originals, about 50 MB already in the old generation, as
     * garbage for a full collection. Entries are read below {@link #size()} only.
     */
    private SampleRegister(Builder b, Set<String> rejectedIds, List<DataIssue> issues, long rowsRead,
                           long rowsExcluded) {
        this.file = b.file;
        this.ids = b.ids;
        this.roles = b.roles;
        this.references = b.references;
        this.holes = b.holes;
        this.from = b.from;
        this.to = b.to;
        this.lines = b.lines;
        this.rejectedIds = Set.copyOf(rejectedIds);
        this.issues = List.copyOf(issues);
        this.rowsRead = rowsRead;
        this.rowsExcluded = rowsExcluded;
    }

    /** The file name used in messages. */
    public String file() {
        return file;
    }

    /** The number of usable entries. */
    public int size() {
        return ids.size();
    }

    /** The index of {@code sampleId}'s entry, or -1. */
    public int indexOf(String sampleId) {
        return ids.indexOf(sampleId);
    }

    /** {@link #indexOf(String)}, trying entry {@code guess} first (see {@link IdIndex#indexOf(String, int)}). */
    public int indexOf(String sampleId, int guess) {
        return ids.indexOf(sampleId, guess);
    }

    /** The entries' sample IDs, numbered as the entries are (shared with the sample table, never changed). */
    IdIndex ids() {
        return ids;
    }

    public String sampleId(int entry) {
        return ids.get(entry);
    }

    public QcRole role(int entry) {
        return ROLES[roles[entry]];
    }

    /** CRM code, or the original sample's ID for a duplicate; empty otherwise. */
    public String reference(int entry) {
        return references[entry];
    }

    public SourceLocation source(int entry) {
        return new SourceLocation(file, lines[entry], 0);
    }

    public RegisterEntry entry(int entry) {
        return new RegisterEntry(ids.get(entry), role(entry), references[entry], holes[entry], from[entry], to[entry],
                source(entry));
    }

    public Optional<RegisterEntry> entry(String sampleId) {
        int e = ids.indexOf(sampleId);
        return e < 0 ? Optional.empty() : Optional.of(entry(e));
    }

    /** IDs whose register row could not be used (unknown role); their lab rows are left out too. */
    public Set<String> rejectedIds() {
        return rejectedIds;
    }

    /** Problems found. */
    public List<DataIssue> issues() {
        return issues;
    }

    /** Data rows. */
    public long rowsRead() {
        return rowsRead;
    }

    /** Rows listed as exceptions. */
    public long rowsExcluded() {
        return rowsExcluded;
    }

    /** Collects entries in file order; each sample ID once. */
    static final class Builder {
        private final String file;
        private final IdIndex ids;
        private byte[] roles;
        private String[] references;
        private String[] holes;
        private double[] from;
        private double[] to;
        private long[] lines;

        /** @param expectedEntries entries expected (a hint that spares regrowing the arrays and the ID index) */
        Builder(String file, int expectedEntries) {
            this.file = file;
            int n = Math.max(16, expectedEntries);
            ids = new IdIndex(n);
            roles = new byte[n];
            references = new String[n];
            holes = new String[n];
            from = new double[n];
            to = new double[n];
            lines = new long[n];
        }

        /** The line of {@code sampleId}'s entry, or -1 when it has none yet. */
        long lineOf(String sampleId) {
            int e = ids.indexOf(sampleId);
            return e < 0 ? -1 : lines[e];
        }

        /** Adds an entry for a sample ID that has none yet ({@link #lineOf} is -1). */
        void add(String sampleId, QcRole role, String reference, String hole, double fromM, double toM, long line) {
            int n = ids.add(sampleId);
            if (n == lines.length) {
                int cap = n * 2;
                roles = Arrays.copyOf(roles, cap);
                references = Arrays.copyOf(references, cap);
                holes = Arrays.copyOf(holes, cap);
                from = Arrays.copyOf(from, cap);
                to = Arrays.copyOf(to, cap);
                lines = Arrays.copyOf(lines, cap);
            }
            roles[n] = (byte) role.ordinal();
            references[n] = reference;
            holes[n] = hole;
            from[n] = fromM;
            to[n] = toM;
            lines[n] = line;
        }

        SampleRegister build(Set<String> rejectedIds, List<DataIssue> issues, long rowsRead, long rowsExcluded) {
            return new SampleRegister(this, rejectedIds, issues, rowsRead, rowsExcluded);
        }
    }
}
