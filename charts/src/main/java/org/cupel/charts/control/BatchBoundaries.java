package org.cupel.charts.control;

import java.util.function.IntFunction;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.AnnotationLine;

/**
 * Dotted vertical lines between consecutive batches of a run-order chart (item {@code i} at x = i + 1),
 * drawn only while they stay apart: beyond {@link #MAX} boundaries they would merge into a grey band, so
 * none is drawn, and the axis title then says nothing about them.
 */
final class BatchBoundaries {
    static final int MAX = 200;
    private static final String NOTE = "dotted lines separate batches";

    private BatchBoundaries() {
    }

    /**
     * Draws the boundaries between the batches of items {@code 0..n-1} and sets the x-axis title: {@code title}
     * with {@code detail} and, when the lines are drawn, a note saying what they are.
     *
     * @param detail what the x order is ("batch date, then position"), or empty
     * @return the number of lines drawn
     */
    static int draw(XYChart chart, int n, IntFunction<String> batchOf, String title, String detail) {
        double[] at = new double[MAX];
        int count = 0;
        for (int i = 1; i < n; i++) {
            if (!batchOf.apply(i).equals(batchOf.apply(i - 1))) {
                if (count == MAX) {
                    count = -1;
                    break;
                }
                at[count++] = i + 0.5;
            }
        }
        for (int k = 0; k < count; k++) {
            chart.addAnnotation(new AnnotationLine(at[k], true, false));
        }
        String inBrackets = count > 0 ? (detail.isEmpty() ? NOTE : detail + "; " + NOTE) : detail;
        chart.setXAxisTitle(inBrackets.isEmpty() ? title : title + " (" + inBrackets + ")");
        return Math.max(count, 0);
    }
}
