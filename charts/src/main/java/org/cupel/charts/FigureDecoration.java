package org.cupel.charts;

import java.awt.geom.Rectangle2D;
import java.util.List;
import org.knowm.xchart.internal.chartpart.Chart;

/**
 * Text a {@link ChartFigure} draws for a panel once its chart is painted, where it needs the chart's mapping
 * from data to the page: category names beside an axis, values beside bars.
 */
public interface FigureDecoration {
    /** Room the decoration needs to the left of the chart, in figure units. */
    default double left() {
        return 0;
    }

    /** Room the decoration needs below the chart, in figure units. */
    default double below() {
        return 0;
    }

    /**
     * The labels, in figure units.
     *
     * @param painted the chart, painted into {@code region}: its screen coordinates are relative to the
     *     region's top left corner
     * @param region where the chart is on the figure
     * @param panel the panel's whole cell (chart, decorations' room, heading and note)
     */
    List<FigureLabel> place(Chart<?, ?> painted, Rectangle2D region, Rectangle2D panel);
}
