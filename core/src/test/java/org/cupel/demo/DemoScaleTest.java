package org.cupel.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.List;
import org.junit.jupiter.api.Test;

class DemoScaleTest {

    @Test
    void batchSizesStayRealisticAtEveryScale() {
        assertEquals(100, DemoSettings.defaults().routinePerBatch());
        assertEquals(25, DemoSettings.defaults().batches());
        DemoSettings million = new DemoSettings(1_000_000, 1);
        assertEquals(800, million.routinePerBatch());
        assertEquals(1_250, million.batches());
        assertEquals(10, million.analytes().size());
        assertEquals(20, new DemoSettings(DemoSettings.MIN_SAMPLES, 1).routinePerBatch());
        assertEquals(25, new DemoSettings(DemoSettings.MIN_SAMPLES, 1).batches());
    }

    @Test
    void scaledProjectReportsTenAnalytesWithTheSameStructure() throws IOException {
        MemorySink sink = new MemorySink();
        DemoSummary summary = DemoGenerator.generate(new DemoSettings(20_000, 11), sink);
        DemoProjectFiles files = new DemoProjectFiles(sink);
        assertEquals(27, summary.labBatches());
        assertEquals(List.of("Au", "Ag", "Cu", "Pb", "Zn", "As", "Sb", "S", "Fe", "Mo"),
                summary.analytes().stream().map(DemoAnalyte::symbol).toList());
        assertEquals(40, files.catalog.size());
        for (String f : files.primaryFiles()) {
            assertEquals(11, files.headers.get(f).size(), f);
            assertTrue(files.labRows.get(f).size() <= 760 * 1.4, f);
        }
        for (PlantedProblem p : summary.planted()) {
            assertFalse(p.detail().isBlank());
            assertEquals(p.kind() == PlantedProblem.Kind.CRM_DRIFT, p.sampleIds().isEmpty(), p.kind().name());
        }
    }
}
