package org.cupel.ingest;

import java.util.HashMap;
import java.util.HashSet;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;

/**
 * Reads the text of one analyte cell into an {@link AssayValue} under a lab's {@link ValueConventions}:
 * numbers (with decimal comma and thousands grouping as configured), {@code <0.005} and {@code >10},
 * negative numbers as below detection when so configured, below-detection codes at the stated limit,
 * missing codes with their reason, and blank cells. Anything else gives an issue saying what was found,
 * what was expected and how to fix it; this class never throws on cell text.
 */
public final class ValueParser {
    static final String EXPECTED = "a number (1.23), <limit, >limit, a below-detection code (BDL, ND) "
            + "or a missing-value code (NR, IS, NA)";

    private final ValueConventions conventions;
    private final NumberScanner numbers;
    private final Set<String> belowCodes = new HashSet<>();
    private final Map<String, MissingReason> missingCodes = new HashMap<>();

    public ValueParser(ValueConventions conventions) {
        this.conventions = conventions;
        this.numbers = new NumberScanner(conventions.decimalComma(), conventions.thousandsSeparator());
        conventions.belowDetectionCodes().forEach(c -> belowCodes.add(codeKey(c)));
        conventions.missingCodes().forEach((c, r) -> missingCodes.put(codeKey(c), r));
    }

    public ValueConventions conventions() {
        return conventions;
    }

    /**
     * @param text the cell text (null is read as blank)
     * @param statedLimit the method's detection limit when known (for below-detection codes, and kept as
     *     the limit of detected values), else NaN
     * @param where the cell, for the issue
     */
    public ParsedValue parse(String text, double statedLimit, SourceLocation where) {
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
            return parseBound(t, first, where);
        }
        double v = numbers.scan(t, 0, t.length());
        if (Double.isNaN(v)) {
            return notANumber(t, where);
        }
        if (v < 0 || (v == 0 && first == '-')) {
            return parseNegative(t, -v, where);
        }
        return ok(AssayValue.detected(v, validLimit(statedLimit)));
    }

    /**
     * The hot path of lab files, without objects: the value of a trimmed cell {@code s[from, to)} that
     * starts with a digit and is a well-formed number, else NaN. For such a cell {@link #parse} gives
     * {@code AssayValue.detected(v, limit)} with the stated limit if valid; for every other cell (NaN
     * here) call {@link #parse}.
     */
    double plainNumber(char[] s, int from, int to) {
        return to > from && s[from] >= '0' && s[from] <= '9' ? numbers.scan(s, from, to) : Double.NaN;
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

    private ParsedValue parseBound(String t, char sign, SourceLocation where) {
        int from = 1;
        while (from < t.length() && (t.charAt(from) == ' ' || t.charAt(from) == '=')) {
            from++;
        }
        double limit = numbers.scan(t, from, t.length());
        if (!(limit > 0)) {
            if (!conventions.decimalComma() && looksLikeDecimalComma(t)) {
                return decimalCommaIssue(t, where);
            }
            return excluded(where, t, "the limit after '" + sign + "' is not a positive number",
                    sign + " followed by a positive number, e.g. " + sign + "0.005",
                    "correct the cell to " + sign + " and the limit, or leave it blank if there is no result");
        }
        return ok(sign == '<' ? AssayValue.belowDetection(limit) : AssayValue.aboveUpperLimit(limit));
    }

    private ParsedValue parseNegative(String t, double magnitude, SourceLocation where) {
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
        return ok(AssayValue.belowDetection(magnitude));
    }

    private ParsedValue notANumber(String t, SourceLocation where) {
        if (!conventions.decimalComma() && looksLikeDecimalComma(t)) {
            return decimalCommaIssue(t, where);
        }
        return excluded(where, t, "the value is not a number or a known code", EXPECTED,
                "correct the cell, or add the code to ingest.missingCodes or ingest.belowDetectionCodes in cupel.yaml");
    }

    private static ParsedValue decimalCommaIssue(String t, SourceLocation where) {
        return excluded(where, t, "the value seems to use a decimal comma",
                "a decimal point (0.005), as ingest.decimalComma is false",
                "set ingest.decimalComma: true in cupel.yaml if this lab writes decimal commas");
    }

    /** One comma between digits that is not valid thousands grouping: 1,23 or 0,005. Error path only. */
    private static boolean looksLikeDecimalComma(String t) {
        int comma = t.indexOf(',');
        if (comma <= 0 || comma != t.lastIndexOf(',') || comma == t.length() - 1) {
            return false;
        }
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            boolean sign = i == 0 && (c == '-' || c == '<' || c == '>');
            if (i != comma && !(c >= '0' && c <= '9') && !sign && c != ' ') {
                return false;
            }
        }
        return true;
    }

    /** The stated limit when it is a usable detection limit, else NaN. */
    static double validLimit(double limit) {
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
