package org.cupel.charts;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.font.FontRenderContext;
import java.awt.font.LineMetrics;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/**
 * Text outside the plots of a {@link ChartFigure}: measured, wrapped and drawn in figure units (1/72 in of
 * the chart's nominal size), so that a layout computed once holds at every output resolution. Measured with
 * antialiased fractional metrics, as the charts are drawn.
 */
public final class Text {
    /** The measuring context: scale-independent metrics, as drawn with antialiasing and fractional metrics. */
    public static final FontRenderContext FRC = new FontRenderContext(null, true, true);

    private Text() {
    }

    public static double width(String s, Font font) {
        return s.isEmpty() ? 0 : font.getStringBounds(s, FRC).getWidth();
    }

    /** Distance between baselines of consecutive lines. */
    public static double lineHeight(Font font) {
        LineMetrics m = font.getLineMetrics("Ag", FRC);
        return Math.ceil(m.getAscent() + m.getDescent() + m.getLeading());
    }

    public static double ascent(Font font) {
        return font.getLineMetrics("Ag", FRC).getAscent();
    }

    /** The widest of {@code lines}. */
    public static double width(List<String> lines, Font font) {
        double w = 0;
        for (String l : lines) {
            w = Math.max(w, width(l, font));
        }
        return w;
    }

    /**
     * {@code text} in lines no wider than {@code width}: explicit line breaks are kept; otherwise it breaks
     * preferably at its "; " separators, and a part longer than a line between words.
     */
    public static List<String> wrap(String text, Font font, double width) {
        List<String> out = new ArrayList<>();
        if (text == null || text.isEmpty()) {
            return out;
        }
        for (String paragraph : text.split("\n")) {
            StringBuilder line = new StringBuilder();
            for (String part : paragraph.split("; ")) {
                String joined = line.length() == 0 ? part : line + "; " + part;
                if (width(joined, font) <= width) {
                    line.setLength(0);
                    line.append(joined);
                    continue;
                }
                if (line.length() > 0) {
                    out.add(line + ";");
                    line.setLength(0);
                }
                for (String word : part.split(" ")) {
                    String next = line.length() == 0 ? word : line + " " + word;
                    if (line.length() > 0 && width(next, font) > width) {
                        out.add(line.toString());
                        line.setLength(0);
                        line.append(word);
                    } else {
                        line.setLength(0);
                        line.append(next);
                    }
                }
            }
            out.add(line.toString());
        }
        return out;
    }

    /** Draws {@code lines} in {@code box}, each aligned left, centred or right as {@code align} says. */
    public static void draw(Graphics2D g, List<String> lines, Font font, Rectangle2D box, Align align) {
        g.setFont(font);
        double lh = lineHeight(font);
        double y = box.getY() + ascent(font);
        for (String line : lines) {
            double w = width(line, font);
            double x = switch (align) {
                case LEFT -> box.getX();
                case CENTRE -> box.getCenterX() - w / 2;
                case RIGHT -> box.getMaxX() - w;
            };
            g.drawString(line, (float) x, (float) y);
            y += lh;
        }
    }

    /** Horizontal alignment of lines in their box. */
    public enum Align { LEFT, CENTRE, RIGHT }
}
