package org.cupel.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.cupel.demo.DemoProjectFiles.LabRow;
import org.cupel.demo.PlantedProblem.Kind;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Each planted problem is really in the files, found from the files alone (not from the generator's
 * own account), and nothing else looks like it.
 */
class DemoPlantedProblemsTest {

    private static MemorySink sink;
    private static DemoSummary summary;
    private static DemoProjectFiles files;

    @BeforeAll
    static void generate() throws IOException {
        sink = new MemorySink();
        summary = DemoGenerator.generate(DemoSettings.defaults(), sink);
        files = new DemoProjectFiles(sink);
    }

    private static PlantedProblem planted(Kind kind) {
        return summary.planted(kind);
    }

    private static List<LabRow> primaryRowsWithRole(String role) {
        List<LabRow> out = new ArrayList<>();
        for (String f : files.primaryFiles()) {
            for (LabRow r : files.labRows.get(f)) {
                DemoProjectFiles.RegisterRow reg = files.registerById.get(r.id());
                if (reg != null && reg.role().equals(role)) {
                    out.add(r);
                }
            }
        }
        return out;
    }

    private static double z(LabRow r, String crm, int column, String analyte) {
        double[] cert = files.catalog.get(crm + "|" + analyte);
        return (DemoProjectFiles.number(r.cells().get(column)) - cert[0]) / cert[1];
    }

    /**
     * Planted problem 1. The drifting CRM's Au z-score regressed on batch index has slope
     * 4 SD / 24 batches = 0.167 per batch; the lab's own scatter (0.75 SD on ~31 results spread over 25
     * batches) gives a slope standard error near 0.02, so +-0.06 is three standard errors.
     */
    @Test
    void driftingCrmClimbsAboutASixthOfAnSdPerBatch() {
        SimpleRegression fit = new SimpleRegression();
        double lateSum = 0;
        int lateN = 0;
        for (LabRow r : primaryRowsWithRole("CRM")) {
            if (files.registerById.get(r.id()).reference().equals(DemoCrm.DRIFTING)) {
                int b = DemoProjectFiles.batchOf(r.file());
                double z = z(r, DemoCrm.DRIFTING, 0, "Au");
                fit.addData(b, z);
                if (b >= 20) {
                    lateSum += z;
                    lateN++;
                }
            }
        }
        assertEquals(4.0 / 24, fit.getSlope(), 0.06);
        assertTrue(lateSum / lateN > 3, "late batches of the drifting CRM average beyond +3 SD");
    }

    /**
     * Planted problem 2. Apart from the drifting CRM, every CRM result lies within 3.5 certified SD of its
     * registered value (the lab's SD is 0.75 of the certified one, so 3.5 SD is 4.7 lab SD: about 3e-6
     * per result to fall outside by chance), except one registered VHC-11 whose Au and Ag lie within
     * 2 SD of VHC-35.
     */
    @Test
    void oneCrmResultIsReallyAnotherCrmOfTheCatalog() {
        List<String> outliers = new ArrayList<>();
        for (LabRow r : primaryRowsWithRole("CRM")) {
            String code = files.registerById.get(r.id()).reference();
            if (!code.equals(DemoCrm.DRIFTING) && Math.abs(z(r, code, 0, "Au")) > 3.5) {
                outliers.add(r.id());
                assertEquals(DemoCrm.SWAP_REGISTERED, code);
                assertTrue(Math.abs(z(r, DemoCrm.SWAP_ACTUAL, 0, "Au")) < 2);
                assertTrue(Math.abs(z(r, DemoCrm.SWAP_ACTUAL, 1, "Ag")) < 2);
            }
        }
        assertEquals(planted(Kind.CRM_SWAP).sampleIds(), outliers);
    }

    /**
     * Planted problem 3. One blank exceeds 10 x DL (0.05 g/t Au, a common practice failure line) and the
     * sample before it in the lab file is a routine sample above 5 g/t; every other blank is below 5 x DL.
     */
    @Test
    void oneBlankIsContaminatedRightAfterAHighGradeSample() {
        List<String> failed = new ArrayList<>();
        for (LabRow r : primaryRowsWithRole("blank")) {
            Double au = DemoProjectFiles.number(r.cells().get(0));
            if (!au.isNaN() && au > 0.05) {
                failed.add(r.id());
                LabRow before = files.labRows.get(r.file()).get(r.index() - 1);
                assertEquals("routine", files.registerById.get(before.id()).role());
                assertTrue(DemoProjectFiles.number(before.cells().get(0)) > 5);
            } else {
                assertTrue(au.isNaN() || au < 0.025, r.toString());
            }
        }
        assertEquals(List.of(planted(Kind.BLANK_CARRY_OVER).sampleIds().get(0)), failed);
    }

    /**
     * Planted problem 4. The median absolute log ratio of pulp pairs (both detected) in the poor batch is
     * more than three times the median of the other batches' medians (the planted factor is six).
     */
    @Test
    void oneBatchHasPoorPulpDuplicatePrecision() {
        Map<String, Double> values = new HashMap<>();
        files.allLabRows().forEach(r -> values.putIfAbsent(r.id(), DemoProjectFiles.number(r.cells().get(0))));
        Map<Integer, List<Double>> byBatch = new HashMap<>();
        for (LabRow r : primaryRowsWithRole("PD")) {
            double a = values.get(r.id());
            double b = values.get(files.registerById.get(r.id()).reference());
            if (!Double.isNaN(a) && !Double.isNaN(b)) {
                byBatch.computeIfAbsent(DemoProjectFiles.batchOf(r.file()), k -> new ArrayList<>())
                        .add(Math.abs(Math.log(a / b)));
            }
        }
        int poor = DemoProjectFiles.batchOf(planted(Kind.POOR_PULP_PRECISION).where());
        double[] others = byBatch.entrySet().stream().filter(e -> e.getKey() != poor)
                .mapToDouble(e -> median(e.getValue())).sorted().toArray();
        assertTrue(median(byBatch.get(poor)) > 3 * others[others.length / 2]);
        assertTrue(median(byBatch.get(poor)) > others[others.length - 1]);
    }

    private static double median(List<Double> v) {
        double[] a = v.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        return a.length % 2 == 1 ? a[a.length / 2] : (a[a.length / 2 - 1] + a[a.length / 2]) / 2;
    }

    /** Planted problem 5: every over-limit cell of the primary lab has a gravimetric re-assay above the limit. */
    @Test
    void overLimitResultsHaveGravimetricReassays() {
        Map<String, List<String>> grav = new HashMap<>();
        for (String f : files.labRows.keySet()) {
            if (f.endsWith("-GRAV.csv")) {
                assertEquals(List.of("Sample ID", "Au_ppm_FA-GRAV", "Ag_ppm_FA-GRAV"), files.headers.get(f));
                files.labRows.get(f).forEach(r -> grav.put(r.id(), r.cells()));
            }
        }
        int[] over = new int[2];
        double[] limit = {10, 100};
        for (String f : files.primaryFiles()) {
            for (LabRow r : files.labRows.get(f)) {
                for (int a = 0; a < 2; a++) {
                    if (r.cells().get(a).equals(">" + (int) limit[a]) && !r.id().endsWith(DemoGenerator.REPEAT_SUFFIX)) {
                        over[a]++;
                        assertNotNull(grav.get(r.id()), r.toString());
                        assertTrue(Double.parseDouble(grav.get(r.id()).get(a)) > limit[a] * 0.9, r.toString());
                    }
                }
            }
        }
        assertTrue(over[0] >= 2 && over[1] >= 2, Arrays.toString(over));
        assertEquals(planted(Kind.OVER_LIMIT_REASSAY).sampleIds().size(), grav.size());
    }

    /** Below detection is written {@code <0.005}, and {@code -0.005} only in the batches of that convention. */
    @Test
    void belowDetectionConventionsFollowTheBatch() {
        int lessThan = 0;
        int negative = 0;
        for (String f : files.primaryFiles()) {
            boolean negativeBatch = LabFileStyle.usesNegativeBelowDetection(DemoProjectFiles.batchOf(f));
            for (LabRow r : files.labRows.get(f)) {
                String au = r.cells().get(0);
                if (au.equals("<0.005")) {
                    lessThan++;
                    assertTrue(!negativeBatch, r.toString());
                } else if (au.equals("-0.005")) {
                    negative++;
                    assertTrue(negativeBatch, r.toString());
                }
            }
        }
        assertTrue(lessThan > 5 * negative && negative > 0, lessThan + " vs " + negative);
    }

    /** The data-entry problems: one ID twice in a file, one unreadable cell, one registered sample never received. */
    @Test
    void dataEntryProblemsAreExactlyThePlantedOnes() {
        List<String> twice = new ArrayList<>();
        List<String> unreadable = new ArrayList<>();
        Set<String> inLab = new HashSet<>();
        for (List<LabRow> rows : files.labRows.values()) {
            Set<String> seen = new HashSet<>();
            for (LabRow r : rows) {
                inLab.add(r.id());
                if (!seen.add(r.id())) {
                    twice.add(r.id());
                }
                for (String c : r.cells()) {
                    if (DemoProjectFiles.number(c) == null && !c.equals("IS") && !c.equals("NR")) {
                        unreadable.add(r.id());
                    }
                }
            }
        }
        List<String> missing = files.register.stream().map(DemoProjectFiles.RegisterRow::id)
                .filter(id -> !inLab.contains(id)).toList();
        assertEquals(planted(Kind.DUPLICATE_ID_ROW).sampleIds(), twice);
        assertEquals(planted(Kind.TEXT_TYPO).sampleIds(), unreadable);
        assertEquals(planted(Kind.NEVER_RECEIVED).sampleIds(), missing);
    }

    @Test
    void oneFileIsTabSeparatedAndOneHasAByteOrderMarkAndCrlf() {
        long tsv = summary.files().stream().filter(f -> f.endsWith(".tsv")).count();
        assertEquals(1, tsv);
        assertTrue(sink.text("lab/OAL-00007.tsv").contains("Sample ID\tAu ppm FA-AAS\tAg ppm AR-ICP\n"));
        byte[] bom = sink.bytes("lab/OAL-00012.csv");
        assertEquals(List.of((byte) 0xEF, (byte) 0xBB, (byte) 0xBF), List.of(bom[0], bom[1], bom[2]));
        String text = sink.text("lab/OAL-00012.csv");
        assertEquals(text.split("\n").length, text.split("\r\n").length);
    }

    /**
     * The umpire lab reads 3 % high: the median umpire/original Au ratio over pairs above 20 x DL lies
     * within 0.5 % of 1.03 (125 pairs with a pair log SD near 0.07 give a median standard error near 0.8 %,
     * so +-1.5 % is about two of them).
     */
    @Test
    void umpireLabReadsThreePercentHigh() {
        Map<String, Double> primary = new HashMap<>();
        for (String f : files.primaryFiles()) {
            files.labRows.get(f).forEach(r -> primary.putIfAbsent(r.id(), DemoProjectFiles.number(r.cells().get(0))));
        }
        List<Double> ratios = new ArrayList<>();
        for (String f : files.labRows.keySet()) {
            if (f.startsWith("lab/umpire-")) {
                for (LabRow r : files.labRows.get(f)) {
                    Double u = DemoProjectFiles.number(r.cells().get(0));
                    Double p = primary.get(files.registerById.get(r.id()).reference());
                    if (p != null && !p.isNaN() && !u.isNaN() && p > 0.1 && p < 10) {
                        ratios.add(u / p);
                    }
                }
            }
        }
        assertTrue(ratios.size() > 60, "pairs " + ratios.size());
        assertEquals(1.03, median(ratios), 0.015);
    }

    /** The table of docs/demo.md quotes the default run's sample IDs; this keeps it true. */
    @Test
    void defaultRunHasTheSampleIdsQuotedInTheDocs() {
        assertEquals(List.of("VH0001006"), planted(Kind.CRM_SWAP).sampleIds());
        assertEquals(List.of("VH0001397", "VH0001396"), planted(Kind.BLANK_CARRY_OVER).sampleIds());
        assertEquals(List.of("VH0001635"), planted(Kind.DUPLICATE_ID_ROW).sampleIds());
        assertEquals(List.of("VH0002273"), planted(Kind.TEXT_TYPO).sampleIds());
        assertEquals(List.of("VH0000644"), planted(Kind.NEVER_RECEIVED).sampleIds());
        assertEquals(List.of("VH0000502", "VH0001650", "VH0002769"), planted(Kind.INSUFFICIENT_SAMPLE_CODE).sampleIds());
        assertEquals(List.of("VH0000898", "VH0002252"), planted(Kind.NOT_RECEIVED_CODE).sampleIds());
        assertEquals("lab/OAL-00016.csv", planted(Kind.POOR_PULP_PRECISION).where());
        assertEquals(10, planted(Kind.OVER_LIMIT_REASSAY).sampleIds().size());
    }
}
