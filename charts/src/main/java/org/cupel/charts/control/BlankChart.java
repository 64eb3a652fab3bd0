package org.cupel.charts.control;

import java.util.ArrayList;
import java.util.List;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartNotes;
import org.cupel.charts.ChartStyle;
import org.cupel.charts.PointBudget;
import org.cupel.control.BlankResult;
import org.cupel.control.Verdict;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Blank results of one analyte in run order on a log scale, with the warning and failure thresholds as
 * step lines, the grade of the sample run just before each blank, failures ringed, and dotted lines
 * between batches.
 */
public final class BlankChart {
    static final String PRECEDING = "Preceding sample";
    static final String FAILED = "Failed blank";
    static final int MAX_LABELS = 12;

    private BlankChart() {
    }

    /** @param results the blanks of one analyte, in batch and run order (as {@code BlankReport} lists them) */
    public static XYChart sequence(List<BlankResult> results) {
        String analyte = results.isEmpty() ? "" : results.get(0).observation().analyte();
        String unit = results.isEmpty() ? "" : results.get(0).observation().unit();
        XYChart chart = new XYChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT)
                .title(analyte + " blanks in run order (" + ChartNotes.count(results.size(), results.size()) + ")")
                .yAxisTitle(analyte + " (" + unit + "), log scale").build();
        ChartStyle.apply(chart);
        chart.getStyler().setYAxisLogarithmic(true);
        chart.getStyler().setAnnotationLineColor(ChartStyle.GREY);
        chart.getStyler().setAnnotationLineStroke(ChartStyle.dotted(1.2f));
        legendRight(chart);
        chart.getStyler().setYAxisDecimalPattern("#,##0.#####");

        int n = results.size();
        boolean[] flagged = new boolean[n];
        for (int i = 0; i < n; i++) {
            flagged[i] = results.get(i).verdict().verdict() != Verdict.PASS;
        }
        int[] keep = PointBudget.thinned(flagged, PointBudget.DEFAULT);
        Points detected = new Points();
        Points censored = new Points();
        Points preceding = new Points();
        Points failed = new Points();
        Points warn = new Points();
        Points fail = new Points();
        for (int i : keep) {
            BlankResult r = results.get(i);
            double x = i + 1;
            double v = r.observation().value().value();
            if (v > 0) {
                (r.observation().value().isDetected() ? detected : censored).add(x, v);
            }
            double p = r.observation().precedingGrade().value();
            if (!r.observation().precedingGrade().isMissing() && p > 0) {
                preceding.add(x, p);
            }
            if (r.threshold() != null) {
                warn.add(x, r.threshold().warn());
                fail.add(x, r.threshold().fail());
            }
            if (r.verdict().verdict() == Verdict.FAIL && v > 0) {
                failed.add(x, v);
            }
        }
        preceding.addTo(chart, PRECEDING, ChartStyle.GREY, ChartMarkers.DIAMOND);
        line(fail.addTo(chart, "Fail above " + rule(results, true), ChartStyle.FAILURE, SeriesMarkers.NONE), ChartStyle.solid(1.6f));
        line(warn.addTo(chart, "Warn above " + rule(results, false), ChartStyle.WARNING, SeriesMarkers.NONE), ChartStyle.dashed(1.6f));
        detected.addTo(chart, "Blank", ChartStyle.DATA, ChartMarkers.CIRCLE);
        censored.addTo(chart, "Blank < DL (at DL)", ChartStyle.SKY_BLUE, ChartMarkers.TRIANGLE_DOWN);
        failed.addTo(chart, FAILED, ChartStyle.FAILURE, ChartMarkers.CIRCLE);
        labelFailures(chart, results);
        if (keep.length < n) {
            ChartNote.add(chart, ChartNotes.count(n, keep.length, PointBudget.count(flagged),
                    PointBudget.flaggedAmong(flagged, keep), "warnings and failures"));
        }

        BatchBoundaries.draw(chart, n, i -> results.get(i).observation().batch(), "Blank number in run order", "");
        if (n > 0) {
            chart.getStyler().setXAxisMin(0.5);
            chart.getStyler().setXAxisMax(n + 0.5);
        }
        return chart;
    }

    /** Failed blanks are named on the chart (the first {@value #MAX_LABELS}), so a reader can find them in the tables. */
    static void labelFailures(XYChart chart, List<BlankResult> results) {
        int labelled = 0;
        for (int i = 0; i < results.size() && labelled < MAX_LABELS; i++) {
            BlankResult r = results.get(i);
            if (r.verdict().verdict() == Verdict.FAIL && r.observation().value().value() > 0) {
                String text = r.observation().sampleId() + (r.carryOver() ? " (carry-over)" : "");
                chart.addAnnotation(new AnnotationText(text, i + 1, r.observation().value().value() * 1.45, false));
                labelled++;
            }
        }
    }

    /** "5×DL" when every blank has the same rule, else "(per analyte)". */
    private static String rule(List<BlankResult> results, boolean fail) {
        String rule = null;
        for (BlankResult r : results) {
            if (r.threshold() == null) {
                continue;
            }
            String x = fail ? r.threshold().failRule() : r.threshold().warnRule();
            if (rule != null && !rule.equals(x)) {
                return "(varies)";
            }
            rule = x;
        }
        return rule == null ? "" : rule;
    }

    private static void line(XYSeries s, java.awt.BasicStroke stroke) {
        if (s != null) {
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Step);
            s.setLineStyle(stroke);
        }
    }

    static void legendRight(XYChart chart) {
        chart.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.OutsideE);
        chart.getStyler().setLegendLayout(org.knowm.xchart.style.Styler.LegendLayout.Vertical);
        chart.getStyler().setAnnotationTextFontColor(ChartStyle.FAILURE);
    }

    /** Growing x/y arrays for one series; a series with no point is left out of the chart. */
    static final class Points {
        private final List<double[]> xy = new ArrayList<>();

        void add(double x, double y) {
            xy.add(new double[] {x, y});
        }

        XYSeries addTo(XYChart chart, String name, java.awt.Color colour, org.knowm.xchart.style.markers.Marker marker) {
            if (xy.isEmpty()) {
                return null;
            }
            double[] x = xy.stream().mapToDouble(p -> p[0]).toArray();
            double[] y = xy.stream().mapToDouble(p -> p[1]).toArray();
            XYSeries s = chart.addSeries(name, x, y);
            s.setMarker(marker);
            s.setMarkerColor(colour);
            s.setLineColor(colour);
            if (marker != SeriesMarkers.NONE) {
                s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            }
            return s;
        }
    }
}
