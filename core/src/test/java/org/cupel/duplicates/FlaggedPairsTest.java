package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;
import org.junit.jupiter.api.Test;

/**
 * The flagged-pair lists: IDs read in the order of the values (original first), and pairs left out of relative
 * measures (mean below 10 × DL) neither judged nor ranked by HARD. Hand-built set: 66 pulp pairs at grades
 * 0.2·1.05^i g/t with a 2 % spread (enough for a Thompson–Howarth model, 50 pairs), one high-grade pair O-HI /
 * D-HI = 1.00 / 1.50 (HARD 0.5 / 2.5 = 20 %, above the 10 % limit) and one low pair O-LO / D-LO = 0.005 / 0.030
 * with DL 0.005 (mean 0.0175 < 10 × 0.005 = 0.05; HARD 0.025 / 0.035 = 71 %, the largest of the set).
 */
class FlaggedPairsTest {

    static List<DuplicatePair> pairs() {
        List<DuplicatePair> out = new ArrayList<>();
        for (int i = 0; i < 66; i++) {
            double c = 0.2 * Math.pow(1.05, i);
            double spread = 0.02 * ((i % 5) - 2) / 2.0;
            out.add(pair("D" + i, "O" + i, c * (1 + spread), c * (1 - spread)));
        }
        out.add(pair("D-HI", "O-HI", 1.00, 1.50));
        out.add(pair("D-LO", "O-LO", 0.005, 0.030));
        return out;
    }

    private static DuplicatePair pair(String id, String originalId, double original, double duplicate) {
        return new DuplicatePair(id, originalId, "J1", QcRole.PULP_DUPLICATE, AssayValue.detected(original, 0.005),
                AssayValue.detected(duplicate, 0.005));
    }

    static DuplicateSetResult set() {
        return DuplicateAnalysis.run("Au", "g/t", pairs(), List.of(), new double[0], DuplicateSettings.DEFAULTS)
                .sets().get(0);
    }

    @Test
    void idsAndValuesAreOriginalFirst() {
        OutlierPair hi = set().outliers().stream().filter(o -> o.id().equals("D-HI")).findFirst().orElseThrow();
        assertEquals("O-HI / D-HI", hi.idsOriginalFirst());
        assertEquals("1", hi.original());
        assertEquals("1.5", hi.duplicate());
        assertEquals(0.2, hi.hard(), 1e-12);
    }

    @Test
    void aPairBelowTheRelativeThresholdIsNotRankedByHard() {
        DuplicateSetResult s = set();
        assertTrue(s.model().available(), s.model().note());
        // Before: D-LO led the HARD-ranked list (71 %) although HARD is not used below 10 × DL.
        assertTrue(s.outliers().stream().noneMatch(o -> o.id().equals("D-LO")), s.outliers().toString());
        assertEquals("D-HI", s.outliers().get(0).id(), "the largest HARD among pairs used in relative measures");
        // The 99 % line still flags it (|d| = 0.025 at mean 0.0175, far above 3.64 σ_c there): listed apart.
        OutlierPair lo = s.outliersBelowRelativeThreshold().get(0);
        assertEquals("O-LO / D-LO", lo.idsOriginalFirst());
        assertEquals(List.of(OutlierPair.Test.ABOVE_99_PERCENT_LINE), lo.tests());
        assertEquals(0.025, lo.absDifference(), 1e-15);
    }

    /**
     * The per-pair flags the charts draw are the decisions of the lists above, pair for pair: D-HI is beyond the
     * HARD limit among both the absolute and the relative pairs; D-LO is above the 99 % line but, left out of
     * relative measures, never beyond the HARD limit, although its HARD (71 %) is above 10 %.
     */
    @Test
    void pairFlagsAreTheListedDecisions() {
        DuplicateSetResult s = set();
        DuplicateSetResult.PairValues v = s.pairs();
        int hi = indexOf(v.absoluteA(), v.absoluteB(), 1.00, 1.50);
        int lo = indexOf(v.absoluteA(), v.absoluteB(), 0.005, 0.030);
        assertTrue(v.absoluteFlags().beyondHardLimit()[hi]);
        assertTrue(v.absoluteFlags().aboveLine99()[lo]);
        assertTrue(!v.absoluteFlags().beyondHardLimit()[lo], "not judged by HARD below 10 x DL");
        assertEquals(-1, indexOf(v.relativeA(), v.relativeB(), 0.005, 0.030), "D-LO is not a relative pair");
        assertTrue(v.relativeFlags().beyondHardLimit()[indexOf(v.relativeA(), v.relativeB(), 1.00, 1.50)]);
        long listedHard = s.outliers().stream().filter(o -> o.tests().contains(OutlierPair.Test.OUTSIDE_HARD_LIMIT))
                .count();
        long listedLine = java.util.stream.Stream.concat(s.outliers().stream(),
                s.outliersBelowRelativeThreshold().stream())
                .filter(o -> o.tests().contains(OutlierPair.Test.ABOVE_99_PERCENT_LINE)).count();
        assertEquals(listedHard, count(v.relativeFlags().beyondHardLimit()));
        assertEquals(listedHard, count(v.absoluteFlags().beyondHardLimit()), "every relative pair here is absolute");
        assertEquals(listedLine, count(v.absoluteFlags().aboveLine99()));
    }

    private static int indexOf(double[] a, double[] b, double original, double duplicate) {
        for (int i = 0; i < a.length; i++) {
            if (a[i] == original && b[i] == duplicate) {
                return i;
            }
        }
        return -1;
    }

    private static long count(boolean[] flags) {
        long n = 0;
        for (boolean f : flags) {
            n += f ? 1 : 0;
        }
        return n;
    }
}
