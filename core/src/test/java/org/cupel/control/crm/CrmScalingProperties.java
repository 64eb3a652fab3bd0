package org.cupel.control.crm;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.LocalDate;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import net.jqwik.api.constraints.Size;

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

    @Property(tries = 200)
    void zAndVerdictsAreInvariantToUnitScaling(@ForAll @Size(min = 1, max = 25) List<@DoubleRange(min = -6, max = 6) Double> z,
                                               @ForAll @DoubleRange(min = 1e-3, max = 1e3) @Scale(4) double factor) {
        SeriesReview a = review(z, 1).series().get(0);
        SeriesReview b = review(z, factor).series().get(0);
        for (int i = 0; i < z.size(); i++) {
            // 1e-6 absolute on z: two roundings of values near 1e3·9 in double precision, far below rule limits.
            assertEquals(a.results().get(i).z(), b.results().get(i).z(), 1e-6);
            if (Math.abs(Math.abs(z.get(i)) - 2) > 1e-6 && Math.abs(Math.abs(z.get(i)) - 3) > 1e-6) {
                assertEquals(a.results().get(i).verdict(), b.results().get(i).verdict());
                assertEquals(a.results().get(i).swapWith(), b.results().get(i).swapWith());
            }
        }
    }

    @Property(tries = 300)
    void zBandsFollowIso13528(@ForAll @DoubleRange(min = -10, max = 10) double z) {
        ZBand expected = Math.abs(z) <= 2 ? ZBand.SATISFACTORY : Math.abs(z) < 3 ? ZBand.QUESTIONABLE
                : ZBand.UNSATISFACTORY;
        assertEquals(expected, ZBand.of(z));
        assertEquals(ZBand.of(z), ZBand.of(-z));
    }
}
