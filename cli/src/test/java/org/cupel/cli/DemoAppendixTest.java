package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every planted problem of the demo project (docs/demo.md, "Planted problems") shows where a reviewer of the
 * QC appendix looks for it: the CSV table of its section and summary.json. The planted IDs are facts of the
 * demo generator (default seed), not of the analyses, so these are checks against outside facts.
 * The report runs once for the class, at screen resolution to keep it cheap.
 */
class DemoAppendixTest {
    @TempDir
    static Path dir;
    private static Path qc;
    private static String runErrors;

    @BeforeAll
    static void writeTheDemoAppendix() {
        qc = dir.resolve("qc");
        CliRun r = CliRun.run("report", "--demo", "--out", qc.toString(), "--screen", "--quiet");
        runErrors = r.code() + " " + r.err();
        assertEquals(0, r.code(), runErrors);
    }

    private static List<String> table(String name) throws IOException {
        return Files.readAllLines(qc.resolve("tables").resolve(name), StandardCharsets.UTF_8);
    }

    private static List<String> rows(String name, String... needles) throws IOException {
        return table(name).stream().filter(line -> {
            for (String n : needles) {
                if (!line.contains(n)) {
                    return false;
                }
            }
            return true;
        }).collect(Collectors.toList());
    }

    private static String json() throws IOException {
        return Files.readString(qc.resolve("summary.json"));
    }

    // Planted problem 1: VHC-23 Au drifts to +4 SD; late batches fail.
    @Test
    void theDriftingCrmFailsAndIsFoundDrifting() throws IOException {
        List<String> drift = rows("crm-drift.csv", "VHC-23,Au,");
        assertEquals(1, drift.size(), String.join("\n", table("crm-drift.csv")));
        assertTrue(drift.get(0).contains("read high"), drift.get(0));
        for (String other : new String[] {"VHC-11,Au,", "VHC-35,Au,", "VHC-48,Au,"}) {
            assertTrue(rows("crm-drift.csv", other).get(0).endsWith(",none"), other + " is not planted to drift");
        }
        assertTrue(!rows("crm-violations.csv", "VHC-23,Au,", ",fail,").isEmpty());
        assertTrue(rows("crm-violations.csv", ",fail,").stream().allMatch(r -> r.startsWith("VHC-23,Au,")),
                "only VHC-23 Au fails: " + String.join("\n", rows("crm-violations.csv", ",fail,")));
        for (String late : new String[] {"OAL-00020", "OAL-00021", "OAL-00022", "OAL-00023", "OAL-00024",
            "OAL-00025"}) {
            List<String> verdict = rows("batch-verdicts.csv", late + ",");
            assertTrue(verdict.get(0).contains(",fail,") && verdict.get(0).contains("VHC-23"), verdict.get(0));
        }
        assertTrue(json().contains("\"crmDriftingSeries\" : 1"), "summary.json counts the drifting series");
    }

    // Planted problem 2: VH0001006 labelled VHC-11 carries VHC-35 material.
    @Test
    void theSwappedCrmIsAProbableSwapNotALabFailure() throws IOException {
        List<String> swaps = rows("crm-swaps.csv", "VH0001006,OAL-00009,VHC-11,");
        assertEquals(2, swaps.size(), "Au and Ag: " + String.join("\n", table("crm-swaps.csv")));
        assertTrue(swaps.stream().allMatch(s -> s.contains(",VHC-35,") && s.contains("not a lab failure")));
        assertTrue(rows("crm-violations.csv", "VH0001006").isEmpty(), "a swap is not a rule violation");
        assertTrue(rows("batch-verdicts.csv", "OAL-00009,").get(0).contains("probable swap"));
        assertTrue(!rows("batch-verdicts.csv", "OAL-00009,").get(0).contains(",fail,"));
        assertTrue(rows("reassay-list.csv", "OAL-00009,").isEmpty(), "a swap asks for the insertion record, not re-assay");
        assertTrue(json().contains("\"crmSwaps\" : 2"));
    }

    // Planted problem 3: blank VH0001397 at 0.208 g/t Au after the 8.95 g/t VH0001396.
    @Test
    void theContaminatedBlankFailsItsBatchAndListsTheSamplesAfterIt() throws IOException {
        List<String> blank = rows("blank-findings.csv", "VH0001397,OAL-00012,", ",Au,");
        assertEquals(1, blank.size());
        assertTrue(blank.get(0).contains(",fail,") && blank.get(0).contains("VH0001396")
                && blank.get(0).endsWith(",yes"), "fails as carry-over after VH0001396: " + blank.get(0));
        assertTrue(rows("blank-findings.csv", ",fail,").size() == 1, "only the planted blank fails");
        assertTrue(rows("batch-verdicts.csv", "OAL-00012,").get(0).contains(",fail,"));
        for (String after : new String[] {"VH0001398", "VH0001399", "VH0001400"}) {
            assertEquals(1, rows("reassay-list.csv", after + ",OAL-00012,", ",Au,", "VH0001397").size(), after);
        }
        assertTrue(rows("reassay-list.csv", "VH0001396,").isEmpty(), "the sample before the blank is not re-assayed");
        assertTrue(json().contains("\"blankCarryOver\" : 1") && json().contains("\"blankFailures\" : 1"));
    }

    // Planted problem 4: OAL-00016's pulp duplicates have log SD 0.42 instead of 0.07.
    @Test
    void thePoorPulpPrecisionBatchIsFlagged() throws IOException {
        List<String> flagged = rows("duplicates-batches-Au.csv", "less precise than the set");
        assertEquals(List.of("OAL-00016,pulp duplicate"),
                flagged.stream().map(r -> r.substring(0, r.indexOf(",", r.indexOf(",") + 1))).collect(Collectors.toList()),
                "only the planted batch and type: " + String.join("\n", flagged));
    }

    // Planted problem 5: 7 Au and 4 Ag over-limit values, each re-assayed by FA-GRAV.
    @Test
    void theGravimetricReassaysAreCountedByMethod() throws IOException {
        assertTrue(rows("detection-limits.csv", "Au (ppm)", "FA-GRAV: 7").size() == 1,
                String.join("\n", table("detection-limits.csv")));
        assertTrue(rows("detection-limits.csv", "Ag (ppm)", "FA-GRAV: 4").size() == 1);
    }

    // Planted problems 6-8: the three data exceptions, each with file and line.
    @Test
    void theDataExceptionsNameFileLineAndValue() throws IOException {
        assertEquals(1, rows("data-exceptions.csv", "lab/OAL-00014.csv,", "VH0001635", "already on line").size());
        assertEquals(1, rows("data-exceptions.csv", "lab/OAL-00019.csv,", ",2,VH0002273,O.317,").size());
        assertEquals(1, rows("data-exceptions.csv", "register.csv,", "VH0000644", "not received").size());
        assertEquals(4, table("data-exceptions.csv").size(), "header and exactly the three planted exceptions");
        assertTrue(json().contains("\"excluded\" : 3"));
    }

    // Planted codes: three samples IS, two NR (PlantLog). The summary opens the page and the PDF, and the
    // samples to re-submit are in their own table with the lab's code.
    @Test
    void theSummaryComesFirstAndTheSamplesToResubmitHaveTheirTable() throws IOException {
        String html = Files.readString(qc.resolve("index.html"));
        int first = html.indexOf("<section id=\"");
        assertTrue(html.startsWith("<section id=\"s-summary\">", first), html.substring(first, first + 60));
        String[][] planted = {{"VH0000502", "OAL-00005", "IS"}, {"VH0000898", "OAL-00008", "NR"},
            {"VH0001650", "OAL-00014", "IS"}, {"VH0002252", "OAL-00019", "NR"}, {"VH0002769", "OAL-00023", "IS"}};
        for (String[] p : planted) {
            assertEquals(1, rows("resubmit-list.csv", p[0] + "," + p[1] + ",", "," + p[2] + ",").size(), p[0]);
        }
        assertEquals(planted.length + 1, table("resubmit-list.csv").size(), "header and the five planted samples");
        assertTrue(json().contains("\"summary\" : {"), "summary.json has the summary's headlines");
    }

    // Numbers as the trade writes them (issue 17).

    /**
     * The demo catalog certifies VHC-23 Au at 1.236 g/t with SD 0.047 (crm-catalog.csv); hand-worked limits:
     * 1.236 ± 2 × 0.047 = 1.142 to 1.330, ± 3 × 0.047 = 1.095 to 1.377, all exact at three decimals. Au is
     * reported in ppm (most demo files say ppm), equal to g/t.
     */
    @Test
    void certifiedValuesAndLimitsAreAtTheCertificatesPrecision() throws IOException {
        assertEquals("crm,analyte,unit,certified,certificate_sd,warning_limit_low,warning_limit_high,"
                + "failure_limit_low,failure_limit_high", table("crm-certificates.csv").get(0));
        assertEquals(List.of("VHC-23,Au,ppm,1.236,0.047,1.142,1.330,1.095,1.377"), rows("crm-certificates.csv",
                "VHC-23,Au,"));
        // Ag of VHC-23: 11.4 ± 0.6, one decimal throughout.
        assertEquals(List.of("VHC-23,Ag,ppm,11.4,0.6,10.2,12.6,9.6,13.2"), rows("crm-certificates.csv",
                "VHC-23,Ag,"));
        assertTrue(rows("crm-summary.csv", "VHC-23,Au (ppm),1.236,31,").size() == 1,
                String.join("\n", table("crm-summary.csv")));
    }

    /** lab/OAL-00008.csv holds "VH0000979,0.070,3.3": the flagged pair shows 0.070, not 0.07. */
    @Test
    void labValuesKeepTheDecimalsTheLabWrote() throws IOException {
        List<String> pair = rows("duplicates-outliers-Au.csv", ",VH0000979,VH0000980,");
        assertEquals(1, pair.size(), String.join("\n", table("duplicates-outliers-Au.csv")));
        assertTrue(pair.get(0).contains(",0.070,,0.317,"), pair.get(0));
    }

    @Test
    void csvTablesHoldOneNumberPerCell() throws IOException {
        String header = table("duplicates-precision-Au.csv").get(0);
        assertTrue(header.contains(",rms_cv_percent,rms_cv_lower_percent,rms_cv_upper_percent,rms_cv_note,"), header);
        // Pulp duplicates' RMS CV, shown as 9.24 % (6.79 % to 11.72 %) on the page.
        List<String> pulp = rows("duplicates-precision-Au.csv", "pulp duplicate,");
        assertTrue(pulp.get(0).contains(",9.24,6.79,11.72,"), pulp.get(0));
        for (String name : List.of("crm-summary.csv", "duplicates-bias-Au.csv", "recovery-comparisons.csv")) {
            for (String line : table(name)) {
                assertTrue(!line.contains("'-") && !line.contains("%,") && !line.endsWith("%"),
                        name + ": a number written as text: " + line);
            }
        }
    }

    @Test
    void summaryJsonHasPercentagesAndNoMapText() throws IOException {
        String json = json();
        // 125 CRMs per 2,499 routine samples = 5.0 %.
        assertTrue(json.contains("\"insertionRatePercent.crm\" : 5.0"), json);
        assertTrue(!JsonOutputsTest.MAP_TEXT.matcher(json).find(), "a map's text in summary.json");
        assertTrue(!json.contains("NaN") && !json.contains("Infinity"));
    }

    @Test
    void theScopeSaysWhichUnitEachAnalyteIsShownIn() throws IOException {
        String html = Files.readString(qc.resolve("index.html"));
        assertTrue(html.contains("Units: Au is reported in ppm, the unit most results are written in"), html.length()
                + " characters");
        assertTrue(html.contains("10 files (775 results) g/t"));
    }
}
