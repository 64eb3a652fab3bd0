package org.cupel.assay;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.LocalDate;
import org.junit.jupiter.api.Test;

class SampleTableTest {

    @Test
    void rowsKeepIdentityRoleAndBatch() {
        Batch b1 = new Batch("J-001", "Lab A", LocalDate.of(2025, 3, 1), "lab/J-001.csv");
        SampleTable.Builder t = SampleTable.builder();
        for (int i = 0; i < 3000; i++) {
            QcRole role = i % 20 == 0 ? QcRole.CRM : QcRole.ROUTINE;
            t.add("S" + i, b1, i + 1, role, role == QcRole.CRM ? "STD-1" : "",
                    new SourceLocation("lab/J-001.csv", i + 5, 0));
        }
        SampleTable table = t.build();
        assertEquals(3000, table.size());
        assertEquals(150, table.rowsWithRole(QcRole.CRM).length);
        assertEquals("STD-1", table.reference(20));
        assertEquals(b1, table.batch(2999));
        assertEquals(2999, table.rowOf("S2999").getAsInt());
        assertEquals("lab/J-001.csv:3004", table.source(2999).toString());
        assertArrayEquals(new int[] {0, 20}, java.util.Arrays.copyOf(table.rowsWithRole(QcRole.CRM), 2));
    }

    /** Every role's rows are those of that role in row order, each call a fresh array the caller may reorder. */
    @Test
    void rowsOfEachRoleAreFoundInRowOrderAndHandedOutAsCopies() {
        Batch b = new Batch("J", "", null, "f");
        QcRole[] roles = QcRole.values();
        SampleTable.Builder t = SampleTable.builder();
        java.util.Random random = new java.util.Random(7);
        for (int i = 0; i < 500; i++) {
            t.add("S" + i, b, i + 1, roles[random.nextInt(roles.length)], "", new SourceLocation("f", i + 2, 0));
        }
        SampleTable table = t.build();
        int total = 0;
        for (QcRole role : roles) {
            int[] expected = java.util.stream.IntStream.range(0, table.size()).filter(r -> table.role(r) == role)
                    .toArray();
            int[] rows = table.rowsWithRole(role);
            assertArrayEquals(expected, rows, role.name());
            java.util.Arrays.fill(rows, -1);
            assertArrayEquals(expected, table.rowsWithRole(role), role + ": a caller's change does not reach the table");
            total += expected.length;
        }
        assertEquals(500, total);
    }

    /**
     * The table takes the builder's arrays as they are (room for 100 rows, 3 used): it counts and searches the
     * rows added only, and the builder, whose arrays the table now holds, refuses any change.
     */
    @Test
    void aBuiltTableHoldsItsRowsOnlyAndItsBuilderTakesNoMore() {
        Batch b = new Batch("J", "", null, "f");
        SampleTable.Builder t = SampleTable.builder(100, null);
        t.add("S1", b, 1, QcRole.CRM, "STD-1", "f", 2);
        t.add("S2", b, 2, QcRole.ROUTINE, "", "f", 3);
        t.add("S3", b, 3, QcRole.CRM, "STD-2", "f", 4);
        SampleTable table = t.build();
        assertEquals(3, table.size());
        assertArrayEquals(new int[] {0, 2}, table.rowsWithRole(QcRole.CRM));
        assertEquals(0, table.rowsWithRole(QcRole.BLANK).length, "unused room is not a row of any role");
        assertEquals(-1, table.row("S9", 3), "a guess beyond the rows falls back to the index");
        assertThrows(IllegalStateException.class, () -> t.add("S4", b, 4, QcRole.ROUTINE, "", "f", 5));
        assertThrows(IllegalStateException.class, () -> t.setRole(0, QcRole.ROUTINE, ""));
        assertThrows(IllegalStateException.class, t::build);
        assertEquals(3, table.size());
        assertEquals(QcRole.CRM, table.role(0));
        assertEquals(-1, table.row("S4", -1), "the refused row was not indexed");
    }

    @Test
    void duplicateIdIsRefused() {
        SampleTable.Builder t = SampleTable.builder();
        Batch b = new Batch("J", "", null, "f");
        t.add("S1", b, 1, QcRole.ROUTINE, "", new SourceLocation("f", 2, 0));
        assertThrows(IllegalArgumentException.class,
                () -> t.add("S1", b, 2, QcRole.ROUTINE, "", new SourceLocation("f", 3, 0)));
    }

    @Test
    void idsNumberedByTheRegisterAndOwnIdsAreFoundAlike() {
        IdIndex register = new IdIndex(16);
        for (String id : new String[] {"R1", "R2", "R3"}) {
            register.add(id);
        }
        Batch b = new Batch("J", "", null, "f");
        SampleTable.Builder t = SampleTable.builder(8, register);
        assertEquals(0, t.addKnown(2, b, 1, QcRole.ROUTINE, "", "f", 2));
        assertEquals(1, t.add("X9", b, 2, QcRole.LAB_REPEAT, "R3", "f", 3));
        assertEquals(2, t.add("R1", b, 3, QcRole.ROUTINE, "", "f", 4));
        assertEquals(-1, t.rowOfKnown(1), "R2 has no lab row");
        assertEquals(2, t.rowOfKnown(0), "an ID added by text finds its register number");
        assertThrows(IllegalArgumentException.class, () -> t.add("R3", b, 4, QcRole.ROUTINE, "", "f", 5));
        assertThrows(IllegalArgumentException.class, () -> t.addKnown(0, b, 4, QcRole.ROUTINE, "", "f", 5));
        assertThrows(IllegalArgumentException.class, () -> t.add("X9", b, 4, QcRole.ROUTINE, "", "f", 5));
        SampleTable table = t.build();
        assertEquals(3, table.size());
        assertEquals("R3", table.id(0));
        assertEquals(1, table.rowOf("X9").getAsInt());
        assertEquals(0, table.row("R3", 1), "a wrong guess falls back to the index");
        assertEquals(1, table.row("X9", 1), "a right guess is taken");
        assertEquals(-1, table.row("R2", 0));
        assertEquals(-1, table.row("nope", 5), "a guess out of range is ignored");
    }
}
