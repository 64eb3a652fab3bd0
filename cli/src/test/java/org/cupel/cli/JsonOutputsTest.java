package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every JSON Cupel writes (each command's {@code --json}, and {@code summary.json}) writes a number that
 * could not be computed as {@code null}: no {@code "NaN"} or {@code "Infinity"} string and no bare NaN or
 * Infinity token (not JSON, RFC 8259 section 6) anywhere in the tree, on the demo project and on a
 * degenerate one (two duplicate pairs, every value below detection, one CRM and one blank, a single smelt).
 * No output carries a Java map's own text ({@code {a=1, b=2}}) either.
 */
class JsonOutputsTest {
    /** Reads the bare tokens too, so that a writer that emits them is caught rather than failing the parse. */
    private static final JsonMapper LENIENT = JsonMapper.builder()
            .enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS).build();
    /** A Java map's toString: "{key=value" inside braces. */
    static final Pattern MAP_TEXT = Pattern.compile("\\{[^{}\"]*?[A-Za-z_][\\w .-]*=[^{}]*}");

    @TempDir
    static Path dir;
    private static Path demo;
    private static Path degenerate;

    @BeforeAll
    static void projects() throws IOException {
        demo = dir.resolve("demo");
        CliRun.ok("demo", demo.toString());
        degenerate = dir.resolve("degenerate");
        write(degenerate.resolve("register.csv"), "sample_id,qc_role,reference\nS1,routine,\nS2,routine,\n"
                + "D1,field duplicate,S1\nD2,field duplicate,S2\nC1,CRM,LOW\nB1,blank,\n");
        write(degenerate.resolve("crm-catalog.csv"), "crm,analyte,unit,certified_value,sd\nLOW,Au,g/t,0.50,0.03\n");
        write(degenerate.resolve("lab/J1.csv"), "Job: J1\nDate reported: 2025-03-03\nSample ID,Au_g/t_FA-AAS\n"
                + "S1,<0.005\nS2,<0.005\nD1,<0.005\nD2,<0.005\nC1,<0.01\nB1,<0.005\n");
        write(degenerate.resolve("testwork/heads.csv"), "feed,replicate,Au_g/t\nF1,1,40\n");
        write(degenerate.resolve("testwork/smelts.csv"), "test_id,condition,feed,charge_g,product,mass_g,Au_g/t\n"
                + "T1,A,F1,50,button,20,95\nT1,A,F1,50,slag,30,<0.5\n");
        write(dir.resolve("censored.csv"), "Sample ID,Au_ppm\nS1,<0.005\nS2,<0.005\nS3,<0.01\n");
        write(dir.resolve("blanks-one.csv"), "sample_id,batch,position,preceding_id,Au_ppm,preceding_Au_ppm,dl_Au\n"
                + "BLK-001,J1,5,S-004,<0.005,<0.005,0.005\n");
    }

    private static void write(Path file, String text) throws IOException {
        Files.createDirectories(file.getParent());
        Files.writeString(file, text);
    }

    /** Every command with --json, on both projects (plain-file commands on files of each kind). */
    private static Map<String, String[]> runs() {
        Map<String, String[]> runs = new LinkedHashMap<>();
        for (Path p : List.of(demo, degenerate)) {
            String name = p.getFileName().toString();
            for (String command : List.of("check", "analyse", "batches", "crm", "duplicates")) {
                runs.put(command + " " + name, new String[] {command, p.toString(), "--json"});
            }
            runs.put("recovery " + name, new String[] {"recovery", p.resolve("testwork").toString(), "--json"});
        }
        Path lab = demo.resolve("lab").resolve("OAL-00001.csv");
        runs.put("censored demo", new String[] {"censored", lab.toString(), "--column", "Au_ppm_FA-AAS", "--json"});
        runs.put("dl-check demo", new String[] {"dl-check", lab.toString(), "--column", "Au_ppm_FA-AAS", "--json"});
        Path censored = dir.resolve("censored.csv");
        runs.put("censored degenerate", new String[] {"censored", censored.toString(), "--column", "Au_ppm", "--json"});
        runs.put("dl-check degenerate", new String[] {"dl-check", censored.toString(), "--column", "Au_ppm", "--json"});
        Path blanks = Path.of(System.getProperty("cupel.testdata"), "control-blanks", "blank-results.csv");
        runs.put("blanks demo", new String[] {"blanks", blanks.toString(), "--json"});
        runs.put("blanks degenerate", new String[] {"blanks", dir.resolve("blanks-one.csv").toString(), "--json"});
        return runs;
    }

    @Test
    void noJsonHoldsNaNOrInfinity() throws IOException {
        List<String> found = new ArrayList<>();
        for (Map.Entry<String, String[]> r : runs().entrySet()) {
            CliRun run = CliRun.run(r.getValue());
            int code = run.code();
            assertTrue(code == CupelCommand.OK || code == CupelCommand.QC_FAILED,
                    r.getKey() + " exit " + code + ": " + run.err());
            nonFinite(r.getKey(), LENIENT.readTree(run.out()), found);
            assertTrue(!MAP_TEXT.matcher(run.out()).find(), r.getKey() + " prints a map's text: "
                    + firstMatch(run.out()));
        }
        assertEquals(List.of(), found);
    }

    @Test
    void summaryJsonOfTheDegenerateProjectHoldsNoNaN() throws IOException {
        Path out = dir.resolve("degenerate-report");
        CliRun r = CliRun.run("report", degenerate.toString(), "--out", out.toString(), "--screen", "--quiet");
        assertTrue(r.code() == CupelCommand.OK || r.code() == CupelCommand.QC_FAILED, r.code() + " " + r.err());
        String json = Files.readString(out.resolve("summary.json"));
        List<String> found = new ArrayList<>();
        nonFinite("summary.json", LENIENT.readTree(json), found);
        assertEquals(List.of(), found);
        assertTrue(!MAP_TEXT.matcher(json).find(), firstMatch(json));
    }

    /** The text report of {@code cupel analyse} lists a group of headlines member by member. */
    @Test
    void analyseNamesEachMemberOfAGroup() {
        String text = CliRun.ok("analyse", demo.toString()).out();
        assertTrue(!MAP_TEXT.matcher(text).find(), firstMatch(text));
        assertTrue(text.lines().anyMatch(l -> l.contains("samplesByRole.crm") && l.strip().endsWith("125")), text);
        // The demo inserts 5 CRMs per 100 routine samples: 125 / 2,499 = 5.0 %.
        assertTrue(text.lines().anyMatch(l -> l.contains("insertionRatePercent.crm") && l.contains("5.0 %")), text);
        // The planted insufficient sample (PlantLog): one row of its own, members in order.
        assertTrue(text.lines().anyMatch(l -> l.contains("resubmit.1")
                && l.contains("VH0000502; OAL-00005; Au, Ag; IS; insufficient")), text);
    }

    @Test
    void theMapPatternFindsAMapsText() {
        assertTrue(MAP_TEXT.matcher("samplesByRole {routine=2499, crm=125}").find());
        assertTrue(MAP_TEXT.matcher("{a=1}").find());
        assertTrue(!MAP_TEXT.matcher("{ \"a\" : 1 }").find(), "JSON is not a map's text");
        assertTrue(!MAP_TEXT.matcher("r = 2.8·s_r").find());
    }

    private static String firstMatch(String text) {
        var m = MAP_TEXT.matcher(text);
        return m.find() ? m.group() : "";
    }

    /** Paths of every NaN or infinity, as a number token or as text. */
    static void nonFinite(String path, JsonNode node, List<String> out) {
        if (node.isObject()) {
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                nonFinite(path + "." + e.getKey(), e.getValue(), out);
            }
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                nonFinite(path + "[" + i + "]", node.get(i), out);
            }
        } else if (node.isNumber() && !Double.isFinite(node.doubleValue())) {
            out.add(path + " = " + node.asText());
        } else if (node.isTextual() && node.asText().matches("[+-]?(NaN|Infinity)")) {
            out.add(path + " = \"" + node.asText() + "\"");
        }
    }
}
