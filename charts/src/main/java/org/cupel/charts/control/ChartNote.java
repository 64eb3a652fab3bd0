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
        String wrapped = org.cupel.charts.ChartNotes.wrap(text, 110);
        int extraLines = (int) wrapped.chars().filter(ch -> ch == '\n').count();
        // The panel is anchored at its bottom edge: lower it by a line per extra line to keep its top fixed.
        c.addAnnotation(new AnnotationTextPanel(wrapped, 95, c.getHeight() - 72 - 15 * extraLines, true));
    }
}
