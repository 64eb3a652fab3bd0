package org.cupel.charts.duplicates;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.Locale;
import org.cupel.assay.QcRole;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartNotes;
import org.cupel.charts.ChartStyle;
import org.cupel.charts.KeyEntry;
import org.cupel.charts.PointBudget;
import org.cupel.duplicates.DuplicateSetResult;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The drawing vocabulary of the duplicate panels: one look per role (pairs, flagged pairs, reference and limit
 * lines), each defined once and used for the series and for its key entry alike, so the key shows what the
 * plot shows.
 */
final class DuplicatePlots {
    /**
     * Points of a curved line. XChart draws a line segment by segment and starts each segment's dash pattern
     * afresh, so a dashed curve needs segments a few dash lengths long to read as dashed (straight lines are
     * drawn from their two ends).
     */
    static final int LINE_POINTS = 20;

    static final Color PAIRS = ChartStyle.DATA;
    static final Marker PAIR_MARKER = ChartMarkers.CIRCLE;
    /** Pairs the analysis flagged: the failure colour and a square, as failed results elsewhere. */
    static final Color FLAGGED = ChartStyle.FAILURE;
    static final Marker FLAGGED_MARKER = ChartMarkers.SQUARE;
    static final BasicStroke ONE_TO_ONE = ChartStyle.solid(1.5f);
    static final BasicStroke HARD_LINES = ChartStyle.dashed(1.5f);
    static final BasicStroke RMA = ChartStyle.solid(2f);
    static final BasicStroke ZERO = ChartStyle.solid(1f);
    static final BasicStroke MEAN = ChartStyle.solid(2f);
    static final BasicStroke MEAN_INTERVAL = ChartStyle.dashed(1.2f);
    static final BasicStroke FITTED = ChartStyle.solid(2f);
    static final BasicStroke LINE90 = ChartStyle.dashed(1.5f);
    static final BasicStroke LINE99 = ChartStyle.dashed(1.5f);
    static final BasicStroke TARGET = ChartStyle.dotted(2f);
    static final Marker MEDIAN_MARKER = ChartMarkers.DIAMOND;

    static final KeyEntry KEY_PAIRS = KeyEntry.points("pair", PAIRS, PAIR_MARKER).sized(ChartStyle.PANEL_MARKER_SIZE);
    static final KeyEntry KEY_ONE_TO_ONE = KeyEntry.line("1:1", ChartStyle.REFERENCE, ONE_TO_ONE);
    static final KeyEntry KEY_HARD_LINES = KeyEntry.line("type's HARD limit", ChartStyle.WARNING, HARD_LINES);

    private DuplicatePlots() {
    }

    /**
     * Whether values spanning {@code lo} to {@code hi} are drawn on a log axis: over less than a decade and a
     * half a log axis would label a single decade.
     */
    static boolean logAxis(double lo, double hi) {
        return hi / lo > 30;
    }

    /** Key entry of the pairs a panel marks. */
    static KeyEntry flaggedKey(String what) {
        return KeyEntry.points(what, FLAGGED, FLAGGED_MARKER).sized(ChartStyle.PANEL_MARKER_SIZE);
    }

    /** The colour that stands for a duplicate type wherever types are compared on one panel. */
    static Color colour(QcRole type) {
        return ChartStyle.CATEGORIES[typeIndex(type) % ChartStyle.CATEGORIES.length];
    }

    static Marker marker(QcRole type) {
        return ChartMarkers.CATEGORIES[typeIndex(type) % ChartMarkers.CATEGORIES.length];
    }

    private static int typeIndex(QcRole type) {
        return Math.max(0, type.ordinal() - QcRole.FIELD_DUPLICATE.ordinal());
    }

    /** "Field duplicates", "Lab repeats": the type as a panel names it. */
    static String typeName(DuplicateSetResult r) {
        String l = r.type().label() + "s";
        return Character.toUpperCase(l.charAt(0)) + l.substring(1);
    }

    /** A panel chart: no title or legend (the figure gives both), axes titled with the unit. */
    static XYChart panel(int width, int height, String xTitle, String yTitle) {
        XYChart chart = new XYChartBuilder().width(width).height(height).xAxisTitle(xTitle).yAxisTitle(yTitle).build();
        ChartStyle.applyPanel(chart);
        return chart;
    }

    /**
     * The pairs as two series: those not flagged, then the flagged ones on top in the failure colour. Thinned
     * to {@link PointBudget#DEFAULT} points, sorted by x, every flagged pair drawn first.
     *
     * @return the indices drawn
     */
    static int[] pairs(XYChart chart, double[] x, double[] y, boolean[] flagged) {
        int[] idx = thinnedByX(x, y, flagged);
        int flaggedDrawn = PointBudget.flaggedAmong(flagged, idx);
        double[][] plain = new double[2][idx.length - flaggedDrawn];
        double[][] marked = new double[2][flaggedDrawn];
        int p = 0;
        int m = 0;
        for (int i : idx) {
            double[][] to = flagged[i] ? marked : plain;
            int k = flagged[i] ? m++ : p++;
            to[0][k] = x[i];
            to[1][k] = y[i];
        }
        points(chart, "pairs", plain[0], plain[1], PAIRS, PAIR_MARKER);
        if (flaggedDrawn > 0) {
            points(chart, "flagged pairs", marked[0], marked[1], FLAGGED, FLAGGED_MARKER);
        }
        return idx;
    }

    static void points(XYChart chart, String name, double[] x, double[] y, Color color, Marker marker) {
        XYSeries s = chart.addSeries(name, x.length == 0 ? new double[] {Double.NaN} : x,
                y.length == 0 ? new double[] {Double.NaN} : y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        s.setMarker(marker);
        s.setMarkerColor(color);
    }

    static XYSeries line(XYChart chart, String name, double[] x, double[] y, Color color, BasicStroke stroke) {
        XYSeries s = chart.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(color);
        s.setLineStyle(stroke);
        return s;
    }

    /**
     * Sort by x (ties by y), then draw every flagged pair and thin the rest evenly: the extremes of x are
     * always drawn, and the same pairs in any order give the same chart.
     */
    static int[] thinnedByX(double[] x, double[] y, boolean[] flagged) {
        int[] order = PointBudget.orderByXThenY(x, y);
        boolean[] sortedFlags = new boolean[order.length];
        for (int i = 0; i < order.length; i++) {
            sortedFlags[i] = flagged[order[i]];
        }
        return PointBudget.pick(order, PointBudget.thinned(sortedFlags, PointBudget.DEFAULT));
    }

    /** "n = 118 ...; 3 flagged beyond the HARD limit", with the thinning when not every pair is drawn. */
    static String countNote(String pairs, boolean[] flagged, int[] drawn, String what) {
        int count = PointBudget.count(flagged);
        String n = ChartNotes.count(flagged.length, drawn.length, count, PointBudget.flaggedAmong(flagged, drawn),
                what);
        String flaggedText = count == 0 ? "none " + what : String.format(Locale.US, "%,d %s", count, what);
        return n.replaceFirst("^(n = [0-9,]+)", "$1 " + java.util.regex.Matcher.quoteReplacement(pairs)) + "; "
                + flaggedText;
    }

    /** Two polylines as one series, separated by a NaN gap, so the key names them once. */
    static double[] joined(double[] first, double[] second) {
        double[] out = new double[first.length + 1 + second.length];
        System.arraycopy(first, 0, out, 0, first.length);
        out[first.length] = Double.NaN;
        System.arraycopy(second, 0, out, first.length + 1, second.length);
        return out;
    }

    static double[] span(double lo, double hi, boolean log) {
        double[] out = new double[LINE_POINTS];
        for (int i = 0; i < LINE_POINTS; i++) {
            double t = i / (LINE_POINTS - 1.0);
            out[i] = log ? lo * Math.pow(hi / lo, t) : lo + (hi - lo) * t;
        }
        return out;
    }

    static double[] scale(double[] x, double f) {
        double[] out = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            out[i] = x[i] * f;
        }
        return out;
    }

    static double[] constant(int n, double v) {
        double[] out = new double[n];
        java.util.Arrays.fill(out, v);
        return out;
    }

    static double positiveMin(double[] a, double[] b) {
        double lo = Double.POSITIVE_INFINITY;
        for (double[] values : new double[][] {a, b}) {
            for (double v : values) {
                if (v > 0) {
                    lo = Math.min(lo, v);
                }
            }
        }
        return Double.isInfinite(lo) ? 0.01 : lo;
    }

    static double max(double[] a, double[] b) {
        double hi = 0;
        for (double[] values : new double[][] {a, b}) {
            for (double v : values) {
                hi = Math.max(hi, v);
            }
        }
        return hi > 0 ? hi : 1;
    }

    static String pct(double fraction, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f %%", 100 * fraction);
    }
}
