package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code cupel duplicates --json} in proportion to a large pairs file: the flagged pairs listed per set are capped
 * (with the count of all, and all of them in {@code --flagged-csv}), and the Thompson–Howarth group points are
 * thinned to every k-th group above 1,000 groups.
 */
class DuplicatesOutputSizeCommandTest {
    @TempDir
    Path dir;

    private static String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = CupelCommand.run(args, new PrintWriter(out), new PrintWriter(err));
        return new String[] {out.toString(), err.toString(), Integer.toString(code)};
    }

    /**
     * 12,000 pulp pairs a = 1 + 0.001·i; b = 1.02·a (HARD = 0.02/2.02 = 0.99 %), except every 10th pair, b = 1.5·a
     * (HARD = 0.5/2.5 = 20 %, beyond the 10 % pulp limit): 1,200 pairs outside the HARD limit. The first ID is
     * "=1+1", which a spreadsheet would run as a formula. 12,000 pairs make 12,000 / 11 = 1,090 groups (10 pairs
     * dropped), listed every ⌈1,090 / 1,000⌉ = 2nd group: 545 points.
     */
    private Path pairs() throws Exception {
        StringBuilder sb = new StringBuilder("id,original,duplicate\n");
        for (int i = 0; i < 12_000; i++) {
            double a = 1 + 0.001 * i;
            double b = (i % 10 == 0 ? 1.5 : 1.02) * a;
            sb.append(i == 0 ? "=1+1" : "P" + i).append(',').append(String.format(Locale.ROOT, "%.4f,%.4f", a, b))
                    .append('\n');
        }
        Path f = dir.resolve("pairs.csv");
        Files.writeString(f, sb.toString());
        return f;
    }

    @Test
    void flaggedPairsAreCappedInTheJsonAndAllWrittenToTheCsv() throws Exception {
        Path f = pairs();
        Path csv = dir.resolve("out/flagged.csv");
        String[] r = run("duplicates", f.toString(), "--json", "--flagged-csv", csv.toString());
        assertEquals("0", r[2], r[1]);
        JsonNode set = new ObjectMapper().readTree(r[0]).get("analytes").get(0).get("sets").get(0);
        int total = set.get("outliersTotal").asInt();
        assertTrue(total >= 1200, "every 10th pair is outside the HARD limit: " + total);
        JsonNode listed = set.get("outliers");
        assertEquals(100, listed.size(), "the default --flagged-limit");
        assertTrue(set.get("outliersNote").asText().contains("the first 100 of " + total + " flagged pairs"),
                set.get("outliersNote").asText());
        assertTrue(set.get("outliersNote").asText().contains("all of them are in " + csv));

        List<String> lines = Files.readAllLines(csv);
        assertEquals("analyte,type,list,rank,id,original_id,batch,original,duplicate,hard,abs_difference,tests",
                lines.get(0));
        List<String> judged = lines.stream().filter(l -> l.contains(",judged_by_hard,")).toList();
        assertEquals(total, judged.size(), "the CSV holds every flagged pair");
        for (int i = 0; i < listed.size(); i++) {
            String[] c = judged.get(i).split(",");
            assertEquals(listed.get(i).get("id").asText(), c[4].replace("'", ""), "same order as the JSON, row " + i);
            assertEquals(listed.get(i).get("hard").asDouble(), Double.parseDouble(c[9]), 0.0);
        }
        double lowestListed = listed.get(listed.size() - 1).get("hard").asDouble();
        for (String l : judged.subList(listed.size(), judged.size())) {
            assertTrue(Double.parseDouble(l.split(",")[9]) <= lowestListed, "the listed pairs have the largest HARD");
        }
        assertTrue(lines.stream().anyMatch(l -> l.contains(",'=1+1,")), "formula-like ID neutralised: " + lines.get(1));
        assertTrue(Files.list(csv.getParent()).allMatch(p -> p.equals(csv)), "no temporary file left");
    }

    @Test
    void groupPointsAreThinnedAboveAThousandGroups() throws Exception {
        String[] r = run("duplicates", pairs().toString(), "--json", "--flagged-limit", "3");
        assertEquals("0", r[2], r[1]);
        JsonNode set = new ObjectMapper().readTree(r[0]).get("analytes").get(0).get("sets").get(0);
        assertEquals(3, set.get("outliers").size());
        assertTrue(set.get("outliersNote").asText().endsWith("--flagged-csv FILE writes them all"));
        JsonNode g = set.get("model").get("groups");
        assertEquals(1090, g.get("count").asInt());
        assertEquals(2, g.get("listedEvery").asInt());
        assertEquals(545, g.get("means").size());
        assertEquals(545, g.get("medianAbsDiff").size());
        assertEquals(10, g.get("dropped").asInt());
        // The lowest group holds the 11 lowest pair means: pairs 1..11 without pair 10 (whose mean is 1.25·a), and
        // pair 12: mean of a = (1.001 + … + 1.009 + 1.011 + 1.012)/11 = 11.068/11 = 1.006182, pair means 1.01·a, so
        // 1.01624 (b rounded to 4 decimals moves it by at most 0.00005); the points rise.
        assertEquals(1.01624, g.get("means").get(0).asDouble(), 0.0001);
        for (int i = 1; i < g.get("means").size(); i++) {
            assertTrue(g.get("means").get(i).asDouble() >= g.get("means").get(i - 1).asDouble());
        }
    }

    @Test
    void theInputFileIsNeverTheFlaggedCsv() throws Exception {
        Path f = pairs();
        long before = Files.size(f);
        String[] r = run("duplicates", f.toString(), "--flagged-csv", f.toString());
        assertEquals("2", r[2]);
        assertTrue(r[1].contains("this is the input file"), r[1]);
        assertEquals(before, Files.size(f));
    }
}
