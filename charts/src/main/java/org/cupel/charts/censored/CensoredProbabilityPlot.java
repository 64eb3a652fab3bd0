package org.cupel.charts.censored;

import java.awt.BasicStroke;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.cupel.assay.Numbers;
import org.cupel.censored.Ros;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartNotes;
import org.cupel.charts.ChartStyle;
import org.cupel.charts.KeyEntry;
import org.cupel.charts.PointBudget;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Censored probability plot: each observation at the normal quantile of its Helsel–Cohn plotting
 * position (from {@link Ros}) against its value on a log axis; detects as blue dots, imputed nondetects as vermillion diamonds,
 * detection limits as dashed lines, and the ROS line {@code ln x = a + b z}. Only draws what
 * {@link Ros.Result} holds.
 */
public final class CensoredProbabilityPlot {
    private static final BasicStroke ROS_LINE = ChartStyle.solid(1.4f);
    private static final BasicStroke LIMIT_LINE = ChartStyle.dashed(1.4f);

    private CensoredProbabilityPlot() {
    }

    /**
     * @param ros the ROS fit of the sample
     * @param valueLabel the axis label with unit, e.g. "Au (g/t)"
     * @param title chart title
     */
    public static ChartFigure create(Ros.Result ros, String valueLabel, String title) {
        XYChart chart = new XYChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT).title(title)
                .xAxisTitle("Normal quantile of the plotting position (z)").yAxisTitle(valueLabel + ", log scale")
                .build();
        ChartStyle.apply(chart);
        chart.getStyler().setYAxisLogarithmic(true);
        // Decades down to 1e-10 labelled as such: the report's pattern (three decimals) wrote 0.0001 as "0".
        chart.getStyler().setYAxisDecimalPattern("#,##0.##########");
        chart.getStyler().setXAxisDecimalPattern("0.0");
        List<Ros.Point> points = new ArrayList<>(ros.points());
        if (points.isEmpty()) {
            XYSeries empty = chart.addSeries("no data", new double[] {0}, new double[] {1});
            empty.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            empty.setMarker(SeriesMarkers.NONE);
            chart.getStyler().setLegendVisible(false);
            chart.getStyler().setAxisTicksVisible(false);
            String why = ros.summary().notes().get(0);
            int cut = why.indexOf(':');
            chart.addAnnotation(new AnnotationText("No probability plot: ROS is not applicable", ChartStyle.WIDTH / 2.0,
                    ChartStyle.HEIGHT / 2.0 + 12, true));
            chart.addAnnotation(new AnnotationText(cut > 0 ? why.substring(cut + 1).strip() : why,
                    ChartStyle.WIDTH / 2.0, ChartStyle.HEIGHT / 2.0 - 12, true));
            return ChartFigure.of(chart, "");
        }
        points.sort(Comparator.comparingDouble(Ros.Point::normalQuantile));
        // The key is the figure's, wrapped to the chart's width: XChart's one-line legend ran off the right edge.
        chart.getStyler().setLegendVisible(false);
        List<KeyEntry> key = new ArrayList<>();
        int drawnDetects = addPoints(chart, points, true, "Detected", ChartStyle.DATA, ChartMarkers.CIRCLE, key);
        int drawnImputed = addPoints(chart, points, false, "Below detection (imputed by ROS)", ChartStyle.FAILURE,
                ChartMarkers.DIAMOND, key);
        double zMin = points.get(0).normalQuantile();
        double zMax = points.get(points.size() - 1).normalQuantile();
        double pad = 0.15 * Math.max(zMax - zMin, 1);
        double lo = zMin - pad;
        double hi = zMax + pad;
        String rosLine = String.format(Locale.US, "ROS line: ln x = %.3f + %.3f z", ros.intercept(), ros.slope());
        XYSeries line = chart.addSeries(rosLine, new double[] {lo, hi},
                new double[] {Math.exp(ros.intercept() + ros.slope() * lo), Math.exp(ros.intercept() + ros.slope() * hi)});
        line.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        line.setMarker(SeriesMarkers.NONE).setLineColor(ChartStyle.REFERENCE).setLineStyle(ROS_LINE);
        key.add(KeyEntry.line(rosLine, ChartStyle.REFERENCE, ROS_LINE));
        addLimits(chart, ros.limits(), lo, hi, key);
        chart.getStyler().setXAxisMin(lo).setXAxisMax(hi);
        int n = points.size();
        long censored = points.stream().filter(p -> !p.detected()).count();
        String note = ChartNotes.count(n, drawnDetects + drawnImputed) + String.format(Locale.US,
                "; %,d censored (%.0f %%)", censored, 100.0 * censored / n);
        return ChartFigure.of(new ChartFigure.Panel("", chart, note).withKey(key));
    }

    private static int addPoints(XYChart chart, List<Ros.Point> all, boolean detected, String name,
                                 java.awt.Color colour, org.knowm.xchart.style.markers.Marker marker,
                                 List<KeyEntry> key) {
        List<Ros.Point> sel = all.stream().filter(p -> p.detected() == detected).toList();
        if (sel.isEmpty()) {
            return 0;
        }
        int[] idx = PointBudget.indices(sel.size(), PointBudget.DEFAULT);
        double[] x = new double[idx.length];
        double[] y = new double[idx.length];
        for (int k = 0; k < idx.length; k++) {
            x[k] = sel.get(idx[k]).normalQuantile();
            y[k] = sel.get(idx[k]).value();
        }
        String label = String.format(Locale.US, "%s (%,d)", name, sel.size());
        XYSeries s = chart.addSeries(label, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        s.setMarker(marker).setMarkerColor(colour);
        key.add(KeyEntry.points(label, colour, marker));
        return idx.length;
    }

    /** One dashed horizontal segment per detection limit, gaps between them, each labelled at the right. */
    private static void addLimits(XYChart chart, double[] limits, double lo, double hi, List<KeyEntry> key) {
        List<Double> xs = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        StringBuilder names = new StringBuilder();
        for (double dl : limits) {
            if (dl <= 0) {
                continue;
            }
            if (!xs.isEmpty()) {
                xs.add(Double.NaN);
                ys.add(Double.NaN);
            }
            xs.add(lo);
            ys.add(dl);
            xs.add(hi);
            ys.add(dl);
            names.append(names.length() == 0 ? "" : ", ").append(Numbers.compact(dl));
        }
        if (xs.isEmpty()) {
            return;
        }
        String label = "Detection limit" + (limits.length > 1 ? "s " : " ") + names;
        XYSeries s = chart.addSeries(label, xs.stream().mapToDouble(Double::doubleValue).toArray(),
                ys.stream().mapToDouble(Double::doubleValue).toArray());
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setMarker(SeriesMarkers.NONE).setLineColor(ChartStyle.WARNING).setLineStyle(LIMIT_LINE);
        key.add(KeyEntry.line(label, ChartStyle.WARNING, LIMIT_LINE));
    }
}
