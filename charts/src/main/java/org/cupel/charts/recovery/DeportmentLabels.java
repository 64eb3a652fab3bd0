package org.cupel.charts.recovery;

import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartStyle;
import org.cupel.charts.FigureDecoration;
import org.cupel.charts.FigureLabel;
import org.cupel.charts.LabelDodge;
import org.cupel.charts.Text;
import org.knowm.xchart.internal.chartpart.Chart;

/**
 * The share of each part of a stacked bar, written on the part when it fits there, else right of the bar with
 * a leader line, the labels beside one bar moved apart by {@link LabelDodge} so that none covers another.
 * Bar positions come from the painted category chart: category i spans the axis from screen x of i to that of
 * i + 1 (XChart's category axis), the bar the middle {@code fill} of it.
 */
final class DeportmentLabels implements FigureDecoration {
    static final Font FONT = new Font("DejaVu Sans", Font.PLAIN, 11);
    private static final double GAP = 2;
    private static final double LEADER = 8;

    private final List<List<Double>> shares;
    private final List<Color> colours;
    private final double fill;

    /**
     * @param shares per series (bottom first), per category
     * @param colours each series' fill, for a label drawn on it
     */
    DeportmentLabels(List<List<Double>> shares, List<Color> colours, double fill) {
        this.shares = shares.stream().map(List::copyOf).toList();
        this.colours = List.copyOf(colours);
        this.fill = fill;
    }

    @Override
    public List<FigureLabel> place(Chart<?, ?> chart, Rectangle2D region, Rectangle2D panel) {
        List<FigureLabel> out = new ArrayList<>();
        int categories = shares.isEmpty() ? 0 : shares.get(0).size();
        double lh = Text.lineHeight(FONT);
        double top = region.getY() + chart.getScreenYFromChart(100);
        double bottom = region.getY() + chart.getScreenYFromChart(0);
        for (int c = 0; c < categories; c++) {
            double left = region.getX() + chart.getScreenXFromChart(c);
            double right = region.getX() + chart.getScreenXFromChart(c + 1);
            double half = (right - left) * fill / 2;
            double centre = (left + right) / 2;
            List<double[]> outside = new ArrayList<>();
            List<String> outsideText = new ArrayList<>();
            double cum = 0;
            for (int s = 0; s < shares.size(); s++) {
                double v = shares.get(s).get(c);
                if (!(v > 0)) {
                    continue;
                }
                double y0 = region.getY() + chart.getScreenYFromChart(cum);
                double y1 = region.getY() + chart.getScreenYFromChart(cum + v);
                cum += v;
                String text = format(v);
                double w = Text.width(text, FONT);
                if (y0 - y1 >= lh + 2 * GAP && w <= 2 * half - 2 * GAP) {
                    out.add(new FigureLabel(List.of(text), FONT, ChartStyle.textOn(colours.get(s)),
                            new Rectangle2D.Double(centre - w / 2, (y0 + y1) / 2 - lh / 2, w, lh), Text.Align.CENTRE,
                            null));
                } else {
                    outside.add(new double[] {(y0 + y1) / 2, w});
                    outsideText.add(text);
                }
            }
            double[] wanted = outside.stream().mapToDouble(p -> p[0]).toArray();
            double[] sizes = new double[wanted.length];
            java.util.Arrays.fill(sizes, lh);
            double[] at = LabelDodge.place(wanted, sizes, GAP, top, bottom);
            double x = centre + half + LEADER;
            for (int k = 0; k < at.length; k++) {
                double w = outside.get(k)[1];
                out.add(new FigureLabel(List.of(outsideText.get(k)), FONT, ChartFigure.INK,
                        new Rectangle2D.Double(x + 2, at[k] - lh / 2, w, lh), Text.Align.LEFT,
                        new Line2D.Double(centre + half, wanted[k], x, at[k])));
            }
        }
        return out;
    }

    /** "92.22", "0.48": two decimals at most, as the deportment table gives them. */
    static String format(double v) {
        return new DecimalFormat("0.##", DecimalFormatSymbols.getInstance(Locale.ROOT)).format(v);
    }
}
