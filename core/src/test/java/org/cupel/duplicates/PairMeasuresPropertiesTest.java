package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

class PairMeasuresPropertiesTest {
    private static final Gen<Double> VALUE = Gen.doubles(1e-4, 1e4, 8);
    private static final Gen<Double> SCALE = Gen.doubles(1e-3, 1e3, 8);

    /** Two results of a pair and a unit factor. */
    record Pair(double a, double b, double scale) {
    }

    private static final Gen<Pair> PAIRS = r -> new Pair(VALUE.next(r), VALUE.next(r), SCALE.next(r));

    /** Equal results (no difference), the two ends of the range either way round, at the extreme factors. */
    private static final List<Gen<Pair>> EDGES = List.of(Gen.constant(new Pair(1e-4, 1e-4, 1e-3)),
            Gen.constant(new Pair(1e4, 1e4, 1e3)), Gen.constant(new Pair(1e-4, 1e4, 1e3)),
            Gen.constant(new Pair(1e4, 1e-4, 1e-3)));

    // Relative tolerance 1e-12: the identities are exact, only floating-point rounding differs.
    private static void close(double expected, double actual) {
        assertEquals(expected, actual, 1e-12 * Math.max(1.0, Math.abs(expected)));
    }

    @Test
    void measuresAreSymmetric() {
        SeededTries.forAll(1000, EDGES, PAIRS, p -> {
            close(PairMeasures.hard(p.a(), p.b()), PairMeasures.hard(p.b(), p.a()));
            close(PairMeasures.rpd(p.a(), p.b()), PairMeasures.rpd(p.b(), p.a()));
            close(PairMeasures.cv(p.a(), p.b()), PairMeasures.cv(p.b(), p.a()));
        });
    }

    @Test
    void relativeMeasuresAreScaleInvariant() {
        SeededTries.forAll(1000, EDGES, PAIRS, p -> {
            double a = p.a();
            double b = p.b();
            double scale = p.scale();
            close(PairMeasures.hard(a, b), PairMeasures.hard(a * scale, b * scale));
            close(PairMeasures.rpd(a, b), PairMeasures.rpd(a * scale, b * scale));
            close(PairMeasures.cv(a, b), PairMeasures.cv(a * scale, b * scale));
        });
    }

    @Test
    void rpdIsTwiceHardAndCvIsRootTwoHard() {
        SeededTries.forAll(1000, EDGES, PAIRS, p -> {
            close(2 * PairMeasures.hard(p.a(), p.b()), PairMeasures.rpd(p.a(), p.b()));
            close(Math.sqrt(2) * PairMeasures.hard(p.a(), p.b()), PairMeasures.cv(p.a(), p.b()));
        });
    }
}
