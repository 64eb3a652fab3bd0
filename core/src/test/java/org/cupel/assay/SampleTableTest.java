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

    @Test
    void duplicateIdIsRefused() {
        SampleTable.Builder t = SampleTable.builder();
        Batch b = new Batch("J", "", null, "f");
        t.add("S1", b, 1, QcRole.ROUTINE, "", new SourceLocation("f", 2, 0));
        assertThrows(IllegalArgumentException.class,
                () -> t.add("S1", b, 2, QcRole.ROUTINE, "", new SourceLocation("f", 3, 0)));
    }
}
