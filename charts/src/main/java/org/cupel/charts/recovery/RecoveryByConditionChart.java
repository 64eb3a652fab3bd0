package org.cupel.charts.recovery;

import java.util.List;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartNotes;
import org.cupel.charts.ChartStyle;
import org.cupel.recovery.ConditionRecovery;
import org.cupel.recovery.RecoveryResult;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Mean recovery of each condition for one analyte with its t-interval as a bar, and every smelt as a point
 * beside it. Intervals near 100% come from the log-loss scale and are therefore not symmetric.
 */
public final class RecoveryByConditionChart {
    private static final double SPREAD = 0.12;

    private RecoveryByConditionChart() {
    }

    public static XYChart of(RecoveryResult result, String analyte) {
        List<ConditionRecovery> conditions = result.conditions().stream().filter(c -> c.analyte().equals(analyte))
                .toList();
        int smelts = conditions.stream().mapToInt(ConditionRecovery::n).sum();
        XYChart chart = new XYChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT)
                .title(analyte + " recovery (" + conditions.get(0).definition().label() + ") per condition, "
                        + ChartNotes.count(smelts, smelts) + " smelts")
                .xAxisTitle("Condition").yAxisTitle(analyte + " recovery (%)").build();
        ChartStyle.apply(chart);
        chart.getStyler().setXAxisTicksVisible(false);
        chart.getStyler().setXAxisMin(0.5).setXAxisMax(conditions.size() + 0.5);
        double bottom = bottom(conditions);
        chart.getStyler().setYAxisMin(bottom);
        for (int c = 0; c < conditions.size(); c++) {
            ConditionRecovery cr = conditions.get(c);
            chart.addAnnotation(new AnnotationText(cr.condition() + " (n = " + cr.n() + ")", c + 1,
                    bottom + 0.04 * (top(conditions) - bottom), false));
        }
        chart.getStyler().setDecimalPattern("0.00");
        double[] px = new double[smelts];
        double[] py = new double[smelts];
        int k = 0;
        for (int c = 0; c < conditions.size(); c++) {
            ConditionRecovery cr = conditions.get(c);
            double[] r = cr.replicates();
            for (int i = 0; i < r.length; i++) {
                px[k] = c + 1 + SPREAD + (r.length == 1 ? 0 : 0.08 * i / (r.length - 1));
                py[k++] = r[i];
            }
            if (cr.tInterval().computed()) {
                XYSeries bar = chart.addSeries("ci-" + c, new double[] {c + 1, c + 1},
                        new double[] {cr.tInterval().lower(), cr.tInterval().upper()});
                bar.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line).setMarker(SeriesMarkers.NONE)
                        .setLineColor(ChartStyle.REFERENCE).setLineStyle(ChartStyle.solid(2.2f)).setShowInLegend(c == 0);
                if (c == 0) {
                    bar.setLabel(Math.round(result.settings().confidence() * 100) + "% CI (t on replicates)");
                }
            }
        }
        XYSeries means = chart.addSeries("Mean", java.util.stream.IntStream.rangeClosed(1, conditions.size())
                .asDoubleStream().toArray(), conditions.stream().mapToDouble(ConditionRecovery::mean).toArray());
        means.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter).setMarker(ChartMarkers.DIAMOND)
                .setMarkerColor(ChartStyle.REFERENCE);
        XYSeries points = chart.addSeries("Smelts", px, py);
        points.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter).setMarker(ChartMarkers.CIRCLE)
                .setMarkerColor(ChartStyle.DATA);
        return chart;
    }

    /** Room under the lowest interval or point for the condition names. */
    private static double bottom(List<ConditionRecovery> conditions) {
        double lo = conditions.stream().mapToDouble(c -> Math.min(c.tInterval().computed() ? c.tInterval().lower()
                : c.mean(), java.util.Arrays.stream(c.replicates()).min().orElse(c.mean()))).min().orElse(0);
        return lo - 0.12 * (top(conditions) - lo);
    }

    private static double top(List<ConditionRecovery> conditions) {
        return conditions.stream().mapToDouble(c -> Math.max(c.tInterval().computed() ? c.tInterval().upper()
                : c.mean(), java.util.Arrays.stream(c.replicates()).max().orElse(c.mean()))).max().orElse(100);
    }
}
