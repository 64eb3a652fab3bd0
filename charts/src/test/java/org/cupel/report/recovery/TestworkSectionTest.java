package org.cupel.report.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.cupel.ingest.ValueConventions;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.TestworkReader;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportSection;
import org.junit.jupiter.api.Test;

class TestworkSectionTest {

    @Test
    void sectionCarriesTablesChartsAndTheCaution() {
        RecoveryResult r = fixture();
        ReportSection s = TestworkSection.build(r);
        assertEquals(4, s.blocks().stream().filter(b -> b instanceof ReportBlock.Table).count());
        assertEquals(6, s.blocks().stream().filter(b -> b instanceof ReportBlock.Figure).count());
        ReportBlock.Callout caution = (ReportBlock.Callout) s.blocks().get(s.blocks().size() - 1);
        assertEquals(ReportBlock.Level.CAUTION, caution.level());
        assertTrue(caution.text().contains("29 CFR 1910.1025") && caution.text().contains("cupellation"));
        assertEquals(8, TestworkSection.recoveries(r).rows().size(), "4 conditions × 2 analytes");
        assertEquals(12, TestworkSection.comparisons(r).rows().size(), "6 pairs × 2 analytes");
        assertTrue(TestworkSection.comparisons(r).rows().stream().anyMatch(row -> row.get(8).startsWith("cannot tell")
                && row.get(10).endsWith("per condition")));
    }

    // 17.5: the section opens with plain-words findings, one box per analyte and one for the metal balance.
    @Test
    void findingsNameEachConditionAndSayWhichIsHigherWherePairsDiffer() {
        RecoveryResult r = fixture();
        ReportSection s = TestworkSection.build(r);
        java.util.List<ReportBlock.Callout> findings = TestworkSection.findings(r);
        assertEquals(r.analytes().size() + 1, findings.size());
        assertTrue(r.comparisons().stream().anyMatch(p -> p.verdict() == org.cupel.recovery.ComparisonVerdict.DIFFERENT),
                "the fixture has pairs that differ, so the wording below is exercised");
        assertEquals(findings, s.blocks().subList(0, findings.size()), "the findings open the section");
        for (int i = 0; i < r.analytes().size(); i++) {
            String a = r.analytes().get(i);
            String text = findings.get(i).text();
            assertTrue(text.startsWith(a + " recovery (by loss, mean with 95 % t-interval): "), text);
            for (org.cupel.recovery.ConditionRecovery c : r.conditions()) {
                if (c.analyte().equals(a)) {
                    assertTrue(text.contains(c.condition() + " " + String.format(java.util.Locale.ROOT, "%.2f %%",
                            c.mean())), c.condition() + " in " + text);
                }
            }
            for (org.cupel.recovery.PairComparison p : r.comparisons()) {
                if (!p.analyte().equals(a) || p.verdict() != org.cupel.recovery.ComparisonVerdict.DIFFERENT) {
                    continue;
                }
                // The condition named first is the one with the larger mean recovery.
                double first = mean(r, a, p.first());
                double second = mean(r, a, p.second());
                String higher = first >= second ? p.first() : p.second();
                String lower = first >= second ? p.second() : p.first();
                assertTrue(text.contains(higher + " higher than " + lower + " by "), higher + " > " + lower + ": " + text);
            }
        }
        ReportBlock.Callout balance = findings.get(findings.size() - 1);
        assertTrue(balance.text().startsWith("The metal balance"), balance.text());
    }

    /** The recovery results of the testwork fixture (testdata/recovery/testwork). */
    private static RecoveryResult fixture() {
        Path dir = Path.of(System.getProperty("cupel.testdata", "../testdata"), "recovery", "testwork");
        return RecoveryAnalysis.run(TestworkReader.read(dir, RecoverySettings.DEFAULTS, ValueConventions.DEFAULTS),
                RecoverySettings.DEFAULTS);
    }

    private static double mean(RecoveryResult r, String analyte, String condition) {
        return r.conditions().stream().filter(c -> c.analyte().equals(analyte) && c.condition().equals(condition))
                .findFirst().orElseThrow().mean();
    }
}
