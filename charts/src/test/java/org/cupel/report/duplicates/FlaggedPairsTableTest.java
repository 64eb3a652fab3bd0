package org.cupel.report.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.duplicates.DuplicateAnalysis;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSettings;
import org.cupel.charts.duplicates.SimulatedPairs;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportTable;
import org.junit.jupiter.api.Test;

/**
 * The report's flagged-pairs table: the original's ID beside the original's value, the duplicate's beside the
 * duplicate's (the demo's lab repeat VH0001166 = 0.783, VH0001166-R = 0.895 was printed crossed), and a pair
 * below 10 × DL without a HARD ranking. The 300 simulated pulp pairs of {@link SimulatedPairs} (DL 0.01) plus
 * O-HI / D-HI = 1.00 / 1.50 (HARD 0.5 / 2.5 = 20 %, above the 10 % limit) and O-LO / D-LO = 0.01 / 0.09 (mean
 * 0.05 below 10 × 0.01 = 0.1; |d| = 0.08, about six times σ_c = 0.01 + 0.05·0.05 there, so above the 99 % line).
 */
class FlaggedPairsTableTest {

    private static ReportTable table() {
        DuplicateReport r = DuplicateAnalysis.run("Au", "g/t", SimulatedPairs.withFlaggedPairs(), List.of(),
                new double[0], DuplicateSettings.DEFAULTS);
        return DuplicatesSection.build(List.of(r), k -> false).blocks().stream()
                .filter(b -> b instanceof ReportBlock.Table).map(b -> ((ReportBlock.Table) b).table())
                .filter(t -> t.id().equals("duplicates-outliers-Au")).findFirst().orElseThrow();
    }

    private static int rowOf(List<List<String>> rows, String originalId) {
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).get(1).equals(originalId)) {
                return i;
            }
        }
        throw new AssertionError(originalId + " not listed: " + rows);
    }

    @Test
    void originalIdSitsBesideTheOriginalValue() {
        ReportTable t = table();
        assertEquals(List.of("Type", "Original ID", "Duplicate ID", "Batch", "Original (g/t)", "Duplicate (g/t)", "HARD",
                "Flagged by"), t.columns());
        List<String> hi = t.rows().get(rowOf(t.rows(), "O-HI"));
        assertEquals(List.of("O-HI", "D-HI", "1", "1.5", "20.0 %"), List.of(hi.get(1), hi.get(2), hi.get(4),
                hi.get(5), hi.get(6)));
    }

    @Test
    void aPairBelowTheRelativeThresholdComesAfterTheRankedPairsWithoutHard() {
        List<List<String>> rows = table().rows();
        int lo = rowOf(rows, "O-LO");
        assertEquals("not used: mean < 10× DL", rows.get(lo).get(6));
        assertTrue(rows.subList(lo, rows.size()).stream().allMatch(r -> r.get(6).startsWith("not used")),
                "pairs below the threshold come after every pair ranked by HARD");
        assertTrue(lo > rowOf(rows, "O-HI"));
    }
}
