package org.cupel.report.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.cupel.ingest.ValueConventions;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.TestworkReader;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportSection;
import org.junit.jupiter.api.Test;

class TestworkSectionTest {

    @Test
    void sectionCarriesTablesChartsAndTheCaution() {
        Path dir = Path.of(System.getProperty("cupel.testdata", "../testdata"), "recovery", "testwork");
        RecoveryResult r = RecoveryAnalysis.run(TestworkReader.read(dir, RecoverySettings.DEFAULTS,
                ValueConventions.DEFAULTS), RecoverySettings.DEFAULTS);
        ReportSection s = TestworkSection.build(r);
        assertEquals(4, s.blocks().stream().filter(b -> b instanceof ReportBlock.Table).count());
        assertEquals(6, s.blocks().stream().filter(b -> b instanceof ReportBlock.Figure).count());
        ReportBlock.Callout caution = (ReportBlock.Callout) s.blocks().get(s.blocks().size() - 1);
        assertEquals(ReportBlock.Level.CAUTION, caution.level());
        assertTrue(caution.text().contains("29 CFR 1910.1025") && caution.text().contains("cupellation"));
        assertEquals(8, TestworkSection.recoveries(r).rows().size(), "4 conditions × 2 analytes");
        assertEquals(12, TestworkSection.comparisons(r).rows().size(), "6 pairs × 2 analytes");
        assertTrue(TestworkSection.comparisons(r).rows().stream().anyMatch(row -> row.get(8).startsWith("cannot tell")
                && row.get(10).endsWith("per condition")));
    }
}
