package org.cupel.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.util.List;
import java.util.Set;
import java.util.ArrayList;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.Batch;
import org.cupel.assay.MissingReason;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

class ProjectFilterTest {
    private final Project p = SmallProject.build();

    @Test
    void keepsOnlySelectedBatchesWithTheirValuesAndChoices() {
        Project f = ProjectFilter.batches(p, new BatchSelection(null, null, Set.of("JOB-2")));
        assertEquals(2, f.samples().size());
        assertEquals(List.of("JOB-2"), f.samples().batches().stream().map(Batch::id).toList());
        AnalyteColumn au = f.analytes().get("Au");
        int s4 = f.samples().rowOf("S4").getAsInt();
        assertEquals(14.2, au.number(s4), 0.0, "values are copied, not recomputed");
        assertEquals("FA-GRAV", au.method(s4));
        assertEquals("in range beats >10", au.selectionReason(s4));
        assertEquals(2, au.candidates(s4).size());
        assertEquals("S4", f.samples().reference(f.samples().rowOf("S5").getAsInt()));
    }

    @Test
    void keepsMissingReasons() {
        Project f = ProjectFilter.batches(p, b -> b.id().equals("JOB-3"));
        AnalyteColumn au = f.analytes().get("Au");
        assertEquals(MissingReason.INSUFFICIENT_SAMPLE, au.value(f.samples().rowOf("S6").getAsInt()).missingReason());
        assertEquals(MissingReason.NOT_ANALYSED, au.value(f.samples().rowOf("S7").getAsInt()).missingReason());
    }

    @Test
    void dropsIssuesOfSamplesLeftOutOnly() {
        Project f = ProjectFilter.batches(p, b -> b.id().equals("JOB-1"));
        // S4 (JOB-2) and S7 (JOB-3) are left out; S8 never reached the table; the file-level issue stays.
        assertEquals(List.of("S8", ""), f.exceptions().all().stream().map(DataIssue::sampleId).toList());
        assertEquals(p.files(), f.files());
    }

    @Test
    void datesBoundInclusivelyAndLeaveOutUndated() {
        BatchSelection march3 = new BatchSelection(LocalDate.of(2025, 3, 3), LocalDate.of(2025, 3, 3), Set.of());
        assertEquals(List.of("JOB-1"), ids(ProjectFilter.batches(p, march3)));
        BatchSelection since = new BatchSelection(LocalDate.of(2025, 3, 4), null, Set.of());
        assertEquals(List.of("JOB-2"), ids(ProjectFilter.batches(p, since)));
        assertEquals(List.of("JOB-1", "JOB-2", "JOB-3"), ids(ProjectFilter.batches(p, BatchSelection.ALL)));
        assertTrue(since.describe().contains("undated batches left out"));
    }

    @Test
    void anEmptyPeriodIsAnInputError() {
        assertThrows(InputException.class,
                () -> new BatchSelection(LocalDate.of(2025, 3, 9), LocalDate.of(2025, 3, 1), Set.of()));
    }

    /** Which of the three batches a selection keeps. */
    record Keep(boolean k1, boolean k2, boolean k3) {
    }

    /** Any selection and its complement partition the samples: none lost, none doubled. */
    @Test
    void selectionAndComplementPartitionTheSamples() {
        // Every one of the eight selections first (none and all included), then random ones.
        List<Gen<Keep>> all = new ArrayList<>();
        for (int m = 0; m < 8; m++) {
            all.add(Gen.constant(new Keep((m & 1) != 0, (m & 2) != 0, (m & 4) != 0)));
        }
        SeededTries.forAll(200, all, r -> new Keep(r.nextBoolean(), r.nextBoolean(), r.nextBoolean()), k -> {
            Set<String> keep = new java.util.HashSet<>();
            if (k.k1()) {
                keep.add("JOB-1");
            }
            if (k.k2()) {
                keep.add("JOB-2");
            }
            if (k.k3()) {
                keep.add("JOB-3");
            }
            Project in = ProjectFilter.batches(p, b -> keep.contains(b.id()));
            Project out = ProjectFilter.batches(p, b -> !keep.contains(b.id()));
            assertEquals(p.samples().size(), in.samples().size() + out.samples().size());
            assertEquals(ProjectSummary.of(p).analytes().get(0).belowDetection(),
                    ProjectSummary.of(in).analytes().get(0).belowDetection()
                            + ProjectSummary.of(out).analytes().get(0).belowDetection());
        });
    }

    private static List<String> ids(Project f) {
        return f.samples().batches().stream().map(Batch::id).toList();
    }
}
