package org.cupel.testing;

import java.util.List;
import java.util.Random;

/**
 * Runs a property: a check over many generated inputs, with JUnit 5 alone. Each try draws its input from its
 * own {@code new Random(seed)}, the seed derived from the property's base seed and the try's index, so a
 * failure names the one seed that regenerates its input. The base seed is fixed per property (from its class
 * and method name), so every run tries the same inputs; {@code -Dcupel.properties.seed=N} gives every property
 * another base seed, to explore further inputs.
 *
 * <p>Edge cases are tried first and count among the tries: the inputs a property must hold at by its
 * definition (bounds of a range, empty and one-element lists, ties) that random draws would rarely hit.
 *
 * <p>On failure the assertion is rethrown as "property Class#method failed at try i of n, seed s ...: input:
 * ..." with the original failure as its cause. A check may {@link #assume} a condition; a try where it does
 * not hold is discarded (it counts as a try but checks nothing), and the property fails when more than five
 * tries in six are discarded, rather than pass having checked nothing.
 */
public final class SeededTries {
    /** The system property that replaces every property's base seed. */
    public static final String SEED_PROPERTY = "cupel.properties.seed";
    /** At most this many discarded tries per checked try. */
    static final int MAX_DISCARD_RATIO = 5;

    private SeededTries() {
    }

    /** What a property asserts of one input; it may throw what the code under test throws. */
    @FunctionalInterface
    public interface Check<T> {
        void check(T input) throws Exception;
    }

    /** Runs {@code tries} tries of {@code check} on inputs from {@code gen}. */
    public static <T> void forAll(int tries, Gen<T> gen, Check<? super T> check) {
        run(callerName(), tries, List.of(), gen, check);
    }

    /**
     * As {@link #forAll(int, Gen, Check)}, the first tries on the given edge cases: each a generator too, so
     * that an edge case may fix one part of the input ({@code budget = 2}) and draw the rest from its try's seed.
     */
    public static <T> void forAll(int tries, List<Gen<T>> edgeCases, Gen<T> gen, Check<? super T> check) {
        run(callerName(), tries, edgeCases, gen, check);
    }

    /** Discards the current try unless the condition holds. */
    public static void assume(boolean condition) {
        if (!condition) {
            throw new Discarded();
        }
    }

    /** The seed of try {@code index} of a property with the given base seed (SplittableRandom's mix). */
    public static long trySeed(long baseSeed, int index) {
        long z = baseSeed + (index + 1L) * 0x9E3779B97F4A7C15L;
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /** The base seed of the named property: fixed, unless {@value #SEED_PROPERTY} is set. */
    public static long baseSeed(String name) {
        long fixed = name.hashCode();
        String override = System.getProperty(SEED_PROPERTY);
        return override == null || override.isBlank() ? fixed : trySeed(Long.parseLong(override.strip()), (int) fixed);
    }

    static <T> void run(String name, int tries, List<Gen<T>> edgeCases, Gen<T> gen, Check<? super T> check) {
        if (tries < edgeCases.size()) {
            throw new IllegalArgumentException(name + ": " + edgeCases.size() + " edge cases, only " + tries + " tries");
        }
        long base = baseSeed(name);
        int discarded = 0;
        for (int i = 0; i < tries; i++) {
            boolean edge = i < edgeCases.size();
            long seed = trySeed(base, i);
            T input;
            try {
                input = (edge ? edgeCases.get(i) : gen).next(new Random(seed));
            } catch (RuntimeException e) {
                throw failure(name, i + 1, tries, where(edge, i, edgeCases.size(), seed, base), e, "(not generated)");
            }
            try {
                check.check(input);
            } catch (Discarded d) {
                discarded++;
            } catch (OutOfMemoryError e) {
                throw e;
            } catch (Exception | Error e) {
                throw failure(name, i + 1, tries, where(edge, i, edgeCases.size(), seed, base), e, Describe.of(input));
            }
        }
        int checked = tries - discarded;
        if (checked == 0 || discarded > MAX_DISCARD_RATIO * checked) {
            throw new AssertionError("property " + name + ": " + discarded + " of " + tries
                    + " tries were discarded by an assumption; the generator does not fit the property");
        }
    }

    private static String where(boolean edge, int i, int edgeCases, long seed, long base) {
        return (edge ? "edge case " + (i + 1) + " of " + edgeCases + ", " : "") + "seed " + seed + " (new Random("
                + seed + "L) regenerates the input; base seed " + base + ")";
    }

    private static AssertionError failure(String name, int i, int tries, String where, Throwable e, String input) {
        return new AssertionError("property " + name + " failed at try " + i + " of " + tries + ", " + where + ": "
                + e + "\ninput: " + input, e);
    }

    /** Class#method of the test that called forAll: the property's name and the source of its base seed. */
    private static String callerName() {
        StackWalker.StackFrame f = StackWalker.getInstance(StackWalker.Option.RETAIN_CLASS_REFERENCE)
                .walk(s -> s.filter(x -> x.getDeclaringClass() != SeededTries.class).findFirst()).orElseThrow();
        // Called from a lambda (inside assertThrows, say), the frame is lambda$method$0: name the method.
        String method = f.getMethodName().replaceFirst("^lambda\\$(.*)\\$\\d+$", "$1");
        return f.getDeclaringClass().getSimpleName() + "#" + method;
    }

    /** Thrown by {@link #assume}; not a failure. */
    private static final class Discarded extends RuntimeException {
        Discarded() {
            super("assumption not met", null, false, false);
        }
    }
}
