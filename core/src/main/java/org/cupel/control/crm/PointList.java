package org.cupel.control.crm;

import java.time.LocalDate;
import java.util.AbstractList;
import java.util.List;
import java.util.RandomAccess;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.SampleTable;

/**
 * The points of a {@link CrmSeries} as an unmodifiable list whose fields can be read by index: those of a
 * project are read from its sample table and analyte column, keeping only each point's row; others are the
 * objects given. A {@link CrmPoint} is made when an element is read.
 */
abstract class PointList extends AbstractList<CrmPoint> implements RandomAccess {

    int row(int i) {
        return get(i).row();
    }

    String sampleId(int i) {
        return get(i).sampleId();
    }

    String batchId(int i) {
        return get(i).batchId();
    }

    int batchOrder(int i) {
        return get(i).batchOrder();
    }

    LocalDate date(int i) {
        return get(i).date();
    }

    int position(int i) {
        return get(i).position();
    }

    AssayValue value(int i) {
        return get(i).value();
    }

    /** The number of the value: the measured value of a detected result. */
    double number(int i) {
        return get(i).value().value();
    }

    /** {@code points} as they are when already this kind of list, else an unmodifiable copy. */
    static PointList of(List<CrmPoint> points) {
        return points instanceof PointList p ? p : new Listed(List.copyOf(points));
    }

    /**
     * The points of {@code rows} in the column.
     *
     * @param batchOrder each batch's rank in time order, by the table's batch index
     */
    static PointList of(SampleTable table, AnalyteColumn col, int[] rows, int[] batchOrder) {
        return new FromColumn(table, col, rows, batchOrder);
    }

    private static final class Listed extends PointList {
        private final List<CrmPoint> points;

        Listed(List<CrmPoint> points) {
            this.points = points;
        }

        @Override
        public CrmPoint get(int i) {
            return points.get(i);
        }

        @Override
        public int size() {
            return points.size();
        }
    }

    private static final class FromColumn extends PointList {
        private final SampleTable table;
        private final AnalyteColumn col;
        private final int[] rows;
        private final int[] batchOrder;

        FromColumn(SampleTable table, AnalyteColumn col, int[] rows, int[] batchOrder) {
            this.table = table;
            this.col = col;
            this.rows = rows;
            this.batchOrder = batchOrder;
        }

        @Override
        public CrmPoint get(int i) {
            int row = rows[i];
            Batch b = table.batch(row);
            return new CrmPoint(row, table.id(row), b.id(), batchOrder(i), b.reported(), table.position(row),
                    col.value(row));
        }

        @Override
        public int size() {
            return rows.length;
        }

        @Override
        int row(int i) {
            return rows[i];
        }

        @Override
        String sampleId(int i) {
            return table.id(rows[i]);
        }

        @Override
        String batchId(int i) {
            return table.batch(rows[i]).id();
        }

        @Override
        int batchOrder(int i) {
            return batchOrder[table.batchIndex(rows[i])];
        }

        @Override
        LocalDate date(int i) {
            return table.batch(rows[i]).reported();
        }

        @Override
        int position(int i) {
            return table.position(rows[i]);
        }

        @Override
        AssayValue value(int i) {
            return col.value(rows[i]);
        }

        @Override
        double number(int i) {
            return col.number(rows[i]);
        }
    }
}
