package org.cupel.assay;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Fixed-decimal text and the decimals after a unit factor; every row hand-worked in its comment. */
class NumbersTest {

    @ParameterizedTest(name = "{0} with {1} decimals is {2}")
    @CsvSource(delimiter = '|', value = {
        "0.07|3|0.070",        // the lab's trailing zero restored
        "1.236|3|1.236",
        "1.2365|3|1.237",      // half-up on the decimal text, as on paper (1.2365 is 1.23649999… in binary)
        "1.2364|3|1.236",
        "12|0|12",
        "-0.0001|3|0.000",     // no negative zero
        "0.07|-1|0.07",        // not known: the shortest form
        "1500|-1|1500"})
    void fixed(double v, int decimals, String expected) {
        assertEquals(expected, Numbers.fixed(v, decimals));
    }

    @ParameterizedTest(name = "{0} decimals times {1} give {2}")
    @CsvSource(delimiter = '|', value = {
        "0|1.0|0",             // ppm to g/t: the same number
        "0|0.001|3",           // 5 ppb = 0.005 g/t
        "2|10000|0",           // 1.25 % = 12500 g/t: no decimals left, never fewer than 0
        "3|1000|0",            // 0.005 g/t = 5 ppb
        "3|0.0001|7",          // 0.005 g/t = 0.0000005 %
        "2|34.285714285714285|-1", // oz/st to g/t (240/7): the written precision is not a count of decimals
        "-1|0.001|-1"})        // not known stays not known
    void decimalsAfterScaling(int decimals, double factor, int expected) {
        assertEquals(expected, Numbers.decimalsAfterScaling(decimals, factor));
    }
}
