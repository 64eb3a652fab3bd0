package org.cupel.charts.control;

import java.util.ArrayList;
import java.util.List;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartNotes;
import org.cupel.charts.ChartStyle;
import org.cupel.charts.PointBudget;
import org.cupel.control.BlankResult;
import org.cupel.control.Verdict;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Blank results of one analyte in run order on a log scale, with the warning and failure thresholds as
 * step lines, the grade of the sample run just before each blank, failures in the failure colour (named under
 * the chart), and dotted lines between batches.
 */
public final class BlankChart {
    static final String PRECEDING = "Preceding sample";
    static final String FAILED = "Failed blank";
    static final int MAX_LABELS = 12;
    static final String WARN = "Warn above ";
    /** The threshold lines, as the legend shows them. */
    static final java.awt.BasicStroke FAIL_LINE = ChartStyle.solid(1.6f);
    static final java.awt.BasicStroke WARN_LINE = ChartStyle.dashed(1.6f);

    private BlankChart() {
    }

    /**
     * @param given the blanks of one analyte, in batch and run order (as {@code BlankReport.results(analyte)} lists
     *     them)
     */
    public static ChartFigure sequence(List<BlankResult> given) {
        // A review's results are made when read: read each once.
        List<BlankResult> results = List.copyOf(given);
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
        Steps warn = new Steps();
        Steps fail = new Steps();
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
        fail.addTo(chart, "Fail above " + rule(results, true), ChartStyle.FAILURE, FAIL_LINE);
        warn.addTo(chart, WARN + rule(results, false), ChartStyle.WARNING, WARN_LINE);
        detected.addTo(chart, "Blank", ChartStyle.DATA, ChartMarkers.CIRCLE);
        censored.addTo(chart, "Blank < DL (at DL)", ChartStyle.SKY_BLUE, ChartMarkers.TRIANGLE_DOWN);
        failed.addTo(chart, FAILED, ChartStyle.FAILURE, ChartMarkers.CIRCLE);
        String note = String.join("; ", java.util.stream.Stream.of(keep.length < n ? ChartNotes.count(n, keep.length,
                PointBudget.count(flagged), PointBudget.flaggedAmong(flagged, keep), "warnings and failures") : "",
                failures(results)).filter(t -> !t.isEmpty()).toList());

        BatchBoundaries.draw(chart, n, i -> results.get(i).observation().batch(), "Blank number in run order", "");
        if (n > 0) {
            chart.getStyler().setXAxisMin(0.5);
            chart.getStyler().setXAxisMax(n + 0.5);
        }
        return ChartFigure.of(chart, note);
    }

    /**
     * The failed blanks by name and position (the first {@value #MAX_LABELS}), for the note under the chart,
     * so that a reader can find them in the tables; names on the plot would cover its points.
     */
    static String failures(List<BlankResult> results) {
        List<String> named = new ArrayList<>();
        int count = 0;
        for (int i = 0; i < results.size(); i++) {
            BlankResult r = results.get(i);
            if (r.verdict().verdict() == Verdict.FAIL && ++count <= MAX_LABELS) {
                named.add(r.observation().sampleId() + " (no. " + (i + 1) + (r.carryOver() ? ", carry-over" : "") + ")");
            }
        }
        return named.isEmpty() ? "" : "Failed blanks: " + String.join(", ", named)
                + (count > named.size() ? " and " + (count - named.size()) + " more" : "");
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

    /**
     * A threshold in run order as a step line with a vertex only where it changes: XChart starts the dash
     * pattern afresh on each segment, so a dashed line with a vertex per blank would be drawn solid, unlike
     * its legend entry. Each blank's threshold holds from half a position before it to the next change.
     */
    static final class Steps {
        private final List<double[]> xy = new ArrayList<>();
        private double lastX;
        private double lastY;

        void add(double x, double y) {
            if (xy.isEmpty()) {
                xy.add(new double[] {x - 0.5, y});
            } else if (y != lastY) {
                xy.add(new double[] {x - 0.5, lastY});
                xy.add(new double[] {x - 0.5, y});
            }
            lastX = x;
            lastY = y;
        }

        void addTo(XYChart chart, String name, java.awt.Color colour, java.awt.BasicStroke stroke) {
            if (xy.isEmpty()) {
                return;
            }
            List<double[]> all = new ArrayList<>(xy);
            all.add(new double[] {lastX + 0.5, lastY});
            XYSeries s = chart.addSeries(name, all.stream().mapToDouble(p -> p[0]).toArray(),
                    all.stream().mapToDouble(p -> p[1]).toArray());
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(colour);
            s.setLineStyle(stroke);
        }
    }

    static void legendRight(XYChart chart) {
        chart.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.OutsideE);
        chart.getStyler().setLegendLayout(org.knowm.xchart.style.Styler.LegendLayout.Vertical);
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
