package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.project.FileAccount;
import org.cupel.project.Project;
import org.cupel.project.ProjectSummary;
import org.junit.jupiter.api.Test;

/** The report's own sections format core records faithfully; expected values are read off the fixture. */
class SectionsTest {
    private final Project project = ReportFixture.project();

    @Test
    void scopeListsBatchesRolesAndLimits() {
        ReportSection s = ScopeSection.build(ProjectSummary.of(project), "all batches");
        ReportTable batches = table(s, "scope-batches");
        assertEquals(List.of("JOB-2", "North & Sons <Lab>", "2025-03-10", "lab1.csv", "3"), batches.rows().get(1));
        ReportTable roles = table(s, "scope-batch-roles");
        assertEquals(List.of("Batch", "File", "Routine", "CRM", "Blank", "Field duplicate"), roles.columns());
        assertEquals(List.of("JOB-2", "lab1.csv", "2", "0", "0", "1"), roles.rows().get(1));
        ReportTable analytes = table(s, "scope-analytes");
        assertEquals(List.of("Au", "g/t", "FA-AAS", "6", "0.005", "1", "0"), analytes.rows().get(0));
        assertEquals(6, s.headlines().get("samples"));
    }

    @Test
    void exceptionsListEveryIssueAndFlagUnbalancedFiles() {
        ReportSection s = DataExceptionsSection.build(project);
        ReportTable issues = table(s, "data-exceptions");
        assertEquals(project.exceptions().size(), issues.rows().size());
        assertEquals(List.of("excluded", "lab1.csv", "9", "3", "../../x", "=1+1", "not a number",
                "a number such as 1.25", "correct the cell"), issues.rows().get(0));
        assertEquals(0, s.headlines().get("filesNotBalanced"));
        Project unbalanced = new Project(project.name(), null, project.config(), project.samples(),
                project.analytes(), project.catalog(), project.exceptions(),
                List.of(new FileAccount("lab1.csv", "lab results", 7, 5, 1)));
        ReportSection u = DataExceptionsSection.build(unbalanced);
        assertTrue(u.blocks().stream().anyMatch(b -> b instanceof ReportBlock.Callout c
                && c.level() == ReportBlock.Level.FAIL && c.text().contains("does not balance")));
    }

    @Test
    void methodsListEverySourceCitedOnceWithWhereCited() {
        QcReport r = ReportFixture.report();
        ReportSection methods = r.sections().stream().filter(x -> x.id().equals(MethodsSection.ID)).findFirst()
                .orElseThrow();
        ReportTable refs = table(methods, "references");
        List<String> sources = refs.rows().stream().map(row -> row.get(1)).toList();
        assertEquals(sources.size(), new java.util.HashSet<>(sources).size(), "each source listed once");
        for (Reference own : MethodsSection.OWN) {
            assertTrue(sources.contains(own.citation()), own.citation());
        }
        for (Reference caution : CautionsSection.SOURCES) {
            assertTrue(sources.contains(caution.citation()), caution.citation());
        }
        ReportSection own = MethodsSection.build(List.of(ReportFixture.extra(), ReportFixture.extra(),
                CautionsSection.build()), project.config());
        ReportTable all = table(own, "references");
        String westgard = Bibliography.get("westgard1981").citation();
        assertEquals(1, all.rows().stream().filter(row -> row.get(1).equals(westgard)).count(),
                "a source two sections list is listed once");
        assertEquals(List.of("1", westgard, "Checks " + ReportFixture.SCRIPT + "; Thresholds in force"),
                all.rows().get(0), "listed first, with both places that cite it (the thresholds table cites it too)");
    }

    // Defaults and their origins are those documented in the settings records' javadoc (BlankSettings:
    // 5 and 3 × DL, common practice; CrmSettings: 1-3s fail after Westgard et al. 1981).
    @Test
    void methodsListTheThresholdsInForceWithTheirOrigin() {
        org.cupel.config.CupelConfig config = org.cupel.config.CupelConfig.fromYaml(
                "blanks:\n  failMultiple: 10\ncrm:\n  rules:\n    4-1s: warn\n", "cupel.yaml");
        ReportTable t = table(MethodsSection.build(List.of(), config), "thresholds");
        assertEquals(List.of("blanks.failMultiple", "10", "a blank fails above this × DL", "user setting"),
                row(t, "blanks.failMultiple"));
        assertEquals("3", row(t, "blanks.warnMultiple").get(1));
        assertEquals("common practice", row(t, "blanks.warnMultiple").get(3));
        assertEquals("user setting", row(t, "crm.rules.4-1s").get(3));
        assertEquals("fail", row(t, "crm.rules.1-3s").get(1));
        assertTrue(row(t, "crm.rules.1-3s").get(3).startsWith("Westgard"));
        assertEquals("30", row(t, "duplicates.fieldHardLimitPercent").get(1));
        assertTrue(t.rows().stream().noneMatch(r -> r.get(0).equals("crm.rules.R-4s")), "rules off are not listed");
    }

    private static List<String> row(ReportTable t, String setting) {
        return t.rows().stream().filter(r -> r.get(0).equals(setting)).findFirst().orElseThrow();
    }

    private static ReportTable table(ReportSection s, String id) {
        return s.blocks().stream().filter(b -> b instanceof ReportBlock.Table t && t.table().id().equals(id))
                .map(b -> ((ReportBlock.Table) b).table()).findFirst().orElseThrow();
    }
}
