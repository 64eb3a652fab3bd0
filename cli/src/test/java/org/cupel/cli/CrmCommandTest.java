package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CrmCommandTest {
    private static final String CATALOG = "crm,analyte,unit,certified_value,sd\n"
            + "LOW,Au,g/t,0.50,0.03\nMID,Au,g/t,2.50,0.10\nHIGH,Au,g/t,6.80,0.25\n";
    /** Batch J3 has MID material in the LOW slot (a planted swap); J4 has a 1-3s failure on HIGH. */
    private static final String RESULTS = "crm,batch,position,date,Au_ppm\n"
            + "LOW,J1,5,2025-03-03,0.51\nMID,J1,15,2025-03-03,2.52\nHIGH,J1,25,2025-03-03,6.75\n"
            + "LOW,J2,5,2025-03-10,0.49\nMID,J2,15,2025-03-10,2.45\nHIGH,J2,25,2025-03-10,6.90\n"
            + "LOW,J3,5,2025-03-17,2.48\nMID,J3,15,2025-03-17,2.55\nHIGH,J3,25,2025-03-17,6.70\n"
            + "LOW,J4,5,2025-03-24,0.50\nMID,J4,15,2025-03-24,2.49\nHIGH,J4,25,2025-03-24,7.70\n"
            + "LOW,J5,5,2025-03-31,<0.01\nZZ-9,J5,15,2025-03-31,1.10\n";

    private static Path[] files(Path dir) throws IOException {
        Path results = Files.writeString(dir.resolve("crm-results.csv"), RESULTS);
        Path catalog = Files.writeString(dir.resolve("crm-catalog.csv"), CATALOG);
        return new Path[] {results, catalog};
    }

    @Test
    void plainModePrintsTablesWithSwapFailureAndExceptions(@TempDir Path dir) throws IOException {
        Path[] f = files(dir);
        CliRun r = CliRun.run("crm", "--results", f[0].toString(), "--catalog", f[1].toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("1 failures, 0 warnings, 1 probable swaps, 2 exceptions"), r.out());
        assertTrue(r.out().contains("probable swap with MID"), r.out());
        assertTrue(r.out().contains("1-3s"), r.out());
        assertTrue(r.out().contains("unknown CRM code 'ZZ-9'"), r.out());
    }

    @Test
    void aCatalogAnalyteTheResultsLackIsLeftOutNotACrash(@TempDir Path dir) throws IOException {
        // The catalog certifies Ag as well; the results file has Au only. Before the fix: exit 3
        // (NullPointerException in CrmData). The Au review is unchanged by the extra certificates.
        Path results = Files.writeString(dir.resolve("crm-results.csv"), RESULTS);
        Path catalog = Files.writeString(dir.resolve("crm-catalog.csv"), CATALOG
                + "LOW,Ag,ppm,3.8,0.3\nMID,Ag,ppm,11.4,0.6\nOTHER,Cu,%,0.2,0.008\n");
        CliRun r = CliRun.run("crm", "--results", results.toString(), "--catalog", catalog.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("12 results in 3 series: 1 failures, 0 warnings, 1 probable swaps, 2 exceptions"),
                r.out());
        assertTrue(!r.out().contains("Ag ("), "no Ag series: " + r.out());
        CliRun json = CliRun.run("crm", "--results", results.toString(), "--catalog", catalog.toString(), "--json");
        assertEquals(0, json.code(), json.err());
        assertEquals(3, new ObjectMapper().readTree(json.out()).get("series").size());
    }

    @Test
    void aSingleFiveSdResultIsReportedAsAnOutlierNotDrift(@TempDir Path dir) throws IOException {
        // LOW (0.50 ± 0.03) over 30 batches alternating 0.509 / 0.491 (z ±0.3), batch 16 at 0.65 (z +5). The
        // EWMA (λ 0.2) jumps to about 1.03 against a limit of 1.00 at that result: drift before the outlier rule.
        StringBuilder csv = new StringBuilder("crm,batch,position,Au_ppm\n");
        for (int i = 1; i <= 30; i++) {
            String v = i == 16 ? "0.65" : i % 2 == 1 ? "0.509" : "0.491";
            csv.append("LOW,J").append(String.format("%02d", i)).append(",1,").append(v).append('\n');
        }
        Path results = Files.writeString(dir.resolve("spike.csv"), csv.toString());
        Path catalog = Files.writeString(dir.resolve("crm-catalog.csv"), CATALOG);
        CliRun r = CliRun.run("crm", "--results", results.toString(), "--catalog", catalog.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Outlier, LOW Au: line 17 (batch J16, result 16, z = +5"), r.out());
        assertTrue(!r.out().contains("Drift, "), r.out());
        JsonNode drift = new ObjectMapper().readTree(CliRun.run("crm", "--results", results.toString(), "--catalog",
                catalog.toString(), "--json").out()).get("series").get(0).get("drift");
        assertEquals(false, drift.get("drifting").asBoolean());
        assertEquals(16, drift.get("outliers").get(0).get("result").asInt());
    }

    @Test
    void jsonModeFollowsDocumentedSchema(@TempDir Path dir) throws IOException {
        Path[] f = files(dir);
        CliRun r = CliRun.run("crm", "--results", f[0].toString(), "--catalog", f[1].toString(), "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals("cupel-crm/1", j.get("schema").asText());
        assertEquals(1, j.get("summary").get("swaps").asInt());
        JsonNode low = j.get("series").get(0);
        assertEquals("LOW", low.get("crm").asText());
        assertEquals("MID", low.get("results").get(2).get("swapWith").asText());
        assertEquals("WARN", low.get("results").get(2).get("verdict").asText());
        assertTrue(low.get("bias").get("meanBiasCiPct").isArray());
        assertEquals(2, j.get("exceptions").size());
    }

    @Test
    void failOnQcAndChartsAndInputErrors(@TempDir Path dir) throws IOException {
        Path[] f = files(dir);
        Path charts = dir.resolve("charts");
        CliRun r = CliRun.run("crm", "--results", f[0].toString(), "--catalog", f[1].toString(), "--fail-on-qc",
                "--charts", charts.toString());
        assertEquals(CupelCommand.QC_FAILED, r.code(), r.err());
        assertTrue(Files.exists(charts.resolve("crm-LOW-Au.png")));
        assertTrue(Files.exists(charts.resolve("crm-z-Au.png")));
        assertTrue(Files.exists(charts.resolve("crm-bias-Au.png")));
        CliRun missing = CliRun.run("crm", "--results", f[0].toString());
        assertEquals(CupelCommand.INPUT_ERROR, missing.code());
        assertTrue(missing.err().contains("--catalog"), missing.err());
        Files.writeString(f[0], "crm,batch,date,Au_ppm\nLOW,J1,03/03/2025,0.5\n");
        CliRun badDate = CliRun.run("crm", "--results", f[0].toString(), "--catalog", f[1].toString());
        assertEquals(CupelCommand.INPUT_ERROR, badDate.code());
        assertTrue(badDate.err().contains(":2:3: date '03/03/2025' is not an ISO date"), badDate.err());
    }

    @Test
    void projectModeReadsAFolder() {
        Path messy = Path.of(System.getProperty("cupel.testdata"), "fixtures", "ingest", "messy-project");
        CliRun r = CliRun.run("crm", messy.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("KRM-99"), r.out());
    }
}
