package org.cupel.report;

import java.util.BitSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Which of several patterns match somewhere in a text, found in one pass over the text that tries a pattern only
 * at the characters a match of it can begin with. Searching each of 34 patterns through a megabyte of report text
 * cost about 30 ns per character per pattern; most characters can begin none of them.
 *
 * <p>Whether a pattern's match can begin with a character {@code c} is asked of the regex engine itself: the
 * pattern is tried at {@code c} alone, after a word character, after a non-word character and at the start of
 * the input (the contexts a word boundary {@code \b} can see); if every try fails without the engine reading past
 * {@code c} ({@link Matcher#hitEnd()} false), no text can hold a match that begins with {@code c} in such a
 * context. A pattern with a look-behind, which can read further back than one character, is tried everywhere. A
 * match found at a position by {@link Matcher#lookingAt()} with transparent, non-anchoring bounds is exactly a
 * match {@link Matcher#find()} can report there.
 */
final class PatternScan {
    private static final String[] BEFORE = {"", "a", " "};

    private final List<Pattern> patterns;
    private final boolean[] anywhere;
    private final Map<Character, BitSet> startsByCharacter = new HashMap<>();

    PatternScan(List<Pattern> patterns) {
        this.patterns = List.copyOf(patterns);
        this.anywhere = new boolean[this.patterns.size()];
        for (int j = 0; j < anywhere.length; j++) {
            anywhere[j] = this.patterns.get(j).pattern().contains("(?<");
        }
    }

    /** The indices of the patterns that find a match in {@code text}. */
    BitSet matching(String text) {
        BitSet found = new BitSet(patterns.size());
        Matcher[] matchers = new Matcher[patterns.size()];
        for (int i = 0; i <= text.length() && found.cardinality() < patterns.size(); i++) {
            BitSet candidates = i < text.length() ? startsWith(text.charAt(i)) : everyPattern();
            for (int j = candidates.nextSetBit(0); j >= 0; j = candidates.nextSetBit(j + 1)) {
                if (!found.get(j) && matchesAt(matchers, j, text, i)) {
                    found.set(j);
                }
            }
        }
        return found;
    }

    private boolean matchesAt(Matcher[] matchers, int j, String text, int at) {
        if (matchers[j] == null) {
            matchers[j] = patterns.get(j).matcher(text).useTransparentBounds(true).useAnchoringBounds(false);
        }
        return matchers[j].region(at, text.length()).lookingAt();
    }

    /** The patterns whose match can begin with {@code c}; computed once per character. */
    private BitSet startsWith(char c) {
        return startsByCharacter.computeIfAbsent(c, this::possibleStarts);
    }

    private BitSet everyPattern() {
        BitSet all = new BitSet(patterns.size());
        all.set(0, patterns.size());
        return all;
    }

    private BitSet possibleStarts(char c) {
        BitSet starts = new BitSet(patterns.size());
        for (int j = 0; j < patterns.size(); j++) {
            if (anywhere[j] || canBeginWith(patterns.get(j), c)) {
                starts.set(j);
            }
        }
        return starts;
    }

    private static boolean canBeginWith(Pattern p, char c) {
        for (String before : BEFORE) {
            String probe = before + c;
            Matcher m = p.matcher(probe).region(before.length(), probe.length()).useTransparentBounds(true)
                    .useAnchoringBounds(false);
            if (m.lookingAt() || m.hitEnd()) {
                return true;
            }
        }
        return false;
    }
}
