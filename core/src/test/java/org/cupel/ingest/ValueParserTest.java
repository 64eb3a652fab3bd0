package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.Qualifier;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every value convention of docs/input-formats.md. The conventions are common practice of assay labs'
 * result files (no published source); each row states the cell and the value it must give.
 */
class ValueParserTest {
    private static final SourceLocation AT = new SourceLocation("lab.csv", 7, 3);
    private final ValueParser defaults = new ValueParser(ValueConventions.DEFAULTS);

    @ParameterizedTest(name = "''{0}'' is detected {1}")
    @CsvSource(delimiter = '|', value = {
        "1.23|1.23", "0.005|0.005", "12|12", "  4.5  |4.5", "+0.7|0.7", ".5|0.5", "1,234.5|1234.5",
        "1,234,567|1234567", "1.2E-3|0.0012", "3e2|300", "0|0"})
    void detectedNumbers(String cell, double expected) {
        ParsedValue p = defaults.parse(cell, Double.NaN, AT);
        assertEquals(Qualifier.DETECTED, p.value().qualifier());
        assertEquals(expected, p.value().value(), 0.0, "exact: the decimal text is parsed once");
        assertNull(p.issue());
    }

    /**
     * The decimals the lab wrote are kept, so that {@code 0.070} is shown as written and not as 0.07
     * (issue 17: a value is shown at the lab's precision). Exponent notation and codes have no count of
     * decimals. Hand-checked: the count is the number of digits after the decimal mark.
     */
    @ParameterizedTest(name = "''{0}'' is shown as ''{2}'' ({1} decimals)")
    @CsvSource(delimiter = '|', value = {
        "0.070|3|0.070", "0.100|3|0.100", "1.0|1|1.0", "12|0|12", "7.|0|7", ".5|1|0.5", "1,234.50|2|1234.50",
        "<0.0050|4|<0.0050", "< 0.5|1|<0.5", "-0.010|3|<0.010", ">10.0|1|>10.0", "1.2E-3|-1|0.0012",
        "0.00000000000000000000001000|26|0.00000000000000000000001000"})
    void theDecimalsAsWrittenAreKept(String cell, int decimals, String shown) {
        AssayValue v = defaults.parse(cell, Double.NaN, AT).value();
        assertEquals(decimals, v.decimals(), cell);
        assertEquals(shown, v.display(), cell);
    }

    @Test
    void aCodeHasNoWrittenDecimals() {
        AssayValue v = defaults.parse("BDL", 0.010, AT).value();
        assertEquals(-1, v.decimals());
        assertEquals("<0.01", v.display(), "the configured limit, shortest form");
    }

    @ParameterizedTest(name = "''{0}'' is below detection at {1}")
    @CsvSource(delimiter = '|', value = {"<0.005|0.005", "< 0.005|0.005", "<=0.01|0.01", "-0.005|0.005", "-2|2"})
    void belowDetectionWithLimitInTheCell(String cell, double limit) {
        AssayValue v = defaults.parse(cell, Double.NaN, AT).value();
        assertEquals(Qualifier.BELOW_DETECTION, v.qualifier());
        assertEquals(limit, v.value(), 0.0);
        assertEquals(limit, v.limit(), 0.0);
    }

    @ParameterizedTest(name = "''{0}'' is above the upper limit {1}")
    @CsvSource(delimiter = '|', value = {">10|10", "> 10|10", ">1,000|1000"})
    void aboveUpperLimit(String cell, double limit) {
        AssayValue v = defaults.parse(cell, Double.NaN, AT).value();
        assertEquals(Qualifier.ABOVE_UPPER_LIMIT, v.qualifier());
        assertEquals(limit, v.limit(), 0.0);
    }

    @ParameterizedTest(name = "code ''{0}'' is below the stated limit")
    @CsvSource({"BDL", "ND", "<DL", "LTD", "LOD", "bdl", "nd"})
    void belowDetectionCodesTakeTheStatedLimit(String cell) {
        AssayValue v = defaults.parse(cell, 0.01, AT).value();
        assertEquals(Qualifier.BELOW_DETECTION, v.qualifier());
        assertEquals(0.01, v.limit(), 0.0);
    }

    @Test
    void belowDetectionCodeWithoutAStatedLimitIsAnExclusionThatSaysHowToFixIt() {
        ParsedValue p = defaults.parse("BDL", Double.NaN, AT);
        assertNull(p.value());
        assertEquals(DataIssue.Severity.EXCLUDED, p.issue().severity());
        assertEquals("BDL", p.issue().found());
        assertTrue(p.issue().fix().contains("ingest.detectionLimits"));
        assertEquals(AT, p.issue().where());
    }

    @ParameterizedTest(name = "''{0}'' is missing: {1}")
    @CsvSource(delimiter = '|', value = {
        "NR|NOT_RECEIVED", "NRS|NOT_RECEIVED", "not received|NOT_RECEIVED", "Not  Received|NOT_RECEIVED",
        "IS|INSUFFICIENT_SAMPLE", "I.S.|INSUFFICIENT_SAMPLE", "INS|INSUFFICIENT_SAMPLE",
        "insufficient|INSUFFICIENT_SAMPLE", "NSS|INSUFFICIENT_SAMPLE",
        "NA|NOT_ANALYSED", "N/A|NOT_ANALYSED", "n/a|NOT_ANALYSED", "not analysed|NOT_ANALYSED",
        "'   '|BLANK_CELL", "''|BLANK_CELL"})
    void missingCodes(String cell, MissingReason reason) {
        ParsedValue p = defaults.parse(cell, Double.NaN, AT);
        assertTrue(p.value().isMissing());
        assertEquals(reason, p.value().missingReason());
        assertNull(p.issue());
    }

    @Test
    void nullCellIsBlank() {
        assertEquals(MissingReason.BLANK_CELL, defaults.parse(null, Double.NaN, AT).value().missingReason());
    }

    @ParameterizedTest(name = "decimal comma: ''{0}'' is {1}")
    @CsvSource(delimiter = '|', value = {"1,23|1.23", "0,005|0.005", "1.234,5|1234.5", "1 234,5|1234.5",
        "<0,005|0.005", "12|12"})
    void decimalComma(String cell, double expected) {
        ValueParser p = new ValueParser(with(true, true, true));
        assertEquals(expected, p.parse(cell, Double.NaN, AT).value().value(), 0.0);
    }

    @ParameterizedTest(name = "decimal comma on: ''{0}'' is refused as ambiguous")
    @CsvSource({"0.005", "1.5"})
    void decimalCommaRefusesAPointThatCannotBeGrouping(String cell) {
        ParsedValue p = new ValueParser(with(true, true, true)).parse(cell, Double.NaN, AT);
        assertNull(p.value());
        assertNotNull(p.issue());
    }

    @ParameterizedTest(name = "decimal comma off: ''{0}'' points at the setting")
    @CsvSource({"'1,23'", "'0,005'", "'<0,005'"})
    void decimalCommaWithoutTheSettingSaysWhichSettingToChange(String cell) {
        ParsedValue p = defaults.parse(cell, Double.NaN, AT);
        assertNull(p.value());
        assertTrue(p.issue().fix().contains("ingest.decimalComma"), p.issue().fix());
    }

    @Test
    void negativeIsAnErrorWhenTheLabNeverMeansBelowDetection() {
        ParsedValue p = new ValueParser(with(false, false, true)).parse("-0.005", Double.NaN, AT);
        assertNull(p.value());
        assertTrue(p.issue().fix().contains("negativeMeansBelowDetection"));
    }

    @Test
    void thousandsGroupingCanBeSwitchedOff() {
        assertNull(new ValueParser(with(false, true, false)).parse("1,234", Double.NaN, AT).value());
        assertEquals(1234.0, defaults.parse("1,234", Double.NaN, AT).value().value(), 0.0);
    }

    @ParameterizedTest(name = "''{0}'' is not a value")
    @CsvSource(delimiter = '|', value = {"abc", "1.2.3", "1,23,4", "12ppm", "NaN", "Infinity", "1e999", "1d",
        "0x1A", "<", "<abc", "<0", "> -1", "-0", "1e", "--5", "#N/A", "1,2345"})
    void textThatIsNotAValueIsAnExclusionNamingTheCell(String cell) {
        ParsedValue p = defaults.parse(cell, Double.NaN, AT);
        assertNull(p.value(), () -> "parsed as " + p.value());
        assertEquals(DataIssue.Severity.EXCLUDED, p.issue().severity());
        assertEquals(cell, p.issue().found());
        assertEquals(AT, p.issue().where());
        assertTrue(!p.issue().expected().isEmpty() && !p.issue().fix().isEmpty());
    }

    @Test
    void detectedValueKeepsTheStatedDetectionLimit() {
        assertEquals(0.005, defaults.parse("1.2", 0.005, AT).value().limit(), 0.0);
    }

    @Test
    void configuredCodesAreRead() {
        ValueConventions c = new ValueConventions(false, true, true, List.of("<LLD"),
                Map.of("LOST", MissingReason.NOT_RECEIVED), Map.of("Au", 0.002), List.of());
        ValueParser p = new ValueParser(c);
        assertEquals(0.002, p.parse("<lld", c.detectionLimit("Au"), AT).value().limit(), 0.0);
        assertEquals(MissingReason.NOT_RECEIVED, p.parse("lost", Double.NaN, AT).value().missingReason());
        assertNull(p.parse("BDL", Double.NaN, AT).value(), "BDL is not a code of this lab");
    }

    @ParameterizedTest(name = "''{0}'' is a lab repeat of ''{1}''")
    @CsvSource(delimiter = '|', value = {"S1001 R|S1001", "S1001-R|S1001", "S1001_R|S1001", "S1001 RPT|S1001",
        "S1001 Rpt|S1001", "S1001_DUP|S1001"})
    void repeatSuffixes(String id, String original) {
        assertEquals(original, ValueConventions.DEFAULTS.repeatOf(id).orElseThrow());
    }

    @Test
    void idsWithoutAMarkerAreNotRepeats() {
        assertTrue(ValueConventions.DEFAULTS.repeatOf("S1001").isEmpty());
        assertTrue(ValueConventions.DEFAULTS.repeatOf("BAR").isEmpty());
        assertTrue(ValueConventions.DEFAULTS.repeatOf("-R").isEmpty());
    }

    private static ValueConventions with(boolean decimalComma, boolean negativeBelow, boolean grouping) {
        ValueConventions d = ValueConventions.DEFAULTS;
        return new ValueConventions(decimalComma, negativeBelow, grouping, d.belowDetectionCodes(),
                d.missingCodes(), d.detectionLimits(), d.repeatSuffixes());
    }
}
