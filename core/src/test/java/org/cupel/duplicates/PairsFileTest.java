package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.cupel.assay.Qualifier;
import org.cupel.assay.QcRole;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PairsFileTest {
    @TempDir
    Path dir;

    @Test
    void readsCensoredValuesTypesAndReportsBadRows() throws Exception {
        Path f = dir.resolve("pairs.csv");
        Files.writeString(f, "id,batch,type,original,duplicate,dl\n"
                + "D1,J1,pulp,1.20,1.31,0.005\n"
                + "D2,J1,umpire,<0.005,0.007,0.005\n"
                + "D3,J2,pulp,abc,1.0,0.005\n"
                + "D4,J2,crm,1.0,1.0,0.005\n"
                + "D5,J2,,2.0,2.1,\n");
        PairsFile.Result r = PairsFile.read(f, QcRole.FIELD_DUPLICATE);
        assertEquals(3, r.pairs().size());
        assertEquals(QcRole.UMPIRE, r.pairs().get(1).type());
        assertEquals(Qualifier.BELOW_DETECTION, r.pairs().get(1).original().qualifier());
        assertEquals(0.005, r.pairs().get(0).original().limit());
        assertEquals(QcRole.FIELD_DUPLICATE, r.pairs().get(2).type());
        assertEquals(2, r.issues().size());
        assertTrue(r.issues().get(0).message().contains("pairs.csv:4:4"), r.issues().get(0).message());
        assertTrue(r.issues().get(1).message().contains("type"), r.issues().get(1).message());
    }

    @Test
    void missingValueColumnsAreAnInputError() throws Exception {
        Path f = dir.resolve("bad.csv");
        Files.writeString(f, "sample,value\nS1,1.0\n");
        InputException e = assertThrows(InputException.class, () -> PairsFile.read(f, QcRole.PULP_DUPLICATE));
        assertTrue(e.getMessage().contains("'original' and 'duplicate'"), e.getMessage());
    }
}
