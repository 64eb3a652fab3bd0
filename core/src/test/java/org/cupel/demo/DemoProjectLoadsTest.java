package org.cupel.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.demo.PlantedProblem.Kind;
import org.cupel.ingest.ProjectLoader;
import org.cupel.project.DataIssue;
import org.cupel.project.FileAccount;
import org.cupel.project.Project;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The default demo project loads with the project loader: no fatal issue, and only the planted exceptions. */
class DemoProjectLoadsTest {

    @TempDir
    static Path dir;
    private static DemoSummary summary;
    private static Project project;

    @BeforeAll
    static void load() throws IOException {
        summary = DemoOnDisk.write(dir);
        project = ProjectLoader.load(dir);
    }

    private static List<String> planted(Kind kind) {
        return summary.planted(kind).sampleIds();
    }

    @Test
    void theExceptionsAreExactlyThePlantedDataEntryProblems() {
        assertFalse(project.exceptions().hasFatal());
        TreeSet<String> expected = new TreeSet<>();
        expected.addAll(planted(Kind.DUPLICATE_ID_ROW));
        expected.addAll(planted(Kind.TEXT_TYPO));
        expected.addAll(planted(Kind.NEVER_RECEIVED));
        TreeSet<String> found = new TreeSet<>();
        List<String> messages = new ArrayList<>();
        for (DataIssue i : project.exceptions().all()) {
            found.add(i.sampleId());
            messages.add(i.message());
        }
        assertEquals(expected, found, String.join("\n", messages));
        assertEquals(3, project.exceptions().size(), String.join("\n", messages));
    }

    @Test
    void everyFileBalancesItsRows() {
        for (FileAccount f : project.files()) {
            assertTrue(f.balances(), f.toString());
        }
    }

    @Test
    void rolesAndReferencesComeFromTheRegister() {
        SampleTable samples = project.samples();
        assertEquals(List.of("Au", "Ag"), project.analyteNames());
        for (QcRole role : List.of(QcRole.CRM, QcRole.BLANK, QcRole.FIELD_DUPLICATE, QcRole.COARSE_DUPLICATE,
                QcRole.PULP_DUPLICATE, QcRole.UMPIRE)) {
            assertEquals((long) summary.registered().get(role), samples.rowsWithRole(role).length, role.name());
        }
        assertEquals(summary.labRepeats(), samples.rowsWithRole(QcRole.LAB_REPEAT).length);
        int swap = samples.rowOf(planted(Kind.CRM_SWAP).get(0)).orElseThrow();
        assertEquals(DemoCrm.SWAP_REGISTERED, samples.reference(swap));
    }

    @Test
    void overLimitGoldIsReportedFromTheGravimetricReassay() {
        AnalyteColumn au = project.analyte("Au").orElseThrow();
        int checked = 0;
        for (String id : planted(Kind.OVER_LIMIT_REASSAY)) {
            int row = project.samples().rowOf(id).orElseThrow();
            if (au.candidates(row).stream().anyMatch(c -> c.value().qualifier().isCensored())) {
                assertEquals("FA-GRAV", au.method(row), id);
                assertTrue(au.value(row).isDetected() && au.number(row) > 9, id);
                checked++;
            }
        }
        assertTrue(checked >= 2, "over-limit Au re-assays checked: " + checked);
    }

    @Test
    void missingCodesKeepTheirReason() {
        AnalyteColumn au = project.analyte("Au").orElseThrow();
        for (String id : planted(Kind.INSUFFICIENT_SAMPLE_CODE)) {
            AssayValue v = au.value(project.samples().rowOf(id).orElseThrow());
            assertEquals(MissingReason.INSUFFICIENT_SAMPLE, v.missingReason(), id);
        }
        for (String id : planted(Kind.NOT_RECEIVED_CODE)) {
            AssayValue v = au.value(project.samples().rowOf(id).orElseThrow());
            assertEquals(MissingReason.NOT_RECEIVED, v.missingReason(), id);
        }
    }
}
