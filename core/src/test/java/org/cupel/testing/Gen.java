package org.cupel.testing;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.function.Function;
import java.util.function.Predicate;

/**
 * A generator of one property input from a seeded {@link Random}: the same seed gives the same input, so a
 * failing try is reproduced by its seed alone ({@link SeededTries}). The static methods are the typed
 * generators the properties combine; a record of several inputs is built by a lambda that calls each in turn.
 *
 * @param <T> the input type
 */
@FunctionalInterface
public interface Gen<T> {
    /** How many draws a {@link #filter} may reject in a row before the generator is judged unfit. */
    int MAX_REJECTIONS = 10_000;

    /** Printable ASCII, markup and quoting characters included. */
    String PRINTABLE_ASCII = " !\"#$%&'()*+,-./0123456789:;<=>?@ABCDEFGHIJKLMNOPQRSTUVWXYZ[\\]^_`abcdefghijklmnopqrstuvwxyz{|}~";

    T next(Random random);

    default <R> Gen<R> map(Function<? super T, ? extends R> f) {
        return r -> f.apply(next(r));
    }

    /** Draws again until the value passes; fails loudly rather than loop when almost nothing passes. */
    default Gen<T> filter(Predicate<? super T> keep) {
        return r -> {
            for (int i = 0; i < MAX_REJECTIONS; i++) {
                T t = next(r);
                if (keep.test(t)) {
                    return t;
                }
            }
            throw new IllegalStateException(MAX_REJECTIONS + " draws in a row were filtered out: the generator"
                    + " does not fit its filter");
        };
    }

    /** A list of a size drawn uniformly from [minSize, maxSize], each element drawn independently. */
    default Gen<List<T>> list(int minSize, int maxSize) {
        return r -> {
            int n = r.nextInt(minSize, maxSize + 1);
            List<T> out = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                out.add(next(r));
            }
            return out;
        };
    }

    static <T> Gen<T> constant(T value) {
        return r -> value;
    }

    /** One of the values, each equally likely. */
    @SafeVarargs
    @SuppressWarnings("varargs") // the array is only copied into an immutable list
    static <T> Gen<T> of(T... values) {
        List<T> copy = List.of(values);
        return r -> copy.get(r.nextInt(copy.size()));
    }

    /** The value of one of the generators, each equally likely. */
    @SafeVarargs
    @SuppressWarnings("varargs") // the array is only copied into an immutable list
    static <T> Gen<T> oneOf(Gen<? extends T>... gens) {
        List<Gen<? extends T>> copy = List.of(gens);
        return r -> copy.get(r.nextInt(copy.size())).next(r);
    }

    /** A generator with its relative weight in {@link #frequency}. */
    record Weighted<T>(int weight, Gen<? extends T> gen) {
    }

    static <T> Weighted<T> weight(int weight, Gen<? extends T> gen) {
        return new Weighted<>(weight, gen);
    }

    /** The value of one of the generators, chosen with probability proportional to its weight. */
    @SafeVarargs
    @SuppressWarnings("varargs") // the array is only copied into an immutable list
    static <T> Gen<T> frequency(Weighted<T>... choices) {
        List<Weighted<T>> copy = List.of(choices);
        int total = copy.stream().mapToInt(Weighted::weight).sum();
        return r -> {
            int k = r.nextInt(total);
            for (Weighted<T> w : copy) {
                k -= w.weight();
                if (k < 0) {
                    return w.gen().next(r);
                }
            }
            throw new AssertionError("weights sum to " + total);
        };
    }

    static Gen<Boolean> booleans() {
        return Random::nextBoolean;
    }

    /** Any long: seeds for the properties that draw further values from a {@link Random} of their own. */
    static Gen<Long> longs() {
        return Random::nextLong;
    }

    /** An int in [min, max], both included. */
    static Gen<Integer> ints(int min, int max) {
        return r -> r.nextInt(min, max + 1);
    }

    /**
     * A double in [min, max]: half of the draws uniform, half spread evenly over the decades between the
     * smallest magnitude the range holds (or 10⁻¹² of its largest, when it holds zero) and its largest, so that
     * a range such as [1e-6, 1e6] gives small values as often as large ones (the property library these
     * generators replace leaned towards small magnitudes too). The ends themselves belong in a property's edge
     * cases.
     */
    static Gen<Double> doubles(double min, double max) {
        if (!(min <= max) || !Double.isFinite(min) || !Double.isFinite(max)) {
            throw new IllegalArgumentException("[" + min + ", " + max + "]");
        }
        double top = Math.max(Math.abs(min), Math.abs(max));
        double floor = min > 0 ? min : max < 0 ? -max : top * 1e-12;
        double lnFloor = Math.log(floor);
        double lnTop = Math.log(top);
        return r -> {
            if (r.nextBoolean() || !(floor > 0) || lnTop <= lnFloor) {
                return Math.min(max, min + (max - min) * r.nextDouble());
            }
            double magnitude = Math.exp(lnFloor + (lnTop - lnFloor) * r.nextDouble());
            boolean negative = max < 0 || (min < 0 && r.nextBoolean());
            return Math.max(min, Math.min(max, negative ? -magnitude : magnitude));
        };
    }

    /**
     * A double drawn as by {@link #doubles(double, double)} and rounded (half up) to {@code scale} decimals:
     * the double nearest that decimal, like a value read from a lab file.
     */
    static Gen<Double> doubles(double min, double max, int scale) {
        BigDecimal lo = BigDecimal.valueOf(min).setScale(scale, RoundingMode.CEILING);
        BigDecimal hi = BigDecimal.valueOf(max).setScale(scale, RoundingMode.FLOOR);
        return doubles(min, max).map(x -> {
            BigDecimal d = new BigDecimal(x).setScale(scale, RoundingMode.HALF_UP);
            return d.max(lo).min(hi).doubleValue();
        });
    }

    /** An array of a length drawn uniformly from [minLength, maxLength]. */
    static Gen<double[]> doubleArrays(Gen<Double> element, int minLength, int maxLength) {
        return element.list(minLength, maxLength).map(l -> l.stream().mapToDouble(Double::doubleValue).toArray());
    }

    /** Raw bytes, every value equally likely, of a length drawn uniformly from [0, maxLength]. */
    static Gen<byte[]> bytes(int maxLength) {
        return r -> {
            byte[] b = new byte[r.nextInt(maxLength + 1)];
            r.nextBytes(b);
            return b;
        };
    }

    /** A string of characters drawn uniformly from {@code alphabet} (repeat a character to weight it). */
    static Gen<String> strings(String alphabet, int minLength, int maxLength) {
        return r -> {
            int n = r.nextInt(minLength, maxLength + 1);
            StringBuilder s = new StringBuilder(n);
            for (int i = 0; i < n; i++) {
                s.append(alphabet.charAt(r.nextInt(alphabet.length())));
            }
            return s.toString();
        };
    }

    /**
     * Any text of up to {@code maxLength} UTF-16 units, leaning towards what breaks text handling: printable
     * ASCII with markup and quotes (half the characters), ASCII control characters, any other character of the
     * Basic Multilingual Plane, characters beyond it (surrogate pairs) and lone surrogates.
     */
    static Gen<String> anyStrings(int maxLength) {
        Gen<String> ch = frequency(
                weight(10, strings(PRINTABLE_ASCII, 1, 1)),
                weight(3, r -> String.valueOf((char) (r.nextBoolean() ? r.nextInt(0x20) : 0x7F))),
                weight(4, r -> String.valueOf((char) r.nextInt(0x80, 0xD800))),
                weight(1, r -> String.valueOf((char) r.nextInt(0xE000, 0x10000))),
                weight(1, r -> Character.toString(r.nextInt(0x10000, Character.MAX_CODE_POINT + 1))),
                weight(1, r -> String.valueOf((char) r.nextInt(0xD800, 0xE000))));
        return r -> {
            int n = r.nextInt(maxLength + 1);
            StringBuilder s = new StringBuilder(n);
            while (s.length() < n) {
                String c = ch.next(r);
                if (s.length() + c.length() <= n) {
                    s.append(c);
                }
            }
            return s.toString();
        };
    }

    /**
     * Any double, with the values that break arithmetic made common: a fifth of the draws are zeros of both
     * signs, NaN, the infinities, the smallest and largest finite values and small integers; the rest spread
     * over every magnitude (a uniform exponent) with either sign.
     */
    static Gen<Double> anyDoubles() {
        Gen<Double> special = of(0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
                Double.MIN_VALUE, -Double.MIN_VALUE, Double.MIN_NORMAL, Double.MAX_VALUE, -Double.MAX_VALUE,
                1.0, -1.0, 0.01, 10.0);
        Gen<Double> spread = r -> (r.nextBoolean() ? 1 : -1) * r.nextDouble(1, 2)
                * Math.scalb(1.0, r.nextInt(Double.MIN_EXPONENT, Double.MAX_EXPONENT + 1));
        return frequency(weight(1, special), weight(4, spread));
    }
}
