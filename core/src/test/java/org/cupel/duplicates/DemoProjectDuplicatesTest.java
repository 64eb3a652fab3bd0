package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.cupel.assay.QcRole;
import org.cupel.demo.DemoOnDisk;
import org.cupel.demo.DemoSummary;
import org.cupel.demo.PlantedProblem;
import org.cupel.ingest.ProjectLoader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The demo project plants one pulp batch with six times the pulp-duplicate error; the analysis must find it. */
class DemoProjectDuplicatesTest {
    @TempDir
    Path dir;

    @Test
    void plantedPoorPulpBatchIsTheOneFlaggedAsLessPrecise() throws Exception {
        DemoSummary summary = DemoOnDisk.write(dir);
        PlantedProblem planted = summary.planted(PlantedProblem.Kind.POOR_PULP_PRECISION);
        List<DuplicateReport> reports = PairExtraction.analyse(ProjectLoader.load(dir), DuplicateSettings.DEFAULTS,
                "Au", QcRole.PULP_DUPLICATE);
        DuplicateSetResult pulp = reports.get(0).sets().get(0);
        List<BatchPrecision> lessPrecise = pulp.batches().stream().filter(BatchPrecision::lessPrecise).toList();
        assertEquals(1, lessPrecise.size(), lessPrecise.toString());
        String batch = lessPrecise.get(0).batch();
        assertTrue(planted.where().contains(batch), planted.where() + " vs " + batch);
        assertTrue(lessPrecise.get(0).failsRule());
    }
}
