package org.cupel.charts.duplicates;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.Arrays;
import java.util.Locale;
import org.cupel.assay.LimitComparison;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartNotes;
import org.cupel.charts.ChartStyle;
import org.cupel.charts.PointBudget;
import org.cupel.duplicates.BiasResult;
import org.cupel.duplicates.DuplicateSetResult;
import org.cupel.duplicates.Estimate;
import org.cupel.duplicates.ModelFit;
import org.cupel.duplicates.NormalDifferenceConstants;
import org.cupel.duplicates.PairGroups;
import org.cupel.duplicates.PairMeasures;
import org.cupel.duplicates.PrecisionModel;
import org.cupel.duplicates.PrecisionModelResult;
import org.cupel.duplicates.RmaFit;
import org.cupel.duplicates.ThompsonHowarth;
import org.knowm.xchart.AnnotationTextPanel;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Charts of one duplicate set, drawn from its core result: nothing is computed here beyond the coordinates
 * of lines whose equations the result gives.
 */
public final class DuplicateCharts {
    private static final int LINE_POINTS = 60;
    private static final String BEYOND_HARD = "beyond the HARD limit";
    /** Group medians drawn at most: enough to trace the median curve, few enough not to hide the pairs. */
    private static final int MEDIANS_BUDGET = 300;

    private DuplicateCharts() {
    }

    /** Original against duplicate with the 1:1 line, the ±HARD-limit lines and, for umpire checks, the RMA line. */
    public static XYChart scatter(DuplicateSetResult r, boolean logAxes) {
        double[] a = r.pairs().absoluteA();
        double[] b = r.pairs().absoluteB();
        XYChart chart = base(title(r, "original vs duplicate"), "Original " + label(r), "Duplicate " + label(r));
        double h = r.precision().hardLimit();
        boolean[] beyond = beyondHard(a, b, h);
        int[] idx = thinnedByX(a, b, beyond);
        double[] x = PointBudget.pick(a, idx);
        double[] y = PointBudget.pick(b, idx);
        points(chart, "pairs", x, y, ChartStyle.DATA);
        double lo = positiveMin(a, b);
        double hi = max(a, b);
        double[] line = span(lo, hi, logAxes);
        line(chart, "1:1", line, scale(line, 1), ChartStyle.REFERENCE, ChartStyle.solid(1.5f));
        String hard = "HARD = " + pct(h, 0);
        line(chart, hard, joined(line, line), joined(scale(line, (1 + h) / (1 - h)), scale(line, (1 - h) / (1 + h))),
                ChartStyle.WARNING, ChartStyle.dashed(1.5f));
        RmaFit rma = r.bias().rma();
        if (rma.available() && r.type() == org.cupel.assay.QcRole.UMPIRE) {
            double[] yr = new double[line.length];
            for (int i = 0; i < line.length; i++) {
                yr[i] = rma.intercept() + rma.slope() * line[i];
            }
            line(chart, String.format(Locale.ROOT, "RMA y = %.4g + %.4g·x", rma.intercept(), rma.slope()), line, yr,
                    ChartStyle.SECOND, ChartStyle.solid(2f));
        }
        chart.getStyler().setXAxisLogarithmic(logAxes);
        chart.getStyler().setYAxisLogarithmic(logAxes);
        note(chart, countNote(beyond, idx, BEYOND_HARD) + " pairs with two detected values");
        return chart;
    }

    /** HARD of each pair, ranked: cumulative % of pairs against HARD, with the type's limit and the acceptance share. */
    public static XYChart rankedHard(DuplicateSetResult r) {
        double[] a = r.pairs().relativeA();
        double[] b = r.pairs().relativeB();
        int n = a.length;
        double[] hard = new double[n];
        for (int i = 0; i < n; i++) {
            hard[i] = 100 * PairMeasures.hard(a[i], b[i]);
        }
        Arrays.sort(hard);
        double[] cum = new double[n];
        for (int i = 0; i < n; i++) {
            cum[i] = 100.0 * (i + 1) / n;
        }
        XYChart chart = base(title(r, "ranked HARD"), "HARD (%)", "Cumulative % of pairs");
        double limitFraction = r.precision().hardLimit();
        boolean[] beyond = new boolean[n];
        for (int i = 0; i < n; i++) {
            beyond[i] = hard[i] > 100 * limitFraction;
        }
        // Sorted already: the even share keeps the curve's ends, and its whole tail past the limit is drawn.
        int[] idx = PointBudget.thinned(beyond, PointBudget.DEFAULT);
        XYSeries s = chart.addSeries("pairs", n == 0 ? new double[] {Double.NaN} : PointBudget.pick(hard, idx),
                n == 0 ? new double[] {Double.NaN} : PointBudget.pick(cum, idx));
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Step);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(ChartStyle.DATA);
        s.setLineStyle(ChartStyle.solid(2f));
        double limit = 100 * r.precision().hardLimit();
        double accept = r.precision().acceptancePercent();
        double right = Math.max(limit * 1.5, n == 0 ? limit : hard[n - 1]);
        line(chart, "limit: HARD " + pct(limit / 100, 0), new double[] {limit, limit}, new double[] {0, 100},
                ChartStyle.FAILURE, ChartStyle.dashed(1.5f));
        line(chart, "rule: " + compact(accept) + " % of pairs within the limit", new double[] {0, right},
                new double[] {accept, accept}, ChartStyle.WARNING, ChartStyle.dotted(2f));
        chart.getStyler().setYAxisMin(0.0).setYAxisMax(100.0).setXAxisMin(0.0).setXAxisMax(right);
        Estimate within = r.precision().percentWithinLimit();
        String verdict = within.available() ? String.format(Locale.ROOT, "%.1f %% of pairs within the limit: %s",
                within.value(), r.precision().rule().name().toLowerCase(Locale.ROOT).replace('_', ' ')) : within.note();
        note(chart, countNote(beyond, idx, BEYOND_HARD) + "; " + verdict);
        return chart;
    }

    /**
     * Thompson–Howarth plot: |d| against pair mean on log–log axes, the group medians, the fitted median line,
     * the 90 % and 99 % control lines, and the |d| a pair at the type's HARD limit would have (target).
     */
    public static XYChart thompsonHowarth(DuplicateSetResult r) {
        PrecisionModelResult model = r.model();
        double[] a = r.pairs().absoluteA();
        double[] b = r.pairs().absoluteB();
        int n = a.length;
        double[] m = new double[n];
        double[] d = new double[n];
        int k = 0;
        for (int i = 0; i < n; i++) {
            double diff = PairMeasures.absDifference(a[i], b[i]);
            if (diff > 0) {
                m[k] = PairMeasures.mean(a[i], b[i]);
                d[k] = diff;
                k++;
            }
        }
        m = Arrays.copyOf(m, k);
        d = Arrays.copyOf(d, k);
        XYChart chart = base(title(r, "Thompson–Howarth"), "Pair mean " + label(r), "|Original − duplicate| " + label(r));
        boolean[] above99 = aboveLine(m, d, model);
        int[] idx = thinnedByX(m, d, above99);
        points(chart, "pairs", PointBudget.pick(m, idx), PointBudget.pick(d, idx), new Color(0, 114, 178, 140));
        String extra = "";
        if (model.available()) {
            PairGroups g = model.groups();
            double[][] all = positiveY(g.means(), g.medianAbsDiff());
            // Group medians come in order of pair mean: even thinning keeps the curve they trace and its ends.
            int[] gi = PointBudget.indices(all[0].length, MEDIANS_BUDGET);
            double[][] positive = {PointBudget.pick(all[0], gi), PointBudget.pick(all[1], gi)};
            XYSeries med = chart.addSeries("group medians (" + g.groupSize() + " pairs"
                    + (gi.length < all[0].length ? String.format(Locale.US, "; %,d of %,d drawn", gi.length,
                    all[0].length) : "") + ")",
                    positive[0].length == 0 ? new double[] {Double.NaN} : positive[0],
                    positive[1].length == 0 ? new double[] {Double.NaN} : positive[1]);
            med.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            med.setMarker(ChartMarkers.DIAMOND);
            med.setMarkerColor(ChartStyle.BLACK);
            ModelFit th = model.thompsonHowarth();
            PrecisionModel pm = th.model();
            double[] x = span(modelStart(pm, positiveMin(m, m)), max(m, m), true);
            line(chart, "fitted median |d|", x, modelLine(pm, x, NormalDifferenceConstants.MEDIAN_ABS_DIFF),
                    ChartStyle.REFERENCE, ChartStyle.solid(2f));
            line(chart, "90 % line", x, modelLine(pm, x, NormalDifferenceConstants.P90), ChartStyle.WARNING,
                    ChartStyle.dashed(1.5f));
            line(chart, "99 % line", x, modelLine(pm, x, NormalDifferenceConstants.P99), ChartStyle.FAILURE,
                    ChartStyle.dashed(1.5f));
            double h = r.precision().hardLimit();
            line(chart, "target: HARD " + pct(h, 0), x, scale(x, 2 * h), ChartStyle.REDDISH_PURPLE,
                    ChartStyle.dotted(2f));
            extra = String.format(Locale.ROOT, "; σc = %.3g + %.3g·c; above 90 %% line %d (exp. %.0f), above 99 %% line %d (exp. %.0f)",
                    pm.sigma0(), pm.k(), model.line90().exceedances(), model.line90().expected(),
                    model.line99().exceedances(), model.line99().expected());
            if (all[0].length < g.groups()) {
                extra += "; " + (g.groups() - all[0].length) + " groups with median |d| = 0 not drawn";
            }
            if (g.dropped() > 0) {
                extra += "; " + g.dropped() + " top pairs outside a full group";
            }
        } else {
            extra = "; no model: " + model.note();
        }
        chart.getStyler().setXAxisLogarithmic(true);
        chart.getStyler().setYAxisLogarithmic(true);
        String zeros = n > k ? "; " + (n - k) + " pairs with |d| = 0 not drawn on log axes" : "";
        note(chart, countNote(above99, idx, "above the 99 % line") + zeros + extra);
        return chart;
    }

    /** Relative difference (b − a)/m against pair mean, with the mean bias and its 95 % interval. */
    public static XYChart relativeDifference(DuplicateSetResult r) {
        double[] a = r.pairs().relativeA();
        double[] b = r.pairs().relativeB();
        int n = a.length;
        double[] m = new double[n];
        double[] rel = new double[n];
        for (int i = 0; i < n; i++) {
            m[i] = PairMeasures.mean(a[i], b[i]);
            rel[i] = 100 * (b[i] - a[i]) / m[i];
        }
        XYChart chart = base(title(r, "relative difference"), "Pair mean " + label(r),
                "(Duplicate − original) / mean (%)");
        boolean[] beyond = beyondHard(a, b, r.precision().hardLimit());
        int[] idx = thinnedByX(m, rel, beyond);
        points(chart, "pairs", PointBudget.pick(m, idx), PointBudget.pick(rel, idx), ChartStyle.DATA);
        double[] x = {positiveMin(m, m), max(m, m)};
        line(chart, "zero", x, new double[] {0, 0}, ChartStyle.REFERENCE, ChartStyle.solid(1f));
        BiasResult bias = r.bias();
        Estimate mb = bias.meanRelativeBias();
        if (mb.hasInterval()) {
            double v = 100 * mb.value();
            line(chart, String.format(Locale.ROOT, "mean %+.1f %%", v), x, new double[] {v, v}, ChartStyle.SECOND,
                    ChartStyle.solid(2f));
            line(chart, "95 % interval of the mean", joined(x, x), joined(new double[] {100 * mb.ciLow(),
                100 * mb.ciLow()}, new double[] {100 * mb.ciHigh(), 100 * mb.ciHigh()}), ChartStyle.SECOND,
                    ChartStyle.dashed(1.2f));
        }
        // Log axes label decades only: over less than a decade and a half they would show one tick label.
        chart.getStyler().setXAxisLogarithmic(x[1] / x[0] > 30);
        note(chart, countNote(beyond, idx, BEYOND_HARD) + "; " + bias.verdict());
        return chart;
    }

    private static XYChart base(String title, String xTitle, String yTitle) {
        XYChart chart = new XYChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT).title(title)
                .xAxisTitle(xTitle).yAxisTitle(yTitle).build();
        ChartStyle.apply(chart);
        chart.getStyler().setAnnotationTextPanelFont(new java.awt.Font("DejaVu Sans", java.awt.Font.PLAIN, 11));
        chart.getStyler().setAnnotationTextPanelBorderColor(new Color(200, 200, 200));
        return chart;
    }

    private static String title(DuplicateSetResult r, String what) {
        return r.analyte() + " " + r.type().label() + "s: " + what;
    }

    private static String label(DuplicateSetResult r) {
        return "(" + r.unit() + ")";
    }

    /** Two polylines as one series, separated by a NaN gap, so the legend names them once. */
    private static double[] joined(double[] first, double[] second) {
        double[] out = new double[first.length + 1 + second.length];
        System.arraycopy(first, 0, out, 0, first.length);
        out[first.length] = Double.NaN;
        System.arraycopy(second, 0, out, first.length + 1, second.length);
        return out;
    }

    private static void note(XYChart chart, String text) {
        String wrapped = ChartNotes.wrap(text, 95);
        int extraLines = (int) wrapped.chars().filter(c -> c == '\n').count();
        // The panel is anchored at its bottom edge: lower it by a line per extra line to keep its top fixed.
        AnnotationTextPanel panel = new AnnotationTextPanel(wrapped, 110, ChartStyle.HEIGHT - 90 - 15 * extraLines,
                true);
        chart.addAnnotation(panel);
    }

    private static void points(XYChart chart, String name, double[] x, double[] y, Color color) {
        XYSeries s = chart.addSeries(name, x.length == 0 ? new double[] {Double.NaN} : x,
                y.length == 0 ? new double[] {Double.NaN} : y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        s.setMarker(ChartMarkers.CIRCLE);
        s.setMarkerColor(color);
    }

    private static void line(XYChart chart, String name, double[] x, double[] y, Color color, BasicStroke stroke) {
        XYSeries s = chart.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(color);
        s.setLineStyle(stroke);
    }

    /**
     * Sort by x (ties by y), then draw every flagged pair and thin the rest evenly: the extremes of x are
     * always drawn, and the same pairs in any order give the same chart.
     */
    private static int[] thinnedByX(double[] x, double[] y, boolean[] flagged) {
        int[] order = PointBudget.orderByXThenY(x, y);
        boolean[] sortedFlags = new boolean[order.length];
        for (int i = 0; i < order.length; i++) {
            sortedFlags[i] = flagged[order[i]];
        }
        return PointBudget.pick(order, PointBudget.thinned(sortedFlags, PointBudget.DEFAULT));
    }

    private static String countNote(boolean[] flagged, int[] drawn, String what) {
        return ChartNotes.count(flagged.length, drawn.length, PointBudget.count(flagged),
                PointBudget.flaggedAmong(flagged, drawn), what);
    }

    /** Pairs whose HARD exceeds the type's limit. */
    private static boolean[] beyondHard(double[] a, double[] b, double limit) {
        boolean[] out = new boolean[a.length];
        for (int i = 0; i < a.length; i++) {
            out[i] = LimitComparison.above(PairMeasures.hard(a[i], b[i]), limit);
        }
        return out;
    }

    /** Pairs above the fitted 99 % line of the Thompson–Howarth model; none when there is no model. */
    private static boolean[] aboveLine(double[] m, double[] d, PrecisionModelResult model) {
        boolean[] out = new boolean[m.length];
        if (!model.available()) {
            return out;
        }
        PrecisionModel pm = model.thompsonHowarth().model();
        double factor = model.line99().factor();
        for (int i = 0; i < m.length; i++) {
            out[i] = ThompsonHowarth.aboveLine(m[i], d[i], factor, pm);
        }
        return out;
    }

    private static double[] modelLine(PrecisionModel pm, double[] x, double factor) {
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            // Below zero only when the fitted σ_c is negative over the whole range; clamp for the log axis.
            y[i] = Math.max(factor * pm.sigmaAt(x[i]), 1e-12);
        }
        return y;
    }

    /** The points with y &gt; 0, for log axes: {x, y}. */
    private static double[][] positiveY(double[] x, double[] y) {
        int k = 0;
        double[] px = new double[x.length];
        double[] py = new double[y.length];
        for (int i = 0; i < x.length; i++) {
            if (y[i] > 0) {
                px[k] = x[i];
                py[k] = y[i];
                k++;
            }
        }
        return new double[][] {Arrays.copyOf(px, k), Arrays.copyOf(py, k)};
    }

    /** Where σ_c turns positive, so the model lines can be drawn on log axes. */
    private static double modelStart(PrecisionModel pm, double lo) {
        if (pm.sigma0() >= 0 || pm.k() <= 0) {
            return lo;
        }
        return Math.max(lo, -pm.sigma0() / pm.k() * 1.05);
    }

    private static double[] span(double lo, double hi, boolean log) {
        double[] out = new double[LINE_POINTS];
        for (int i = 0; i < LINE_POINTS; i++) {
            double t = i / (LINE_POINTS - 1.0);
            out[i] = log ? lo * Math.pow(hi / lo, t) : lo + (hi - lo) * t;
        }
        return out;
    }

    private static double[] scale(double[] x, double f) {
        double[] out = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            out[i] = x[i] * f;
        }
        return out;
    }

    private static double positiveMin(double[] a, double[] b) {
        double lo = Double.POSITIVE_INFINITY;
        for (double v : a) {
            if (v > 0) {
                lo = Math.min(lo, v);
            }
        }
        for (double v : b) {
            if (v > 0) {
                lo = Math.min(lo, v);
            }
        }
        return Double.isInfinite(lo) ? 0.01 : lo;
    }

    private static double max(double[] a, double[] b) {
        double hi = 0;
        for (double v : a) {
            hi = Math.max(hi, v);
        }
        for (double v : b) {
            hi = Math.max(hi, v);
        }
        return hi > 0 ? hi : 1;
    }

    private static String pct(double fraction, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f %%", 100 * fraction);
    }

    private static String compact(double v) {
        return org.cupel.assay.Numbers.compact(v);
    }
}
