package org.cupel.assay;

import java.util.AbstractList;
import java.util.Arrays;
import java.util.List;
import java.util.RandomAccess;

/**
 * An unmodifiable list of doubles held in one primitive array: a statistic per observation (a control
 * chart's running value and limits) costs 8 bytes per point instead of a boxed {@code Double} and its
 * reference. Elements are boxed only when read through {@link #get(int)}.
 */
public final class DoubleList extends AbstractList<Double> implements RandomAccess {
    private final double[] values;

    private DoubleList(double[] values) {
        this.values = values;
    }

    /** A list of {@code values}, copied. */
    public static DoubleList of(double[] values) {
        return new DoubleList(values.clone());
    }

    /** {@code list} itself when it is already a {@code DoubleList}, else a copy; nulls are not allowed. */
    public static DoubleList copyOf(List<Double> list) {
        if (list instanceof DoubleList d) {
            return d;
        }
        double[] out = new double[list.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = list.get(i);
        }
        return new DoubleList(out);
    }

    @Override
    public Double get(int index) {
        return values[index];
    }

    /** The element at {@code index}, unboxed. */
    public double getDouble(int index) {
        return values[index];
    }

    @Override
    public int size() {
        return values.length;
    }

    /** A copy of the elements. */
    public double[] toDoubleArray() {
        return values.clone();
    }

    @Override
    public boolean equals(Object o) {
        if (o instanceof DoubleList d) {
            return Arrays.equals(values, d.values);
        }
        return super.equals(o);
    }

    @Override
    public int hashCode() {
        return super.hashCode();
    }
}
