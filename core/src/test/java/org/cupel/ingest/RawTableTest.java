package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class RawTableTest {
    private final RawTable table = new RawTable("f.csv", Map.of(), List.of("Sample ID", "QC_Role", "Au ppm"), 1,
            List.of(new RawRow(2, List.of("S1", "CRM"))));

    @Test
    void columnMatchingIgnoresCaseAndSeparators() {
        assertEquals(0, table.column("sample_id"));
        assertEquals(1, table.column("role", "qc-role"));
        assertEquals(2, table.column("AU_PPM"));
        assertEquals(-1, table.column("batch"));
    }

    @Test
    void locationsAreOneBased() {
        assertEquals("f.csv:2:3", table.at(table.rows().get(0), 2).toString());
        assertEquals("", table.rows().get(0).cell(2));
    }
}
