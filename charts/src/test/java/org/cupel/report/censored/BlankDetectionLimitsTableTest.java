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
import org.cupel.report.ReportTable;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;

/** The appendix's table of detection limits from the project's blanks: EPA MDL_b beside MDL_s, each defined. */
class BlankDetectionLimitsTableTest {

    /**
     * Seven blanks reading 1..7 ppb and three routine samples. By hand: mean 4, s = √(28/6) = 2.16025;
     * t(6, 0.99) = 3.14267 (40 CFR 136 App. B table 3.143); MDL_b = 4 + 3.14267·2.16025 = 10.789 (every blank
     * has a number); MDL_s = 6.789; 3·s = 6.481. Shown to 4 significant digits.
     */
    @Test
    void mdlBIncludesTheBlankMeanAndEveryLimitIsDefined() {
        SampleTable.Builder st = SampleTable.builder();
        Batch batch = new Batch("B1", "lab", null, "b.csv");
        AnalyteColumn.Builder col = AnalyteColumn.builder(new Analyte("Au", GradeUnit.PPB));
        for (int i = 1; i <= 10; i++) {
            QcRole role = i <= 7 ? QcRole.BLANK : QcRole.ROUTINE;
            int row = st.add("S" + i, batch, i, role, "", new SourceLocation("b.csv", i + 1, 0));
            col.add(row, new MethodValue("FA", AssayValue.detected(i <= 7 ? i : 100 * i, 0.5), null));
        }
        SampleTable samples = st.build();
        AnalyteCensoring a = AnalyteCensoring.of(col.build(samples.size(), MethodSelector.FIRST), samples,
                CensoredSettings.DEFAULTS);
        ReportTable t = DetectionLimitSection.build(List.of(a)).blocks().stream()
                .filter(b -> b instanceof ReportBlock.Table).map(b -> ((ReportBlock.Table) b).table())
                .filter(x -> x.id().equals("blank-detection-limits")).findFirst().orElseThrow();
        List<String> row = t.rows().get(0);
        assertEquals("Au (ppb)", row.get(0));
        assertEquals("7 (7 with a number, 0 below detection)", row.get(1));
        assertEquals("10.79", row.get(3));
        assertEquals("6.481", row.get(4));
        assertEquals("6.789", row.get(7));
        assertTrue(t.note().contains("It includes the blank mean") && t.note().contains("leaves out their mean")
                && t.note().contains("net levels above the blank mean"), t.note());
    }
}
