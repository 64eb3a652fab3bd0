package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.BitSet;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.IntStream;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * One {@link PatternScan} finds the patterns that {@link java.util.regex.Matcher#find()} finds, each searched on
 * its own through the whole text: the reference is the JDK's own search, which the scan only skips ahead of.
 */
class PatternScanProperties {
    /** Pieces of the report's method names, near misses and separators, so that matches and failures both occur. */
    private static final List<String> PIECES = List.of("Welch", "welch", "Welchs", "Kaplan", "–", "-", "Meier",
            "RMS", " ", "CV", "SD", "least", "squares", "Least Squares", "bootstrap", "BOOTSTRAP", "Bootstrapped",
            "ROS", "Helsel", "Cohn", "sign", "test", "Thompson", " & ", "Howarth", "HC3", "HARD", "HARDs", "\n",
            "(", ")", ",", "1-2s", "Westgard", "Shewhart", "maximum", "Likelihood", "ISO", "5725", "13528", "MLE",
            "paired t", "t", "Student", "chi-square", "Chi-Square", "é", "0.070", "VH0400021", "x");

    /** Texts of up to 40 pieces. */
    private static final Gen<String> TEXTS = r -> {
        StringBuilder text = new StringBuilder();
        int n = r.nextInt(0, 41);
        for (int i = 0; i < n; i++) {
            text.append(PIECES.get(r.nextInt(PIECES.size())));
        }
        return text.toString();
    };

    private static BitSet eachOnItsOwn(List<Pattern> patterns, String text) {
        BitSet found = new BitSet();
        IntStream.range(0, patterns.size()).filter(j -> patterns.get(j).matcher(text).find()).forEach(found::set);
        return found;
    }

    @Test
    void theReportsMethodPatternsAreFoundWhereFindFindsThem() {
        List<Pattern> patterns = Bibliography.standard().methods().stream().map(Bibliography.Method::pattern)
                .toList();
        int[] matched = {0};
        SeededTries.forAll(3000, List.of(Gen.constant(""), Gen.constant("Kaplan–Meier"),
                Gen.constant("xWelch"), Gen.constant("RMS\nCV")), TEXTS, text -> {
                    BitSet expected = eachOnItsOwn(patterns, text);
                    assertEquals(expected, new PatternScan(patterns).matching(text), text);
                    matched[0] += expected.cardinality();
                });
        assertTrue(matched[0] > 3000, "the generated texts name methods: " + matched[0]);
    }

    /**
     * Patterns whose start depends on what comes before it (word boundaries, a look-behind, the start of the input,
     * a match of nothing) and case-insensitive ones are found where find() finds them.
     */
    @Test
    void patternsThatLookBackOrMatchNothingAreFoundAlike() {
        List<Pattern> patterns = List.of(Pattern.compile("\\B(?:st|CV)"), Pattern.compile("(?<=Kaplan.)Meier"),
                Pattern.compile("^Welch"), Pattern.compile("x*"), Pattern.compile("(?i)\\bls?q?\\b"),
                Pattern.compile("\\(1"), Pattern.compile("t$"), Pattern.compile("\\bé"));
        SeededTries.forAll(3000, TEXTS, text -> assertEquals(eachOnItsOwn(patterns, text),
                new PatternScan(patterns).matching(text), text));
    }
}
