package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.lang.reflect.Array;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * The analysis of a duplicate set with its model computed on a spare core ({@link SideTask#start}) is the
 * analysis computed on one thread ({@link SideTask#inPlace}), bit for bit: every number, flag, list and note of
 * the result, whichever thread ran what and however the threads were timed.
 */
class SideBySideEquivalenceProperties {

    /** The pairs of one set, drawn from a seed, and whether the absolute and relative pairs may differ. */
    record SetInput(long seed, int n, boolean censored) {
    }

    /**
     * Sizes on both sides of the bootstrap limit (5,000 pairs) and of the radix sort (4,096), and small sets,
     * where Thompson–Howarth is refused (fewer than its minimum pairs) or the batches are few pairs each.
     */
    private static final List<Gen<SetInput>> EDGES = List.of(r -> new SetInput(r.nextLong(), 0, true),
            r -> new SetInput(r.nextLong(), 1, false), r -> new SetInput(r.nextLong(), 4096, true),
            r -> new SetInput(r.nextLong(), 5001, false), r -> new SetInput(r.nextLong(), 7000, true),
            r -> new SetInput(r.nextLong(), PairScreen.SPLIT_FROM + 1, true));

    @Test
    void theSetAnalysedSideBySideIsTheSetAnalysedOnOneThread() {
        Gen<Integer> n = Gen.oneOf(Gen.ints(0, 300), Gen.ints(300, 7000));
        SeededTries.forAll(40, EDGES, r -> new SetInput(r.nextLong(), n.next(r), r.nextBoolean()), in -> {
            List<DuplicatePair> pairs = pairs(in);
            assertEquals(analysed(pairs, false), analysed(pairs, true));
        });
    }

    /**
     * A set screened in two halves, the second by a side task, is the set screened in one pass: at the sizes
     * where the split starts, with an odd count (the halves differ by one pair), and above.
     */
    @Test
    void aSetScreenedInHalvesIsTheSetScreenedInOnePass() {
        List<Gen<SetInput>> edges = List.of(r -> new SetInput(r.nextLong(), PairScreen.SPLIT_FROM - 1, true),
                r -> new SetInput(r.nextLong(), PairScreen.SPLIT_FROM, false),
                r -> new SetInput(r.nextLong(), PairScreen.SPLIT_FROM + 1, true));
        Gen<Integer> n = Gen.ints(PairScreen.SPLIT_FROM, 3 * PairScreen.SPLIT_FROM);
        SeededTries.forAll(8, edges, r -> new SetInput(r.nextLong(), n.next(r), r.nextBoolean()), in -> {
            List<DuplicatePair> pairs = pairs(in);
            for (DuplicateSettings settings : List.of(DuplicateSettings.DEFAULTS,
                    DuplicateSettings.withDefaults().censoredAtHalfLimit(true).build())) {
                assertEquals(PairScreen.screen(pairs, settings),
                        PairScreen.decide(pairs, settings, SideTask::start).all());
            }
        });
    }

    /**
     * Sets analysed from four threads at once, as the analyses of a project do: more callers than spare threads,
     * so that some side tasks are taken back by their callers and others wait in the queue. Every result is the
     * one-thread result and nothing deadlocks.
     */
    @Test
    void setsAnalysedFromSeveralThreadsAtOnceAreTheOneThreadResults() throws Exception {
        List<List<DuplicatePair>> sets = new ArrayList<>();
        List<String> expected = new ArrayList<>();
        Random seeds = new Random(20261203);
        for (int i = 0; i < 8; i++) {
            sets.add(pairs(new SetInput(seeds.nextLong(), 2000 + 700 * i, i % 2 == 0)));
            expected.add(analysed(sets.get(i), false));
        }
        ExecutorService callers = Executors.newFixedThreadPool(4);
        try {
            List<Future<String>> results = new ArrayList<>();
            for (List<DuplicatePair> set : sets) {
                results.add(callers.submit(() -> analysed(set, true)));
            }
            for (int i = 0; i < sets.size(); i++) {
                assertEquals(expected.get(i), results.get(i).get(), "set " + i);
            }
        } finally {
            callers.shutdownNow();
        }
    }

    private static String analysed(List<DuplicatePair> pairs, boolean sideBySide) {
        DuplicateSetResult r = DuplicateAnalysis.analyseSet("Au", "g/t", QcRole.PULP_DUPLICATE, pairs,
                new double[] {0.1, 1, 10}, DuplicateSettings.DEFAULTS,
                sideBySide ? SideTask::start : SideTask::inPlace);
        return text(r);
    }

    /**
     * Log-normal grades with Thompson–Howarth errors (σ = 0.01 + 0.05c) written to three decimals, so that equal
     * means are common; a few pairs below detection or missing when {@code censored}; pairs in batches of 1 to 60.
     */
    static List<DuplicatePair> pairs(SetInput in) {
        Random r = new Random(in.seed());
        List<DuplicatePair> out = new ArrayList<>(in.n());
        int batch = 0;
        int leftInBatch = 0;
        for (int i = 0; i < in.n(); i++) {
            if (leftInBatch == 0) {
                batch++;
                leftInBatch = 1 + r.nextInt(60);
            }
            leftInBatch--;
            double c = Math.exp(r.nextGaussian() - 1);
            double sigma = 0.01 + 0.05 * c;
            out.add(new DuplicatePair("D" + i, "S" + i, "B" + batch, QcRole.PULP_DUPLICATE,
                    member(r, c + sigma * r.nextGaussian(), in.censored()),
                    member(r, c + sigma * r.nextGaussian(), in.censored())));
        }
        return out;
    }

    private static AssayValue member(Random r, double v, boolean censored) {
        double rounded = Math.round(v * 1000) / 1000.0;
        if (censored && r.nextInt(50) == 0) {
            return r.nextBoolean() ? AssayValue.belowDetection(0.005)
                    : AssayValue.missing(MissingReason.INSUFFICIENT_SAMPLE);
        }
        return rounded < 0.005 ? AssayValue.belowDetection(0.005) : AssayValue.detected(rounded, 0.005);
    }

    /**
     * The whole result as text, every double by its bits (so that equal text is equal bits, −0.0 and NaN
     * included), records and lists element by element, the chart values of {@link DuplicateSetResult.PairValues}
     * array by array.
     */
    static String text(Object value) {
        StringBuilder out = new StringBuilder();
        append(out, value);
        return out.toString();
    }

    private static void append(StringBuilder out, Object value) {
        if (value instanceof Double d) {
            out.append(Long.toHexString(Double.doubleToRawLongBits(d)));
        } else if (value != null && value.getClass().isArray()) {
            out.append('[');
            for (int i = 0; i < Array.getLength(value); i++) {
                append(out, Array.get(value, i));
                out.append(',');
            }
            out.append(']');
        } else if (value instanceof Collection<?> c) {
            out.append('[');
            for (Object o : c) {
                append(out, o);
                out.append(',');
            }
            out.append(']');
        } else if (value instanceof Record r) {
            out.append(r.getClass().getSimpleName()).append('(');
            for (RecordComponent c : r.getClass().getRecordComponents()) {
                out.append(c.getName()).append('=');
                try {
                    c.getAccessor().setAccessible(true);
                    append(out, c.getAccessor().invoke(r));
                } catch (ReflectiveOperationException e) {
                    throw new AssertionError(e);
                }
                out.append(';');
            }
            out.append(')');
        } else if (value instanceof DuplicateSetResult.PairValues p) {
            for (Object o : new Object[] {p.absoluteA(), p.absoluteB(), p.relativeA(), p.relativeB(),
                p.absoluteFlags(), p.relativeFlags()}) {
                append(out, o);
            }
        } else {
            out.append(value);
        }
    }
}
