package org.cupel.report.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.charts.duplicates.SimulatedPairs;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportSection;
import org.junit.jupiter.api.Test;

class DuplicatesSectionTest {
    @Test
    void formatsTablesFiguresAndHeadlinesFromTheCoreResults() {
        DuplicateReport report = SimulatedPairs.report(300, 40);
        ReportSection s = DuplicatesSection.build(List.of(report), key -> false);
        assertEquals("duplicates", s.id());
        long tables = s.blocks().stream().filter(b -> b instanceof ReportBlock.Table).count();
        long figures = s.blocks().stream().filter(b -> b instanceof ReportBlock.Figure).count();
        assertTrue(tables >= 6, "tables: " + tables);
        // One figure each of pairs, bias and precision for the analyte, a panel per type in each.
        assertEquals(3, figures);
        ReportBlock.Figure precision = s.blocks().stream().filter(b -> b instanceof ReportBlock.Figure)
                .map(b -> (ReportBlock.Figure) b).filter(f -> f.name().equals("duplicates-Au-precision")).findFirst()
                .orElseThrow();
        // Umpire checks: 40 pairs, below the Thompson–Howarth minimum; the panel shows the pairs and says why.
        org.cupel.charts.ChartFigure figure = (org.cupel.charts.ChartFigure) precision.chart().get();
        assertTrue(figure.panels().get(1).note().contains("no model"), figure.panels().get(1).note());
        double rms = report.sets().get(0).precision().rmsCv().value();
        assertEquals(Math.round(10000 * rms) / 100.0, s.headlines().get("Au.pulp_duplicate.rmsCvPercent"));
        String settings = ((ReportBlock.Paragraph) s.blocks().get(1)).text();
        assertTrue(settings.contains("common practice"), settings);
        assertTrue(s.references().stream().anyMatch(r -> r.authors().startsWith("Miller")));
    }

    @Test
    void labelsUserSettings() {
        String text = DuplicatesSection.settingsText(org.cupel.duplicates.DuplicateSettings.DEFAULTS,
                key -> key.equals("duplicates.pulpHardLimitPercent"));
        assertTrue(text.contains("user settings"), text);
    }
}
