package org.cupel.assay;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The primitive list behaves as the boxed list it replaces (java.util.List contract). */
class DoubleListTest {

    @Test
    void equalsAndHashesLikeTheBoxedList() {
        double[] source = {0.5, -1.25, Double.NaN, 3};
        DoubleList list = DoubleList.of(source);
        List<Double> boxed = List.of(0.5, -1.25, Double.NaN, 3.0);
        assertEquals(boxed, list);
        assertEquals(list, boxed);
        assertEquals(boxed.hashCode(), list.hashCode());
        assertEquals(-1.25, list.getDouble(1));
    }

    @Test
    void isACopyAndUnmodifiable() {
        double[] source = {1, 2};
        DoubleList list = DoubleList.of(source);
        source[0] = 99;
        assertEquals(1.0, list.get(0));
        assertArrayEquals(new double[] {1, 2}, list.toDoubleArray());
        assertThrows(UnsupportedOperationException.class, () -> list.add(3.0));
        assertSame(list, DoubleList.copyOf(list));
        assertEquals(list, DoubleList.copyOf(List.of(1.0, 2.0)));
    }
}
