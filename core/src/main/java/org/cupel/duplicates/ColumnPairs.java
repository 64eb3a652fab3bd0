package org.cupel.duplicates;

import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;

/**
 * The pairs of one analyte of a project, read from the sample table and the analyte's column when asked for: the
 * duplicate's ID, its original's ID, batch and type from the table, both values from the column with the
 * detection limits the lab's below-detection values give ({@link DetectionLimits#valueOf}). Nothing per pair is
 * held but the two row numbers; the table and the column are held by the project anyway.
 */
final class ColumnPairs extends PairList {
    private final SampleTable samples;
    private final AnalyteColumn column;
    private final DetectionLimits limits;
    private final int[] duplicateRows;
    private final int[] originalRows;

    /**
     * @param duplicateRows the duplicate's row of each pair
     * @param originalRows the original's row of each pair
     */
    ColumnPairs(SampleTable samples, AnalyteColumn column, DetectionLimits limits, int[] duplicateRows,
                int[] originalRows) {
        if (duplicateRows.length != originalRows.length) {
            throw new IllegalArgumentException(duplicateRows.length + " duplicate rows, " + originalRows.length
                    + " original rows");
        }
        this.samples = samples;
        this.column = column;
        this.limits = limits;
        this.duplicateRows = duplicateRows;
        this.originalRows = originalRows;
    }

    @Override
    public DuplicatePair get(int i) {
        int row = duplicateRows[i];
        return new DuplicatePair(samples.id(row), samples.reference(row), batch(i), type(i), original(i),
                duplicate(i));
    }

    @Override
    public AssayValue original(int i) {
        return limits.valueOf(column, originalRows[i]);
    }

    @Override
    public AssayValue duplicate(int i) {
        return limits.valueOf(column, duplicateRows[i]);
    }

    @Override
    public QcRole type(int i) {
        return samples.role(duplicateRows[i]);
    }

    @Override
    public String batch(int i) {
        return samples.batch(duplicateRows[i]).id();
    }

    @Override
    public int size() {
        return duplicateRows.length;
    }
}
