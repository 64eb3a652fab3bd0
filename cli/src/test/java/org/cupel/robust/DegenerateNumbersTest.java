package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.cupel.cli.CliRun;
import org.cupel.cli.CupelCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Guarantee 6 (issue 9): on degenerate inputs (one sample, all censored, zero mean, too few pairs for
 * Thompson–Howarth) no NaN or infinity reaches the --json output without an explanation beside it: an
 * object holding a non-finite number (or its "not computed" text) also holds a non-empty note, reason
 * or warning, or an enclosing object does. Since issue 17 every JSON writer writes such a number as null
 * (JsonOutputsTest); this test still reads the bare tokens and texts, so a writer that emits them again is
 * caught here too.
 */
class DegenerateNumbersTest {
    private static final JsonMapper LENIENT = JsonMapper.builder()
            .enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS).build();
    private static final Pattern EXPLAINS = Pattern.compile("(?i).*(note|reason|warning|caution|message|why).*");

    @Test
    void degeneratePlainFilesGiveNoUnexplainedNaN(@TempDir Path dir) throws IOException {
        List<String> unexplained = new ArrayList<>();
        Map<String, String[]> runs = new java.util.LinkedHashMap<>();
        Path one = write(dir, "one.csv", "Sample ID,Au_ppm\nS1,0.5\n");
        Path censored = write(dir, "censored.csv", "Sample ID,Au_ppm\nS1,<0.005\nS2,<0.005\nS3,<0.01\n");
        Path zeros = write(dir, "zeros.csv", "Sample ID,Au_ppm\nS1,0\nS2,0\nS3,0\nS4,0\n");
        runs.put("censored one", new String[] {"censored", one.toString(), "--column", "Au_ppm", "--json"});
        runs.put("censored all", new String[] {"censored", censored.toString(), "--column", "Au_ppm", "--json"});
        runs.put("censored zeros", new String[] {"censored", zeros.toString(), "--column", "Au_ppm", "--json"});
        Path pair = write(dir, "pair.csv", "id,batch,original,duplicate,dl\nD1,J1,0.5,0.48,0.005\n");
        Path zeroPairs = write(dir, "zp.csv", "id,batch,original,duplicate,dl\nD1,J1,0,0,0.005\nD2,J1,0,0,0.005\n");
        Path censoredPairs = write(dir, "cp.csv",
                "id,batch,original,duplicate,dl\nD1,J1,<0.005,<0.005,0.005\nD2,J1,<0.005,<0.005,0.005\n");
        runs.put("duplicates one", new String[] {"duplicates", pair.toString(), "--json"});
        runs.put("duplicates zeros", new String[] {"duplicates", zeroPairs.toString(), "--json"});
        runs.put("duplicates censored", new String[] {"duplicates", censoredPairs.toString(), "--json"});
        Path blanks = write(dir, "blanks.csv", "sample_id,batch,position,preceding_id,Au_ppm,preceding_Au_ppm,dl_Au\n"
                + "BLK-001,J1,5,S-004,<0.005,<0.005,0.005\n");
        runs.put("blanks one", new String[] {"blanks", blanks.toString(), "--json"});
        Path catalog = write(dir, "cat.csv", "crm,analyte,unit,certified_value,sd\nLOW,Au,g/t,0.50,0.03\n");
        Path crm = write(dir, "crm.csv", "crm,batch,position,date,Au_ppm\nLOW,J1,5,2025-03-03,<0.01\n");
        runs.put("crm one censored", new String[] {"crm", "--results", crm.toString(), "--catalog", catalog.toString(),
            "--json"});
        Path tw = dir.resolve("tw");
        write(tw, "heads.csv", "feed,replicate,Au_g/t\nF1,1,40\n");
        write(tw, "smelts.csv", "test_id,condition,feed,charge_g,product,mass_g,Au_g/t\n"
                + "T1,A,F1,50,button,20,95\nT1,A,F1,50,slag,30,1\n");
        runs.put("recovery one", new String[] {"recovery", tw.toString(), "--json"});
        for (Map.Entry<String, String[]> r : runs.entrySet()) {
            CliRun run = CliRun.run(r.getValue());
            int code = run.code();
            assertTrue(code != CupelCommand.INTERNAL_ERROR, r.getKey() + ": " + run.err());
            if (code == CupelCommand.OK || code == CupelCommand.QC_FAILED) {
                collect(r.getKey(), LENIENT.readTree(run.out()), false, unexplained);
            }
        }
        assertEquals(List.of(), unexplained);
    }

    private static Path write(Path dir, String name, String text) throws IOException {
        Files.createDirectories(dir);
        return Files.writeString(dir.resolve(name), text);
    }

    /** Paths of non-finite values with no explanation in their object or an enclosing one. */
    static void collect(String path, JsonNode node, boolean explained, List<String> out) {
        if (node.isObject()) {
            boolean here = explained || hasExplanation(node);
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                collect(path + "." + e.getKey(), e.getValue(), here, out);
            }
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                collect(path + "[" + i + "]", node.get(i), explained, out);
            }
        } else if (isNonFinite(node) && !explained && !notApplicable(path)) {
            out.add(path + " = " + node.asText());
        }
    }

    /**
     * The degrees of freedom of the Wilcoxon signed-rank test: a rank test has none, and the record
     * (TestResult) documents df as NaN for it; the test's name stands beside the field.
     */
    private static boolean notApplicable(String path) {
        return path.endsWith(".wilcoxon.df");
    }

    private static boolean isNonFinite(JsonNode n) {
        if (n.isNumber()) {
            return !Double.isFinite(n.doubleValue());
        }
        String t = n.asText();
        return n.isTextual() && (t.equals("NaN") || t.endsWith("Infinity"));
    }

    private static boolean hasExplanation(JsonNode object) {
        for (Map.Entry<String, JsonNode> e : object.properties()) {
            if (EXPLAINS.matcher(e.getKey()).matches() && !e.getValue().isNull()
                    && !(e.getValue().isTextual() && e.getValue().asText().isBlank())
                    && !(e.getValue().isArray() && e.getValue().isEmpty())) {
                return true;
            }
        }
        return false;
    }
}
