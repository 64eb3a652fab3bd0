package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.cupel.assay.QcRole;
import org.cupel.config.CupelConfig;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class LabFileReaderTest {
    @TempDir
    Path dir;

    @Test
    void configMapsAnUnusualHeaderAndOtherColumnsAreListedAsIgnored() throws IOException {
        IngestSettings s = IngestSettings.from(CupelConfig.fromYaml("ingest:\n  columns: {Au1: \"Au g/t FA-AAS\"}\n",
                "cupel.yaml"));
        LabFile f = new LabFileReader(s).read(write("a.csv", "sample_id,Au1,Wt_kg\nA1,0.5,2.4\n"), "a.csv");
        assertEquals(1, f.columns().size());
        assertEquals("FA-AAS", f.columns().get(0).analyte().method());
        assertEquals(List.of("Wt_kg"), f.ignoredColumns());
    }

    @Test
    void roleColumnAndDecimalCommaSemicolonFile() throws IOException {
        IngestSettings s = IngestSettings.from(CupelConfig.fromYaml("ingest:\n  decimalComma: true\n", "c"));
        LabFile f = new LabFileReader(s).read(write("b.csv", "Sample;QC role;Reference;Au ppm\nA1;;;0,52\n"
                + "A2;STD;KRM-1;1,50\n"), "b.csv");
        assertEquals(0.52, f.rows().get(0).results().get(0).value().value().value(), 0.0);
        assertEquals(QcRole.CRM, f.rows().get(1).role());
        assertEquals("KRM-1", f.rows().get(1).reference());
        assertEquals(null, f.rows().get(0).role(), "no role: the register decides");
    }

    @Test
    void twoColumnsForTheSameAnalyteAndMethodAreAnInputError() throws IOException {
        Path p = write("c.csv", "sample_id,Au_ppm,Au (g/t)\nA1,1,1\n");
        InputException e = assertThrows(InputException.class, () -> new LabFileReader(IngestSettings.DEFAULTS)
                .read(p, "c.csv"));
        assertTrue(e.getMessage().startsWith("c.csv:1:3:"), e.getMessage());
    }

    @Test
    void aFileWithoutAnalyteColumnsIsAnInputError() throws IOException {
        Path p = write("d.csv", "sample_id,hole\nA1,H1\n");
        InputException e = assertThrows(InputException.class, () -> new LabFileReader(IngestSettings.DEFAULTS)
                .read(p, "d.csv"));
        assertTrue(e.getMessage().contains("no analyte column"));
    }

    @Test
    void dmyDatesWhenConfigured() throws IOException {
        IngestSettings s = IngestSettings.from(CupelConfig.fromYaml("ingest:\n  dateFormat: DMY\n", "c"));
        LabFile f = new LabFileReader(s).read(write("e.csv", "sample_id,date,Au_ppm\nA1,14/03/2025,1\n"), "e.csv");
        assertEquals("2025-03-14", f.batches().get(0).reported().toString());
        LabFile iso = new LabFileReader(IngestSettings.DEFAULTS).read(dir.resolve("e.csv"), "e.csv");
        assertEquals(1, iso.issues().size(), "a DMY date under the ISO setting is a warning");
    }

    @Test
    void positionColumnAndRowOrder() throws IOException {
        LabFile f = new LabFileReader(IngestSettings.DEFAULTS).read(write("g.csv",
                "sample_id,seq,Au_ppm\nA1,5,1\nA2,x,2\nA3,,3\n"), "g.csv");
        assertEquals(List.of(5, 2, 3), f.rows().stream().map(LabRow::position).toList());
        assertEquals(1, f.issues().size(), "the unreadable position is a warning");
    }

    private Path write(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p;
    }
}
