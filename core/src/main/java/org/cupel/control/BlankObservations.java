package org.cupel.control;

import java.util.AbstractList;
import java.util.List;
import java.util.RandomAccess;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.SampleTable;

/**
 * Blank observations as an unmodifiable list whose fields can be read by index: those of a project are read
 * from its sample table and analyte columns ({@link #of(SampleTable, AnalyteColumn, int[], int[], double[])}),
 * keeping only each blank's row, the row before it and its detection limit; others are the objects given. A
 * {@link BlankObservation} is made when an element is read.
 */
abstract class BlankObservations extends AbstractList<BlankObservation> implements RandomAccess {

    int row(int i) {
        return get(i).row();
    }

    String analyte(int i) {
        return get(i).analyte();
    }

    String unit(int i) {
        return get(i).unit();
    }

    AssayValue value(int i) {
        return get(i).value();
    }

    double detectionLimit(int i) {
        return get(i).detectionLimit();
    }

    String sampleId(int i) {
        return get(i).sampleId();
    }

    String precedingId(int i) {
        return get(i).precedingId();
    }

    AssayValue precedingGrade(int i) {
        return get(i).precedingGrade();
    }

    /** The lists this one is made of, one after the other: itself unless joined. */
    List<BlankObservations> parts() {
        return List.of(this);
    }

    /** {@code observations} as they are when already this kind of list, else an unmodifiable copy. */
    static BlankObservations of(List<BlankObservation> observations) {
        return observations instanceof BlankObservations b ? b : new Listed(List.copyOf(observations));
    }

    /**
     * The blanks of one analyte read from the project's columns.
     *
     * @param rows the blanks' rows in run order
     * @param preceding the row run before each blank in its batch, -1 when it opens the batch
     * @param limits each blank's detection limit, {@code NaN} when unknown
     */
    static BlankObservations of(SampleTable table, AnalyteColumn col, int[] rows, int[] preceding, double[] limits) {
        return new FromColumn(table, col, rows, preceding, limits);
    }

    /** The observations of {@code parts}, one after the other. */
    static BlankObservations concat(List<BlankObservations> parts) {
        return parts.size() == 1 ? parts.get(0) : new Joined(parts);
    }

    private static final class Listed extends BlankObservations {
        private final List<BlankObservation> observations;

        Listed(List<BlankObservation> observations) {
            this.observations = observations;
        }

        @Override
        public BlankObservation get(int i) {
            return observations.get(i);
        }

        @Override
        public int size() {
            return observations.size();
        }
    }

    private static final class FromColumn extends BlankObservations {
        private final SampleTable table;
        private final AnalyteColumn col;
        private final String analyte;
        private final String unit;
        private final int[] rows;
        private final int[] preceding;
        private final double[] limits;

        FromColumn(SampleTable table, AnalyteColumn col, int[] rows, int[] preceding, double[] limits) {
            this.table = table;
            this.col = col;
            this.preceding = preceding;
            this.analyte = col.analyte().name();
            this.unit = col.analyte().unit().symbol();
            this.rows = rows;
            this.limits = limits;
        }

        @Override
        public BlankObservation get(int i) {
            int row = rows[i];
            // The batch's ID: the table's batch record of the row has the lab and ID of its batch in the sequence.
            return new BlankObservation(row, table.id(row), table.batch(row).id(), table.position(row),
                    analyte, unit, col.value(row), limits[i], precedingId(i), precedingGrade(i));
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
        String analyte(int i) {
            return analyte;
        }

        @Override
        String unit(int i) {
            return unit;
        }

        @Override
        AssayValue value(int i) {
            return col.value(rows[i]);
        }

        @Override
        double detectionLimit(int i) {
            return limits[i];
        }

        @Override
        String sampleId(int i) {
            return table.id(rows[i]);
        }

        @Override
        String precedingId(int i) {
            int prev = preceding[i];
            return prev < 0 ? "" : table.id(prev);
        }

        @Override
        AssayValue precedingGrade(int i) {
            int prev = preceding[i];
            return prev < 0 ? AssayValue.missing(MissingReason.NONE) : col.value(prev);
        }
    }

    private static final class Joined extends BlankObservations {
        private final List<BlankObservations> parts;
        private final int[] start;

        Joined(List<BlankObservations> parts) {
            this.parts = List.copyOf(parts);
            this.start = new int[parts.size() + 1];
            for (int p = 0; p < parts.size(); p++) {
                start[p + 1] = start[p] + parts.get(p).size();
            }
        }

        /** The part holding observation {@code i}. */
        private int part(int i) {
            java.util.Objects.checkIndex(i, size());
            int p = java.util.Arrays.binarySearch(start, i);
            if (p < 0) {
                return -p - 2;
            }
            while (start[p + 1] == i) {
                p++; // empty parts start where the next begins
            }
            return p;
        }

        @Override
        List<BlankObservations> parts() {
            return parts;
        }

        /** {@code read} of observation {@code i}, in the part that holds it. */
        private <R> R at(int i, PartRead<R> read) {
            int p = part(i);
            return read.of(parts.get(p), i - start[p]);
        }

        @Override
        public BlankObservation get(int i) {
            return at(i, BlankObservations::get);
        }

        @Override
        public int size() {
            return start[start.length - 1];
        }

        @Override
        int row(int i) {
            int p = part(i);
            return parts.get(p).row(i - start[p]);
        }

        @Override
        String analyte(int i) {
            return at(i, BlankObservations::analyte);
        }

        @Override
        String unit(int i) {
            return at(i, BlankObservations::unit);
        }

        @Override
        AssayValue value(int i) {
            return at(i, BlankObservations::value);
        }

        @Override
        double detectionLimit(int i) {
            int p = part(i);
            return parts.get(p).detectionLimit(i - start[p]);
        }

        @Override
        String sampleId(int i) {
            return at(i, BlankObservations::sampleId);
        }

        @Override
        String precedingId(int i) {
            return at(i, BlankObservations::precedingId);
        }

        @Override
        AssayValue precedingGrade(int i) {
            return at(i, BlankObservations::precedingGrade);
        }
    }

    /** A field of an observation of a part, by its index in the part. */
    private interface PartRead<R> {
        R of(BlankObservations part, int i);
    }
}
