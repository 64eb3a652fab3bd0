package org.cupel.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.cupel.control.BlankReport;
import org.cupel.control.BlankResult;
import org.cupel.control.BlankReview;
import org.cupel.control.Verdict;
import org.cupel.control.crm.CrmResult;
import org.cupel.control.crm.CrmReview;
import org.cupel.control.crm.SeriesReview;
import org.cupel.assay.QcRole;
import org.cupel.demo.PlantedProblem.Kind;
import org.cupel.duplicates.BatchPrecision;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSetResult;
import org.cupel.duplicates.DuplicateSettings;
import org.cupel.duplicates.PairExtraction;
import org.cupel.ingest.ProjectLoader;
import org.cupel.project.Project;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * End to end: the CRM, blank and duplicate reviews, with their default settings, find the planted CRM
 * drift, CRM swap, blank carry-over and poor pulp precision of the default demo project, and nothing else
 * of the same kind.
 */
class DemoControlFindingsTest {

    @TempDir
    static Path dir;
    private static DemoSummary summary;
    private static Project project;

    @BeforeAll
    static void load() throws IOException {
        summary = DemoOnDisk.write(dir);
        project = ProjectLoader.load(dir);
    }

    private static List<String> planted(Kind kind) {
        return summary.planted(kind).sampleIds();
    }

    @Test
    void onlyTheDriftingCrmFailsAndItIsFlaggedAsDrifting() {
        CrmReview review = CrmReview.of(project);
        for (SeriesReview s : review.series()) {
            boolean planted = s.crm().equals(DemoCrm.DRIFTING) && s.analyte().name().equals("Au");
            assertEquals(planted, s.drift().drifting(), s.crm() + " " + s.analyte().name());
            assertEquals(planted, s.failures() > 0, s.crm() + " " + s.analyte().name() + " failures " + s.failures());
        }
    }

    @Test
    void theSwappedCrmIsTheOnlyProbableSwapAndPointsAtTheRightMaterial() {
        List<String> swaps = new ArrayList<>();
        for (SeriesReview s : CrmReview.of(project).series()) {
            for (CrmResult r : s.results()) {
                if (r.swapWith() != null && !r.swapWith().isEmpty()) {
                    swaps.add(r.point().sampleId() + " " + s.analyte().name());
                    assertEquals(DemoCrm.SWAP_ACTUAL, r.swapWith());
                }
            }
        }
        String id = planted(Kind.CRM_SWAP).get(0);
        assertEquals(List.of(id + " Au", id + " Ag"), swaps);
    }

    @Test
    void theContaminatedBlankIsTheOnlyFailedBlankAndACarryOverFinding() {
        BlankReport report = BlankReview.review(project);
        String blank = planted(Kind.BLANK_CARRY_OVER).get(0);
        for (BlankResult r : report.results()) {
            if (r.verdict().verdict() == Verdict.FAIL) {
                assertEquals(blank, r.observation().sampleId(), r.toString());
            }
        }
        assertTrue(report.carryOverFindings().stream().anyMatch(r -> r.observation().sampleId().equals(blank)));
        assertTrue(report.carryOverFindings().stream().allMatch(r -> r.observation().sampleId().equals(blank)));
    }

    @Test
    void thePoorPulpBatchIsTheOnlyPulpBatchLessPreciseThanTheSet() {
        DuplicateReport gold = PairExtraction.analyse(project, DuplicateSettings.DEFAULTS).stream()
                .filter(r -> r.analyte().equals("Au")).findFirst().orElseThrow();
        DuplicateSetResult pulp = gold.sets().stream().filter(s -> s.type() == QcRole.PULP_DUPLICATE)
                .findFirst().orElseThrow();
        String poor = summary.planted().stream().filter(p -> p.kind() == Kind.POOR_PULP_PRECISION).findFirst()
                .orElseThrow().where().replace("lab/", "").replace(".csv", "");
        List<String> lessPrecise = pulp.batches().stream().filter(BatchPrecision::lessPrecise)
                .map(BatchPrecision::batch).toList();
        assertEquals(List.of(poor), lessPrecise);
    }
}
