package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.assay.Numbers;
import org.cupel.assay.Qualifier;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/** Invariants of cell reading over arbitrary input. */
class ValueParserProperties {
    private static final SourceLocation AT = new SourceLocation("f.csv", 1, 1);
    private final ValueParser parser = new ValueParser(ValueConventions.DEFAULTS);
    private final ValueParser commaParser = new ValueParser(new ValueConventions(true, true, true,
            ValueConventions.DEFAULTS.belowDetectionCodes(), ValueConventions.DEFAULTS.missingCodes(),
            ValueConventions.DEFAULTS.detectionLimits(), ValueConventions.DEFAULTS.repeatSuffixes()));

    /** A cell's text and the detection limit the file gives for it. */
    record Cell(String text, double limit) {
    }

    /**
     * Any text (half the tries), or a short text of what cells are made of: digits, marks, signs, qualifiers,
     * codes and spaces, so that near-numbers and near-codes are common.
     */
    private static final Gen<String> TEXT = Gen.oneOf(Gen.anyStrings(255),
            Gen.strings("0123456789.,-+<>eE %NDBLISnabdl\u00a0\t", 0, 20));

    @Test
    void neverThrowsAndGivesExactlyAValueOrAnExclusion() {
        Gen<Double> limits = Gen.anyDoubles();
        List<Gen<Cell>> edges = List.of(r -> new Cell("", limits.next(r)), Gen.constant(new Cell("<", Double.NaN)),
                Gen.constant(new Cell("1", Double.POSITIVE_INFINITY)), Gen.constant(new Cell("<0", -0.0)));
        SeededTries.forAll(1000, edges, r -> new Cell(TEXT.next(r), limits.next(r)), cell -> {
            for (ValueParser p : new ValueParser[] {parser, commaParser}) {
                ParsedValue r = p.parse(cell.text(), cell.limit(), AT);
                if (r.value() == null) {
                    assertEquals(DataIssue.Severity.EXCLUDED, r.issue().severity());
                } else {
                    assertTrue(r.issue() == null || r.issue().severity() == DataIssue.Severity.WARNING);
                }
            }
        });
    }

    @Test
    void aPrintedPositiveNumberReadsBackExactly() {
        List<Gen<Double>> edges = List.of(Gen.constant(0.0), Gen.constant(1e-12), Gen.constant(1e9));
        SeededTries.forAll(1000, edges, Gen.doubles(0, 1e9, 12), v -> {
            String text = Numbers.compact(v);
            assertEquals(v, parser.parse(text, Double.NaN, AT).value().value(), 0.0);
        });
    }

    @Test
    void lessThanAnyPositiveNumberIsCensoredAtThatNumber() {
        List<Gen<Double>> edges = List.of(Gen.constant(1e-6), Gen.constant(1e6));
        SeededTries.forAll(1000, edges, Gen.doubles(1e-6, 1e6, 9), v -> {
            var value = parser.parse("<" + Numbers.compact(v), Double.NaN, AT).value();
            assertEquals(Qualifier.BELOW_DETECTION, value.qualifier());
            assertEquals(v, value.limit(), 0.0);
        });
    }
}
