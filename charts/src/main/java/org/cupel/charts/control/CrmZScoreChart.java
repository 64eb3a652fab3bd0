package org.cupel.charts.control;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartNotes;
import org.cupel.charts.ChartStyle;
import org.cupel.charts.KeyEntry;
import org.cupel.charts.PointBudget;
import org.cupel.charts.RingMarker;
import org.cupel.control.crm.CrmResult;
import org.cupel.control.crm.SeriesReview;
import org.cupel.control.crm.ZBand;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Every CRM of one analyte on one normalised chart, z = (x − certified)/SD against time, to show drift
 * that affects the whole lab rather than one material. Time is days since the first dated batch when
 * every result is dated, else the batch number. Swaps are left out (their z is not a measure of the lab);
 * z is clipped to ±6 so one wild result does not flatten the rest. Results that the review put outside the
 * satisfactory band ({@link CrmResult#band()}: questionable or unsatisfactory, ISO 13528) are ringed in the
 * warning and failure colours; nothing is judged here (a result exactly on 2 SD is satisfactory, as
 * {@link ZBand} decides). The key is the figure's, under the chart, wrapping over as many rows as the CRMs
 * need.
 */
public final class CrmZScoreChart {
    static final String QUESTIONABLE = "Questionable: 2 < |z| < 3";
    static final String UNSATISFACTORY = "Unsatisfactory: |z| ≥ 3";
    private static final double CLIP = 6;
    private static final java.awt.BasicStroke CRM_LINE = ChartStyle.solid(0.8f);
    private static final java.awt.BasicStroke ZERO_LINE = ChartStyle.solid(1.2f);

    private CrmZScoreChart() {
    }

    public static ChartFigure of(String analyte, List<SeriesReview> series) {
        LocalDate origin = null;
        boolean dated = true;
        for (SeriesReview s : series) {
            for (CrmResult r : s.results()) {
                LocalDate d = r.point().date();
                dated &= d != null;
                if (d != null && (origin == null || d.isBefore(origin))) {
                    origin = d;
                }
            }
        }
        dated &= origin != null;
        XYChart c = new XYChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT)
                .title("All CRMs, " + analyte + ": z-score over time")
                .xAxisTitle(dated ? "Days since " + origin : "Batch number (some batches undated)")
                .yAxisTitle("z = (result − certified) / certificate SD").build();
        ChartStyle.apply(c);
        c.getStyler().setYAxisMin(-CLIP).setYAxisMax(CLIP).setLegendVisible(false);
        List<KeyEntry> key = new ArrayList<>();
        double maxX = 1;
        long total = 0;
        long drawn = 0;
        long flagged = 0;
        long flaggedDrawn = 0;
        int k = 0;
        List<double[]> questionable = new ArrayList<>();
        List<double[]> unsatisfactory = new ArrayList<>();
        for (SeriesReview s : series) {
            List<CrmResult> judged = s.results().stream().filter(r -> !r.isSwap()).toList();
            boolean[] beyond = new boolean[judged.size()];
            for (int i = 0; i < beyond.length; i++) {
                beyond[i] = judged.get(i).band() != ZBand.SATISFACTORY;
            }
            int[] idx = PointBudget.thinned(beyond, PointBudget.DEFAULT / Math.max(1, series.size()));
            flagged += PointBudget.count(beyond);
            flaggedDrawn += PointBudget.flaggedAmong(beyond, idx);
            double[] x = new double[idx.length];
            double[] y = new double[idx.length];
            for (int i = 0; i < idx.length; i++) {
                CrmResult r = judged.get(idx[i]);
                x[i] = dated ? ChronoUnit.DAYS.between(origin, r.point().date()) : r.point().batchOrder() + 1;
                y[i] = Math.max(-CLIP, Math.min(CLIP, r.z()));
                maxX = Math.max(maxX, x[i]);
                if (r.band() != ZBand.SATISFACTORY) {
                    (r.band() == ZBand.QUESTIONABLE ? questionable : unsatisfactory).add(new double[] {x[i], y[i]});
                }
            }
            total += judged.size();
            drawn += idx.length;
            if (idx.length > 0) {
                String name = s.crm() + " (n = " + judged.size() + ")";
                XYSeries xs = c.addSeries(name, x, y);
                xs.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
                org.knowm.xchart.style.markers.Marker marker = ChartMarkers.CATEGORIES[k % ChartMarkers.CATEGORIES.length];
                java.awt.Color col = ChartStyle.CATEGORIES[k % ChartStyle.CATEGORIES.length];
                xs.setMarker(marker).setLineStyle(CRM_LINE);
                xs.setMarkerColor(col).setLineColor(col);
                key.add(new KeyEntry(name, col, CRM_LINE, marker));
            }
            k++;
        }
        double[] ends = {0, maxX};
        key.add(band(c, "±2 SD", 2, ChartStyle.WARNING));
        key.add(band(c, "±3 SD", 3, ChartStyle.FAILURE));
        XYSeries zero = c.addSeries("z = 0", ends, new double[] {0, 0});
        zero.setMarker(SeriesMarkers.NONE).setLineColor(ChartStyle.REFERENCE).setLineStyle(ZERO_LINE);
        key.add(KeyEntry.line("z = 0", ChartStyle.REFERENCE, ZERO_LINE));
        marked(c, key, QUESTIONABLE, questionable, ChartStyle.WARNING);
        marked(c, key, UNSATISFACTORY, unsatisfactory, ChartStyle.FAILURE);
        return ChartFigure.of(new ChartFigure.Panel("", c, ChartNotes.count(total, drawn, flagged, flaggedDrawn,
                "results outside the satisfactory band") + "; swaps left out; |z| clipped at 6").withKey(key));
    }

    /** The results of one band, ringed over their CRM's markers; no series (and no key entry) when there are none. */
    private static void marked(XYChart c, List<KeyEntry> key, String name, List<double[]> points,
                               java.awt.Color colour) {
        if (points.isEmpty()) {
            return;
        }
        String label = name + " (" + points.size() + ")";
        XYSeries s = c.addSeries(label, points.stream().mapToDouble(p -> p[0]).toArray(),
                points.stream().mapToDouble(p -> p[1]).toArray());
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        s.setMarker(RingMarker.RING).setMarkerColor(colour);
        key.add(KeyEntry.points(label, colour, RingMarker.RING));
    }

    private static KeyEntry band(XYChart c, String name, double z, java.awt.Color color) {
        java.awt.BasicStroke stroke = z >= 3 ? ChartStyle.solid(1.6f) : ChartStyle.dashed(1.3f);
        double[] ends = {c.getStyler().getXAxisMin() == null ? 0 : c.getStyler().getXAxisMin(), maxX(c)};
        XYSeries up = c.addSeries(name, ends, new double[] {z, z});
        up.setMarker(SeriesMarkers.NONE).setLineColor(color).setLineStyle(stroke);
        XYSeries down = c.addSeries(name + " low", ends, new double[] {-z, -z});
        down.setMarker(SeriesMarkers.NONE).setLineColor(color).setLineStyle(stroke)
                .setShowInLegend(false);
        return KeyEntry.line(name, color, stroke);
    }

    private static double maxX(XYChart c) {
        double m = 1;
        for (XYSeries s : c.getSeriesMap().values()) {
            m = Math.max(m, s.getXMax());
        }
        return m;
    }
}
