package org.cupel.charts.control;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cupel.assay.Numbers;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartNotes;
import org.cupel.charts.ChartStyle;
import org.cupel.charts.PointBudget;
import org.cupel.control.Verdict;
import org.cupel.control.crm.CertifiedLimits;
import org.cupel.control.crm.CrmResult;
import org.cupel.control.crm.SeriesReview;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Control chart of one CRM and analyte: results in series order, certified value, ±2 SD and ±3 SD
 * certificate limits, the project's running mean, batch boundaries as dotted verticals, and each result
 * marked by its outcome. The value axis spans certified ± 5 SD (wider when judged results need it);
 * results beyond it (swaps, mostly) sit on the edge, and the note under the chart gives their values.
 */
public final class CrmControlChart {
    private static final double SPAN_SD = 5;
    private static final int MAX_LABELS = BlankChart.MAX_LABELS;

    private CrmControlChart() {
    }

    /** The chart, its small print (n, certificate limits, thinning) in a strip under it. */
    public static ChartFigure of(SeriesReview s) {
        CertifiedLimits lim = s.limits();
        // A review's results are made when read: read each once.
        List<CrmResult> rs = List.copyOf(s.results());
        int n = rs.size();
        String unit = s.analyte().unit().symbol();
        XYChart c = new XYChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT)
                .title("CRM " + s.crm() + ": " + s.analyte().name() + " in time order")
                .yAxisTitle(s.analyte().label()).build();
        ChartStyle.apply(c);
        double lo = lim.certified() - SPAN_SD * lim.sd();
        double hi = lim.certified() + SPAN_SD * lim.sd();
        for (CrmResult r : rs) {
            if (!r.isSwap()) {
                lo = Math.min(lo, r.point().value().value());
                hi = Math.max(hi, r.point().value().value());
            }
        }
        c.getStyler().setYAxisMin(lo - (hi - lo) * 0.03).setYAxisMax(hi + (hi - lo) * 0.03).setXAxisMin(0.5)
                .setXAxisMax(n + 0.5);
        double[] ends = {0.5, n + 0.5};
        line(c, "Certified", ends, lim.certified(),
                ChartStyle.REFERENCE, ChartStyle.solid(1.6f), true);
        line(c, "±2 SD", ends, lim.warnHigh(), ChartStyle.WARNING, ChartStyle.dashed(1.4f), true);
        line(c, "-2 SD", ends, lim.warnLow(), ChartStyle.WARNING, ChartStyle.dashed(1.4f), false);
        line(c, "±3 SD", ends, lim.failHigh(), ChartStyle.FAILURE, ChartStyle.solid(1.8f), true);
        line(c, "-3 SD", ends, lim.failLow(), ChartStyle.FAILURE, ChartStyle.solid(1.8f), false);
        runningMean(c, rs);
        if (s.projectLimits().available()) {
            line(c, "Own ±2 SD", ends, s.projectLimits().warnHigh(),
                    ChartStyle.SECOND, ChartStyle.dotted(1.6f), true);
            line(c, "project -2 SD", ends, s.projectLimits().warnLow(), ChartStyle.SECOND, ChartStyle.dotted(1.6f),
                    false);
        }
        boolean[] flagged = new boolean[n];
        for (int i = 0; i < n; i++) {
            flagged[i] = rs.get(i).verdict() != Verdict.PASS || rs.get(i).isSwap();
        }
        int[] shown = PointBudget.thinned(flagged, PointBudget.DEFAULT);
        points(c, rs, shown, "Pass", r -> r.verdict() == Verdict.PASS, ChartStyle.DATA,
                ChartMarkers.CIRCLE, lo, hi);
        points(c, rs, shown, "Warn", r -> r.verdict() == Verdict.WARN && !r.isSwap(), ChartStyle.WARNING,
                ChartMarkers.DIAMOND, lo, hi);
        points(c, rs, shown, "Fail", r -> r.verdict() == Verdict.FAIL, ChartStyle.FAILURE,
                ChartMarkers.SQUARE, lo, hi);
        points(c, rs, shown, "Swap", CrmResult::isSwap, ChartStyle.REDDISH_PURPLE,
                ChartMarkers.TRIANGLE_UP, lo, hi);
        c.getStyler().setAnnotationLineColor(new Color(185, 185, 185)).setAnnotationLineStroke(ChartStyle.dotted(0.8f));
        BatchBoundaries.draw(c, n, i -> rs.get(i).point().batchId(), "Result number", "batch date, then position");
        String note = ChartNotes.count(n, shown.length, PointBudget.count(flagged),
                PointBudget.flaggedAmong(flagged, shown), "warnings, failures and swaps")
                + offScale(rs, lo, hi)
                + String.format(Locale.ROOT,
                "; certified %s %s, limits ±2 and ±3 × certificate SD %s %s", lim.certifiedText(), unit,
                lim.sdText(), unit)
                + (s.projectLimits().available()
                ? String.format(Locale.US, "; own ±2 SD from the project's %,d results", s.projectLimits().n()) : "");
        return ChartFigure.of(c, note);
    }

    private static void line(XYChart c, String name, double[] x, double y, Color color,
                             java.awt.BasicStroke stroke, boolean legend) {
        XYSeries s = c.addSeries(name, x, new double[] {y, y});
        s.setMarker(SeriesMarkers.NONE).setLineColor(color).setLineStyle(stroke).setShowInLegend(legend);
    }

    /** The running mean as a line through at most {@link PointBudget#DEFAULT} evenly spaced results. */
    private static void runningMean(XYChart c, List<CrmResult> rs) {
        List<Double> x = new ArrayList<>();
        List<Double> y = new ArrayList<>();
        for (int i : PointBudget.indices(rs.size(), PointBudget.DEFAULT)) {
            if (!rs.get(i).isSwap() && Double.isFinite(rs.get(i).runningMean())) {
                x.add(i + 1.0);
                y.add(rs.get(i).runningMean());
            }
        }
        if (x.size() >= 2) {
            XYSeries s = c.addSeries("Running mean", x, y);
            s.setMarker(SeriesMarkers.NONE).setLineColor(ChartStyle.SECOND).setLineStyle(ChartStyle.solid(2f));
        }
    }

    private static void points(XYChart c, List<CrmResult> rs, int[] idx, String name,
                               java.util.function.Predicate<CrmResult> which, Color color,
                               org.knowm.xchart.style.markers.Marker marker, double lo, double hi) {
        List<Double> x = new ArrayList<>();
        List<Double> y = new ArrayList<>();
        for (int i : idx) {
            CrmResult r = rs.get(i);
            if (which.test(r)) {
                x.add(i + 1.0);
                y.add(Math.max(lo, Math.min(hi, r.point().value().value())));
            }
        }
        if (!x.isEmpty()) {
            XYSeries s = c.addSeries(name + " " + x.size(), x, y);
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(marker).setMarkerColor(color);
        }
    }

    /**
     * The results beyond the value axis (drawn on its edge) with their values, the first {@value #MAX_LABELS}
     * by number, for the note under the chart: "; off scale, drawn at the edge: no. 12 = 2.47 (MID?)".
     */
    private static String offScale(List<CrmResult> rs, double lo, double hi) {
        List<String> named = new ArrayList<>();
        int count = 0;
        for (int i = 0; i < rs.size(); i++) {
            double v = rs.get(i).point().value().value();
            if ((v < lo || v > hi) && ++count <= MAX_LABELS) {
                named.add("no. " + (i + 1) + " = " + rs.get(i).point().value().display()
                        + (rs.get(i).isSwap() ? " (" + rs.get(i).swapWith() + "?)" : ""));
            }
        }
        return named.isEmpty() ? "" : "; off scale, drawn at the edge: " + String.join(", ", named)
                + (count > named.size() ? " and " + (count - named.size()) + " more" : "");
    }
}
