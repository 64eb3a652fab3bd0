package org.cupel.ingest;

import java.util.HashMap;
import java.util.HashSet;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.Numbers;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;
import org.cupel.units.GradeUnit;

/**
 * Reads the text of one analyte cell into an {@link AssayValue} under a lab's {@link ValueConventions}:
 * numbers (with decimal comma and thousands grouping as configured), {@code <0.005} and {@code >10},
 * negative numbers as below detection when so configured, below-detection codes at the stated limit,
 * missing codes with their reason, and blank cells. Anything else gives an issue saying what was found,
 * what was expected and how to fix it; this class never throws on cell text.
 *
 * <p>Two guards keep impossible numbers out of the statistics. A grade is a mass fraction, so a value or
 * limit above 100 % in its unit ({@link #ceiling}: 1,000,000 g/t, 100 %, 1e9 ppb) is a wrong unit or a
 * typing error, never an assay, and is left out with an issue; without a known unit the ceiling is 1e9,
 * which is 100 % in ppb, the smallest unit read. With every value at most 1e9, sums of squares of a
 * billion values stay below 1e27, far from the 1.8e308 at which a double overflows, so the statistics need
 * no scaled arithmetic. A number a double cannot hold (1e400, 1e-400, which would read as infinity or 0) is
 * left out with an issue too.
 *
 * <p>One parser reads one file: it remembers the first cell read with a thousands separator that could be
 * a decimal mark ({@code 1,234} as 1234) and the first cell that looks written with the other decimal mark
 * ({@code 0,512} when {@code ingest.decimalComma} is false). A file with both mixes two readings of one
 * character, and {@link #checkDecimalMarks()} refuses it rather than guess per cell.
 */
public final class ValueParser {
    static final String EXPECTED = "a number (1.23), <limit, >limit, a below-detection code (BDL, ND) "
            + "or a missing-value code (NR, IS, NA)";
    /** 100 % in ppb, the smallest grade unit read: the ceiling of a value whose unit is not known. */
    public static final double UNIT_FREE_CEILING = 1e9;

    private final ValueConventions conventions;
    /** Whether the conventions come from cupel.yaml (the fix can name a setting) or are fixed (plain tables). */
    private final boolean configurable;
    private final NumberScanner numbers;
    private final Set<String> belowCodes = new HashSet<>();
    private final Map<String, MissingReason> missingCodes = new HashMap<>();
    private SourceLocation groupedAt;
    private String groupedText;
    private SourceLocation otherMarkAt;
    private String otherMarkText;

    /** A parser of a project's lab files under their configured conventions ({@code ingest} in cupel.yaml). */
    public ValueParser(ValueConventions conventions) {
        this(conventions, true);
    }

    private ValueParser(ValueConventions conventions, boolean configurable) {
        this.conventions = conventions;
        this.configurable = configurable;
        this.numbers = new NumberScanner(conventions.decimalComma(), conventions.thousandsSeparator());
        conventions.belowDetectionCodes().forEach(c -> belowCodes.add(codeKey(c)));
        conventions.missingCodes().forEach((c, r) -> missingCodes.put(codeKey(c), r));
    }

    /**
     * A parser of a table read under the default conventions whatever cupel.yaml says (the plain tables of
     * the analysis commands, the CRM catalog): its fixes ask for decimal points, not for a setting.
     */
    public static ValueParser forPlainTable() {
        return new ValueParser(ValueConventions.DEFAULTS, false);
    }

    public ValueConventions conventions() {
        return conventions;
    }

    /**
     * The largest value a cell in {@code unit} can hold: 100 % as a mass fraction; {@link #UNIT_FREE_CEILING}
     * when the unit is not known (null).
     */
    public static double ceiling(GradeUnit unit) {
        return unit == null ? UNIT_FREE_CEILING : 1e6 / unit.gramsPerTonne();
    }

    /** {@link #parse(String, double, SourceLocation, GradeUnit)} for a cell whose unit is not known. */
    public ParsedValue parse(String text, double statedLimit, SourceLocation where) {
        return parse(text, statedLimit, where, null);
    }

    /**
     * @param text the cell text (null is read as blank)
     * @param statedLimit the method's detection limit when known (for below-detection codes, and kept as
     *     the limit of detected values), else NaN
     * @param where the cell, for the issue
     * @param unit the cell's grade unit, for the ceiling of 100 %; null when not known
     */
    public ParsedValue parse(String text, double statedLimit, SourceLocation where, GradeUnit unit) {
        String t = text == null ? "" : text.strip();
        if (t.isEmpty()) {
            return ok(AssayValue.missing(MissingReason.BLANK_CELL));
        }
        char first = t.charAt(0);
        if (mayBeCode(t, first)) {
            ParsedValue coded = parseCode(t, statedLimit, where);
            if (coded != null) {
                return coded;
            }
        }
        if (first == '<' || first == '>') {
            return parseBound(t, first, where, unit);
        }
        double v = number(t, 0, where);
        if (Double.isNaN(v)) {
            return notANumber(t, where);
        }
        if (v < 0 || (v == 0 && first == '-')) {
            return parseNegative(t, -v, where, unit);
        }
        if (v > ceiling(unit)) {
            return aboveCeiling(t, where, unit);
        }
        return ok(AssayValue.detected(v, validLimit(statedLimit)).withDecimals(numbers.decimals()));
    }

    /**
     * The hot path of lab files, without objects: the value of a trimmed cell {@code s[from, to)} that
     * starts with a digit and is a well-formed number without thousands separators, else NaN. For such a
     * cell at most {@code ceiling} {@link #parse} gives {@code AssayValue.detected(v, limit)} with the stated
     * limit if valid; for every other cell (NaN here, or above the ceiling) call {@link #parse}, which also
     * notes the decimal mark of grouped numbers.
     */
    double plainNumber(char[] s, int from, int to) {
        return to > from && s[from] >= '0' && s[from] <= '9' ? numbers.scan(s, from, to, false) : Double.NaN;
    }

    /**
     * The decimals the number {@link #plainNumber} just read was written with ({@code 0.070}: 3), or
     * {@link org.cupel.assay.Numbers#UNKNOWN_DECIMALS} for exponent notation.
     */
    int plainDecimals() {
        return numbers.decimals();
    }

    /**
     * Throws when this parser's file mixed two readings of one character: a number read with it as the
     * thousands separator and another cell that looks written with it as the decimal mark.
     *
     * @throws InputException naming both cells and the setting that decides
     */
    public void checkDecimalMarks() {
        if (groupedAt == null || otherMarkAt == null) {
            return;
        }
        char mark = numbers.groupMark();
        boolean comma = conventions.decimalComma();
        throw new InputException(groupedAt.file() + ": the numbers mix two readings of '" + mark + "': '"
                + MessageText.clip(groupedText) + "' (line " + groupedAt.line() + ", column " + groupedAt.column()
                + ") reads with '" + mark + "' as thousands separator, while '" + MessageText.clip(otherMarkText)
                + "' (line " + otherMarkAt.line() + ", column " + otherMarkAt.column() + ") looks written with '"
                + mark + "' as decimal mark; " + (configurable ? "set ingest.decimalComma: " + !comma + " in cupel.yaml "
                + "if this lab writes " + (comma ? "decimal points" : "decimal commas") + ", or correct the cells so "
                + "the file uses one decimal mark." : "this table is read with decimal points (the ingest settings "
                + "do not apply to it), so write every number with a decimal point and no thousands separator."));
    }

    /**
     * The number {@code t[from, ...)} spells, NaN when it is none. Read without thousands separators first;
     * a number that needs them is noted as evidence of the decimal mark (a space group is no evidence).
     */
    private double number(String t, int from, SourceLocation where) {
        char[] s = t.toCharArray();
        double v = numbers.scan(s, from, s.length, false);
        if (!Double.isNaN(v)) {
            return v;
        }
        v = numbers.scan(s, from, s.length);
        if (!Double.isNaN(v) && groupedAt == null && where != null && t.indexOf(numbers.groupMark(), from) >= 0) {
            groupedAt = where;
            groupedText = t;
        }
        return v;
    }

    /** Numbers, {@code <0.005} and {@code -0.005} skip the code lookup (the hot path). */
    private static boolean mayBeCode(String t, char first) {
        if (first >= '0' && first <= '9') {
            return false;
        }
        if ((first == '<' || first == '>' || first == '-' || first == '+') && t.length() > 1) {
            char second = t.charAt(1);
            return !(second >= '0' && second <= '9') && second != '.' && second != ' ' && second != '=';
        }
        return true;
    }

    private ParsedValue parseCode(String t, double statedLimit, SourceLocation where) {
        String key = codeKey(t);
        if (belowCodes.contains(key)) {
            double limit = validLimit(statedLimit);
            if (Double.isNaN(limit)) {
                return excluded(where, t, "the value is coded below detection but no detection limit is known",
                        "a value with its limit (<0.005), or a limit for the analyte in ingest.detectionLimits",
                        "set ingest.detectionLimits in cupel.yaml, e.g. {Au: 0.005}, in the unit of the column");
            }
            return ok(AssayValue.belowDetection(limit));
        }
        MissingReason reason = missingCodes.get(key);
        return reason == null ? null : ok(AssayValue.missing(reason));
    }

    private ParsedValue parseBound(String t, char sign, SourceLocation where, GradeUnit unit) {
        int from = 1;
        while (from < t.length() && (t.charAt(from) == ' ' || t.charAt(from) == '=')) {
            from++;
        }
        double limit = number(t, from, where);
        if (!(limit > 0)) {
            if (looksLikeOtherDecimalMark(t)) {
                return otherDecimalMarkIssue(t, where);
            }
            if (numbers.outOfRange(t.substring(from))) {
                return outOfRange(t, where);
            }
            return excluded(where, t, "the limit after '" + sign + "' is not a positive number",
                    sign + " followed by a positive number, e.g. " + sign + "0.005",
                    "correct the cell to " + sign + " and the limit, or leave it blank if there is no result");
        }
        if (limit > ceiling(unit)) {
            return aboveCeiling(t, where, unit);
        }
        int decimals = numbers.decimals();
        return ok((sign == '<' ? AssayValue.belowDetection(limit) : AssayValue.aboveUpperLimit(limit))
                .withDecimals(decimals));
    }

    private ParsedValue parseNegative(String t, double magnitude, SourceLocation where, GradeUnit unit) {
        int decimals = numbers.decimals();
        if (!conventions.negativeMeansBelowDetection()) {
            return excluded(where, t, "the value is negative",
                    "a value of 0 or more (ingest.negativeMeansBelowDetection is false)",
                    "correct the value, or set ingest.negativeMeansBelowDetection: true if the lab writes "
                            + "-0.005 for <0.005");
        }
        if (!(magnitude > 0)) {
            return excluded(where, t, "a negative zero cannot be read as a detection limit",
                    "-limit (e.g. -0.005) meaning below that limit", "write the limit, e.g. <0.005");
        }
        if (magnitude > ceiling(unit)) {
            return aboveCeiling(t, where, unit);
        }
        return ok(AssayValue.belowDetection(magnitude).withDecimals(decimals));
    }

    private ParsedValue notANumber(String t, SourceLocation where) {
        if (looksLikeOtherDecimalMark(t)) {
            return otherDecimalMarkIssue(t, where);
        }
        if (numbers.outOfRange(t)) {
            return outOfRange(t, where);
        }
        return excluded(where, t, "the value is not a number or a known code", EXPECTED,
                "correct the cell, or add the code to ingest.missingCodes or ingest.belowDetectionCodes in cupel.yaml");
    }

    /** A cell written with the decimal mark the settings do not expect; noted as evidence of the file's mark. */
    private ParsedValue otherDecimalMarkIssue(String t, SourceLocation where) {
        if (otherMarkAt == null && where != null) {
            otherMarkAt = where;
            otherMarkText = t;
        }
        if (conventions.decimalComma()) {
            return excluded(where, t, "the value seems to use a decimal point",
                    "a decimal comma (0,005), as ingest.decimalComma is true",
                    "set ingest.decimalComma: false in cupel.yaml if this lab writes decimal points");
        }
        if (!configurable) {
            return excluded(where, t, "the value seems to use a decimal comma", "a decimal point (0.005)",
                    "write the value with a decimal point: this table is read with decimal points");
        }
        return excluded(where, t, "the value seems to use a decimal comma",
                "a decimal point (0.005), as ingest.decimalComma is false",
                "set ingest.decimalComma: true in cupel.yaml if this lab writes decimal commas");
    }

    private static ParsedValue outOfRange(String t, SourceLocation where) {
        return excluded(where, t, "the number is too large or too small to compute with (it would read as "
                        + "infinity or 0)", "a number between about 1e-307 and 1e308",
                "correct the value; no grade is that large or that small");
    }

    private static ParsedValue aboveCeiling(String t, SourceLocation where, GradeUnit unit) {
        String ceiling = Numbers.compact(ceiling(unit));
        return unit == null
                ? excluded(where, t, "the value is above " + ceiling + ", which is 100 % even in ppb, the smallest "
                        + "grade unit, so it cannot be an assay", "a grade of at most 100 %",
                        "correct the value or its unit")
                : excluded(where, t, "the value is above 100 % (" + ceiling + " " + unit.symbol() + "), so it "
                        + "cannot be an assay", "a grade of at most " + ceiling + " " + unit.symbol(),
                        "correct the value, or the column's unit if the values are in another one");
    }

    /**
     * One decimal mark of the kind the settings do not expect (a comma when {@code decimalComma} is false, a
     * point when it is true) between digits, that is not valid thousands grouping: 1,23 or 0,005. Error path
     * only.
     */
    private boolean looksLikeOtherDecimalMark(String t) {
        char mark = numbers.groupMark();
        int at = t.indexOf(mark);
        if (at <= 0 || at != t.lastIndexOf(mark) || at == t.length() - 1) {
            return false;
        }
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            boolean sign = i == 0 && (c == '-' || c == '<' || c == '>');
            if (i != at && !(c >= '0' && c <= '9') && !sign && c != ' ') {
                return false;
            }
        }
        return true;
    }

    /** The stated limit when it is a usable detection limit, else NaN. */
    public static double validLimit(double limit) {
        return limit > 0 && Double.isFinite(limit) ? limit : Double.NaN;
    }

    private static ParsedValue ok(AssayValue v) {
        return new ParsedValue(v, null);
    }

    private static ParsedValue excluded(SourceLocation where, String found, String problem, String expected,
                                        String fix) {
        return new ParsedValue(null,
                new DataIssue(DataIssue.Severity.EXCLUDED, where, "", found, problem, expected, fix));
    }

    /** Codes match ignoring case and with runs of white space as one space. */
    static String codeKey(String code) {
        StringBuilder sb = new StringBuilder(code.length());
        boolean space = false;
        for (int i = 0; i < code.length(); i++) {
            char c = code.charAt(i);
            if (Character.isWhitespace(c)) {
                space = sb.length() > 0;
            } else {
                if (space) {
                    sb.append(' ');
                    space = false;
                }
                sb.append(c);
            }
        }
        return sb.toString().toLowerCase(Locale.ROOT);
    }
}
