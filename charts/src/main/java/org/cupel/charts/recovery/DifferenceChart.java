package org.cupel.charts.recovery;

import java.util.List;
import org.cupel.charts.AxisLabels;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartStyle;
import org.cupel.recovery.PairComparison;
import org.cupel.recovery.RecoveryResult;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Each pair's difference in recovery with its Welch CI, against zero and the equivalence margin: a CI inside
 * the margin lines reads "equivalent", one clear of zero "different". The pairs and their verdicts are named
 * left of the plot, beside their rows.
 */
public final class DifferenceChart {
    private DifferenceChart() {
    }

    /** The chart, each pair of conditions and its verdict named left of its row. */
    public static ChartFigure of(RecoveryResult result, String analyte) {
        List<PairComparison> pairs = result.comparisons().stream().filter(p -> p.analyte().equals(analyte)).toList();
        double margin = result.settings().equivalenceMargin();
        XYChart chart = new XYChartBuilder().width(ChartStyle.WIDTH).height(Math.max(360, 140 + 60 * pairs.size()))
                .title(analyte + ": differences between conditions (" + pairs.size() + " pairs)")
                .xAxisTitle("Difference in recovery, first − second (percentage points)").build();
        ChartStyle.apply(chart);
        chart.getStyler().setYAxisTicksVisible(false).setYAxisTitleVisible(false);
        chart.getStyler().setYAxisMin(0.5).setYAxisMax(pairs.size() + 0.6);
        double lo = -margin;
        double hi = margin;
        for (int i = 0; i < pairs.size(); i++) {
            PairComparison p = pairs.get(i);
            double y = pairs.size() - i;
            if (p.welch().computed()) {
                lo = Math.min(lo, p.welch().lower());
                hi = Math.max(hi, p.welch().upper());
                XYSeries ci = chart.addSeries("ci-" + i, new double[] {p.welch().lower(), p.welch().upper()},
                        new double[] {y, y});
                ci.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line).setMarker(SeriesMarkers.NONE)
                        .setLineColor(ChartStyle.DATA).setLineStyle(ChartStyle.solid(2.5f)).setShowInLegend(i == 0);
                if (i == 0) {
                    // The caption says the verdicts use the Holm-adjusted p, not these per-pair intervals.
                    ci.setLabel(Math.round(result.settings().confidence() * 100) + "% CI (Welch, per pair)");
                }
            }
            XYSeries d = chart.addSeries("d-" + i, new double[] {p.welch().difference()}, new double[] {y});
            d.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter).setMarker(ChartMarkers.DIAMOND)
                    .setMarkerColor(ChartStyle.REFERENCE).setShowInLegend(false);
        }
        vertical(chart, "No difference", 0, pairs.size(), ChartStyle.REFERENCE, ChartStyle.solid(1.2f));
        vertical(chart, "Equivalence margin ±" + margin + " pp", -margin, pairs.size(), ChartStyle.WARNING,
                ChartStyle.dashed(1.5f));
        vertical(chart, "margin+", margin, pairs.size(), ChartStyle.WARNING, ChartStyle.dashed(1.5f))
                .setShowInLegend(false);
        double pad = 0.08 * (hi - lo);
        chart.getStyler().setXAxisMin(lo - pad).setXAxisMax(hi + pad);
        double[] rows = new double[pairs.size()];
        List<String> names = new java.util.ArrayList<>();
        for (int i = 0; i < pairs.size(); i++) {
            PairComparison p = pairs.get(i);
            rows[i] = pairs.size() - i;
            names.add(p.first() + " − " + p.second() + "\n" + p.verdict().label());
        }
        return ChartFigure.of(new ChartFigure.Panel("", chart, "")
                .with(AxisLabels.left(rows, names, ChartFigure.NOTE_FONT)));
    }

    private static XYSeries vertical(XYChart chart, String name, double x, int pairs, java.awt.Color colour,
                                     java.awt.BasicStroke stroke) {
        XYSeries s = chart.addSeries(name, new double[] {x, x}, new double[] {0.5, pairs + 0.6});
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line).setMarker(SeriesMarkers.NONE).setLineColor(colour)
                .setLineStyle(stroke);
        return s;
    }
}
