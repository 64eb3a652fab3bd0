package org.cupel.cli;

import java.util.ArrayList;
import java.util.List;

/** Word wrapping for the terminal: lines break at spaces; a word longer than a whole line is cut at its end. */
final class TextWrap {
    private TextWrap() {
    }

    /** Display columns of {@code s}: one per character (code point). */
    static int columns(String s) {
        return s.codePointCount(0, s.length());
    }

    /** {@code text} in lines of at most {@code width} columns, broken at spaces (dropped at the break). */
    static List<String> lines(String text, int width) {
        return wrap(text, "", width, "", width);
    }

    /**
     * A line of prose wrapped to {@code width}: the first part keeps the line's own indentation, the others
     * are indented two columns more (at most half the width), so that a reader sees where an item continues.
     */
    static List<String> hanging(String text, int width) {
        if (columns(text) <= width) {
            return List.of(text);
        }
        int indent = Math.min(text.length() - text.stripLeading().length(), width / 2);
        String first = " ".repeat(indent);
        String next = " ".repeat(Math.min(indent + 2, width / 2));
        return wrap(text.stripLeading(), first, width - indent, next, width - next.length());
    }

    private static List<String> wrap(String text, String firstIndent, int firstRoom, String nextIndent,
                                     int nextRoom) {
        List<String> out = new ArrayList<>();
        String indent = firstIndent;
        int room = Math.max(1, firstRoom);
        String rest = text;
        while (columns(rest) > room) {
            int cut = breakAt(rest, room);
            out.add(indent + rest.substring(0, cut).stripTrailing());
            rest = rest.substring(cut).stripLeading();
            indent = nextIndent;
            room = Math.max(1, nextRoom);
        }
        out.add(indent + rest);
        return out;
    }

    /** Where a line of at most {@code room} columns ends: at the last space that fits, else after {@code room}. */
    private static int breakAt(String s, int room) {
        int limit = s.offsetByCodePoints(0, room);
        int space = s.lastIndexOf(' ', limit);
        return space > 0 ? space : limit;
    }
}
