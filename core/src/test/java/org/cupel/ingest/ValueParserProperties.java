package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.cupel.assay.Numbers;
import org.cupel.assay.Qualifier;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;

/** Invariants of cell reading over arbitrary input. */
class ValueParserProperties {
    private static final SourceLocation AT = new SourceLocation("f.csv", 1, 1);
    private final ValueParser parser = new ValueParser(ValueConventions.DEFAULTS);
    private final ValueParser commaParser = new ValueParser(new ValueConventions(true, true, true,
            ValueConventions.DEFAULTS.belowDetectionCodes(), ValueConventions.DEFAULTS.missingCodes(),
            ValueConventions.DEFAULTS.detectionLimits(), ValueConventions.DEFAULTS.repeatSuffixes()));

    @Property
    void neverThrowsAndGivesExactlyAValueOrAnExclusion(@ForAll String text, @ForAll double limit) {
        for (ValueParser p : new ValueParser[] {parser, commaParser}) {
            ParsedValue r = p.parse(text, limit, AT);
            if (r.value() == null) {
                assertEquals(DataIssue.Severity.EXCLUDED, r.issue().severity());
            } else {
                assertTrue(r.issue() == null || r.issue().severity() == DataIssue.Severity.WARNING);
            }
        }
    }

    @Property
    void aPrintedPositiveNumberReadsBackExactly(@ForAll @DoubleRange(min = 0, max = 1e9) @Scale(12) double v) {
        String text = Numbers.compact(v);
        assertEquals(v, parser.parse(text, Double.NaN, AT).value().value(), 0.0);
    }

    @Property
    void lessThanAnyPositiveNumberIsCensoredAtThatNumber(@ForAll @DoubleRange(min = 1e-6, max = 1e6) @Scale(9) double v) {
        var value = parser.parse("<" + Numbers.compact(v), Double.NaN, AT).value();
        assertEquals(Qualifier.BELOW_DETECTION, value.qualifier());
        assertEquals(v, value.limit(), 0.0);
    }
}
