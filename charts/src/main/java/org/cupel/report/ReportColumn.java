package org.cupel.report;

import java.text.Normalizer;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * One column of a {@link ReportTable}: its header on the page and its typed columns in the CSV.
 *
 * <p>CSV header style: lower-case words joined by {@code _}, the unit last ({@code rms_cv_percent},
 * {@code mean_g_per_t}); an interval adds {@code _lower} and {@code _upper} before the unit
 * ({@code rms_cv_lower_percent}); a lab value adds {@code <key>_qualifier} ({@code <}, {@code >}, empty
 * for a detected value, or why it is missing); a column whose numbers can be not computable adds
 * {@code <key>_note} with the reason. The CSV columns of a table are fixed by its columns, never by its
 * rows, so an empty table has the same header as a full one. Each CSV column has one {@link CsvType},
 * which maps onto a typed data-frame column (text, double, long).
 *
 * @param header the header on the page, with the unit where it applies ("RMS CV (95 % CI)")
 * @param key the CSV name without unit ("rms_cv")
 * @param kind what the column holds
 * @param unit the unit of its numbers as written on the page ("%", "g/t", "pp"), empty when none
 * @param noted whether the CSV has a {@code <key>_note} column for the reason a number is not computable
 * @param parts for {@link Kind#PARTS}, the numbers of each cell in order; empty otherwise
 */
public record ReportColumn(String header, String key, Kind kind, String unit, boolean noted, List<Part> parts) {

    /** What a column holds. */
    public enum Kind {
        /** Text, or anything shown as text (the CSV writes the display). */
        TEXT,
        /** A number per row. */
        NUMBER,
        /** A whole number per row (a count). */
        INTEGER,
        /** An estimate with lower and upper ends. */
        INTERVAL,
        /** A lab value as reported, with its qualifier. */
        ASSAY,
        /**
         * Several numbers read together on the page ("5 (5.0 %)": a count and its rate; "14 (10.4; p = 0.155)"),
         * one CSV column each.
         */
        PARTS
    }

    /**
     * One number of a {@link Kind#PARTS} column: CSV name {@code <key>[_<suffix>][_<unit>]}.
     *
     * @param suffix empty for the first, main number
     * @param unit its unit as written on the page, empty when none
     * @param type its CSV type
     */
    public record Part(String suffix, String unit, CsvType type) {
        public Part {
            suffix = suffix == null ? "" : suffix;
            unit = unit == null ? "" : unit;
        }
    }

    /** The type of one CSV column, as a data frame would hold it. */
    public enum CsvType { TEXT, DOUBLE, LONG }

    /** One CSV column: its name and type. */
    public record CsvColumn(String name, CsvType type) {
    }

    /** One CSV field: its text and whether it is a number (never neutralised) or text (neutralised). */
    public record CsvField(String text, boolean numeric) {
        static final CsvField EMPTY = new CsvField("", true);
    }

    public ReportColumn {
        if (header == null || kind == null) {
            throw new IllegalArgumentException("a column needs a header and a kind");
        }
        key = key == null || key.isBlank() ? slug(header) : key;
        unit = unit == null ? "" : unit;
        parts = parts == null ? List.of() : List.copyOf(parts);
        if ((kind == Kind.PARTS) == parts.isEmpty()) {
            throw new IllegalArgumentException("column " + header + ": parts are for a PARTS column, which needs them");
        }
    }

    public static ReportColumn text(String header) {
        return new ReportColumn(header, null, Kind.TEXT, "", false, List.of());
    }

    public static ReportColumn text(String header, String key) {
        return new ReportColumn(header, key, Kind.TEXT, "", false, List.of());
    }

    public static ReportColumn count(String header, String key) {
        return new ReportColumn(header, key, Kind.INTEGER, "", false, List.of());
    }

    public static ReportColumn number(String header, String key, String unit) {
        return new ReportColumn(header, key, Kind.NUMBER, unit, false, List.of());
    }

    public static ReportColumn interval(String header, String key, String unit) {
        return new ReportColumn(header, key, Kind.INTERVAL, unit, false, List.of());
    }

    public static ReportColumn assay(String header, String key, String unit) {
        return new ReportColumn(header, key, Kind.ASSAY, unit, false, List.of());
    }

    public static ReportColumn parts(String header, String key, Part... parts) {
        return new ReportColumn(header, key, Kind.PARTS, "", false, List.of(parts));
    }

    /** The same column with a {@code <key>_note} CSV column for the reason a number is not computable. */
    public ReportColumn withNote() {
        return new ReportColumn(header, key, kind, unit, true, parts);
    }

    /** Whether {@code cell} may stand in this column. */
    boolean accepts(Cell cell) {
        if (cell instanceof Cell.Blank || cell instanceof Cell.NotComputed || kind == Kind.TEXT) {
            return true;
        }
        return switch (kind) {
            case NUMBER -> cell instanceof Cell.Number;
            case INTEGER -> cell instanceof Cell.Number n && n.value() == Math.rint(n.value());
            case INTERVAL -> cell instanceof Cell.Interval || cell instanceof Cell.Number;
            case ASSAY -> cell instanceof Cell.Assay;
            case PARTS -> cell instanceof Cell.Parts p && p.numbers().size() == parts.size();
            default -> false;
        };
    }

    /** The CSV columns this column writes, in order. */
    public List<CsvColumn> csvColumns() {
        String u = unit.isEmpty() ? "" : "_" + unitSlug(unit);
        List<CsvColumn> out = new ArrayList<>(4);
        switch (kind) {
            case TEXT -> out.add(new CsvColumn(key, CsvType.TEXT));
            case NUMBER -> out.add(new CsvColumn(key + u, CsvType.DOUBLE));
            case INTEGER -> out.add(new CsvColumn(key + u, CsvType.LONG));
            case INTERVAL -> {
                out.add(new CsvColumn(key + u, CsvType.DOUBLE));
                out.add(new CsvColumn(key + "_lower" + u, CsvType.DOUBLE));
                out.add(new CsvColumn(key + "_upper" + u, CsvType.DOUBLE));
            }
            case ASSAY -> {
                out.add(new CsvColumn(key + u, CsvType.DOUBLE));
                out.add(new CsvColumn(key + "_qualifier", CsvType.TEXT));
            }
            case PARTS -> parts.forEach(p -> out.add(new CsvColumn(key + (p.suffix().isEmpty() ? "" : "_" + p.suffix())
                    + (p.unit().isEmpty() ? "" : "_" + unitSlug(p.unit())), p.type())));
            default -> throw new IllegalStateException(kind.name());
        }
        if (noted) {
            out.add(new CsvColumn(key + "_note", CsvType.TEXT));
        }
        return out;
    }

    /** The CSV fields of {@code cell} in this column, one per {@link #csvColumns()} entry. */
    public List<CsvField> csvFields(Cell cell) {
        List<CsvField> out = new ArrayList<>(4);
        String note = cell instanceof Cell.NotComputed nc ? nc.reason() : cell instanceof Cell.Parts p ? p.note() : "";
        switch (kind) {
            case TEXT -> out.add(new CsvField(cell.display(), false));
            case NUMBER, INTEGER -> out.add(number(cell instanceof Cell.Number n ? n : null));
            case INTERVAL -> {
                Cell.Interval i = cell instanceof Cell.Interval x ? x
                        : cell instanceof Cell.Number n ? new Cell.Interval(n, null, null) : null;
                out.add(number(i == null ? null : i.estimate()));
                out.add(number(i == null ? null : i.lower()));
                out.add(number(i == null ? null : i.upper()));
            }
            case ASSAY -> {
                if (cell instanceof Cell.Assay a) {
                    out.add(a.value().isMissing() ? CsvField.EMPTY : new CsvField(a.value().number(), true));
                    out.add(new CsvField(qualifier(a), false));
                } else {
                    out.add(CsvField.EMPTY);
                    out.add(new CsvField("", false));
                }
            }
            case PARTS -> {
                for (int i = 0; i < parts.size(); i++) {
                    out.add(number(cell instanceof Cell.Parts p ? p.numbers().get(i) : null));
                }
            }
            default -> throw new IllegalStateException(kind.name());
        }
        if (noted) {
            out.add(new CsvField(note, false));
        }
        return out;
    }

    private static CsvField number(Cell.Number n) {
        return n == null ? CsvField.EMPTY : new CsvField(n.plain(), true);
    }

    private static String qualifier(Cell.Assay a) {
        return switch (a.value().qualifier()) {
            case DETECTED -> "";
            case BELOW_DETECTION -> "<";
            case ABOVE_UPPER_LIMIT -> ">";
            default -> a.display();
        };
    }

    private static final Map<String, String> SYMBOLS = Map.ofEntries(Map.entry("σ", "sigma"), Map.entry("ρ", "rho"),
            Map.entry("χ", "chi"), Map.entry("ν", "nu"), Map.entry("λ", "lambda"), Map.entry("μ", "mu"),
            Map.entry("÷", " per "), Map.entry("×", " x "), Map.entry("·", " "), Map.entry("√", " sqrt "),
            Map.entry("/", " over "));

    /**
     * A CSV name from a page header: {@code %} becomes "percent", Greek letters and √ their names, / "over",
     * sub- and superscripts their digits, anything else not a letter or digit a single {@code _}; lower case.
     * "RMS CV (95 % CI)" gives {@code rms_cv_95_percent_ci}, "σ₀" {@code sigma0}, "DL/√2" {@code dl_over_sqrt_2}.
     */
    public static String slug(String header) {
        String s = header.replace("%", " percent ");
        for (Map.Entry<String, String> g : SYMBOLS.entrySet()) {
            s = s.replace(g.getKey(), g.getValue());
        }
        s = Normalizer.normalize(s, Normalizer.Form.NFKD).toLowerCase(Locale.ROOT);
        StringBuilder out = new StringBuilder(s.length());
        boolean gap = false;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c < 128 && Character.isLetterOrDigit(c)) {
                if (gap && out.length() > 0) {
                    out.append('_');
                }
                out.append(c);
                gap = false;
            } else if (Character.getType(c) != Character.NON_SPACING_MARK) {
                gap = true;
            }
        }
        return out.length() == 0 ? "column" : out.toString();
    }

    /** A unit as a CSV name part: {@code %} "percent", {@code g/t} "g_per_t", {@code pp} "pp". */
    public static String unitSlug(String unit) {
        return slug(unit.replace("/", " per "));
    }

    /** The same column under another key (to keep keys unique within a table). */
    ReportColumn withKey(String newKey) {
        return new ReportColumn(header, newKey, kind, unit, noted, parts);
    }
}
