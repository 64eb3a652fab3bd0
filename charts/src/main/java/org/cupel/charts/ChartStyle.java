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

    public static final Color[] SERIES = {BLUE, VERMILLION, BLUISH_GREEN, ORANGE, REDDISH_PURPLE, SKY_BLUE, BLACK,
        YELLOW};

    public static final int WIDTH = 900;
    public static final int HEIGHT = 560;

    private static final String FONT = "DejaVu Sans";

    private ChartStyle() {
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
        chart.getStyler().setMarkerSize(6);
    }

    public static void apply(CategoryChart chart) {
        applyAxes(chart.getStyler());
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
