package org.cupel.report;

import java.util.regex.Pattern;

/**
 * No-break spaces that keep a quantity on one line where a table cell wraps: "±" with the number it
 * qualifies ("0.412 ± 0.0311" breaks, if at all, before the "±"), and the two ends of a range of numbers
 * ("−1.48 to +1.29"). Renderers that wrap cells (the page, the terminal) apply them; the text of the tables
 * and the CSV files keep plain spaces.
 */
public final class NoBreak {
    /** U+00A0, a space at which no line may break. */
    public static final char SPACE = '\u00A0';
    private static final Pattern RANGE = Pattern.compile("(?<![\\p{L}\\p{N}.])([-+−]?\\d[\\d.,]*%?) to (?=[-+−]?\\d)");

    private NoBreak() {
    }

    /** The space after "±" made a no-break space. */
    public static String plusMinus(String text) {
        return text.replace("± ", "±" + SPACE);
    }

    /** The spaces around the "to" of a range of two numbers made no-break spaces. */
    public static String ranges(String text) {
        return RANGE.matcher(text).replaceAll("$1" + SPACE + "to" + SPACE);
    }
}
