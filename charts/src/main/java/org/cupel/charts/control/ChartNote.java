package org.cupel.charts.control;

import org.knowm.xchart.AnnotationTextPanel;
import org.knowm.xchart.XYChart;

/** Puts the chart's small print (n, limits) in a box in the top left corner of the plot area. */
final class ChartNote {
    private ChartNote() {
    }

    static void add(XYChart c, String text) {
        c.getStyler().setAnnotationTextPanelBackgroundColor(new java.awt.Color(255, 255, 255, 225))
                .setAnnotationTextPanelBorderColor(new java.awt.Color(200, 200, 200))
                .setAnnotationTextPanelFont(new java.awt.Font("DejaVu Sans", java.awt.Font.PLAIN, 12));
        c.addAnnotation(new AnnotationTextPanel(text, 95, c.getHeight() - 72, true));
    }
}
