package org.cupel.control.crm;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Drift needs a sustained signal; one result far out is an outlier finding. Hand-built CRM series on a
 * certificate of 1.000 ± 0.050 g/t, one result per batch (undated, so time is the sequence number), with a
 * background that alternates z = +0.3, −0.3 (1.015, 0.985). EWMA: NIST/SEMATECH e-Handbook 6.3.2.4 (λ = 0.2,
 * L = 3); CUSUM: Montgomery, tabular CUSUM (k = 0.5, h = 5); arithmetic in each test.
 */
class DriftOutlierTest {
    private static final double CERTIFIED = 1.000;
    private static final double SD = 0.050;

    /** The series with z-scores {@code z} (values certified + z·SD, rounded to the 0.001 a lab reports). */
    private static SeriesReview review(double... z) {
        CrmFixture f = new CrmFixture().certificate("K", CERTIFIED, SD);
        for (int i = 0; i < z.length; i++) {
            f.crm("C" + (i + 1), String.format("B%02d", i + 1), 1, "K", Math.round((CERTIFIED + z[i] * SD) * 1000) / 1000.0);
        }
        return CrmReview.of(f.project()).series("K", "Au").orElseThrow();
    }

    private static double[] background(int n) {
        double[] z = new double[n];
        for (int i = 0; i < n; i++) {
            z[i] = i % 2 == 0 ? 0.3 : -0.3;
        }
        return z;
    }

    /** 15 background results, then 15 at {@code level} ± 0.3. */
    private static double[] stepTo(double level) {
        double[] z = background(30);
        for (int i = 15; i < 30; i++) {
            z[i] += level;
        }
        return z;
    }

    @Test
    void oneFiveSdResultIsAnOutlierNotDrift() {
        // 30 results, result 16 at +5 SD (1.250). Before the spike the EWMA oscillates about ±0.033 (E = 0.06 +
        // 0.8·E' and E' = −0.06 + 0.8·E give E = 0.0333 after a +0.3). At the spike E = 0.2·5 + 0.8·0.0333 = 1.027,
        // above the limit 3·√(0.2/1.8·(1 − 0.8^32)) = 0.9996: without the exclusion that single result read as
        // "EWMA outside its limits", i.e. drift. CUSUM: C⁺ = 5 − 0.5 = 4.5 ≤ 5, no signal either way.
        double[] z = background(30);
        z[15] = 5;
        SeriesReview s = review(z);
        SeriesDrift d = s.drift();
        assertFalse(d.drifting(), d.findings().toString());
        assertEquals(1, d.outliers().size());
        DriftOutlier o = d.outliers().get(0);
        assertEquals("C16", o.sampleId());
        assertEquals(15, o.index());
        assertEquals(5.0, o.z(), 1e-9);
        assertTrue(o.finding().contains("not drift"), o.finding());
        assertEquals(29, d.ewma().n(), "the EWMA runs over the 29 other results");
        // The result itself still fails 1-3s: it is a single-result problem, reported as such.
        assertTrue(s.results().get(15).rules().contains("1-3s"));
    }

    @Test
    void aStepShiftIsDrift() {
        // 15 background results, then 15 at +1.5 ± 0.3 (z 1.8, 1.2, ...): C⁺ grows by 1.3 and 0.7 in turn, so it
        // passes h = 5 at the sixth shifted result (1.3 + 0.7 + 1.3 + 0.7 + 1.3 + 0.7 = 6.0). No result is beyond 3.
        SeriesDrift d = review(stepTo(1.5)).drift();
        assertTrue(d.drifting());
        assertEquals(List.of(), d.outliers());
        assertTrue(d.findings().stream().anyMatch(f -> f.startsWith("CUSUM")), d.findings().toString());
        assertEquals(21, d.judgedIndex(d.cusum().firstSignal()) + 1, "result 21: the sixth of the shift");
    }

    @Test
    void aLargeStepShiftBeyondThreeSdIsDriftNotOutliers() {
        // 15 background results, then 15 at +4 ± 0.3 (z 4.3, 3.7): every shifted result is beyond 3 SD but has a
        // neighbour beyond 2 SD on its side, so none is isolated and the shift stays in the drift statistics.
        SeriesDrift d = review(stepTo(4)).drift();
        assertTrue(d.drifting());
        assertEquals(List.of(), d.outliers());
    }

    @Test
    void aLinearTrendIsDrift() {
        // z = −1.5 + 0.1·(i − 1) ± 0.3 over 30 results: from −1.5 to +1.4 SD, none beyond 2. The least-squares slope
        // of z on the sequence number is about 0.1 per result, with a residual SD near 0.3 over 30 points: SE(b) ≈
        // 0.3/√(Σ(t − t̄)²) = 0.3/√2247.5 = 0.0063, t ≈ 16, p far below 0.05.
        double[] z = background(30);
        for (int i = 0; i < 30; i++) {
            z[i] += -1.5 + 0.1 * i;
        }
        SeriesDrift d = review(z).drift();
        assertTrue(d.drifting());
        assertTrue(d.trend().pValue() < 1e-6, d.trend().toString());
        assertEquals(0.1, d.trend().slope(), 0.01);
        assertEquals(List.of(), d.outliers());
    }

    @Test
    void whatCountsAsIsolated() {
        // Beyond 3 with no neighbour beyond 2 on its side: isolated. A neighbour at 2.5 on the same side joins it
        // into a shift; one on the other side does not. Exactly 3 SD (1.377 on 1.236 ± 0.047, double
        // 3.0000000000000004) is not beyond 3. Two adjacent results beyond 3 are a shift, not two outliers.
        assertArrayEquals(new boolean[] {false, true, false}, IsolatedOutliers.of(new double[] {0, 5, 0}));
        assertArrayEquals(new boolean[] {false, false, false}, IsolatedOutliers.of(new double[] {0, 5, 2.5}));
        assertArrayEquals(new boolean[] {false, true, false}, IsolatedOutliers.of(new double[] {0, 5, -2.5}));
        assertArrayEquals(new boolean[] {false}, IsolatedOutliers.of(new double[] {(1.377 - 1.236) / 0.047}));
        assertArrayEquals(new boolean[] {false, false}, IsolatedOutliers.of(new double[] {5, -5.5 * -1}));
        assertArrayEquals(new boolean[] {true}, IsolatedOutliers.of(new double[] {-4}));
    }
}
