package org.cupel.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.cupel.ingest.ValueConventions;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;

/** Through the reader: the same testwork written in g/t, ppm, oz/st or ppb gives the same recovery. */
class ReaderUnitPropertiesTest {

    private static double recovery(GradeUnit unit, String symbol, double slagGpt, String massUnit, double massFactor)
            throws IOException {
        Path dir = Files.createTempDirectory("cupel-units");
        try {
            double f = GradeUnit.G_PER_T.convert(1, unit);
            Files.writeString(dir.resolve("heads.csv"), String.format(Locale.ROOT,
                    "feed,Au_%s\nF1,%.17g\nF1,%.17g\n", symbol, 40.0 * f, 41.0 * f));
            Files.writeString(dir.resolve("smelts.csv"), String.format(Locale.ROOT,
                    "test_id,condition,feed,charge_%s,product,mass_%s,Au_%s\nT1,A,F1,%.17g,button,%.17g,%.17g\n"
                            + "T1,A,F1,%.17g,slag,%.17g,%.17g\n", massUnit, massUnit, symbol, 50 * massFactor,
                    20 * massFactor, 98.0 * f, 50 * massFactor, 130 * massFactor, slagGpt * f));
            Testwork t = TestworkReader.read(dir, RecoverySettings.DEFAULTS, ValueConventions.DEFAULTS);
            return RecoveryAnalysis.run(t, RecoverySettings.DEFAULTS).smelts().get(0).byLoss();
        } finally {
            for (String name : new String[] {"heads.csv", "smelts.csv"}) {
                Files.deleteIfExists(dir.resolve(name));
            }
            Files.deleteIfExists(dir);
        }
    }

    /** The unit the grades are written in and the slag grade in g/t. */
    record Written(GradeUnit unit, double slagGpt) {
    }

    private static final Gen<GradeUnit> UNITS = Gen.of(GradeUnit.PPM, GradeUnit.OZ_PER_SHORT_TON, GradeUnit.PPB,
            GradeUnit.MG_PER_KG);

    @Test
    void recoveryDoesNotDependOnTheUnitsWritten() {
        Gen<Double> slag = Gen.doubles(0.05, 5);
        List<Gen<Written>> ends = List.of(r -> new Written(UNITS.next(r), 0.05), r -> new Written(UNITS.next(r), 5));
        SeededTries.forAll(40, ends, r -> new Written(UNITS.next(r), slag.next(r)), in -> {
            double inGpt = recovery(GradeUnit.G_PER_T, "g/t", in.slagGpt(), "g", 1);
            double other = recovery(in.unit(), in.unit().symbol(), in.slagGpt(), "kg", 1e-3);
            assertEquals(inGpt, other, 1e-9);
        });
    }
}
