package org.cupel.charts.control;

import java.util.List;
import java.util.Locale;
import org.cupel.assay.Numbers;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartMarkers;
import org.cupel.charts.ChartStyle;
import org.cupel.control.crm.BiasVsGrade;
import org.cupel.control.crm.SeriesReview;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Mean bias % of each CRM against its certified value, with the t-interval of the mean as error bars,
 * the zero-bias line and the least-squares line of bias on grade: a lab fine at low grade and biased at
 * high grade shows a slope.
 */
public final class CrmBiasChart {
    private CrmBiasChart() {
    }

    public static ChartFigure of(BiasVsGrade grade, List<SeriesReview> series) {
        List<SeriesReview> usable = series.stream().filter(s -> Double.isFinite(s.bias().meanBiasPct())).toList();
        String unit = series.isEmpty() ? "" : series.get(0).analyte().unit().symbol();
        XYChart c = new XYChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT)
                .title("Bias against certified grade, " + grade.analyte())
                .xAxisTitle("Certified value (" + unit + ")")
                .yAxisTitle("Mean bias (% of certified), 95 % CI").build();
        ChartStyle.apply(c);
        double maxX = 0;
        double minX = Double.POSITIVE_INFINITY;
        double lowY = 0;
        double highY = 0;
        for (int k = 0; k < usable.size(); k++) {
            SeriesReview s = usable.get(k);
            double half = Double.isFinite(s.bias().meanHighPct())
                    ? (s.bias().meanHighPct() - s.bias().meanLowPct()) / 2 : 0;
            double x = s.limits().certified();
            maxX = Math.max(maxX, x);
            lowY = Math.min(lowY, s.bias().meanBiasPct() - half);
            highY = Math.max(highY, s.bias().meanBiasPct() + half);
            minX = Math.min(minX, x);
            XYSeries p = c.addSeries(s.crm() + " (n = " + s.bias().n() + ")", new double[] {x},
                    new double[] {s.bias().meanBiasPct()}, new double[] {half});
            p.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            java.awt.Color col = ChartStyle.CATEGORIES[k % ChartStyle.CATEGORIES.length];
            p.setMarker(ChartMarkers.CIRCLE).setMarkerColor(col).setLineColor(col);
        }
        if (usable.isEmpty()) {
            minX = 0;
            maxX = 1;
        }
        double[] ends = {0, maxX * 1.08};
        double spanY = Math.max(highY - lowY, 1);
        c.getStyler().setXAxisMin(0.0).setXAxisMax(maxX * 1.08).setYAxisMin(lowY - 0.05 * spanY)
                .setYAxisMax(highY + 0.05 * spanY);
        XYSeries zero = c.addSeries("No bias", ends, new double[] {0, 0});
        zero.setMarker(SeriesMarkers.NONE).setLineColor(ChartStyle.REFERENCE).setLineStyle(ChartStyle.solid(1.2f));
        String note;
        if (grade.fit().estimated()) {
            XYSeries fit = c.addSeries("Least-squares line", ends, new double[] {grade.fit().intercept(),
                grade.fit().intercept() + grade.fit().slope() * ends[1]});
            fit.setMarker(SeriesMarkers.NONE).setLineColor(ChartStyle.GREY).setLineStyle(ChartStyle.dashed(1.3f));
            note = String.format(Locale.ROOT, "n = %d CRMs; slope %s %% per %s (95 %% CI %s to %s, %s)",
                    grade.fit().n(), Numbers.significant(grade.fit().slope(), 3), unit,
                    Numbers.significant(grade.fit().slopeLow(), 3), Numbers.significant(grade.fit().slopeHigh(), 3),
                    grade.fit().pText());
        } else {
            note = "n = " + usable.size() + " CRMs; no line: " + grade.fit().note();
        }
        return ChartFigure.of(c, note);
    }
}
