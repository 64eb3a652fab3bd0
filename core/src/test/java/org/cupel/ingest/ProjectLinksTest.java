package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.cupel.project.Project;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.TestworkReader;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15, item 9: symbolic links in a project. A link is followed inside the project folder; one that
 * leads outside is refused unless {@code ingest.followLinksOutsideProject} is true; a link to nothing is
 * named; and nothing of a file outside the project reaches a message.
 */
class ProjectLinksTest {
    private static final String SECRET = "root:x:0:0:a line that must never be echoed";

    @TempDir
    Path tmp;
    private Path project;
    private Path outside;
    private ProjectFolder folder;

    @BeforeEach
    void folders() throws IOException {
        project = Files.createDirectories(tmp.resolve("project"));
        outside = Files.createDirectories(tmp.resolve("elsewhere"));
        folder = new ProjectFolder(project);
        folder.write("lab/a.csv", "Sample ID,Au_ppm\nS1,0.5\n");
        folder.write("register.csv", "sample_id,qc_role,reference\nS1,routine,\nS2,routine,\n");
    }

    private static String everything(Project p) {
        return p.exceptions().all().toString();
    }

    @Test
    void aLinkInsideTheProjectIsFollowed() throws IOException {
        folder.write("archive/b.csv", "Sample ID,Au_ppm\nS2,0.7\n");
        Files.createSymbolicLink(project.resolve("lab/b.csv"), project.resolve("archive/b.csv"));
        Project p = ProjectLoader.load(project);
        assertEquals(2, p.samples().size());
    }

    @Test
    void aLinkLeavingTheProjectIsRefusedAndNamed() throws IOException {
        Files.writeString(outside.resolve("b.csv"), "Sample ID,Au_ppm\nS2,0.7\n");
        Files.createSymbolicLink(project.resolve("lab/b.csv"), outside.resolve("b.csv"));
        Project p = ProjectLoader.inspect(project);
        List<DataIssue> fatal = ProjectFolder.issues(p, "lab/b.csv", DataIssue.Severity.FATAL);
        assertEquals(1, fatal.size(), everything(p));
        assertTrue(fatal.get(0).problem().contains("leads outside the project folder")
                && fatal.get(0).problem().contains("ingest.followLinksOutsideProject: true"), fatal.toString());
        assertEquals(1, p.samples().size(), "S2 was not read");
        InputException e = assertThrows(InputException.class, () -> ProjectLoader.load(project));
        assertTrue(e.getMessage().startsWith("lab/b.csv: a link that leads outside"), e.getMessage());
    }

    @Test
    void theSettingAllowsLinksLeavingTheProject() throws IOException {
        Files.writeString(outside.resolve("b.csv"), "Sample ID,Au_ppm\nS2,0.7\n");
        Files.createSymbolicLink(project.resolve("lab/b.csv"), outside.resolve("b.csv"));
        folder.write("cupel.yaml", "ingest:\n  followLinksOutsideProject: true\n");
        assertEquals(2, ProjectLoader.load(project).samples().size());
    }

    @Test
    void aLinkToNothingIsNamedNotSkipped() throws IOException {
        Files.createSymbolicLink(project.resolve("lab/b.csv"), project.resolve("lab/gone.csv"));
        Project p = ProjectLoader.inspect(project);
        List<DataIssue> fatal = ProjectFolder.issues(p, "lab/b.csv", DataIssue.Severity.FATAL);
        assertEquals(1, fatal.size(), everything(p));
        assertTrue(fatal.get(0).problem().startsWith("a link to a file that does not exist"), fatal.toString());
        assertTrue(p.files().stream().anyMatch(f -> f.file().equals("lab/b.csv")), "listed in the accounting");
    }

    /** A link to a file outside (a system file, say) never puts a line of that file into a message. */
    @Test
    void noLineOfAFileOutsideTheProjectIsEchoed() throws IOException {
        Files.writeString(outside.resolve("passwd"), SECRET + "\n" + SECRET + "\n");
        Files.createSymbolicLink(project.resolve("lab/b.csv"), outside.resolve("passwd"));
        Files.delete(project.resolve("register.csv"));
        Files.createSymbolicLink(project.resolve("register.csv"), outside.resolve("passwd"));
        Project p = ProjectLoader.inspect(project);
        assertFalse(everything(p).contains("never be echoed"), everything(p));
        assertEquals(2, p.exceptions().withSeverity(DataIssue.Severity.FATAL).size(), everything(p));
    }

    @Test
    void aConfigLinkLeavingTheProjectIsRefused() throws IOException {
        Files.writeString(outside.resolve("cupel.yaml"), "project: elsewhere\n");
        Files.createSymbolicLink(project.resolve("cupel.yaml"), outside.resolve("cupel.yaml"));
        InputException e = assertThrows(InputException.class, () -> ProjectLoader.readConfig(project));
        assertTrue(e.getMessage().startsWith("cupel.yaml: a link that leads outside"), e.getMessage());
    }

    @Test
    void aTestworkLinkLeavingTheProjectIsRefused() throws IOException {
        Files.writeString(outside.resolve("heads.csv"), "feed,replicate,Au_g/t\nF1,1,300\n");
        folder.write("testwork/smelts.csv", "test_id,condition,replicate,feed,charge_g,product,mass_g,Au_g/t\n"
                + "SM-01,A,1,F1,50,button,30.6,472.5\n");
        Files.createSymbolicLink(project.resolve("testwork/heads.csv"), outside.resolve("heads.csv"));
        InputException e = assertThrows(InputException.class,
                () -> TestworkReader.read(project, RecoverySettings.DEFAULTS, ValueConventions.DEFAULTS));
        assertTrue(e.getMessage().contains("heads.csv: a link that leads outside"), e.getMessage());
    }
}
