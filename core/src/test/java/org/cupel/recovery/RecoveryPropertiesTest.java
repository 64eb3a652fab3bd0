package org.cupel.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.assay.AssayValue;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;

class RecoveryPropertiesTest {

    private static SmeltRecovery recovery(double charge, double button, double buttonGpt, double slag, double slagGpt,
                                          double headGpt) {
        Smelt s = Fixtures.smelt("T", "A", charge, Fixtures.button(button, buttonGpt),
                Fixtures.slag(slag, AssayValue.detected(slagGpt)));
        HeadGrade h = HeadGrade.of("F1", "Au", List.of(AssayValue.detected(headGpt)), RecoverySettings.DEFAULTS);
        return SmeltRecovery.compute(s, "Au", h, CensoredAs.LIMIT, 0.05);
    }

    /** A mass factor, a charge mass and a slag grade. */
    record Masses(double factor, double charge, double slagGpt) {
    }

    /** Recovery is a ratio of metals, so scaling every mass by one factor leaves it unchanged. */
    @Test
    void invariantToCommonScalingOfMasses() {
        Gen<Double> factor = Gen.doubles(0.01, 100);
        Gen<Double> charge = Gen.doubles(10, 500);
        Gen<Double> slag = Gen.doubles(0.1, 20);
        List<Gen<Masses>> ends = List.of(Gen.constant(new Masses(0.01, 10, 0.1)),
                Gen.constant(new Masses(100, 500, 20)));
        SeededTries.forAll(300, ends, r -> new Masses(factor.next(r), charge.next(r), slag.next(r)), in -> {
            double factorValue = in.factor();
            SmeltRecovery a = recovery(in.charge(), 30, 900, 250, in.slagGpt(), 300);
            SmeltRecovery b = recovery(in.charge() * factorValue, 30 * factorValue, 900, 250 * factorValue,
                    in.slagGpt(), 300);
            assertEquals(a.byLoss(), b.byLoss(), 1e-9);
            assertEquals(a.direct(), b.direct(), 1e-9);
            assertEquals(a.calculated(), b.calculated(), 1e-9);
        });
    }

    /** A head grade and a slag grade in g/t, and the unit they are also reported in. */
    record Grades(double headGpt, double slagGpt, GradeUnit unit) {
    }

    private static final Gen<GradeUnit> UNITS = Gen.of(GradeUnit.PPM, GradeUnit.OZ_PER_SHORT_TON,
            GradeUnit.OZ_PER_LONG_TON, GradeUnit.PPB);

    /**
     * Grades reported in ppm or oz/st and converted to g/t by {@link GradeUnit} give the same recovery as
     * grades reported in g/t (1 g/t = 1 ppm; 1 oz/st = 240/7 g/t, NIST Handbook 44 Appendix C).
     */
    @Test
    void invariantToGradeUnits() {
        Gen<Double> head = Gen.doubles(1, 2000);
        Gen<Double> slag = Gen.doubles(0.1, 50);
        List<Gen<Grades>> ends = List.of(r -> new Grades(1, 0.1, UNITS.next(r)), r -> new Grades(2000, 50, UNITS.next(r)));
        SeededTries.forAll(300, ends, r -> new Grades(head.next(r), slag.next(r), UNITS.next(r)), in -> {
            double headGpt = in.headGpt();
            double slagGpt = in.slagGpt();
            GradeUnit unit = in.unit();
            double toUnit = GradeUnit.G_PER_T.convert(1, unit);
            SmeltRecovery gpt = recovery(100, 40, headGpt * 2.4, 250, slagGpt, headGpt);
            SmeltRecovery other = recovery(100, 40, unit.convert(headGpt * 2.4 * toUnit, GradeUnit.G_PER_T), 250,
                    unit.convert(slagGpt * toUnit, GradeUnit.G_PER_T), unit.convert(headGpt * toUnit, GradeUnit.G_PER_T));
            assertEquals(gpt.byLoss(), other.byLoss(), 1e-9);
            assertEquals(gpt.direct(), other.direct(), 1e-9);
        });
    }

    /** The results of two conditions, 2 to 6 each, in [90, 100] %. */
    record Conditions(List<Double> a, List<Double> b) {
    }

    /** Swapping the two conditions flips the sign of d, t and the CI and leaves ν and p unchanged. */
    @Test
    void welchAntisymmetricUnderSwap() {
        Gen<List<Double>> results = Gen.doubles(90, 100).list(2, 6);
        // No spread in either condition (not computed), in one only, and the two ends of the range.
        List<Gen<Conditions>> edges = List.of(Gen.constant(new Conditions(List.of(90.0, 90.0), List.of(90.0, 90.0))),
                Gen.constant(new Conditions(List.of(100.0, 100.0), List.of(90.0, 90.0))),
                r -> new Conditions(List.of(95.0, 95.0), results.next(r)),
                Gen.constant(new Conditions(List.of(90.0, 100.0), List.of(100.0, 90.0, 100.0))));
        SeededTries.forAll(300, edges, r -> new Conditions(results.next(r), results.next(r)), in -> {
            double[] x = in.a().stream().mapToDouble(Double::doubleValue).toArray();
            double[] y = in.b().stream().mapToDouble(Double::doubleValue).toArray();
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
        });
    }

    /** Holm-adjusted p-values never fall below the raw ones and keep their order. */
    @Test
    void holmIsMonotone() {
        // One p-value at each end, and ties.
        List<Gen<List<Double>>> edges = List.of(Gen.constant(List.of(0.0)), Gen.constant(List.of(1.0)),
                Gen.constant(List.of(0.5, 0.5)), Gen.constant(List.of(0.0, 1.0, 0.0, 1.0)));
        SeededTries.forAll(300, edges, Gen.doubles(0, 1).list(1, 10), p -> {
            double[] raw = p.stream().mapToDouble(Double::doubleValue).toArray();
            double[] adj = Holm.adjust(raw);
            for (int i = 0; i < raw.length; i++) {
                assertTrue(adj[i] >= raw[i] - 1e-15 && adj[i] <= 1);
                for (int j = 0; j < raw.length; j++) {
                    if (raw[i] < raw[j]) {
                        assertTrue(adj[i] <= adj[j] + 1e-15);
                    }
                }
            }
        });
    }
}
