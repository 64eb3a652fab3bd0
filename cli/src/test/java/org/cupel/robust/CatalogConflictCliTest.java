package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.cupel.cli.CliRun;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A later CRM certificate with the same CRM, analyte and method but a value ten times the first (issue 15, item
 * 11): on d55c4a7 it was listed only as "already certified" and the user was not told that the certificate in
 * use is in doubt. {@code cupel check} now warns on the row in use, naming both rows, the one used and the fix.
 */
class CatalogConflictCliTest {

    @Test
    void checkWarnsThatTheCertificateInUseIsInDoubt(@TempDir Path dir) throws IOException {
        Map<String, String> files = Map.of("lab/OAL-1.csv", FuzzTarget.LAB, "register.csv", FuzzTarget.REGISTER_CSV,
                "crm-catalog.csv", FuzzTarget.CATALOG_CSV + "KC-1,Au,g/t,4.12,0.18,4.044,4.196,FA-AAS\n");
        for (Map.Entry<String, String> e : files.entrySet()) {
            Files.createDirectories(dir.resolve(e.getKey()).getParent());
            Files.writeString(dir.resolve(e.getKey()), e.getValue());
        }
        CliRun check = CliRun.run("check", dir.toString(), "--json");
        assertEquals(0, check.code(), check.err());
        List<String> catalogIssues = new ArrayList<>();
        for (JsonNode i : new ObjectMapper().readTree(check.out()).get("exceptions")) {
            if (i.get("where").get("file").asText().equals("crm-catalog.csv")) {
                catalogIssues.add(i.get("severity").asText() + " " + i.get("where").get("line").asInt() + ": "
                        + i.get("problem").asText());
            }
        }
        String both = "crm-catalog.csv:2 gives 0.412 g/t (SD 0.018, FA-AAS) and crm-catalog.csv:4 gives 4.12 g/t "
                + "(SD 0.18, FA-AAS), 10× the first";
        assertEquals(List.of(
                "EXCLUDED 4: KC-1 Au is certified twice with different values: " + both
                        + "; line 2 is used and this row is left out",
                "WARNING 2: the certificate used for KC-1 Au is in doubt: " + both
                        + "; the KC-1 results are judged against line 2 until the catalog is corrected"),
                catalogIssues);
        assertTrue(check.out().contains("delete the wrong row of the catalog"), check.out());
    }
}
