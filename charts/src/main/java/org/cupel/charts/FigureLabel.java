package org.cupel.charts;

import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.List;

/**
 * A text placed on a {@link ChartFigure} once its charts are painted: the lines, how they are drawn, the box
 * they take in figure units and, for a label moved away from what it names, the leader line back to it.
 *
 * @param leader from the label to what it names, or null
 */
public record FigureLabel(List<String> lines, Font font, Color colour, Rectangle2D box, Text.Align align,
                          Line2D leader) {
    public FigureLabel {
        lines = List.copyOf(lines);
        box = (Rectangle2D) box.clone();
        leader = leader == null ? null : (Line2D) leader.clone();
    }

    @Override
    public Rectangle2D box() {
        return (Rectangle2D) box.clone();
    }

    @Override
    public Line2D leader() {
        return leader == null ? null : (Line2D) leader.clone();
    }

    /** The text as one string, lines joined by a space. */
    public String text() {
        return String.join(" ", lines);
    }
}
