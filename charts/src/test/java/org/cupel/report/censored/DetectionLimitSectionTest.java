package org.cupel.report.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.assay.Analyte;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodSelector;
import org.cupel.assay.MethodValue;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.cupel.censored.AnalyteCensoring;
import org.cupel.censored.CensoredSettings;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportSection;
import org.cupel.report.ReportTable;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;

class DetectionLimitSectionTest {

    /**
     * The manganese data of USEPA (2009) Unified Guidance Example 15-1 as routine samples, the &lt;5 values
     * from a second method, plus one blank and one missing value.
     */
    private static AnalyteCensoring manganese() {
        String[] mn = {"<2", "<2", "<2", "3.3", "<5", "<5", "<5", "5.3", "6.3", "7.7", "8.4", "9.5", "10.0", "11.9",
            "12.1", "12.6", "16.9", "17.9", "21.6", "22.7", "34.5", "45.9", "53.6", "77.2", "106.3"};
        SampleTable.Builder st = SampleTable.builder();
        Batch batch = new Batch("B1", "lab", null, "mn.csv");
        AnalyteColumn.Builder col = AnalyteColumn.builder(new Analyte("Mn", GradeUnit.PPB));
        for (int i = 0; i < mn.length; i++) {
            int row = st.add("S" + i, batch, i, QcRole.ROUTINE, "", new SourceLocation("mn.csv", i + 2, 0));
            AssayValue v = mn[i].startsWith("<") ? AssayValue.belowDetection(Double.parseDouble(mn[i].substring(1)))
                    : AssayValue.detected(Double.parseDouble(mn[i]), 2);
            col.add(row, new MethodValue(mn[i].equals("<5") ? "ICP-MS dil" : "ICP-MS", v, null));
        }
        int blank = st.add("BLK", batch, 26, QcRole.BLANK, "", new SourceLocation("mn.csv", 27, 0));
        col.add(blank, new MethodValue("ICP-MS", AssayValue.belowDetection(1), null));
        st.add("NR", batch, 27, QcRole.ROUTINE, "", new SourceLocation("mn.csv", 28, 0));
        SampleTable samples = st.build();
        return AnalyteCensoring.of(col.build(samples.size(), MethodSelector.FIRST), samples,
                CensoredSettings.DEFAULTS);
    }

    @Test
    void limitsCountsAndMethodsPerAnalyte() {
        ReportSection section = DetectionLimitSection.build(List.of(manganese()));
        assertEquals(DetectionLimitSection.TITLE, section.title());
        ReportTable limits = ((ReportBlock.Table) section.blocks().get(1)).table();
        List<String> row = limits.rows().get(0);
        assertEquals("Mn (ppb)", row.get(0));
        assertEquals("1, 2, 5", row.get(1));
        assertEquals("26", row.get(3));
        assertEquals("7 (26.9 %)", row.get(4));
        assertEquals("1", row.get(6));
        assertEquals("ICP-MS: 23, ICP-MS dil: 3", row.get(7));
    }

    @Test
    void summaryTableUsesRoutineSamplesOnlyAndNamesTheMethodUsed() {
        ReportSection section = DetectionLimitSection.build(List.of(manganese()));
        ReportTable summary = section.blocks().stream().filter(b -> b instanceof ReportBlock.Table)
                .map(b -> ((ReportBlock.Table) b).table()).filter(t -> t.id().startsWith("censored-summary"))
                .findFirst().orElseThrow();
        assertEquals("Kaplan–Meier", summary.columns().get(1));
        // USEPA (2009) Example 15-1: KM mean 19.867 (blank and missing row are not routine values).
        assertEquals("19.87", summary.rows().get(2).get(1));
        assertEquals("25", summary.rows().get(0).get(1));
        assertTrue(section.blocks().stream().anyMatch(b -> b instanceof ReportBlock.Callout c
                && c.text().contains("uses Kaplan–Meier")));
        assertTrue(section.blocks().stream().anyMatch(b -> b instanceof ReportBlock.Figure));
        assertEquals("Kaplan–Meier", section.headlines().get("Mn (ppb) summary method"));
    }
}
