package org.cupel.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.cupel.assay.Qualifier;
import org.cupel.ingest.ValueConventions;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TestworkReaderTest {
    private static final String HEADS = "feed,replicate,Au_g/t,Ag_g/t\nF1,1,863,41\nF1,2,861,<0.5\n";

    private static Testwork read(Path dir, String heads, String smelts) throws IOException {
        Files.createDirectories(dir.resolve("testwork"));
        Files.writeString(dir.resolve("testwork/heads.csv"), heads);
        Files.writeString(dir.resolve("testwork/smelts.csv"), smelts);
        return TestworkReader.read(dir, RecoverySettings.DEFAULTS, ValueConventions.DEFAULTS);
    }

    @Test
    void longFormatGroupsProductsBySmelt(@TempDir Path dir) throws IOException {
        Testwork t = read(dir, HEADS, "test_id,condition,replicate,feed,charge_g,product,product_role,mass_g,Au_g/t,Ag_g/t\n"
                + "T1,A,1,F1,100,button,collected,40,2148,95\n"
                + "T1,A,1,F1,100,slag,loss,260,1.31,<0.2\n"
                + "T2,A,2,F1,100,bead,,38,2200,97\n"
                + "T2,A,2,F1,100,matte,,12,15,3\n");
        assertEquals(java.util.List.of("Au", "Ag"), t.analytes());
        assertEquals(2, t.smelts().size());
        assertEquals(2, t.heads("F1", "Au").size());
        assertEquals(Qualifier.BELOW_DETECTION, t.heads("F1", "Ag").get(1).qualifier());
        Smelt t2 = t.smelts().get(1);
        assertEquals(ProductRole.COLLECTED, t2.products().get(0).role(), "bead is collected by name");
        assertEquals(ProductRole.LOSS, t2.products().get(1).role(), "matte is a loss by name");
        assertEquals(1.31, t.smelts().get(0).products().get(1).grade("Au").value(), 1e-12);
    }

    /** Wide and long formats of the same smelts give the same products; kg and oz/st are converted exactly. */
    @Test
    void wideFormatWithOtherUnitsMatchesLong(@TempDir Path dir) throws IOException {
        Testwork wide = read(dir, HEADS, "test_id,condition,replicate,feed,charge_kg,button_g,button_Au_oz/st,"
                + "slag_g,slag_Au_g/t\nT1,A,1,F1,0.1,40,62.65,260,1.31\n");
        Smelt s = wide.smelts().get(0);
        assertEquals(100, s.chargeGrams(), 1e-12);
        assertEquals(2, s.products().size());
        assertEquals("button", s.products().get(0).name());
        assertEquals(ProductRole.COLLECTED, s.products().get(0).role());
        assertEquals(62.65 * 240 / 7, s.products().get(0).grade("Au").value(), 1e-9);
        assertEquals(ProductRole.LOSS, s.products().get(1).role());
    }

    /** A lab duplicate (label ending -LD) is averaged with its original: one pulp, one replicate. */
    @Test
    void labDuplicateOfAHeadIsAveragedWithItsOriginal(@TempDir Path dir) throws IOException {
        Testwork t = read(dir, "feed,replicate,Au_g/t\nF1,1,300\nF1,2,310\nF1,2-LD,314\n",
                "test_id,condition,feed,charge_g,product,mass_g,Au_g/t\nT1,A,F1,50,button,30,500\n");
        assertEquals(2, t.heads("F1", "Au").size());
        assertEquals(312, t.heads("F1", "Au").get(1).value(), 1e-12);
    }

    /** recovery.productRoles overrides the role implied by the name (a speiss kept as collected, say). */
    @Test
    void productRolesSettingOverridesTheName(@TempDir Path dir) throws IOException {
        Files.createDirectories(dir.resolve("testwork"));
        Files.writeString(dir.resolve("testwork/heads.csv"), HEADS);
        Files.writeString(dir.resolve("testwork/smelts.csv"), "test_id,condition,feed,charge_g,button_g,button_Au_g/t,"
                + "speiss_g,speiss_Au_g/t\nT1,A,F1,100,40,2000,5,600\n");
        RecoverySettings settings = RecoverySettings.withDefaults()
                .productRoles(java.util.Map.of("speiss", "collected")).build();
        Testwork t = TestworkReader.read(dir, settings, ValueConventions.DEFAULTS);
        assertEquals(ProductRole.COLLECTED, t.smelts().get(0).products().get(1).role());
    }

    @Test
    void missingColumnNamesFileAndFix(@TempDir Path dir) {
        InputException e = assertThrows(InputException.class, () -> read(dir, HEADS,
                "test_id,condition,feed,product,mass_g,Au_g/t\nT1,A,F1,button,40,2148\n"));
        assertTrue(e.getMessage().contains("smelts.csv") && e.getMessage().contains("charge_g"), e.getMessage());
    }

    @Test
    void badMassExcludesTheSmeltWithLocation(@TempDir Path dir) throws IOException {
        Testwork t = read(dir, HEADS, "test_id,condition,feed,charge_g,product,mass_g,Au_g/t\n"
                + "T1,A,F1,100,button,forty,2148\nT2,A,F1,100,button,40,2148\n");
        assertEquals(1, t.smelts().size());
        assertTrue(t.issues().stream().anyMatch(i -> i.message().contains("smelts.csv:2:6")
                && i.message().contains("forty")), t.issues().toString());
    }
}
