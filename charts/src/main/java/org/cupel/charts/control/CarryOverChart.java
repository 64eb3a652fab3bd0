package org.cupel.charts.control;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.Numbers;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartNotes;
import org.cupel.charts.ChartStyle;
import org.cupel.charts.PointBudget;
import org.cupel.control.BlankResult;
import org.cupel.control.CarryOverRelation;
import org.cupel.control.Verdict;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Carry-over scatter of one analyte: the grade of the preceding sample against the blank that followed,
 * both on log axes, with reference lines for 1 % and 0.1 % carried over, the least-squares line of the
 * carry-over relation, and the rank correlation in the corner.
 */
public final class CarryOverChart {
    private CarryOverChart() {
    }

    public static ChartFigure scatter(List<BlankResult> given, CarryOverRelation relation) {
        // A review's results are made when read: read each once.
        List<BlankResult> results = List.copyOf(given);
        String analyte = results.isEmpty() ? relation.analyte() : results.get(0).observation().analyte();
        String unit = results.isEmpty() ? "" : results.get(0).observation().unit();
        XYChart chart = new XYChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT)
                .title(analyte + " blank vs preceding sample (" + ChartNotes.count(drawnCount(results), drawnCount(results))
                        + ")")
                .xAxisTitle("Grade of the preceding sample, " + analyte + " (" + unit + "), log scale")
                .yAxisTitle("Blank, " + analyte + " (" + unit + "), log scale").build();
        ChartStyle.apply(chart);
        chart.getStyler().setXAxisLogarithmic(true);
        chart.getStyler().setYAxisLogarithmic(true);
        BlankChart.legendRight(chart);
        chart.getStyler().setYAxisDecimalPattern("#,##0.#####");
        chart.getStyler().setXAxisDecimalPattern("#,##0.#####");

        BlankChart.Points pass = new BlankChart.Points();
        BlankChart.Points censored = new BlankChart.Points();
        BlankChart.Points failed = new BlankChart.Points();
        double ymin = Double.POSITIVE_INFINITY;
        double xmin = Double.POSITIVE_INFINITY;
        double xmax = 0;
        List<BlankResult> plotted = results.stream().filter(CarryOverChart::plottable).toList();
        int drawn = plotted.size();
        boolean[] flagged = new boolean[drawn];
        for (int i = 0; i < drawn; i++) {
            flagged[i] = plotted.get(i).verdict().verdict() == Verdict.FAIL;
        }
        // The axis ranges come from every plotted blank; the points drawn from the budget.
        for (BlankResult r : plotted) {
            double x = r.observation().precedingGrade().value();
            double y = r.observation().value().value();
            xmin = Math.min(xmin, x);
            ymin = Math.min(ymin, y);
            xmax = Math.max(xmax, x);
        }
        int[] keep = PointBudget.thinned(flagged, PointBudget.DEFAULT);
        for (int i : keep) {
            BlankResult r = plotted.get(i);
            double x = r.observation().precedingGrade().value();
            double y = r.observation().value().value();
            if (r.verdict().verdict() == Verdict.FAIL) {
                failed.add(x, y);
            } else if (r.observation().value().isDetected()) {
                pass.add(x, y);
            } else {
                censored.add(x, y);
            }
        }
        if (drawn > 0) {
            ratioLine(chart, "1 % carried over", 0.01, Math.max(xmin, ymin / 0.01), xmax, ChartStyle.dashed(1f));
            ratioLine(chart, "0.1 % carried over", 0.001, Math.max(xmin, ymin / 0.001), xmax, ChartStyle.dotted(1.2f));
            failLine(chart, results, xmin, xmax);
            rank(chart, relation, xmin, xmax);
        }
        pass.addTo(chart, "Blank", ChartStyle.DATA, ChartMarkers.CIRCLE);
        censored.addTo(chart, "Blank < DL (at DL)", ChartStyle.SKY_BLUE, ChartMarkers.TRIANGLE_DOWN);
        failed.addTo(chart, BlankChart.FAILED, ChartStyle.FAILURE, ChartMarkers.CIRCLE);
        return ChartFigure.of(chart, keep.length < drawn ? ChartNotes.count(drawn, keep.length,
                PointBudget.count(flagged), PointBudget.flaggedAmong(flagged, keep), "failed blanks") : "");
    }

    private static boolean plottable(BlankResult r) {
        return !r.observation().precedingGrade().isMissing() && r.observation().precedingGrade().value() > 0
                && r.observation().value().value() > 0;
    }

    /** "= 0.032" or "< 0.0001". */
    static String pValue(double p) {
        return p < 1e-4 ? "< 0.0001" : "= " + Numbers.significant(p, 2);
    }

    private static int drawnCount(List<BlankResult> results) {
        int n = 0;
        for (BlankResult r : results) {
            if (!r.observation().precedingGrade().isMissing() && r.observation().precedingGrade().value() > 0
                    && r.observation().value().value() > 0) {
                n++;
            }
        }
        return n;
    }

    /** The rank correlation as an invisible legend entry, where readers look for the lines' meaning. */
    private static void rank(XYChart chart, CarryOverRelation r, double xmin, double xmax) {
        String text = Double.isNaN(r.spearmanRho()) ? "Spearman ρ: not computed"
                : "Spearman ρ = " + Numbers.significant(r.spearmanRho(), 3) + ", p "
                + pValue(r.spearmanP()) + " (n = " + r.nRank() + ")";
        XYSeries s = chart.addSeries(text, new double[] {xmin}, new double[] {xmin});
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(new java.awt.Color(255, 255, 255, 0));
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
    }

    /** The failure threshold as a horizontal line when every blank has the same one. */
    private static void failLine(XYChart chart, List<BlankResult> results, double xmin, double xmax) {
        double level = Double.NaN;
        for (BlankResult r : results) {
            if (r.threshold() == null || (!Double.isNaN(level) && r.threshold().fail() != level)) {
                return;
            }
            level = r.threshold().fail();
        }
        XYSeries s = chart.addSeries("Fail above " + Numbers.compact(level), new double[] {xmin, xmax},
                new double[] {level, level});
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(ChartStyle.FAILURE);
        s.setLineStyle(ChartStyle.solid(1.4f));
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
    }

    private static void ratioLine(XYChart chart, String name, double ratio, double xmin, double xmax,
                                  java.awt.BasicStroke stroke) {
        XYSeries s = chart.addSeries(name, new double[] {xmin, xmax}, new double[] {ratio * xmin, ratio * xmax});
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(ChartStyle.GREY);
        s.setLineStyle(stroke);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
    }
}
