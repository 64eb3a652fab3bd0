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
}
