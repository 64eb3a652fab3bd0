package org.cupel.report.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.charts.control.CrmChartsTest;
import org.cupel.control.crm.CrmReview;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportSection;
import org.cupel.report.ReportTable;
import org.junit.jupiter.api.Test;

class CrmSectionTest {

    @Test
    void sectionListsSummarySwapsDriftAndCharts() {
        CrmReview r = CrmChartsTest.plantedReview();
        ReportSection s = CrmSection.of(r);
        assertEquals("crms", s.id());
        List<ReportTable> tables = s.blocks().stream().filter(b -> b instanceof ReportBlock.Table)
                .map(b -> ((ReportBlock.Table) b).table()).toList();
        ReportTable summary = tables.stream().filter(t -> t.id().equals("crm-summary")).findFirst().orElseThrow();
        assertEquals(3, summary.rows().size());
        ReportTable swaps = tables.stream().filter(t -> t.id().equals("crm-swaps")).findFirst().orElseThrow();
        assertEquals("J109-LOW", swaps.rows().get(0).get(0));
        assertEquals("MID", swaps.rows().get(0).get(6));
        long figures = s.blocks().stream().filter(b -> b instanceof ReportBlock.Figure).count();
        assertEquals(3 + 2, figures);
        assertEquals(1L, s.headlines().get("crmSwaps"));
        assertTrue(s.blocks().get(0) instanceof ReportBlock.Callout);
        for (ReportBlock b : s.blocks()) {
            if (b instanceof ReportBlock.Figure f) {
                assertTrue(f.chart().get() != null);
            }
        }
    }

    @Test
    void biasTextGivesTheMeanBiasItsIntervalAndWhetherItIsSignificant() {
        // Results 1.1, 1.2, 1.3 on a certified 1.0: biases 10, 20, 30 %; mean 20 %, SD 10 %, n 3. Student t
        // (0.975, 2 df) = 4.3027 (any t table): half-width 4.3027 × 10 / √3 = 24.84, so the interval -4.84 to
        // +44.84 holds 0: not significant.
        assertEquals("+20.00 % (95 % CI -4.84 to +44.84), not significant", CrmSection.biasText(
                org.cupel.control.crm.BiasEstimate.of(new double[] {1.1, 1.2, 1.3}, 1.0, 0.95)));
        // Results 1.10, 1.11, 1.12: biases 10, 11, 12 %; SD 1 %: half-width 4.3027 × 1 / √3 = 2.48, interval +8.52 to +13.48.
        assertEquals("+11.00 % (95 % CI +8.52 to +13.48), significant", CrmSection.biasText(
                org.cupel.control.crm.BiasEstimate.of(new double[] {1.10, 1.11, 1.12}, 1.0, 0.95)));
        // One result: no interval; the estimate's note says why.
        assertEquals("+5.00 % (one result: no interval for the mean bias)", CrmSection.biasText(
                org.cupel.control.crm.BiasEstimate.of(new double[] {1.05}, 1.0, 0.95)));
    }
}
