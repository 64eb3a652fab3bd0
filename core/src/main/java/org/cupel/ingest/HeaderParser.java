package org.cupel.ingest;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.cupel.units.GradeUnit;

/**
 * Reads analyte column headers: an element or compound symbol, a unit, and optionally a method,
 * separated by {@code _}, space, or with the unit in parentheses ({@code Au_ppm}, {@code Au (g/t)},
 * {@code Au ppb FA-AAS}, {@code Cu %}, {@code Au_g/t_FA-GRAV}, {@code Ag ppm ICP-AES}). The config's
 * {@code ingest.columns} maps any other header onto this grammar ({@code Au1: "Au g/t FA-AAS"}).
 */
public final class HeaderParser {
    private final Map<String, String> overrides = new HashMap<>();

    /** A parser without overrides. */
    public HeaderParser() {
        this(Map.of());
    }

    /** @param overrides header as written → header in the grammar; matched as {@link RawTable#normalise} */
    public HeaderParser(Map<String, String> overrides) {
        overrides.forEach((k, v) -> this.overrides.put(RawTable.normalise(k), v));
    }

    /** The analyte, unit and method, or empty when the header is not an analyte column. */
    public Optional<AnalyteHeader> parse(String header) {
        if (header == null) {
            return Optional.empty();
        }
        String mapped = overrides.get(RawTable.normalise(header));
        return grammar(mapped != null ? mapped : header);
    }

    /** Whether the config maps this header explicitly. */
    public boolean isOverridden(String header) {
        return header != null && overrides.containsKey(RawTable.normalise(header));
    }

    private static Optional<AnalyteHeader> grammar(String header) {
        List<String> tokens = tokens(header);
        if (tokens.size() < 2 || !isSymbol(tokens.get(0))) {
            return Optional.empty();
        }
        String analyte = normaliseSymbol(tokens.get(0));
        int methodFrom;
        Optional<GradeUnit> unit = tokens.size() >= 3 ? GradeUnit.parse(tokens.get(1) + "_" + tokens.get(2))
                : Optional.empty();
        if (unit.isPresent() && GradeUnit.parse(tokens.get(1)).isEmpty()) {
            methodFrom = 3;
        } else {
            unit = GradeUnit.parse(tokens.get(1));
            methodFrom = 2;
        }
        if (unit.isEmpty()) {
            return Optional.empty();
        }
        String method = String.join("-", tokens.subList(methodFrom, tokens.size()));
        return Optional.of(new AnalyteHeader(analyte, unit.get(), method));
    }

    /** Splits on space, {@code _} and parentheses; {@code /} and {@code -} stay inside tokens. */
    private static List<String> tokens(String header) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        for (int i = 0; i < header.length(); i++) {
            char c = header.charAt(i);
            if (c == '_' || c == '(' || c == ')' || c == '[' || c == ']' || Character.isWhitespace(c)) {
                if (cur.length() > 0) {
                    out.add(cur.toString());
                    cur.setLength(0);
                }
            } else {
                cur.append(c);
            }
        }
        if (cur.length() > 0) {
            out.add(cur.toString());
        }
        return out;
    }

    /** An element or compound symbol: a letter first, letters and digits only, at most 12 characters. */
    private static boolean isSymbol(String t) {
        if (t.isEmpty() || t.length() > 12 || !Character.isLetter(t.charAt(0))) {
            return false;
        }
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            if (!(c >= 'A' && c <= 'Z') && !(c >= 'a' && c <= 'z') && !(c >= '0' && c <= '9')) {
                return false;
            }
        }
        return true;
    }

    /** {@code AU} and {@code au} are written Au; compounds (Fe2O3, SiO2) are kept as written. */
    private static String normaliseSymbol(String t) {
        boolean letters = t.length() <= 2 && t.chars().allMatch(Character::isLetter);
        if (!letters) {
            return t;
        }
        return t.substring(0, 1).toUpperCase(Locale.ROOT) + t.substring(1).toLowerCase(Locale.ROOT);
    }
}
