package org.cupel.charts.recovery;

import java.util.List;
import org.cupel.assay.Numbers;
import org.cupel.charts.AxisLabels;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartNotes;
import org.cupel.charts.ChartStyle;
import org.cupel.recovery.ConditionRecovery;
import org.cupel.recovery.RecoveryResult;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Mean recovery of each condition for one analyte with its t-interval as a bar, and every smelt as a point
 * beside it. Intervals near 100% come from the log-loss scale and are therefore not symmetric. The recovery
 * axis spans the intervals and smelts with a margin, not from zero, so that differences of a point or two show;
 * its title says where it starts. Condition names are written under the plot.
 */
public final class RecoveryByConditionChart {
    private static final double SPREAD = 0.12;
    /** Margin around the data on the recovery axis, as a share of their range. */
    static final double MARGIN = 0.04;

    private RecoveryByConditionChart() {
    }

    public static ChartFigure of(RecoveryResult result, String analyte) {
        List<ConditionRecovery> conditions = result.conditions().stream().filter(c -> c.analyte().equals(analyte))
                .toList();
        int smelts = conditions.stream().mapToInt(ConditionRecovery::n).sum();
        double[] range = axisRange(low(conditions), high(conditions));
        String from = range[0] > 0 ? ", axis from " + Numbers.compact(range[0]) + " %, not zero" : "";
        XYChart chart = new XYChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT)
                .title(analyte + " recovery (" + conditions.get(0).definition().label() + ") per condition, "
                        + ChartNotes.count(smelts, smelts) + " smelts")
                .yAxisTitle(analyte + " recovery (%)" + from).build();
        ChartStyle.apply(chart);
        chart.getStyler().setXAxisTicksVisible(false).setXAxisTitleVisible(false);
        chart.getStyler().setLegendPosition(Styler.LegendPosition.OutsideE)
                .setLegendLayout(Styler.LegendLayout.Vertical);
        chart.getStyler().setXAxisMin(0.5).setXAxisMax(conditions.size() + 0.5);
        chart.getStyler().setYAxisMin(range[0]).setYAxisMax(range[1]);
        chart.getStyler().setYAxisDecimalPattern("#,##0.##");
        double[] px = new double[smelts];
        double[] py = new double[smelts];
        double[] at = new double[conditions.size()];
        List<String> names = new java.util.ArrayList<>();
        int k = 0;
        for (int c = 0; c < conditions.size(); c++) {
            ConditionRecovery cr = conditions.get(c);
            at[c] = c + 1;
            names.add(cr.condition() + "\n(n = " + cr.n() + ")");
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
                    bar.setLabel(Math.round(result.settings().confidence() * 100) + "% CI\n(t on replicates)");
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
        return ChartFigure.of(new ChartFigure.Panel("", chart, "")
                .with(AxisLabels.below(at, names, "Condition", ChartFigure.NOTE_FONT)));
    }

    /**
     * The recovery axis: from below {@code lo} to above {@code hi} by {@value #MARGIN} of their range, out to
     * the next multiple of a round step (1, 2, 2.5 or 5 × 10^k, about a fifth of the range), never below zero
     * and, when no value is above 100 %, not above 100 %. 91.5 to 98.9 % gives 90 to 100 %.
     */
    static double[] axisRange(double lo, double hi) {
        double span = Math.max(hi - lo, 1e-6);
        double step = roundStep(span / 5);
        double a = Math.floor((lo - MARGIN * span) / step) * step;
        double b = Math.ceil((hi + MARGIN * span) / step) * step;
        return new double[] {lo >= 0 ? Math.max(0, a) : a, hi <= 100 ? Math.min(100, b) : b};
    }

    /** The smallest of 1, 2, 2.5, 5 × 10^k not below {@code x}. */
    static double roundStep(double x) {
        double decade = Math.pow(10, Math.floor(Math.log10(x)));
        for (double m : new double[] {1, 2, 2.5, 5, 10}) {
            if (m * decade >= x * (1 - 1e-12)) {
                return m * decade;
            }
        }
        return 10 * decade;
    }

    /** The lowest interval bound, mean or smelt. */
    static double low(List<ConditionRecovery> conditions) {
        return conditions.stream().mapToDouble(c -> Math.min(c.tInterval().computed() ? c.tInterval().lower()
                : c.mean(), java.util.Arrays.stream(c.replicates()).min().orElse(c.mean()))).min().orElse(0);
    }

    /** The highest interval bound, mean or smelt. */
    static double high(List<ConditionRecovery> conditions) {
        return conditions.stream().mapToDouble(c -> Math.max(c.tInterval().computed() ? c.tInterval().upper()
                : c.mean(), java.util.Arrays.stream(c.replicates()).max().orElse(c.mean()))).max().orElse(100);
    }
}
