package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.demo.DemoGenerator;
import org.cupel.demo.DemoSettings;
import org.cupel.demo.DemoSummary;
import org.cupel.demo.PlantedProblem;
import org.cupel.ingest.ProjectLoader;
import org.cupel.project.Project;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The demo project's planted contaminated blank (docs/demo.md) is found, and its re-assay bracket is right. */
class DemoBlanksTest {
    @TempDir
    static Path dir;
    static DemoSummary summary;
    static Project project;
    static BatchReview review;

    @BeforeAll
    static void generate() throws IOException {
        summary = DemoGenerator.generate(DemoSettings.defaults(), path -> {
            Path p = dir.resolve(path);
            Files.createDirectories(p.getParent());
            return Files.newBufferedWriter(p);
        });
        project = ProjectLoader.load(dir);
        review = BatchReview.of(project, List.of());
    }

    private static PlantedProblem planted() {
        return summary.planted().stream().filter(p -> p.kind() == PlantedProblem.Kind.BLANK_CARRY_OVER)
                .findFirst().orElseThrow();
    }

    @Test
    void plantedBlankIsTheOnlyCarryOverFinding() {
        PlantedProblem p = planted();
        List<BlankResult> carry = review.blanks().carryOverFindings().stream()
                .filter(r -> r.observation().analyte().equals("Au")).toList();
        assertEquals(1, carry.size(), carry.toString());
        BlankResult r = carry.get(0);
        assertTrue(p.sampleIds().contains(r.observation().sampleId()), p + " vs " + r.observation());
        assertTrue(p.sampleIds().contains(r.observation().precedingId()), p + " vs " + r.observation());
        assertEquals(Verdict.FAIL, r.verdict().verdict());
        assertTrue(r.observation().precedingGrade().value() > 5, r.observation().toString());
    }

    @Test
    void reassayListNamesTheSamplesAfterTheBlankUpToTheNextPassingBlank() {
        BlankResult r = review.blanks().carryOverFindings().stream()
                .filter(x -> x.observation().analyte().equals("Au")).findFirst().orElseThrow();
        SampleTable t = project.samples();
        int blankRow = r.observation().row();
        // Walk the batch in run order, by hand, from the blank to the next Au blank that passed.
        BatchSequence seq = BatchSequence.of(t);
        int[] rows = seq.rows(seq.batchOf(blankRow));
        List<String> expected = new ArrayList<>();
        for (int k = seq.indexInBatch(blankRow) + 1; k < rows.length; k++) {
            int row = rows[k];
            if (t.role(row) == QcRole.BLANK && passedAu(row)) {
                break;
            }
            if (t.role(row) == QcRole.ROUTINE || t.role(row).isDuplicate() && t.role(row) != QcRole.LAB_REPEAT
                    && t.role(row) != QcRole.UMPIRE) {
                expected.add(t.id(row));
            }
        }
        assertFalse(expected.isEmpty());
        List<String> listed = review.reassay().entries().stream()
                .filter(e -> e.analyte().equals("Au") && e.triggeredBy().contains(r.observation().sampleId()))
                .map(ReassayEntry::sampleId).toList();
        assertEquals(expected, listed);
        // The routine sample the blank follows is not re-assayed because of the blank.
        assertFalse(listed.contains(r.observation().precedingId()));
    }

    private static boolean passedAu(int row) {
        return review.blanks().results().stream().anyMatch(b -> b.observation().row() == row
                && b.observation().analyte().equals("Au") && b.verdict().verdict() == Verdict.PASS);
    }

    @Test
    void batchOfThePlantedBlankFailsAndInsertionIsOnTarget() {
        BlankResult r = review.blanks().carryOverFindings().get(0);
        BatchVerdict v = review.verdicts().stream().filter(b -> b.batch().equals(r.observation().batch()))
                .findFirst().orElseThrow();
        assertEquals(Verdict.FAIL, v.verdict());
        // The demo inserts one CRM and one blank per 20 routine samples (docs/demo.md).
        InsertionRate crm = review.insertion().overall().rates().get(0);
        InsertionRate blank = review.insertion().overall().rates().get(1);
        assertFalse(crm.belowTarget(), crm.toString());
        assertFalse(blank.belowTarget(), blank.toString());
    }
}
