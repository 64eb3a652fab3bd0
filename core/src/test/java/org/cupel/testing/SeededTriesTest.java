package org.cupel.testing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** The property harness itself: what a failure reports, edge cases, determinism, discards, generators. */
class SeededTriesTest {
    private static final Pattern FAILURE = Pattern.compile(
            "property SeededTriesTest#aFailureNamesThePropertyTryAndSeedAndTheSeedRegeneratesTheInput failed at try"
                    + " (\\d+) of 1000, seed (-?\\d+) \\(new Random\\(-?\\d+L\\) regenerates the input; base seed"
                    + " -?\\d+\\): .*\ninput: (\\d+)", Pattern.DOTALL);

    @Test
    void aFailureNamesThePropertyTryAndSeedAndTheSeedRegeneratesTheInput() {
        Gen<Integer> gen = Gen.ints(0, 1000);
        AssertionError e = assertThrows(AssertionError.class,
                () -> SeededTries.forAll(1000, gen, x -> assertTrue(x < 990, "below 990")));
        Matcher m = FAILURE.matcher(e.getMessage());
        assertTrue(m.find(), e.getMessage());
        int input = Integer.parseInt(m.group(3));
        assertTrue(input >= 990, e.getMessage());
        assertEquals(input, gen.next(new Random(Long.parseLong(m.group(2)))), "the seed regenerates the input");
        assertInstanceOf(AssertionError.class, e.getCause());
        assertTrue(e.getCause().getMessage().startsWith("below 990"), "the original failure is the cause");
    }

    @Test
    void anExceptionOfTheCodeUnderTestIsReportedWithItsInput() {
        AssertionError e = assertThrows(AssertionError.class, () -> SeededTries.forAll(10,
                List.of(Gen.constant("x\u0000\uD800\"")), Gen.constant("ok"), s -> Integer.parseInt(s)));
        assertTrue(e.getMessage().contains("edge case 1 of 1"), e.getMessage());
        assertTrue(e.getMessage().endsWith("input: \"x\\u0000\\uD800\\\"\""), e.getMessage());
        assertInstanceOf(NumberFormatException.class, e.getCause());
    }

    @Test
    void edgeCasesComeFirstAndCountAmongTheTries() {
        List<Integer> seen = new ArrayList<>();
        SeededTries.forAll(10, List.of(Gen.constant(-1), Gen.constant(-2), r -> -3 - r.nextInt(5)), Gen.ints(0, 9),
                seen::add);
        assertEquals(10, seen.size());
        assertEquals(List.of(-1, -2), seen.subList(0, 2));
        assertTrue(seen.get(2) <= -3 && seen.subList(3, 10).stream().allMatch(x -> x >= 0), seen.toString());
    }

    @Test
    void everyRunTriesTheSameInputs() {
        List<Long> first = new ArrayList<>();
        List<Long> second = new ArrayList<>();
        for (List<Long> into : List.of(first, second)) {
            SeededTries.run("SeededTriesTest#sameInputs", 50, List.of(), Gen.longs(), into::add);
        }
        assertEquals(first, second);
        assertEquals(50, first.stream().distinct().count(), "one seed per try");
    }

    @Test
    void aPropertyThatDiscardsAlmostEveryTryFails() {
        // 1 try in 7 checked: 6 discarded per checked try, over the ratio of 5.
        AssertionError e = assertThrows(AssertionError.class,
                () -> SeededTries.forAll(70, Gen.ints(0, 6), x -> SeededTries.assume(x == 0)));
        assertTrue(e.getMessage().contains("tries were discarded"), e.getMessage());
        // 1 in 2 checked passes.
        SeededTries.forAll(70, Gen.ints(0, 1), x -> SeededTries.assume(x == 0));
    }

    @Test
    void roundedDoublesStayInTheirRangeWithTheirDecimals() {
        Gen<Double> g = Gen.doubles(1e-4, 1e4, 8);
        Random r = new Random(1);
        int small = 0;
        for (int i = 0; i < 10_000; i++) {
            double x = g.next(r);
            assertTrue(x >= 1e-4 && x <= 1e4, () -> "out of range: " + x);
            assertTrue(new BigDecimal(Double.toString(x)).stripTrailingZeros().scale() <= 8, () -> "decimals: " + x);
            small += x < 1 ? 1 : 0;
        }
        // Half the draws spread over the 8 decades, 4 of them below 1: about a quarter (2,500) below 1;
        // uniform draws alone would give 1 in 10,000.
        assertTrue(small > 2000 && small < 3000, "below 1: " + small);
    }

    @Test
    void anyStringsKeepTheirLengthAndHoldWhatBreaksTextHandling() {
        Gen<String> g = Gen.anyStrings(40);
        Random r = new Random(2);
        boolean control = false;
        boolean markup = false;
        boolean pair = false;
        boolean lone = false;
        for (int i = 0; i < 2000; i++) {
            String s = g.next(r);
            assertTrue(s.length() <= 40);
            for (int k = 0; k < s.length(); k++) {
                char c = s.charAt(k);
                control |= c < 0x20;
                markup |= c == '<' || c == '&';
                boolean high = Character.isHighSurrogate(c);
                boolean next = k + 1 < s.length() && Character.isLowSurrogate(s.charAt(k + 1));
                pair |= high && next;
                lone |= Character.isSurrogate(c) && !(high && next) && !(k > 0 && Character.isHighSurrogate(s.charAt(k - 1)));
            }
        }
        assertTrue(control && markup && pair && lone, control + " " + markup + " " + pair + " " + lone);
    }

    @Test
    void aFilterThatRejectsEverythingFailsLoudly() {
        Gen<Integer> never = Gen.ints(0, 9).filter(x -> x > 9);
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> never.next(new Random(3)));
        assertTrue(e.getMessage().contains("filtered out"), e.getMessage());
    }

    record Pair(double[] x, List<String> names) {
    }

    @Test
    void inputsAreDescribedElementByElement() {
        assertEquals("Pair[x=[0.5, -0.0, NaN] (length 3), names=[\"a\\u00E9\", null] (size 2)]",
                Describe.of(new Pair(new double[] {0.5, -0.0, Double.NaN}, java.util.Arrays.asList("a\u00e9", null))));
        String longText = Describe.of("x".repeat(10_000));
        assertTrue(longText.length() < Describe.MAX_CHARS + 40 && longText.endsWith("more characters)"), longText);
    }
}
