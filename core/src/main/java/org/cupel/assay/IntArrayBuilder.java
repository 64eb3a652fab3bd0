package org.cupel.assay;

import java.util.Arrays;

/** A growing array of ints, for a column of row numbers or indices filled one at a time. */
public final class IntArrayBuilder {
    private int[] values = new int[16];
    private int size;

    public void add(int value) {
        if (size == values.length) {
            values = Arrays.copyOf(values, 2 * size);
        }
        values[size++] = value;
    }

    public int size() {
        return size;
    }

    /** The values added, in an array of their own. */
    public int[] toArray() {
        return Arrays.copyOf(values, size);
    }
}
