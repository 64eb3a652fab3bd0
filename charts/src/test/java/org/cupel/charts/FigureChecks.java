package org.cupel.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.internal.chartpart.Chart;
import org.knowm.xchart.internal.chartpart.PlotArea;

/**
 * What every figure must show, checked on its layout: nothing written (notes, keys, headings, names beside an
 * axis) lies over a plot, no two labels collide, and XChart writes no text inside a plot.
 */
public final class FigureChecks {
    private FigureChecks() {
    }

    /** The plot area of each panel, on the figure, after painting it. */
    public static List<Rectangle2D> plots(ChartFigure f) {
        ChartFigure.Layout l = f.layout();
        List<Rectangle2D> out = new ArrayList<>();
        List<Chart<?, ?>> charts = f.charts();
        for (int i = 0; i < charts.size(); i++) {
            Rectangle2D p = PlotArea.of(charts.get(i));
            Rectangle2D region = l.charts().get(i);
            out.add(new Rectangle2D.Double(region.getX() + p.getX(), region.getY() + p.getY(), p.getWidth(),
                    p.getHeight()));
        }
        return out;
    }

    /** Notes, keys and headings lie outside every plot, and the charts write no text in their plots. */
    public static void writingStaysOutOfThePlots(String name, ChartFigure f) {
        ChartFigure.Layout l = f.layout();
        List<Rectangle2D> written = new ArrayList<>(l.notes());
        written.addAll(l.keys());
        written.addAll(l.headings());
        for (Rectangle2D plot : plots(f)) {
            for (Rectangle2D w : written) {
                assertFalse(w.intersects(plot), name + ": " + w + " lies over the plot " + plot);
            }
        }
        for (Chart<?, ?> c : f.charts()) {
            assertEquals(0, PlotArea.textAnnotations(c), name + ": text written inside a plot");
        }
    }

    /** Every label lies outside every plot (names beside an axis). */
    public static void labelsStayOutOfThePlots(String name, ChartFigure f) {
        for (Rectangle2D plot : plots(f)) {
            for (FigureLabel label : f.layout().labels()) {
                assertFalse(label.box().intersects(plot), name + ": '" + label.text() + "' " + label.box()
                        + " lies over the plot " + plot);
            }
        }
    }

    /** No two labels' boxes intersect. */
    public static void labelsApart(String name, ChartFigure f) {
        List<FigureLabel> labels = f.layout().labels();
        for (int i = 0; i < labels.size(); i++) {
            for (int j = i + 1; j < labels.size(); j++) {
                assertFalse(labels.get(i).box().intersects(labels.get(j).box()), name + ": '" + labels.get(i).text()
                        + "' " + labels.get(i).box() + " and '" + labels.get(j).text() + "' " + labels.get(j).box()
                        + " overlap");
            }
        }
    }
}
