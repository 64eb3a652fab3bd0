package org.cupel.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import org.knowm.xchart.CategoryChart;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.AxesChartStyler;
import org.knowm.xchart.style.Styler;

/**
 * The one visual style of every Cupel chart: a white plot area, thin light grid, DejaVu Sans at sizes
 * readable when printed at column width, and the colour-blind-safe palette of Okabe and Ito (2008),
 * "Color Universal Design", with meaning fixed per role so colours read the same on every chart.
 */
public final class ChartStyle {
    /** Okabe–Ito: black, orange, sky blue, bluish green, yellow, blue, vermillion, reddish purple. */
    public static final Color BLACK = new Color(0, 0, 0);
    public static final Color ORANGE = new Color(230, 159, 0);
    public static final Color SKY_BLUE = new Color(86, 180, 233);
    public static final Color BLUISH_GREEN = new Color(0, 158, 115);
    public static final Color YELLOW = new Color(240, 228, 66);
    public static final Color BLUE = new Color(0, 114, 178);
    public static final Color VERMILLION = new Color(213, 94, 0);
    public static final Color REDDISH_PURPLE = new Color(204, 121, 167);
    public static final Color GREY = new Color(120, 120, 120);

    /** Data points. */
    public static final Color DATA = BLUE;
    /** Reference values: certified value, 1:1 line, fitted model. */
    public static final Color REFERENCE = BLACK;
    /** Warning limits (2 SD, 90 % line). */
    public static final Color WARNING = ORANGE;
    /** Failure limits and failing points (3 SD, 99 % line). */
    public static final Color FAILURE = VERMILLION;
    /** A second data series (umpire lab, second condition). */
    public static final Color SECOND = BLUISH_GREEN;

    /**
     * Things of one kind compared on one chart (CRMs, duplicate types): Okabe–Ito colours other than the
     * orange and vermillion that mean warning and failure.
     */
    public static final Color[] CATEGORIES = {BLUE, REDDISH_PURPLE, BLUISH_GREEN, SKY_BLUE, BLACK, GREY};

    public static final Color[] SERIES = {BLUE, VERMILLION, BLUISH_GREEN, ORANGE, REDDISH_PURPLE, SKY_BLUE, BLACK,
        YELLOW};

    public static final int WIDTH = 900;
    public static final int HEIGHT = 560;

    /** The one typeface of charts and figures. */
    static final String FONT = "DejaVu Sans";
    /** Point markers, in chart units. */
    public static final int MARKER_SIZE = 6;
    /** Point markers of a panel, half a figure wide. */
    public static final int PANEL_MARKER_SIZE = 5;

    private ChartStyle() {
    }

    /**
     * Black or white, whichever reads better on {@code fill}: black on fills lighter than mid-grey by relative
     * luminance (W3C 2008, "Web Content Accessibility Guidelines (WCAG) 2.0", definition of relative
     * luminance), white on darker ones.
     */
    public static Color textOn(Color fill) {
        return luminance(fill) > 0.18 ? BLACK : Color.WHITE;
    }

    static double luminance(Color c) {
        return 0.2126 * linear(c.getRed()) + 0.7152 * linear(c.getGreen()) + 0.0722 * linear(c.getBlue());
    }

    private static double linear(int channel) {
        double v = channel / 255.0;
        return v <= 0.03928 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }

    public static BasicStroke solid(float width) {
        return new BasicStroke(width);
    }

    public static BasicStroke dashed(float width) {
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {8f, 5f}, 0f);
    }

    public static BasicStroke dotted(float width) {
        return new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 10f, new float[] {2f, 4f}, 0f);
    }

    public static void apply(XYChart chart) {
        applyAxes(chart.getStyler());
        chart.getStyler().setMarkerSize(MARKER_SIZE);
    }

    public static void apply(CategoryChart chart) {
        applyAxes(chart.getStyler());
    }

    /**
     * The style of a chart drawn as a panel of a {@link ChartFigure}: no title (the figure writes the panel's
     * heading), no legend (the figure's key serves every panel) and type a size smaller, for half the width.
     */
    public static void applyPanel(XYChart chart) {
        apply(chart);
        AxesChartStyler s = chart.getStyler();
        s.setChartTitleVisible(false);
        s.setLegendVisible(false);
        s.setAxisTitleFont(new Font(FONT, Font.PLAIN, 13));
        s.setAxisTickLabelsFont(new Font(FONT, Font.PLAIN, 11));
        s.setAxisTitlePadding(4);
        chart.getStyler().setMarkerSize(PANEL_MARKER_SIZE);
    }

    private static void applyAxes(AxesChartStyler s) {
        s.setChartBackgroundColor(Color.WHITE);
        s.setPlotBackgroundColor(Color.WHITE);
        s.setPlotBorderColor(new Color(90, 90, 90));
        s.setPlotGridLinesColor(new Color(225, 225, 225));
        s.setPlotGridLinesStroke(new BasicStroke(0.6f));
        s.setChartTitleFont(new Font(FONT, Font.BOLD, 17));
        s.setChartTitleBoxVisible(false);
        s.setAxisTitleFont(new Font(FONT, Font.PLAIN, 14));
        s.setAxisTickLabelsFont(new Font(FONT, Font.PLAIN, 12));
        s.setLegendFont(new Font(FONT, Font.PLAIN, 12));
        s.setLegendPosition(Styler.LegendPosition.OutsideS);
        s.setLegendLayout(Styler.LegendLayout.Horizontal);
        s.setLegendBorderColor(Color.WHITE);
        s.setAnnotationTextFont(new Font(FONT, Font.PLAIN, 12));
        s.setSeriesColors(SERIES);
        s.setSeriesMarkers(ChartMarkers.defaults());
        s.setAntiAlias(true);
        s.setDecimalPattern("#,##0.###");
        s.setLocale(java.util.Locale.US);
    }
}
