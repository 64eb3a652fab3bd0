package org.cupel.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Size;
import org.cupel.assay.AssayValue;
import org.cupel.units.GradeUnit;

class RecoveryPropertiesTest {

    private static SmeltRecovery recovery(double charge, double button, double buttonGpt, double slag, double slagGpt,
                                          double headGpt) {
        Smelt s = Fixtures.smelt("T", "A", charge, Fixtures.button(button, buttonGpt),
                Fixtures.slag(slag, AssayValue.detected(slagGpt)));
        HeadGrade h = HeadGrade.of("F1", "Au", List.of(AssayValue.detected(headGpt)), RecoverySettings.DEFAULTS);
        return SmeltRecovery.compute(s, "Au", h, CensoredAs.LIMIT, 0.05);
    }

    /** Recovery is a ratio of metals, so scaling every mass by one factor leaves it unchanged. */
    @Property(tries = 300)
    void invariantToCommonScalingOfMasses(@ForAll @DoubleRange(min = 0.01, max = 100) double factor,
                                          @ForAll @DoubleRange(min = 10, max = 500) double charge,
                                          @ForAll @DoubleRange(min = 0.1, max = 20) double slagGpt) {
        SmeltRecovery a = recovery(charge, 30, 900, 250, slagGpt, 300);
        SmeltRecovery b = recovery(charge * factor, 30 * factor, 900, 250 * factor, slagGpt, 300);
        assertEquals(a.byLoss(), b.byLoss(), 1e-9);
        assertEquals(a.direct(), b.direct(), 1e-9);
        assertEquals(a.calculated(), b.calculated(), 1e-9);
    }

    /**
     * Grades reported in ppm or oz/st and converted to g/t by {@link GradeUnit} give the same recovery as
     * grades reported in g/t (1 g/t = 1 ppm; 1 oz/st = 240/7 g/t, NIST Handbook 44 Appendix C).
     */
    @Property(tries = 300)
    void invariantToGradeUnits(@ForAll @DoubleRange(min = 1, max = 2000) double headGpt,
                               @ForAll @DoubleRange(min = 0.1, max = 50) double slagGpt,
                               @ForAll("units") GradeUnit unit) {
        double toUnit = GradeUnit.G_PER_T.convert(1, unit);
        SmeltRecovery gpt = recovery(100, 40, headGpt * 2.4, 250, slagGpt, headGpt);
        SmeltRecovery other = recovery(100, 40, unit.convert(headGpt * 2.4 * toUnit, GradeUnit.G_PER_T), 250,
                unit.convert(slagGpt * toUnit, GradeUnit.G_PER_T), unit.convert(headGpt * toUnit, GradeUnit.G_PER_T));
        assertEquals(gpt.byLoss(), other.byLoss(), 1e-9);
        assertEquals(gpt.direct(), other.direct(), 1e-9);
    }

    @net.jqwik.api.Provide
    net.jqwik.api.Arbitrary<GradeUnit> units() {
        return net.jqwik.api.Arbitraries.of(GradeUnit.PPM, GradeUnit.OZ_PER_SHORT_TON, GradeUnit.OZ_PER_LONG_TON,
                GradeUnit.PPB);
    }

    /** Swapping the two conditions flips the sign of d, t and the CI and leaves ν and p unchanged. */
    @Property(tries = 300)
    void welchAntisymmetricUnderSwap(@ForAll @Size(min = 2, max = 6) List<@DoubleRange(min = 90, max = 100) Double> a,
                                     @ForAll @Size(min = 2, max = 6) List<@DoubleRange(min = 90, max = 100) Double> b) {
        double[] x = a.stream().mapToDouble(Double::doubleValue).toArray();
        double[] y = b.stream().mapToDouble(Double::doubleValue).toArray();
        WelchTest.Result ab = WelchTest.test(x, y, 0.95);
        WelchTest.Result ba = WelchTest.test(y, x, 0.95);
        if (!ab.computed()) {
            assertEquals(ab.note(), ba.note());
            return;
        }
        assertEquals(-ab.t(), ba.t(), 1e-9 * Math.max(1, Math.abs(ab.t())));
        assertEquals(ab.df(), ba.df(), 1e-9 * ab.df());
        assertEquals(ab.p(), ba.p(), 1e-12);
        assertEquals(-ab.lower(), ba.upper(), 1e-9);
        assertEquals(-ab.upper(), ba.lower(), 1e-9);
    }

    /** Holm-adjusted p-values never fall below the raw ones and keep their order. */
    @Property(tries = 300)
    void holmIsMonotone(@ForAll @Size(min = 1, max = 10) List<@DoubleRange(min = 0, max = 1) Double> p) {
        double[] raw = p.stream().mapToDouble(Double::doubleValue).toArray();
        double[] adj = Holm.adjust(raw);
        for (int i = 0; i < raw.length; i++) {
            org.junit.jupiter.api.Assertions.assertTrue(adj[i] >= raw[i] - 1e-15 && adj[i] <= 1);
            for (int j = 0; j < raw.length; j++) {
                if (raw[i] < raw[j]) {
                    org.junit.jupiter.api.Assertions.assertTrue(adj[i] <= adj[j] + 1e-15);
                }
            }
        }
    }
}
