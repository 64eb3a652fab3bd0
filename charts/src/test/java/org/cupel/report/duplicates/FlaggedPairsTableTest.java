package org.cupel.report.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;
import org.cupel.duplicates.DuplicateAnalysis;
import org.cupel.duplicates.DuplicatePair;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSettings;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportTable;
import org.junit.jupiter.api.Test;

/**
 * The report's flagged-pairs table: the original's ID beside the original's value, the duplicate's beside the
 * duplicate's (the demo's lab repeat VH0001166 = 0.783, VH0001166-R = 0.895 was printed crossed), and a pair
 * below 10 × DL without a HARD ranking. Same hand-built set as core FlaggedPairsTest: 66 pulp pairs with a 2 %
 * spread, O-HI / D-HI = 1.00 / 1.50 (HARD 20 %), O-LO / D-LO = 0.005 / 0.030 at DL 0.005 (mean below 0.05).
 */
class FlaggedPairsTableTest {

    private static DuplicatePair pair(String id, String originalId, double original, double duplicate) {
        return new DuplicatePair(id, originalId, "J1", QcRole.PULP_DUPLICATE, AssayValue.detected(original, 0.005),
                AssayValue.detected(duplicate, 0.005));
    }

    private static ReportTable table() {
        List<DuplicatePair> pairs = new ArrayList<>();
        for (int i = 0; i < 66; i++) {
            double c = 0.2 * Math.pow(1.05, i);
            double spread = 0.02 * ((i % 5) - 2) / 2.0;
            pairs.add(pair("D" + i, "O" + i, c * (1 + spread), c * (1 - spread)));
        }
        pairs.add(pair("D-HI", "O-HI", 1.00, 1.50));
        pairs.add(pair("D-LO", "O-LO", 0.005, 0.030));
        DuplicateReport r = DuplicateAnalysis.run("Au", "g/t", pairs, List.of(), new double[0],
                DuplicateSettings.DEFAULTS);
        return DuplicatesSection.build(List.of(r), k -> false).blocks().stream()
                .filter(b -> b instanceof ReportBlock.Table).map(b -> ((ReportBlock.Table) b).table())
                .filter(t -> t.id().equals("duplicates-outliers-Au")).findFirst().orElseThrow();
    }

    @Test
    void originalIdSitsBesideTheOriginalValue() {
        ReportTable t = table();
        assertEquals(List.of("Type", "Original ID", "Duplicate ID", "Batch", "Original", "Duplicate", "HARD",
                "Flagged by"), t.columns());
        List<String> hi = t.rows().get(0);
        assertEquals(List.of("O-HI", "D-HI", "1", "1.5", "20.0 %"), List.of(hi.get(1), hi.get(2), hi.get(4),
                hi.get(5), hi.get(6)));
    }

    @Test
    void aPairBelowTheRelativeThresholdComesLastWithoutHard() {
        List<List<String>> rows = table().rows();
        List<String> last = rows.get(rows.size() - 1);
        assertEquals("O-LO", last.get(1));
        assertEquals("not used: mean < 10× DL", last.get(6));
        assertTrue(rows.subList(0, rows.size() - 1).stream().noneMatch(r -> r.get(1).equals("O-LO")));
    }
}
