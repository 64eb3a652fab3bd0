package org.cupel.charts.recovery;

import java.awt.Color;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartStyle;
import org.cupel.recovery.Deportment;
import org.cupel.recovery.RecoveryResult;
import org.knowm.xchart.CategoryChart;
import org.knowm.xchart.CategoryChartBuilder;

/**
 * Where the metal went: the mean share of each product per condition, stacked to 100 %, each share written
 * on its part of the bar or, where the part is too thin for it, beside the bar (see {@link DeportmentLabels}).
 */
public final class DeportmentChart {
    /** Share of each category's width the bar takes: the rest is room for the labels of thin parts. */
    static final double BAR_FILL = 0.6;

    private DeportmentChart() {
    }

    public static ChartFigure of(RecoveryResult result, String analyte) {
        List<Deportment> rows = result.deportment().stream().filter(d -> d.analyte().equals(analyte) && d.n() > 0)
                .toList();
        int smelts = rows.stream().mapToInt(Deportment::n).sum();
        Set<String> products = new LinkedHashSet<>();
        rows.forEach(d -> products.addAll(d.sharePercent().keySet()));
        CategoryChart chart = new CategoryChartBuilder().width(ChartStyle.WIDTH).height(ChartStyle.HEIGHT)
                .title(analyte + " deportment by condition (mean of n = " + smelts + " smelts)")
                .xAxisTitle("Condition").yAxisTitle("Share of " + analyte + " in products (%)").build();
        ChartStyle.apply(chart);
        chart.getStyler().setStacked(true);
        chart.getStyler().setAvailableSpaceFill(BAR_FILL);
        chart.getStyler().setYAxisMin(0.0).setYAxisMax(100.0);
        List<String> conditions = rows.stream().map(Deportment::condition).toList();
        List<List<Double>> shares = new ArrayList<>();
        List<Color> colours = new ArrayList<>();
        for (String p : products) {
            List<Double> share = new ArrayList<>();
            rows.forEach(d -> share.add(d.sharePercent().getOrDefault(p, 0.0)));
            Color colour = ChartStyle.SERIES[shares.size() % ChartStyle.SERIES.length];
            chart.addSeries(p, conditions, share).setFillColor(colour);
            shares.add(share);
            colours.add(colour);
        }
        return ChartFigure.of(new ChartFigure.Panel("", chart, "")
                .with(new DeportmentLabels(shares, colours, BAR_FILL)));
    }
}
