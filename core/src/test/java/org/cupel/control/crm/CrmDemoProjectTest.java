package org.cupel.control.crm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.cupel.control.Verdict;
import org.cupel.demo.DemoGenerator;
import org.cupel.demo.DemoSettings;
import org.cupel.ingest.ProjectLoader;
import org.cupel.project.Project;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The CRM problems planted by the demo generator (docs/demo.md, "Planted problems" 1 and 2) are found. */
class CrmDemoProjectTest {
    @TempDir
    static Path dir;
    static CrmReview review;

    @BeforeAll
    static void generate() throws IOException {
        DemoGenerator.generate(DemoSettings.defaults(), rel -> {
            Path p = dir.resolve(rel);
            Files.createDirectories(p.getParent());
            Writer w = Files.newBufferedWriter(p, StandardCharsets.UTF_8);
            return w;
        });
        Project project = ProjectLoader.load(dir);
        review = CrmReview.of(project);
    }

    @Test
    void drifting_VHC_23_isFoundByTrendCusumAndEwma() {
        SeriesReview s = review.series("VHC-23", "Au").orElseThrow();
        assertTrue(s.drift().drifting());
        assertTrue(s.drift().trend().slopeLow() > 0, "slope interval above zero");
        assertTrue(s.drift().cusum().firstSignal() >= 0);
        assertTrue(s.drift().ewma().firstSignal() >= 0);
        assertTrue(s.failures() > 0, "late batches fail");
        assertTrue(s.bias().meanLowPct() > 0 && !s.bias().certifiedInsideMeanInterval());
        // The drift starts at zero: the first results pass.
        assertEquals(Verdict.PASS, s.results().get(0).verdict());
        for (String other : List.of("VHC-11", "VHC-35", "VHC-48")) {
            SeriesReview o = review.series(other, "Au").orElseThrow();
            assertTrue(o.bias().certifiedInsideMeanInterval(), other + " is unbiased in the demo");
        }
    }

    @Test
    void swapped_VH0001006_isAProbableSwapWith_VHC_35_inBothAnalytes() {
        for (String analyte : List.of("Au", "Ag")) {
            SeriesReview s = review.series("VHC-11", analyte).orElseThrow();
            List<CrmResult> swaps = s.results().stream().filter(CrmResult::isSwap).toList();
            assertEquals(1, swaps.size(), analyte);
            CrmResult r = swaps.get(0);
            assertEquals("VH0001006", r.point().sampleId());
            assertEquals("OAL-00009", r.point().batchId());
            assertEquals("VHC-35", r.swapWith());
            assertEquals(Verdict.WARN, r.verdict());
            assertFalse(r.triggersReassay());
        }
        assertEquals(2, review.swaps());
    }
}
