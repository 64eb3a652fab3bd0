package org.cupel.charts.recovery;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.cupel.charts.ChartStyle;
import org.cupel.recovery.Deportment;
import org.cupel.recovery.RecoveryResult;
import org.knowm.xchart.CategoryChart;
import org.knowm.xchart.CategoryChartBuilder;

/** Where the metal went: the mean share of each product per condition, stacked to 100%. */
public final class DeportmentChart {
    private DeportmentChart() {
    }

    public static CategoryChart of(RecoveryResult result, String analyte) {
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
        chart.getStyler().setYAxisMin(0.0).setYAxisMax(100.0);
        chart.getStyler().setLabelsVisible(true);
        chart.getStyler().setLabelsFontColorAutomaticEnabled(false);
        chart.getStyler().setLabelsFontColor(ChartStyle.BLACK);
        chart.getStyler().setLabelsPosition(0.5);
        chart.getStyler().setDecimalPattern("0.##");
        List<String> conditions = rows.stream().map(Deportment::condition).toList();
        for (String p : products) {
            List<Double> share = new ArrayList<>();
            rows.forEach(d -> share.add(d.sharePercent().getOrDefault(p, 0.0)));
            chart.addSeries(p, conditions, share);
        }
        return chart;
    }
}
