package org.cupel.demo;

/**
 * One sampled interval of a drill hole and its true grades (one per analyte, in the analyte's unit).
 *
 * @param hole  hole ID
 * @param from  depth of the top of the interval, m
 * @param to    depth of the bottom, m
 * @param grade true grade per analyte
 */
record DrillInterval(String hole, double from, double to, double[] grade) {
}
