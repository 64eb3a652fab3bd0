package org.cupel.control.crm;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.LocalDate;
import java.util.List;
import org.cupel.assay.LimitComparison;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * z-scores and rule outcomes do not depend on the unit: multiplying every value, certified value and SD
 * by one factor (a unit change, e.g. g/t to ppb) leaves z and every verdict unchanged (z is a ratio of
 * differences; common practice, ISO 13528 defines z in units of σ_pt).
 */
class CrmScalingProperties {

    private static CrmReview review(List<Double> z, double factor) {
        CrmFixture f = new CrmFixture().certificate("MID", 2.5 * factor, 0.1 * factor)
                .certificate("HIGH", 9.0 * factor, 0.3 * factor);
        for (int i = 0; i < z.size(); i++) {
            String b = "B" + i;
            f.batch(b, LocalDate.of(2025, 1, 1).plusDays(i));
            f.crm(b + "-M", b, 1, "MID", org.cupel.assay.AssayValue.detected((2.5 + 0.1 * z.get(i)) * factor,
                    0.005 * factor));
        }
        return CrmReview.of(f.project());
    }

    /** 1 to 25 z-scores in [−6, 6] and a unit factor in [0.001, 1000] with four decimals. */
    record Series(List<Double> z, double factor) {
    }

    @Test
    void zAndVerdictsAreInvariantToUnitScaling() {
        Gen<List<Double>> zs = Gen.doubles(-6, 6).list(1, 25);
        Gen<Double> factor = Gen.doubles(1e-3, 1e3, 4);
        List<Gen<Series>> extremes = List.of(r -> new Series(zs.next(r), 1e-3), r -> new Series(zs.next(r), 1e3),
                r -> new Series(List.of(-6.0, 6.0, 0.0), factor.next(r)));
        SeededTries.forAll(200, extremes, r -> new Series(zs.next(r), factor.next(r)), in -> {
            List<Double> z = in.z();
            SeriesReview a = review(z, 1).series().get(0);
            SeriesReview b = review(z, in.factor()).series().get(0);
            for (int i = 0; i < z.size(); i++) {
                // 1e-6 absolute on z: two roundings of values near 1e3·9 in double precision, far below rule limits.
                assertEquals(a.results().get(i).z(), b.results().get(i).z(), 1e-6);
                if (Math.abs(Math.abs(z.get(i)) - 2) > 1e-6 && Math.abs(Math.abs(z.get(i)) - 3) > 1e-6) {
                    assertEquals(a.results().get(i).verdict(), b.results().get(i).verdict());
                    assertEquals(a.results().get(i).swapWith(), b.results().get(i).swapWith());
                }
            }
        });
    }

    @Test
    void zBandsFollowIso13528() {
        // The band limits themselves (|z| = 2 is satisfactory, |z| = 3 unsatisfactory), the doubles beside
        // them (on the limit within LimitComparison's 1e-9 relative tolerance), values a real hair beyond the
        // tolerance (1e-8 relative), zero and the ends of the range: random doubles never land on a limit.
        List<Gen<Double>> limits = new java.util.ArrayList<>();
        for (double z : new double[] {2, 3, Math.nextUp(2.0), Math.nextDown(3.0), 2 * (1 + 1e-8), 3 * (1 - 1e-8),
                0, 10}) {
            limits.add(Gen.constant(z));
            limits.add(Gen.constant(-z));
        }
        SeededTries.forAll(300, limits, Gen.doubles(-10, 10), z -> {
            // ISO 13528 bands, a value on a limit decided as every limit is (LimitComparison).
            double a = Math.abs(z);
            ZBand expected = LimitComparison.atMost(a, 2) ? ZBand.SATISFACTORY
                    : LimitComparison.below(a, 3) ? ZBand.QUESTIONABLE : ZBand.UNSATISFACTORY;
            assertEquals(expected, ZBand.of(z));
            assertEquals(ZBand.of(z), ZBand.of(-z));
        });
    }
}
