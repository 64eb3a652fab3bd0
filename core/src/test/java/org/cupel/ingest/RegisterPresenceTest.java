package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.cupel.project.Project;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/**
 * Issue 15, item 4: a register that is missing or misnamed silently turned every CRM, blank and duplicate
 * into a routine sample. A near miss is now fatal (the file names it and the fix), and a project with no
 * register at all is warned about.
 */
class RegisterPresenceTest extends InFolderTest {
    private static final String LAB = "Sample ID,Au_ppm\nS1,0.5\nC1,0.41\nB1,<0.005\n";
    private static final String REGISTER = "sample_id,qc_role,reference\nS1,routine,\nC1,crm,KC-1\nB1,blank,\n";

    @BeforeEach
    void lab() {
        folder.write("lab/a.csv", LAB);
    }

    private DataIssue fatal() {
        Project p = ProjectLoader.inspect(tmp);
        List<DataIssue> fatal = p.exceptions().withSeverity(DataIssue.Severity.FATAL);
        assertEquals(1, fatal.size(), p.exceptions().all().toString());
        assertTrue(fatal.get(0).where().file().equals("register.csv"), fatal.toString());
        assertThrows(InputException.class, () -> ProjectLoader.load(tmp), "the analyses stop");
        return fatal.get(0);
    }

    @Test
    void aRegisterWithTheWrongCaseIsNamedAndFatal() {
        folder.write("Register.csv", REGISTER);
        String m = fatal().problem();
        assertTrue(m.startsWith("not found, but the project folder holds [Register.csv]"), m);
        assertTrue(m.contains("rename the sample register to register.csv"), m);
    }

    @Test
    void aRegisterSavedAsTsvOrMisspeltIsNamed() {
        folder.write("register.tsv", REGISTER.replace(',', '\t'));
        folder.write("regsiter.csv", REGISTER);
        assertTrue(fatal().problem().contains("[register.tsv, regsiter.csv]"));
    }

    @Test
    void aFolderNamedRegisterCsvIsFatal() throws IOException {
        Files.createDirectories(tmp.resolve("register.csv"));
        assertTrue(fatal().problem().startsWith("a folder, expected a file"));
    }

    @Test
    void aLinkToNothingNamedRegisterCsvIsFatal() throws IOException {
        Files.createSymbolicLink(tmp.resolve("register.csv"), tmp.resolve("gone.csv"));
        assertTrue(fatal().problem().startsWith("a link to a file that does not exist"));
    }

    @Test
    void aProjectWithoutARegisterIsWarnedAbout() {
        Project p = ProjectLoader.load(tmp);
        DataIssue w = ProjectFolder.issues(p, "register.csv", DataIssue.Severity.WARNING).get(0);
        assertTrue(w.problem().contains("no sample register") && w.problem().contains("analysed as routine"),
                w.problem());
    }

    @Test
    void aHeaderOnlyLabFileIsWarnedAbout() {
        folder.write("lab/a.csv", "Sample ID,Au_ppm\n");
        folder.write("register.csv", REGISTER);
        Project p = ProjectLoader.inspect(tmp);
        assertTrue(ProjectFolder.issues(p, "lab/a.csv", DataIssue.Severity.WARNING).get(0).problem()
                .contains("a header on line 1 but no data rows"));
    }
}
