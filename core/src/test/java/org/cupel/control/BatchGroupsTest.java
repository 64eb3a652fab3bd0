package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.junit.jupiter.api.Test;

/**
 * Umpire-lab batches are told from primary batches by what they hold: umpire checks and nothing but controls
 * beside them. Expected groups are read off the run-order codes (R routine, C CRM, B blank, U umpire check,
 * P pulp duplicate).
 */
class BatchGroupsTest {

    @Test
    void batchesOfUmpireChecksAreGroupedByLabApartFromThePrimaryBatches() {
        SampleTable.Builder b = SampleTable.builder();
        add(b, "P1", "Primary Lab", "RRCRBRU");
        add(b, "U1", "Umpire Lab", "UUU");
        add(b, "P2", "Primary Lab", "RPRC");
        add(b, "U2", "Umpire Lab", "UCUB");
        add(b, "X1", "Second Umpire", "UU");
        add(b, "Q1", "Primary Lab", "CB");
        SampleTable t = b.build();
        BatchSequence seq = BatchSequence.of(t);
        List<BatchVerdict> verdicts = BatchVerdicts.judge(t, seq, List.of());
        BatchGroups g = BatchGroups.of(t, seq, verdicts);
        // P1 holds one umpire check among routine samples: a primary batch. Q1 holds only controls and no
        // umpire check: nothing marks it as an umpire batch, so it stays primary.
        assertEquals(List.of("P1", "P2", "Q1"), g.primary().stream().map(BatchVerdict::batch).toList());
        assertEquals(2, g.umpireLabs().size());
        UmpireLab first = g.umpireLabs().get(0);
        assertEquals("Umpire Lab", first.lab());
        assertEquals(List.of("U1", "U2"), first.batches().stream().map(BatchVerdict::batch).toList());
        // U1: 3 checks; U2: 2 checks beside a CRM and a blank.
        assertEquals(5, first.checkAssays());
        assertEquals(new UmpireLab("Second Umpire", List.of(verdicts.get(4)), 2), g.umpireLabs().get(1));
        assertEquals(3, g.umpireBatches());
    }

    @Test
    void aProjectWithoutUmpireChecksIsAllPrimary() {
        Sequences s = new Sequences().batch("J1", "RRCB").batch("J2", "RFR")
                .au("J1-3", AssayValue.detected(1, 0.005));
        SampleTable t = s.table();
        BatchSequence seq = BatchSequence.of(t);
        BatchGroups g = BatchGroups.of(t, seq, BatchVerdicts.judge(t, seq, List.of()));
        assertEquals(2, g.primary().size());
        assertEquals(List.of(), g.umpireLabs());
        assertEquals(0, g.umpireBatches());
    }

    @Test
    void verdictsMustMatchTheBatches() {
        SampleTable t = new Sequences().batch("J1", "RR").table();
        assertThrows(IllegalArgumentException.class, () -> BatchGroups.of(t, BatchSequence.of(t), List.of()));
    }

    private static void add(SampleTable.Builder b, String id, String lab, String code) {
        Batch batch = new Batch(id, lab, null, id + ".csv");
        for (int i = 0; i < code.length(); i++) {
            QcRole role = Sequences.role(code.charAt(i));
            b.add(id + "-" + (i + 1), batch, i + 1, role, "", new SourceLocation(id + ".csv", i + 2, 0));
        }
    }
}
