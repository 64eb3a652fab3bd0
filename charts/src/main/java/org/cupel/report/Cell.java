package org.cupel.report;

import java.util.List;
import java.util.Locale;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Numbers;

/**
 * One typed cell of a {@link ReportTable}: what it shows on the page ({@link #display()}, for HTML, PDF
 * and Word) and what it is as data (numbers stay numbers in the CSV, one number per CSV cell). A cell is
 * made by the static factories below, which fix how each kind of number is written.
 *
 * <p>Display conventions (common practice in QC reports, Cupel's choice where noted): percentages with a
 * space before the sign ({@code 9.24 %}); counts with thousands grouping ({@code 3,361}); intervals as
 * {@code estimate (lower to upper)}; p-values with three decimals, below 0.001 as {@code < 0.001}; lab
 * values with the lab's decimals ({@link AssayValue#display()}). In the CSV a number is written plain: no
 * grouping, no {@code %} (the unit is in the header), no {@code +}.
 */
public sealed interface Cell permits Cell.Text, Cell.Number, Cell.Interval, Cell.Assay, Cell.Parts,
        Cell.NotComputed, Cell.Blank {

    /** The text shown in the HTML, PDF and Word tables. */
    String display();

    /** Text: a name, a verdict, a reason. Neutralised against spreadsheet formulas in the CSV. */
    record Text(String text) implements Cell {
        public Text {
            text = text == null ? "" : text;
        }

        @Override
        public String display() {
            return text;
        }
    }

    /**
     * A number.
     *
     * @param value the number (finite)
     * @param plain the number as the CSV writes it ({@code 9.24}, {@code -0.09}, {@code 3361})
     * @param display the number as the page shows it ({@code 9.24 %}, {@code +0.09}, {@code 3,361}, {@code < 0.001})
     */
    record Number(double value, String plain, String display) implements Cell {
        /** A plain decimal: the CSV writes it as it is, so it must be nothing else. */
        private static final java.util.regex.Pattern PLAIN = java.util.regex.Pattern.compile("-?\\d+(\\.\\d+)?");

        public Number {
            if (!Double.isFinite(value)) {
                throw new IllegalArgumentException("a number cell needs a finite value; use Cell.notComputed");
            }
            if (plain == null || !PLAIN.matcher(plain).matches()) {
                throw new IllegalArgumentException("not a plain decimal for the CSV: " + plain);
            }
            display = display == null ? plain : display;
        }
    }

    /**
     * An estimate with its interval; {@code lower} and {@code upper} are null when there is no interval.
     * Shown as {@code 9.24 % (6.79 % to 11.72 %)}; three CSV columns.
     */
    record Interval(Number estimate, Number lower, Number upper) implements Cell {
        public Interval {
            if (estimate == null || (lower == null) != (upper == null)) {
                throw new IllegalArgumentException("an interval needs an estimate and both ends or neither");
            }
        }

        @Override
        public String display() {
            return lower == null ? estimate.display()
                    : estimate.display() + " (" + lower.display() + " to " + upper.display() + ")";
        }
    }

    /** A single reported lab value, as the lab wrote it ({@code 0.070}, {@code <0.005}); CSV: number and qualifier. */
    record Assay(AssayValue value) implements Cell {
        @Override
        public String display() {
            return value.display();
        }
    }

    /**
     * Several numbers read together ({@code 5 (5.0 %)}, {@code 14 (10.4; p = 0.155)}), shown as
     * {@code display}; one CSV column each ({@link ReportColumn.Kind#PARTS}). A null number is empty in the CSV;
     * {@code note} (how the numbers were made, when it matters) goes to the column's note.
     */
    record Parts(List<Number> numbers, String display, String note) implements Cell {
        public Parts {
            numbers = java.util.Collections.unmodifiableList(new java.util.ArrayList<>(numbers));
            display = display == null ? "" : display;
            note = note == null ? "" : note;
        }

        /** Numbers without a note. */
        public Parts(List<Number> numbers, String display) {
            this(numbers, display, "");
        }
    }

    /**
     * A number that could not be computed: the page shows {@code shown} (the reason itself, or a dash), the
     * CSV leaves the number empty and writes {@code reason} in the column's note.
     */
    record NotComputed(String reason, String shown) implements Cell {
        public NotComputed {
            reason = reason == null ? "" : reason;
            shown = shown == null ? reason : shown;
        }

        @Override
        public String display() {
            return shown;
        }
    }

    /** An empty cell (nothing applies); empty in the CSV. */
    record Blank() implements Cell {
        @Override
        public String display() {
            return "";
        }
    }

    /**
     * A text cell. Tables repeat their words (a duplicate type, a verdict, a batch, a reason) down long
     * columns, so equal texts share one cell from a small bounded cache: a million-sample project's re-assay
     * list then costs little more than its strings did.
     */
    static Cell text(String text) {
        return Shared.text(text);
    }

    static Cell blank() {
        return new Blank();
    }

    /** Not computable; the page shows the reason. */
    static Cell notComputed(String reason) {
        return new NotComputed(reason, reason);
    }

    /** Not computable; the page shows a dash and the CSV note keeps the reason. */
    static Cell dash(String reason) {
        return new NotComputed(reason, "–");
    }

    /** {@code v} with {@code decimals} decimals, or not computed when {@code v} is not finite. */
    static Cell fixed(double v, int decimals) {
        return Double.isFinite(v) ? fixedNumber(v, decimals) : dash("not computed");
    }

    /** {@code v} with {@code digits} significant digits. */
    static Cell significant(double v, int digits) {
        return Double.isFinite(v) ? significantNumber(v, digits) : dash("not computed");
    }

    /** A count, shown with thousands grouping. */
    static Cell count(long n) {
        if (n >= 0 && n < Shared.SMALL_COUNTS) {
            return Shared.COUNTS[(int) n];
        }
        return new Number(n, Long.toString(n), String.format(Locale.US, "%,d", n));
    }

    /** A percentage given in percent ({@code 9.24} for 9.24 %), shown with {@code decimals} decimals. */
    static Cell percent(double percent, int decimals) {
        return Double.isFinite(percent) ? percentNumber(percent, decimals) : dash("not computed");
    }

    /** A signed percentage ({@code +7.14 %}): bias, where the sign is the finding. */
    static Cell signedPercent(double percent, int decimals) {
        return Double.isFinite(percent) ? signedPercentNumber(percent, decimals) : dash("not computed");
    }

    /** A p-value: three decimals, {@code < 0.001} below that; the CSV keeps three significant digits. */
    static Cell pValue(double p) {
        if (!Double.isFinite(p)) {
            return dash("not computed");
        }
        String shown = p < 0.001 ? "< 0.001" : String.format(Locale.ROOT, "%.3f", p);
        return new Number(p, Numbers.significant(p, 3), shown);
    }

    /** A lab value as the lab wrote it. */
    static Cell assay(AssayValue v) {
        return new Assay(v);
    }

    static Number fixedNumber(double v, int decimals) {
        String s = Numbers.fixed(v, decimals);
        return new Number(v, s, s);
    }

    static Number significantNumber(double v, int digits) {
        String s = Numbers.significant(v, digits);
        return new Number(v, s, s);
    }

    static Number percentNumber(double percent, int decimals) {
        String s = Numbers.fixed(percent, decimals);
        return new Number(percent, s, s + " %");
    }

    static Number signedPercentNumber(double percent, int decimals) {
        String s = Numbers.fixed(percent, decimals);
        return new Number(percent, s, (s.startsWith("-") || isZero(s) ? "" : "+") + s + " %");
    }

    /**
     * A signed number with {@code decimals} decimals and no unit sign ({@code +7.14}): a bias under a header
     * that names its unit ("Mean bias % (95 % CI)"), where a % in every cell would only crowd the table.
     */
    static Number signedFixedNumber(double v, int decimals) {
        String s = Numbers.fixed(v, decimals);
        return new Number(v, s, (s.startsWith("-") || isZero(s) ? "" : "+") + s);
    }

    private static boolean isZero(String s) {
        return s.chars().noneMatch(c -> c >= '1' && c <= '9');
    }

    /** An estimate with both ends, or the estimate alone when an end is not finite. */
    static Cell interval(Number estimate, double lower, double upper,
                         java.util.function.DoubleFunction<Number> format) {
        if (!Double.isFinite(lower) || !Double.isFinite(upper)) {
            return new Interval(estimate, null, null);
        }
        return new Interval(estimate, format.apply(lower), format.apply(upper));
    }

    /** Cells shared between tables: counts below 1,000 (positions, pairs) and recently made texts. */
    final class Shared {
        static final int SMALL_COUNTS = 1000;
        static final Number[] COUNTS = new Number[SMALL_COUNTS];
        private static final int TEXTS = 4096;
        private static final java.util.concurrent.ConcurrentHashMap<String, Text> RECENT =
                new java.util.concurrent.ConcurrentHashMap<>();
        private static final Text EMPTY = new Text("");

        static {
            for (int i = 0; i < SMALL_COUNTS; i++) {
                String s = Integer.toString(i);
                COUNTS[i] = new Number(i, s, s);
            }
        }

        private Shared() {
        }

        static Text text(String text) {
            if (text == null || text.isEmpty()) {
                return EMPTY;
            }
            Text t = RECENT.get(text);
            if (t != null) {
                return t;
            }
            if (RECENT.size() >= TEXTS) {
                // Unique texts (sample IDs) would fill the cache; start again rather than grow.
                RECENT.clear();
            }
            t = new Text(text);
            RECENT.putIfAbsent(text, t);
            return t;
        }
    }
}
