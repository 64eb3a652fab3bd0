package org.cupel.charts;

import java.awt.Font;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.knowm.xchart.internal.chartpart.Chart;

/**
 * Names of categories (conditions, pairs of conditions, duplicate types) beside the axis that places them:
 * under the chart for an x axis, to its left for a y axis, never inside the plot. The chart hides that axis'
 * own ticks and title; each name is centred on its category's position, and the type is made smaller, down to
 * {@value #SMALLEST} units, until neighbouring names no longer touch.
 */
public final class AxisLabels implements FigureDecoration {
    static final int SMALLEST = 8;
    private static final double GAP = 6;

    private final boolean below;
    private final double[] at;
    private final List<List<String>> labels;
    private final String title;
    private final Font font;

    private AxisLabels(boolean below, double[] at, List<String> labels, String title, Font font) {
        if (at.length != labels.size()) {
            throw new IllegalArgumentException("one position per label expected");
        }
        this.below = below;
        this.at = at.clone();
        this.labels = labels.stream().map(l -> List.of(l.split("\n"))).toList();
        this.title = title;
        this.font = font;
    }

    /**
     * Names under the chart, at x = {@code at}, and the axis title under them.
     *
     * @param labels one per position; "\n" breaks a name into lines
     */
    public static AxisLabels below(double[] at, List<String> labels, String title, Font font) {
        return new AxisLabels(true, at, labels, title, font);
    }

    /** Names left of the chart, at y = {@code at}, right-aligned against it. */
    public static AxisLabels left(double[] at, List<String> labels, Font font) {
        return new AxisLabels(false, at, labels, "", font);
    }

    @Override
    public double left() {
        if (below) {
            return 0;
        }
        double w = 0;
        for (List<String> l : labels) {
            w = Math.max(w, Text.width(l, font));
        }
        return Math.ceil(w + 2 * GAP);
    }

    @Override
    public double below() {
        if (!below) {
            return 0;
        }
        int lines = labels.stream().mapToInt(List::size).max().orElse(0);
        double titleRoom = title.isEmpty() ? 0 : Text.lineHeight(titleFont()) + GAP;
        return Math.ceil(GAP + lines * Text.lineHeight(font) + GAP + titleRoom);
    }

    @Override
    public List<FigureLabel> place(Chart<?, ?> painted, Rectangle2D region, Rectangle2D panel) {
        List<FigureLabel> out = new ArrayList<>();
        for (int size = font.getSize(); size >= SMALLEST; size--) {
            out = boxes(painted, region, font.deriveFont((float) size));
            if (apart(out) || size == SMALLEST) {
                break;
            }
        }
        if (below && !title.isEmpty() && !out.isEmpty()) {
            double centre = (out.get(0).box().getCenterX() + out.get(out.size() - 1).box().getCenterX()) / 2;
            Font tf = titleFont();
            double w = Text.width(title, tf);
            double top = region.getMaxY() + below() - GAP / 2 - Text.lineHeight(tf);
            out.add(new FigureLabel(List.of(title), tf, ChartFigure.INK, new Rectangle2D.Double(centre - w / 2, top, w,
                    Text.lineHeight(tf)), Text.Align.CENTRE, null));
        }
        return out;
    }

    private List<FigureLabel> boxes(Chart<?, ?> chart, Rectangle2D region, Font f) {
        List<FigureLabel> out = new ArrayList<>();
        double lh = Text.lineHeight(f);
        for (int i = 0; i < at.length; i++) {
            List<String> lines = labels.get(i);
            double w = Text.width(lines, f);
            double h = lines.size() * lh;
            Rectangle2D box;
            if (below) {
                double x = region.getX() + chart.getScreenXFromChart(at[i]);
                box = new Rectangle2D.Double(x - w / 2, region.getMaxY() + GAP, w, h);
            } else {
                double y = region.getY() + chart.getScreenYFromChart(at[i]);
                box = new Rectangle2D.Double(region.getX() - GAP - w, y - h / 2, w, h);
            }
            out.add(new FigureLabel(lines, f, ChartFigure.INK, box, below ? Text.Align.CENTRE : Text.Align.RIGHT,
                    null));
        }
        return out;
    }

    /** No two boxes closer than the gap along the axis. */
    private boolean apart(List<FigureLabel> boxes) {
        List<FigureLabel> sorted = new ArrayList<>(boxes);
        sorted.sort((p, q) -> below ? Double.compare(p.box().getX(), q.box().getX())
                : Double.compare(p.box().getY(), q.box().getY()));
        for (int i = 1; i < sorted.size(); i++) {
            Rectangle2D p = sorted.get(i - 1).box();
            Rectangle2D q = sorted.get(i).box();
            if (below ? p.getMaxX() + GAP > q.getX() : p.getMaxY() + GAP / 3 > q.getY()) {
                return false;
            }
        }
        return true;
    }

    private Font titleFont() {
        return font.deriveFont(Font.PLAIN, font.getSize2D() + 2);
    }

    @Override
    public String toString() {
        return "AxisLabels[" + (below ? "below" : "left") + " at " + Arrays.toString(at) + "]";
    }
}
