package org.cupel.charts.control;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.junit.jupiter.api.Test;

class BatchBoundariesTest {

    @Test
    void linesAreDrawnAndNamedWhileThereAreFewBatches() {
        XYChart chart = new XYChartBuilder().width(400).height(300).build();
        // items 0-2 in batch A, 3-4 in B, 5 in C: two boundaries
        String[] batches = {"A", "A", "A", "B", "B", "C"};
        assertEquals(2, BatchBoundaries.draw(chart, batches.length, i -> batches[i], "Result number",
                "batch date, then position"));
        assertEquals("Result number (batch date, then position; dotted lines separate batches)",
                chart.getXAxisTitle());
    }

    @Test
    void beyondTheLimitNoLineIsDrawnAndTheTitleSaysNothingOfThem() {
        XYChart chart = new XYChartBuilder().width(400).height(300).build();
        int n = BatchBoundaries.MAX + 2; // every item its own batch: MAX + 1 boundaries
        assertEquals(0, BatchBoundaries.draw(chart, n, i -> "B" + i, "Blank number in run order", ""));
        assertEquals("Blank number in run order", chart.getXAxisTitle());
    }

    @Test
    void exactlyTheLimitIsStillDrawn() {
        XYChart chart = new XYChartBuilder().width(400).height(300).build();
        int n = BatchBoundaries.MAX + 1; // MAX boundaries
        assertEquals(BatchBoundaries.MAX, BatchBoundaries.draw(chart, n, i -> "B" + i, "Result number", ""));
        assertEquals("Result number (dotted lines separate batches)", chart.getXAxisTitle());
    }
}
