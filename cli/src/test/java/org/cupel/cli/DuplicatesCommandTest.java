package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DuplicatesCommandTest {
    @TempDir
    Path dir;

    /** Invented pulp duplicates, 10 % relative SD, in two batches; batch J2 twice as noisy as J1. */
    private Path pairsCsv() throws Exception {
        Random random = new Random(3L);
        StringBuilder sb = new StringBuilder("id,batch,original,duplicate,dl\n");
        for (int i = 0; i < 120; i++) {
            double c = Math.exp(random.nextGaussian());
            double sd = (i < 60 ? 0.03 : 0.12) * c;
            sb.append(String.format(Locale.ROOT, "D%d,%s,%.3f,%.3f,0.005%n", i, i < 60 ? "J1" : "J2",
                    Math.abs(c + sd * random.nextGaussian()), Math.abs(c + sd * random.nextGaussian())));
        }
        sb.append("D999,J1,<0.005,0.006,0.005\n");
        Path f = dir.resolve("pairs.csv");
        Files.writeString(f, sb.toString());
        return f;
    }

    @Test
    void printsTheReadableTablesForAPairsFile() throws Exception {
        // --wide: the checks read whole lines.
        CliRun r = CliRun.run("duplicates", pairsCsv().toString(), "--analyte", "Au", "--unit", "g/t", "--wide");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Au (g/t): duplicate precision"), r.out());
        assertTrue(r.out().contains("pulp duplicate"), r.out());
        assertTrue(r.out().contains("Thompson–Howarth"), r.out());
        assertTrue(r.out().contains("batch J2: ") && r.out().contains("less precise than the set"), r.out());
        assertTrue(!r.out().contains("batch J1:"), r.out());
    }

    @Test
    void failOnQcExitsOneWhenABatchFails() throws Exception {
        assertEquals(1, CliRun.run("duplicates", pairsCsv().toString(), "--fail-on-qc").code());
    }

    @Test
    void jsonCarriesCountsAndExclusions() throws Exception {
        CliRun r = CliRun.run("duplicates", pairsCsv().toString(), "--json", "--dl-multiple", "5");
        assertEquals(0, r.code(), r.err());
        JsonNode doc = new ObjectMapper().readTree(r.out());
        JsonNode set = doc.get("analytes").get(0).get("sets").get(0);
        assertEquals(121, set.get("precision").get("pairs").asInt());
        assertEquals(1, set.get("precision").get("excludedRelative").get("BELOW_DETECTION").asInt());
        assertEquals(5.0, set.get("precision").get("limitMultiple").asDouble());
        assertTrue(set.get("model").get("thompsonHowarth").get("sigma0").has("ciLow"));
        assertTrue(set.get("pairs") == null, "pair values are not written to JSON");
    }

    @Test
    void writesCharts() throws Exception {
        Path charts = dir.resolve("charts");
        CliRun r = CliRun.run("duplicates", pairsCsv().toString(), "--charts", charts.toString());
        assertEquals(0, r.code(), r.err());
        // One pairs file, one analyte: its three figures (pairs, bias, precision), whatever the number of types.
        try (var files = Files.list(charts)) {
            assertEquals(java.util.Set.of("duplicates-value-pairs.png", "duplicates-value-bias.png",
                    "duplicates-value-precision.png"), files.map(f -> f.getFileName().toString())
                    .collect(java.util.stream.Collectors.toSet()));
        }
    }

    @Test
    void badInputGivesExitTwoAndAMessage() throws Exception {
        Path f = dir.resolve("wrong.csv");
        Files.writeString(f, "sample,value\nS1,1\n");
        CliRun r = CliRun.run("duplicates", f.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("'original' and 'duplicate'"), r.err());
        assertEquals(2, CliRun.run("duplicates", f.toString(), "--type", "crm").code());
    }

    @Test
    void runsOnTheDemoProjectAndFlagsThePoorPulpBatch() throws Exception {
        Path demo = dir.resolve("demo");
        assertEquals(0, CliRun.run("demo", demo.toString()).code());
        CliRun r = CliRun.run("duplicates", demo.toString(), "--analyte", "Au", "--type", "pulp", "--wide");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("less precise than the set"), r.out());
        assertEquals(2, CliRun.run("duplicates", demo.toString(), "--analyte", "Zn").code());
    }
}
