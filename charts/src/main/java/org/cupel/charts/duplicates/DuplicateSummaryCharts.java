package org.cupel.charts.duplicates;

import static org.cupel.charts.duplicates.DuplicatePlots.line;
import static org.cupel.charts.duplicates.DuplicatePlots.pct;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cupel.assay.Numbers;
import org.cupel.charts.AxisLabels;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartStyle;
import org.cupel.charts.KeyEntry;
import org.cupel.charts.PointBudget;
import org.cupel.duplicates.DuplicateSetResult;
import org.cupel.duplicates.Estimate;
import org.cupel.duplicates.PairMeasures;
import org.cupel.duplicates.PrecisionModel;
import org.cupel.duplicates.RuleOutcome;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * The panels that put the duplicate types of one analyte side by side: ranked HARD against each type's limit,
 * the mean relative bias of each type, and the precision each type's model gives across the grades. Every
 * decision shown (rule met, bias shown) is the core result's.
 */
public final class DuplicateSummaryCharts {
    /** Precision is drawn up to this many percent: above it, a relative SD says little. */
    static final double PRECISION_CAP = 200;
    private static final BasicStroke CURVE = ChartStyle.solid(2f);
    private static final BasicStroke RULE = ChartStyle.dotted(2f);
    private static final BasicStroke INTERVAL = ChartStyle.solid(2.2f);
    private static final BasicStroke LIMIT = ChartStyle.dashed(1f);
    /** Markers of the summary panels, larger than the pairs' since they stand for a whole type. */
    private static final int MARKER = 9;

    private DuplicateSummaryCharts() {
    }

    /**
     * Ranked HARD of every type: the share of pairs at or below each HARD, one curve per type, a marker where
     * each curve meets its type's limit (at the share within the limit the core result gives), and the rule's
     * required share.
     */
    public static ChartFigure.Panel rankedHard(List<DuplicateSetResult> sets, String letter, int width, int height) {
        XYChart chart = DuplicatePlots.panel(width, height, "HARD (%)", "Cumulative % of pairs");
        List<KeyEntry> key = new ArrayList<>();
        double right = 0;
        List<String> counts = new ArrayList<>();
        List<String> thinned = new ArrayList<>();
        for (DuplicateSetResult r : sets) {
            double limit = 100 * r.precision().hardLimit();
            right = Math.max(right, 1.5 * limit);
            double[] unsorted = hard(r);
            int[] order = PointBudget.orderByXThenY(unsorted, unsorted);
            double[] hard = PointBudget.pick(unsorted, order);
            boolean[] flags = r.pairs().relativeFlags().beyondHardLimit();
            int n = hard.length;
            counts.add(shortName(r) + " " + n);
            if (n == 0) {
                continue;
            }
            right = Math.max(right, hard[n - 1]);
            boolean[] beyond = new boolean[n];
            double[] cum = new double[n];
            for (int i = 0; i < n; i++) {
                beyond[i] = flags[order[i]];
                cum[i] = 100.0 * (i + 1) / n;
            }
            // Sorted: the even share keeps the curve's ends, and its whole flagged tail is drawn.
            int[] idx = PointBudget.thinned(beyond, PointBudget.DEFAULT);
            if (idx.length < n) {
                thinned.add(shortName(r));
            }
            Color colour = DuplicatePlots.colour(r.type());
            XYSeries s = line(chart, shortName(r), PointBudget.pick(hard, idx), PointBudget.pick(cum, idx), colour,
                    CURVE);
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Step);
            Estimate within = r.precision().percentWithinLimit();
            if (within.available()) {
                line(chart, shortName(r) + " limit", new double[] {limit, limit}, new double[] {0, within.value()},
                        colour, LIMIT);
                DuplicatePlots.points(chart, shortName(r) + " at limit", new double[] {limit},
                        new double[] {within.value()}, colour, DuplicatePlots.marker(r.type()));
            }
            key.add(new KeyEntry(shortName(r) + ": " + withinText(r), colour, CURVE, DuplicatePlots.marker(r.type()),
                    MARKER));
        }
        right = Math.min(100, right);
        double accept = sets.get(0).precision().acceptancePercent();
        line(chart, "rule", new double[] {0, right}, new double[] {accept, accept}, ChartStyle.WARNING, RULE);
        key.add(KeyEntry.line("rule: " + Numbers.compact(accept) + " % of pairs within the type's limit",
                ChartStyle.WARNING, RULE));
        chart.getStyler().setYAxisMin(0.0).setYAxisMax(100.0).setXAxisMin(0.0).setXAxisMax(right);
        chart.getStyler().setMarkerSize(MARKER);
        String note = "Pairs used in relative measures: " + String.join(", ", counts) + "; each type's limit is "
                + "drawn up to where its curve meets it"
                + (thinned.isEmpty() ? "" : "; " + String.join(", ", thinned) + ": curve thinned to "
                + String.format(Locale.US, "%,d", PointBudget.DEFAULT) + " points, all beyond the limit kept");
        return new ChartFigure.Panel(letter + " Ranked HARD, every type", chart, note).withKey(key);
    }

    /**
     * The mean relative bias of each type with its 95 % interval, one row per type, against zero: a type whose
     * interval excludes zero (the core result's {@code significant}) is drawn in the failure colour.
     */
    public static ChartFigure.Panel bias(List<DuplicateSetResult> sets, String letter, int width, int height) {
        XYChart chart = DuplicatePlots.panel(width, height, "Mean (dup. − orig.) / mean (%), 95 % interval", "");
        chart.getStyler().setYAxisTicksVisible(false).setYAxisTitleVisible(false);
        int rows = sets.size();
        double lo = 0;
        double hi = 0;
        double[] at = new double[rows];
        List<String> names = new ArrayList<>();
        for (int k = 0; k < rows; k++) {
            DuplicateSetResult r = sets.get(k);
            double y = rows - k;
            at[k] = y;
            Estimate e = r.bias().meanRelativeBias();
            names.add(shortName(r) + (e.available() ? "" : "\n(not computed)"));
            if (!e.available()) {
                continue;
            }
            boolean shown = r.bias().significant();
            Color colour = shown ? ChartStyle.FAILURE : ChartStyle.DATA;
            if (e.hasInterval()) {
                line(chart, "interval " + k, new double[] {100 * e.ciLow(), 100 * e.ciHigh()}, new double[] {y, y},
                        colour, INTERVAL);
                lo = Math.min(lo, 100 * e.ciLow());
                hi = Math.max(hi, 100 * e.ciHigh());
            }
            lo = Math.min(lo, 100 * e.value());
            hi = Math.max(hi, 100 * e.value());
            DuplicatePlots.points(chart, "mean " + k, new double[] {100 * e.value()}, new double[] {y}, colour,
                    shown ? DuplicatePlots.FLAGGED_MARKER : ChartMarkers.CIRCLE);
        }
        double pad = Math.max(1, 0.1 * (hi - lo));
        chart.getStyler().setXAxisMin(lo - pad).setXAxisMax(hi + pad).setYAxisMin(0.4).setYAxisMax(rows + 0.6);
        chart.getStyler().setMarkerSize(MARKER);
        line(chart, "zero", new double[] {0, 0}, new double[] {0.4, rows + 0.6}, ChartStyle.REFERENCE,
                DuplicatePlots.ZERO);
        List<KeyEntry> key = List.of(
                new KeyEntry("no bias shown (interval includes 0)", ChartStyle.DATA, INTERVAL, ChartMarkers.CIRCLE,
                        MARKER),
                new KeyEntry("bias shown (interval excludes 0)", ChartStyle.FAILURE, INTERVAL,
                        DuplicatePlots.FLAGGED_MARKER, MARKER));
        return new ChartFigure.Panel(letter + " Mean relative bias, every type", chart,
                "Student-t interval of the mean relative difference over the pairs used in relative measures")
                .withKey(key).with(AxisLabels.left(at, names, ChartFigure.PANEL_NOTE_FONT));
    }

    /**
     * The precision P = 2σc/c (%) of one measurement that each type's Thompson–Howarth model gives across its
     * range of pair means, up to {@value #PRECISION_CAP} %.
     */
    public static ChartFigure.Panel precision(List<DuplicateSetResult> sets, String letter, int width, int height) {
        XYChart chart = DuplicatePlots.panel(width, height, "Grade " + "(" + sets.get(0).unit() + ")",
                "Precision 2σc/c (%)");
        List<KeyEntry> key = new ArrayList<>();
        List<String> none = new ArrayList<>();
        double top = 0;
        boolean capped = false;
        for (DuplicateSetResult r : sets) {
            if (!r.model().available()) {
                none.add(shortName(r));
                continue;
            }
            PrecisionModel pm = r.model().thompsonHowarth().model();
            double[] a = r.pairs().absoluteA();
            double[] b = r.pairs().absoluteB();
            double[] x = DuplicatePlots.span(DuplicateCharts.modelStart(pm, DuplicatePlots.positiveMin(a, b)),
                    DuplicatePlots.max(a, b), true);
            double[] y = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                double p = 100 * pm.precisionAt(x[i]);
                capped |= p > PRECISION_CAP;
                y[i] = p > PRECISION_CAP ? Double.NaN : p;
                top = Double.isNaN(y[i]) ? top : Math.max(top, y[i]);
            }
            Color colour = DuplicatePlots.colour(r.type());
            line(chart, shortName(r), x, y, colour, CURVE);
            key.add(KeyEntry.line(String.format(Locale.ROOT, "%s: σc = %.3g + %.3g·c", shortName(r), pm.sigma0(),
                    pm.k()), colour, CURVE));
        }
        chart.getStyler().setXAxisLogarithmic(true).setYAxisMin(0.0).setYAxisMax(top > 0 ? top * 1.08 : 1);
        String note = "2σc/c of one measurement from each type's Thompson–Howarth model, over the type's range of "
                + "pair means" + (capped ? "; above " + Numbers.compact(PRECISION_CAP) + " % not drawn" : "")
                + (none.isEmpty() ? "" : "; no model: " + String.join(", ", none));
        if (key.isEmpty()) {
            DuplicatePlots.points(chart, "none", new double[0], new double[0], ChartStyle.DATA, ChartMarkers.CIRCLE);
            return new ChartFigure.Panel(letter + " Precision by grade, every type", chart, note);
        }
        return new ChartFigure.Panel(letter + " Precision by grade, every type", chart, note).withKey(key);
    }

    /** The HARD of each pair used in relative measures, in %. */
    private static double[] hard(DuplicateSetResult r) {
        double[] a = r.pairs().relativeA();
        double[] b = r.pairs().relativeB();
        double[] hard = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            hard[i] = 100 * PairMeasures.hard(a[i], b[i]);
        }
        return hard;
    }

    /** "60.5 % within 30 %: fail". */
    private static String withinText(DuplicateSetResult r) {
        Estimate within = r.precision().percentWithinLimit();
        if (!within.available()) {
            return "not judged";
        }
        RuleOutcome rule = r.precision().rule();
        return String.format(Locale.ROOT, "%.1f %% within %s: %s", within.value(), pct(r.precision().hardLimit(), 0),
                rule.name().toLowerCase(Locale.ROOT).replace('_', ' '));
    }

    /** "Field", "Coarse-reject", "Lab repeat", "Umpire": a type on a panel that compares types. */
    static String shortName(DuplicateSetResult r) {
        String l = r.type().label().replace(" duplicate", "").replace(" check", "");
        return Character.toUpperCase(l.charAt(0)) + l.substring(1);
    }
}
