package org.cupel.charts.duplicates;

import static org.cupel.charts.duplicates.DuplicatePlots.joined;
import static org.cupel.charts.duplicates.DuplicatePlots.line;
import static org.cupel.charts.duplicates.DuplicatePlots.max;
import static org.cupel.charts.duplicates.DuplicatePlots.pct;
import static org.cupel.charts.duplicates.DuplicatePlots.positiveMin;
import static org.cupel.charts.duplicates.DuplicatePlots.scale;
import static org.cupel.charts.duplicates.DuplicatePlots.span;

import java.util.Arrays;
import java.util.Locale;
import org.cupel.assay.QcRole;
import org.cupel.charts.ChartFigure;
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
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * The panels of one duplicate set, drawn from its core result: the pairs, with those the analysis flagged
 * marked, and the lines whose equations the result gives. Nothing is judged here: a pair is marked because
 * the core result flags it (the flagged-pairs table lists the same pairs).
 */
public final class DuplicateCharts {
    static final String BEYOND_HARD = "beyond the HARD limit";
    static final String ABOVE_99 = "above the 99 % line";
    /** Group medians drawn at most: enough to trace the median curve, few enough not to hide the pairs. */
    private static final int MEDIANS_BUDGET = 300;

    private DuplicateCharts() {
    }

    /**
     * Original against duplicate (log axes over more than a decade and a half) with the 1:1 line, the type's HARD-limit lines and, for umpire
     * checks, the reduced major axis; pairs beyond the HARD limit marked.
     */
    public static ChartFigure.Panel scatter(DuplicateSetResult r, String letter, int width, int height) {
        double[] a = r.pairs().absoluteA();
        double[] b = r.pairs().absoluteB();
        XYChart chart = DuplicatePlots.panel(width, height, "Original " + unit(r), "Duplicate " + unit(r));
        boolean[] beyond = r.pairs().absoluteFlags().beyondHardLimit();
        int[] drawn = DuplicatePlots.pairs(chart, a, b, beyond);
        double[] x = {positiveMin(a, b), max(a, b)};
        line(chart, "1:1", x, x, ChartStyle.REFERENCE, DuplicatePlots.ONE_TO_ONE);
        double h = r.precision().hardLimit();
        line(chart, "HARD limit", joined(x, x), joined(scale(x, (1 + h) / (1 - h)), scale(x, (1 - h) / (1 + h))),
                ChartStyle.WARNING, DuplicatePlots.HARD_LINES);
        RmaFit rma = r.bias().rma();
        String rmaNote = "";
        if (rma.available() && r.type() == QcRole.UMPIRE) {
            double[] y = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                y[i] = rma.intercept() + rma.slope() * x[i];
            }
            line(chart, "RMA", x, y, ChartStyle.SECOND, DuplicatePlots.RMA);
            rmaNote = String.format(Locale.ROOT, "; RMA y = %.4g + %.4g·x", rma.intercept(), rma.slope());
        }
        boolean log = DuplicatePlots.logAxis(x[0], x[1]);
        chart.getStyler().setXAxisLogarithmic(log).setYAxisLogarithmic(log);
        return new ChartFigure.Panel(heading(letter, r, true), chart,
                DuplicatePlots.countNote("pairs, both detected", beyond, drawn, BEYOND_HARD) + rmaNote);
    }

    /**
     * Relative difference (b − a)/m against pair mean, with the mean and its 95 % interval, and the HARD limit
     * as the relative difference ±2 × limit it equals; pairs beyond the HARD limit marked.
     */
    public static ChartFigure.Panel relativeDifference(DuplicateSetResult r, String letter, int width, int height) {
        double[] a = r.pairs().relativeA();
        double[] b = r.pairs().relativeB();
        int n = a.length;
        double[] m = new double[n];
        double[] rel = new double[n];
        for (int i = 0; i < n; i++) {
            m[i] = PairMeasures.mean(a[i], b[i]);
            rel[i] = 100 * (b[i] - a[i]) / m[i];
        }
        XYChart chart = DuplicatePlots.panel(width, height, "Pair mean " + unit(r), "(Dup. − orig.) / mean (%)");
        boolean[] beyond = r.pairs().relativeFlags().beyondHardLimit();
        int[] drawn = DuplicatePlots.pairs(chart, m, rel, beyond);
        double[] x = {positiveMin(m, m), max(m, m)};
        line(chart, "zero", x, new double[] {0, 0}, ChartStyle.REFERENCE, DuplicatePlots.ZERO);
        // |b − a| / m = 2·HARD, so the limit h is the band ±200·h %.
        double limit = 200 * r.precision().hardLimit();
        line(chart, "HARD limit", joined(x, x), joined(new double[] {limit, limit}, new double[] {-limit, -limit}),
                ChartStyle.WARNING, DuplicatePlots.HARD_LINES);
        BiasResult bias = r.bias();
        Estimate mb = bias.meanRelativeBias();
        if (mb.hasInterval()) {
            double v = 100 * mb.value();
            line(chart, "mean", x, new double[] {v, v}, ChartStyle.SECOND, DuplicatePlots.MEAN);
            line(chart, "95 % interval of the mean", joined(x, x), joined(new double[] {100 * mb.ciLow(),
                100 * mb.ciLow()}, new double[] {100 * mb.ciHigh(), 100 * mb.ciHigh()}), ChartStyle.SECOND,
                    DuplicatePlots.MEAN_INTERVAL);
        }
        chart.getStyler().setXAxisLogarithmic(DuplicatePlots.logAxis(x[0], x[1]));
        return new ChartFigure.Panel(heading(letter, r, true), chart,
                DuplicatePlots.countNote("pairs", beyond, drawn, BEYOND_HARD) + "; " + bias.verdict());
    }

    /**
     * Thompson–Howarth plot: |d| against pair mean on log–log axes, the group medians, the fitted median line,
     * the 90 % and 99 % control lines and the |d| of a pair at the type's HARD limit (target); pairs above the
     * 99 % line marked. Without a model, the pairs and the reason.
     */
    public static ChartFigure.Panel thompsonHowarth(DuplicateSetResult r, String letter, int width, int height) {
        PrecisionModelResult model = r.model();
        double[] a = r.pairs().absoluteA();
        double[] b = r.pairs().absoluteB();
        boolean[] flags = r.pairs().absoluteFlags().aboveLine99();
        int n = a.length;
        double[] m = new double[n];
        double[] d = new double[n];
        boolean[] above = new boolean[n];
        int k = 0;
        for (int i = 0; i < n; i++) {
            double diff = PairMeasures.absDifference(a[i], b[i]);
            if (diff > 0) {
                m[k] = PairMeasures.mean(a[i], b[i]);
                d[k] = diff;
                above[k] = flags[i];
                k++;
            }
        }
        m = Arrays.copyOf(m, k);
        d = Arrays.copyOf(d, k);
        above = Arrays.copyOf(above, k);
        XYChart chart = DuplicatePlots.panel(width, height, "Pair mean " + unit(r), "|Orig. − dup.| " + unit(r));
        int[] drawn = DuplicatePlots.pairs(chart, m, d, above);
        String extra;
        if (model.available()) {
            extra = modelLines(chart, r, m);
        } else {
            extra = "; no model: " + model.note();
        }
        chart.getStyler().setXAxisLogarithmic(true).setYAxisLogarithmic(true);
        String zeros = n > k ? "; " + (n - k) + " pairs with |d| = 0 not drawn on log axes" : "";
        String count = DuplicatePlots.countNote("pairs", above, drawn, ABOVE_99);
        // With a model, its expected count follows the count of pairs above the 99 % line it qualifies.
        String note = model.available() ? count + extra + zeros : count + zeros + extra;
        return new ChartFigure.Panel(heading(letter, r, false), chart, note);
    }

    /** Draws the group medians and the model's lines; returns the note on them. */
    private static String modelLines(XYChart chart, DuplicateSetResult r, double[] m) {
        PrecisionModelResult model = r.model();
        PairGroups g = model.groups();
        double[][] all = positiveY(g.means(), g.medianAbsDiff());
        // Group medians come in order of pair mean: even thinning keeps the curve they trace and its ends.
        int[] gi = PointBudget.indices(all[0].length, MEDIANS_BUDGET);
        XYSeries med = chart.addSeries("group medians", gi.length == 0 ? new double[] {Double.NaN}
                : PointBudget.pick(all[0], gi), gi.length == 0 ? new double[] {Double.NaN} : PointBudget.pick(all[1], gi));
        med.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        med.setMarker(DuplicatePlots.MEDIAN_MARKER);
        med.setMarkerColor(ChartStyle.BLACK);
        ModelFit th = model.thompsonHowarth();
        PrecisionModel pm = th.model();
        double[] x = span(modelStart(pm, positiveMin(m, m)), max(m, m), true);
        line(chart, "fitted median |d|", x, modelLine(pm, x, NormalDifferenceConstants.MEDIAN_ABS_DIFF),
                ChartStyle.REFERENCE, DuplicatePlots.FITTED);
        line(chart, "90 % line", x, modelLine(pm, x, NormalDifferenceConstants.P90), ChartStyle.WARNING,
                DuplicatePlots.LINE90);
        line(chart, "99 % line", x, modelLine(pm, x, NormalDifferenceConstants.P99), ChartStyle.FAILURE,
                DuplicatePlots.LINE99);
        double h = r.precision().hardLimit();
        double[] ends = {x[0], x[x.length - 1]};
        line(chart, "target", ends, scale(ends, 2 * h), ChartStyle.REDDISH_PURPLE, DuplicatePlots.TARGET);
        String extra = String.format(Locale.ROOT, " (expected %.0f); %d above the 90 %% line (expected %.0f); "
                + "σc = %.3g + %.3g·c from groups of %d", model.line99().expected(), model.line90().exceedances(),
                model.line90().expected(), pm.sigma0(), pm.k(), g.groupSize());
        if (gi.length < all[0].length) {
            extra += String.format(Locale.US, "; %,d of %,d group medians drawn", gi.length, all[0].length);
        }
        if (all[0].length < g.groups()) {
            extra += "; " + (g.groups() - all[0].length) + " groups with median |d| = 0 not drawn";
        }
        if (g.dropped() > 0) {
            extra += "; " + g.dropped() + " top pairs outside a full group";
        }
        return extra;
    }

    /** "(a) Field duplicates, HARD limit 30 %". */
    private static String heading(String letter, DuplicateSetResult r, boolean limit) {
        return letter + " " + DuplicatePlots.typeName(r) + (limit ? ", HARD limit " + pct(r.precision().hardLimit(), 0)
                : "");
    }

    private static String unit(DuplicateSetResult r) {
        return "(" + r.unit() + ")";
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
    static double modelStart(PrecisionModel pm, double lo) {
        if (pm.sigma0() >= 0 || pm.k() <= 0) {
            return lo;
        }
        return Math.max(lo, -pm.sigma0() / pm.k() * 1.05);
    }
}
