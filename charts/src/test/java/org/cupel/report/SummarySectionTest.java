package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.BufferedWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import org.cupel.demo.DemoGenerator;
import org.cupel.demo.DemoSettings;
import org.cupel.ingest.ProjectFiles;
import org.cupel.ingest.ProjectLoader;
import org.cupel.ingest.ValueConventions;
import org.cupel.project.Project;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.TestworkReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The summary of the demo appendix (the default demo project, docs/demo.md). The planted facts checked here
 * are the demo generator's, not the analyses': three samples coded IS (VH0000502 in OAL-00005, VH0001650 in
 * OAL-00014, VH0002769 in OAL-00023) and two NR (VH0000898 in OAL-00008, VH0002252 in OAL-00019) in both
 * analyte columns; five batches of 25 umpire checks at Brisk Fen Analytical; the carry-over blank VH0001397 in
 * OAL-00012; the VHC-23 Au drift that fails the late batches OAL-00020 to OAL-00025.
 */
class SummarySectionTest {
    @TempDir
    static Path dir;
    static QcReport report;
    static ReportSection summary;

    @BeforeAll
    static void demoAppendix() throws Exception {
        DemoGenerator.generate(DemoSettings.defaults(), rel -> {
            Path p = dir.resolve(rel);
            Files.createDirectories(p.getParent());
            return new BufferedWriter(Files.newBufferedWriter(p, StandardCharsets.UTF_8));
        });
        Project project = ProjectLoader.load(dir);
        RecoverySettings settings = project.config().section("recovery", RecoverySettings.class,
                RecoverySettings.DEFAULTS);
        RecoveryResult testwork = RecoveryAnalysis.run(TestworkReader.read(ProjectFiles.of(dir, project.config()),
                settings, ValueConventions.from(project.config())), settings);
        report = QcAppendix.build(project, Optional.of(testwork), "all batches", ReportFixture.GENERATED);
        summary = report.sections().get(0);
    }

    private static List<String> callouts(ReportSection s) {
        return s.blocks().stream().filter(b -> b instanceof ReportBlock.Callout).map(b -> ((ReportBlock.Callout) b)
                .text()).toList();
    }

    private static ReportTable table(ReportSection s, String id) {
        return s.blocks().stream().filter(b -> b instanceof ReportBlock.Table t && t.table().id().equals(id))
                .map(b -> ((ReportBlock.Table) b).table()).findFirst().orElseThrow();
    }

    /** Every text of the section, paragraphs, callouts and table cells, one per line. */
    private static String text(ReportSection s) {
        List<String> out = new ArrayList<>();
        for (ReportBlock b : s.blocks()) {
            if (b instanceof ReportBlock.Paragraph p) {
                out.add(p.text());
            } else if (b instanceof ReportBlock.Callout c) {
                out.add(c.text());
            } else if (b instanceof ReportBlock.Table t) {
                t.table().rows().forEach(r -> out.add(String.join(" | ", r)));
            }
        }
        return String.join("\n", out);
    }

    @Test
    void theFirstSectionAfterTheCoverIsTheSummary() {
        assertEquals(SummarySection.ID, summary.id());
        assertEquals("Summary", summary.title());
        assertEquals(1, report.sections().stream().filter(s -> s.id().equals(SummarySection.ID)).count());
    }

    @Test
    void theSamplesToResubmitAreListedWithBatchAndTheLabsCode() {
        String resubmit = callouts(summary).stream().filter(c -> c.startsWith("Re-submit")).findFirst().orElseThrow();
        assertTrue(resubmit.startsWith("Re-submit 5 samples"), resubmit);
        assertTrue(resubmit.contains("Insufficient sample (IS): VH0000502 (OAL-00005), VH0001650 (OAL-00014), "
                + "VH0002769 (OAL-00023)."), resubmit);
        assertTrue(resubmit.contains("Not received (NR): VH0000898 (OAL-00008), VH0002252 (OAL-00019)."), resubmit);
        assertTrue(resubmit.endsWith("tables/resubmit-list.csv."), resubmit);
        // The full table sits in the verdict section and is written under the name the summary gives.
        ReportSection verdicts = section("verdicts");
        ReportTable list = table(verdicts, "resubmit-list");
        assertEquals("tables/resubmit-list.csv", new ReportFiles(report).table(list));
        assertEquals(List.of("VH0000502,OAL-00005,IS,insufficient sample", "VH0000898,OAL-00008,NR,not received",
                "VH0001650,OAL-00014,IS,insufficient sample", "VH0002252,OAL-00019,NR,not received",
                "VH0002769,OAL-00023,IS,insufficient sample"), list.rows().stream()
                .map(r -> r.get(0) + "," + r.get(1) + "," + r.get(5) + "," + r.get(6)).toList());
        assertTrue(list.rows().stream().allMatch(r -> r.get(4).equals("Au, Ag")), "both analytes were coded");
    }

    @Test
    void theUmpireLabHasItsOwnLineAndIsNotAmongTheBatchesThatCouldNotBeJudged() {
        List<String> c = callouts(summary);
        String verdict = c.get(0);
        assertTrue(verdict.startsWith("25 batches from Orrindale Assay Laboratory"), verdict);
        assertTrue(verdict.endsWith(" 0 could not be judged."), verdict);
        List<String> umpire = c.stream().filter(x -> x.startsWith("Umpire lab")).toList();
        assertEquals(1, umpire.size(), String.join("\n", c));
        assertTrue(umpire.get(0).startsWith("Umpire lab (Brisk Fen Analytical): 5 batches (BFA-U0001–BFA-U0005), "
                + "125 check assays, not counted among the batches above"), umpire.get(0));
        assertTrue(umpire.get(0).contains("Au: umpire lab reads"), "the bias against the primary lab is on the line");
        String everythingElse = text(summary).replace(umpire.get(0), "");
        assertFalse(everythingElse.contains("BFA-"), "no umpire batch elsewhere in the summary");
        assertFalse(table(summary, "summary-batches").rows().stream().anyMatch(r -> r.get(1).equals("cannot judge")));
        // The verdict section counts them apart too.
        assertEquals(0, section("verdicts").headlines().get("batchesNotJudged"));
        assertEquals(5, section("verdicts").headlines().get("umpireBatches"));
    }

    @Test
    void failedBatchesAreNamedWithTheirReasons() {
        ReportTable t = table(summary, "summary-batches");
        List<String> failed = t.rows().stream().filter(r -> r.get(1).equals("fail")).map(r -> r.get(0)).toList();
        for (String late : List.of("OAL-00012", "OAL-00020", "OAL-00021", "OAL-00022", "OAL-00023", "OAL-00024",
                "OAL-00025")) {
            assertTrue(failed.contains(late), late + " in " + failed);
        }
        String blank = row(t, "OAL-00012").get(2);
        assertTrue(blank.startsWith("VH0001397 Au: 0.208 ppm is above the failure threshold") && blank.contains(
                "carry-over") && blank.endsWith("(also 1 warning)"), blank);
        for (String late : List.of("OAL-00020", "OAL-00025")) {
            assertTrue(row(t, late).get(2).contains("VHC-23 Au"), row(t, late).toString());
        }
        // Every failed batch of the verdict section is in the summary, failed first, each with every failing
        // control result of the batch named.
        ReportTable verdicts = table(section("verdicts"), "batch-verdicts");
        List<String> allFailed = verdicts.rows().stream().filter(r -> r.get(3).equals("fail")).map(r -> r.get(0))
                .toList();
        assertEquals(allFailed, failed);
        assertEquals(allFailed, t.rows().subList(0, allFailed.size()).stream().map(r -> r.get(0)).toList());
        String accepted = summary.blocks().stream().filter(b -> b instanceof ReportBlock.Paragraph)
                .map(b -> ((ReportBlock.Paragraph) b).text()).filter(p -> p.startsWith("Accepted")).findFirst()
                .orElseThrow();
        List<String> passed = verdicts.rows().stream().filter(r -> r.get(3).equals("pass")).map(r -> r.get(0)).toList();
        assertEquals("Accepted (" + passed.size() + "): " + BatchRanges.compact(passed) + ".", accepted);
    }

    @Test
    void precisionCrmBiasAndRecoveryEachHaveTheirLines() {
        List<String> c = callouts(summary);
        assertEquals(List.of("field duplicates", "coarse-reject duplicates", "pulp duplicates", "lab repeats"),
                c.stream().filter(x -> x.startsWith("Precision, ")).map(x -> x.substring(11, x.indexOf(" —")))
                        .toList());
        assertTrue(c.stream().anyMatch(x -> x.startsWith("Precision, field duplicates — Au: 60.5 % of 81 pairs within "
                + "HARD 30 %")), "the planted poor field precision of Au");
        List<String> crms = c.stream().filter(x -> x.startsWith("CRM ")).toList();
        assertEquals(List.of("VHC-11", "VHC-23", "VHC-35", "VHC-48"), crms.stream()
                .map(x -> x.substring(4, x.indexOf(','))).sorted().collect(Collectors.toList()));
        String drifting = crms.stream().filter(x -> x.startsWith("CRM VHC-23")).findFirst().orElseThrow();
        assertTrue(drifting.matches(".*Au \\+[0-9.]+ % \\(95 % CI \\+[0-9.]+ to \\+[0-9.]+\\), significant "
                + "\\(n = \\d+\\), drifting.*"), drifting);
        // 17.5: the testwork section opens with the same finding boxes as the summary shows.
        ReportSection testwork = section("testwork");
        List<String> findings = callouts(testwork).subList(0, 3);
        assertTrue(findings.get(0).startsWith("Au recovery"), findings.get(0));
        assertTrue(testwork.blocks().get(0) instanceof ReportBlock.Callout, "the finding comes first");
        assertTrue(c.containsAll(findings), "the summary repeats the recovery findings");
    }

    @Test
    void summaryJsonCarriesTheHeadlines() throws Exception {
        JsonNode s = new ObjectMapper().readTree(SummaryJson.toJson(report)).get("sections").get("summary")
                .get("headlines");
        assertEquals(25, s.get("batches").asInt());
        assertEquals(0, s.get("batchesNotJudged").asInt());
        assertEquals(5, s.get("umpireBatches").asInt());
        assertEquals(125, s.get("umpireCheckAssays").asInt());
        assertEquals(5, s.get("resubmit").size());
        assertEquals("VH0000502", s.get("resubmit").get(0).get("sampleId").asText());
        assertEquals("IS", s.get("resubmit").get(0).get("labCodes").get(0).asText());
        assertEquals("FAIL", s.get("precision").get("field duplicate").get("Au").get("rule").asText());
        assertTrue(s.get("crmBias").get("VHC-23").get("Au").get("significant").asBoolean());
        assertEquals("tables/reassay-list.csv", s.get("reassayList").asText());
    }

    @Test
    void aLongResubmitListNamesTheFirstTwentyAndCountsTheRest() {
        List<org.cupel.control.ResubmitEntry> entries = new ArrayList<>();
        for (int i = 1; i <= 23; i++) {
            entries.add(entry("S" + i, org.cupel.assay.MissingReason.INSUFFICIENT_SAMPLE, List.of()));
        }
        entries.add(entry("T1", org.cupel.assay.MissingReason.NOT_RECEIVED, List.of("NR")));
        entries.add(entry("T2", org.cupel.assay.MissingReason.NOT_RECEIVED, List.of("LNR")));
        String text = SummarySection.resubmitText(entries);
        // 20 named in reading order (all insufficient), 3 insufficient and both not-received counted; a group
        // whose codes are not known shows none.
        assertTrue(text.startsWith("Insufficient sample: S1 (J1), S2 (J1), "), text);
        assertTrue(text.contains("S20 (J1) and 3 more. Not received (NR, LNR): 2 more."), text);
        assertFalse(text.contains("S21"), text);
    }

    private static org.cupel.control.ResubmitEntry entry(String id, org.cupel.assay.MissingReason reason,
                                                         List<String> codes) {
        return new org.cupel.control.ResubmitEntry(id, "J1", "Lab", 1, "routine", reason, codes, List.of("Au"),
                new org.cupel.assay.SourceLocation("j1.csv", 2, 0));
    }

    private static ReportSection section(String id) {
        return report.sections().stream().filter(s -> s.id().equals(id)).findFirst().orElseThrow();
    }

    private static List<String> row(ReportTable t, String first) {
        return t.rows().stream().filter(r -> r.get(0).equals(first)).findFirst().orElseThrow();
    }
}
