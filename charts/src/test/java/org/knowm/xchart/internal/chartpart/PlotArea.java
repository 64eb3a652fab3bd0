package org.knowm.xchart.internal.chartpart;

import java.awt.geom.Rectangle2D;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.AnnotationTextPanel;

/**
 * Test access to what XChart keeps to itself: where a painted chart put its plot, and the text it was asked to
 * write inside the plot. Lives in XChart's package for its package-private accessors; tests only.
 */
public final class PlotArea {
    private PlotArea() {
    }

    /** The plot area of a chart after it was painted, in the chart's own coordinates. */
    public static Rectangle2D of(Chart<?, ?> chart) {
        return chart.getPlot().getBounds();
    }

    /** How many text annotations (labels, boxes) the chart draws in its plot. */
    public static long textAnnotations(Chart<?, ?> chart) {
        return chart.annotations.stream().filter(a -> a instanceof AnnotationText || a instanceof AnnotationTextPanel)
                .count();
    }
}
