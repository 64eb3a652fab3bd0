package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.cupel.assay.QcRole;
import org.cupel.control.crm.CrmReview;
import org.cupel.demo.DemoGenerator;
import org.cupel.demo.DemoSettings;
import org.cupel.ingest.ProjectLoader;
import org.cupel.project.Project;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo's failed CRMs are bracketed by passing CRMs, not by the blanks beside them. In batch OAL-00024 the
 * drifting VHC-23 result VH0002950 fails (1-3s); the register puts blank VH0002948 two places before it and
 * VHC-11 VH0002908 and VHC-35 VH0002954 (both passing) around it. Bounded by the blank, only 4 samples went
 * back, although a blank says nothing about a bias at grade. Bounded by the CRMs, the bracket holds the register
 * IDs VH0002909 to VH0002953 (45 IDs) less the blanks VH0002917 and VH0002948 and the failed CRM: 42 samples.
 */
class DemoReassayTest {
    @TempDir
    Path dir;

    @Test
    void aFailedCrmIsBracketedByPassingCrmsNotByABlank() throws Exception {
        DemoGenerator.generate(DemoSettings.defaults(), path -> {
            Path p = dir.resolve(path);
            Files.createDirectories(p.getParent());
            return Files.newBufferedWriter(p);
        });
        Project project = ProjectLoader.load(dir);
        BatchReview review = BatchReview.of(project, CrmReview.of(project).outcomes());
        ReassayBracket b = review.reassay().brackets().stream().filter(x -> x.controlId().equals("VH0002950"))
                .findFirst().orElseThrow();
        assertEquals("from passing CRM VH0002908 to passing CRM VH0002954", b.note());
        assertEquals(42, b.nSamples());
        for (ReassayBracket x : review.reassay().brackets()) {
            if (x.role().equals(QcRole.CRM.label())) {
                assertFalse(x.note().contains("blank"), x.toString());
            }
        }
        assertTrue(review.reassay().entries().stream().anyMatch(e -> e.sampleId().equals("VH0002910")),
                "VH0002910, before the blank VH0002917, goes back with the failed CRM");
    }
}
