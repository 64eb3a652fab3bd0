package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/** Invariants of batch verdicts, re-assay lists and blank thresholds. */
class ControlProperties {

    /** 1 to 5 batches of 1 to 25 samples, each a routine sample (R, half of them), CRM, blank or field duplicate. */
    private static final Gen<List<String>> BATCHES = Gen.strings("RRRCBF", 1, 25).list(1, 5);

    private static SampleTable table(List<String> codes, List<Integer> order) {
        Sequences s = new Sequences();
        for (int i : order) {
            s.batch("J" + i, codes.get(i));
        }
        return s.table();
    }

    /** Outcomes decided by a seeded coin per sample ID, so every table order sees the same outcomes. */
    private static List<ControlOutcome> outcomes(SampleTable t, long seed) {
        List<ControlOutcome> out = new ArrayList<>();
        for (int row = 0; row < t.size(); row++) {
            QcRole role = t.role(row);
            if (role == QcRole.CRM || role == QcRole.BLANK) {
                Random r = new Random(seed ^ t.id(row).hashCode());
                Verdict v = Verdict.values()[r.nextInt(Verdict.values().length)];
                out.add(Sequences.outcome(t, t.id(row), v));
            }
        }
        return out;
    }

    record Batches(List<String> codes, long seed, boolean wholeBatch) {
    }

    private static final Gen<Batches> BATCHES_AND_SEED = r -> new Batches(BATCHES.next(r), r.nextLong(), r.nextBoolean());

    @Test
    void verdictsAndReassayDoNotDependOnBatchOrOutcomeOrder() {
        SeededTries.forAll(300, BATCHES_AND_SEED, in -> {
            List<String> codes = in.codes();
            long seed = in.seed();
            List<Integer> order = new ArrayList<>();
            for (int i = 0; i < codes.size(); i++) {
                order.add(i);
            }
            SampleTable a = table(codes, order);
            List<Integer> shuffled = new ArrayList<>(order);
            Collections.shuffle(shuffled, new Random(seed));
            SampleTable b = table(codes, shuffled);
            List<ControlOutcome> outB = new ArrayList<>(outcomes(b, seed));
            Collections.shuffle(outB, new Random(seed + 1));
            assertEquals(byBatch(BatchVerdicts.judge(a, outcomes(a, seed))), byBatch(BatchVerdicts.judge(b, outB)));
            assertEquals(
                    new java.util.TreeSet<>(ids(ReassayList.build(a, outcomes(a, seed), ReassaySettings.DEFAULTS))),
                    new java.util.TreeSet<>(ids(ReassayList.build(b, outB, ReassaySettings.DEFAULTS))));
        });
    }

    @Test
    void reassayListNeverHoldsControlSamples() {
        SeededTries.forAll(300, BATCHES_AND_SEED, in -> {
            List<Integer> order = new ArrayList<>();
            for (int i = 0; i < in.codes().size(); i++) {
                order.add(i);
            }
            SampleTable t = table(in.codes(), order);
            ReassaySettings s = ReassaySettings.withDefaults().scope(in.wholeBatch()
                    ? ReassaySettings.Scope.WHOLE_BATCH : ReassaySettings.Scope.BRACKET).build();
            for (ReassayEntry e : ReassayList.build(t, outcomes(t, in.seed()), s).entries()) {
                assertFalse(ReassayList.isControl(t.role(t.rowOf(e.sampleId()).getAsInt())), e.sampleId());
            }
        });
    }

    /** A blank's detection limit, its value as a multiple of that limit, a power of ten and whether it is censored. */
    record Blank(double dl, double multiple, int decade, boolean censored) {
    }

    @Test
    void scalingValueAndLimitTogetherLeavesTheVerdict() {
        Gen<Double> dl = Gen.doubles(0.001, 10, 6);
        Gen<Double> multiple = Gen.doubles(0, 20);
        Gen<Integer> decade = Gen.ints(-3, 4);
        // The value exactly at its limit (multiple 0 gives max(dl, 0) = dl) and exactly at the default warning
        // and failure multiples (3 and 5), the ends of the limits and of the decades.
        List<Gen<Blank>> edges = List.of(
                r -> new Blank(dl.next(r), 0, decade.next(r), false),
                r -> new Blank(0.001, multiple.next(r), -3, r.nextBoolean()),
                r -> new Blank(10, multiple.next(r), 4, r.nextBoolean()),
                r -> new Blank(10, 20, -3, false),
                r -> new Blank(0.001, 20, 4, false),
                r -> new Blank(dl.next(r), 3, decade.next(r), false),
                r -> new Blank(dl.next(r), 5, decade.next(r), false));
        SeededTries.forAll(1000, edges,
                r -> new Blank(dl.next(r), multiple.next(r), decade.next(r), r.nextBoolean()), in -> {
                    // Unit changes multiply by powers of ten (ppb ↔ ppm ↔ %), the scaling that matters here.
                    double f = Math.pow(10, in.decade());
                    double d = in.dl();
                    AssayValue v = in.censored() ? AssayValue.belowDetection(d)
                            : AssayValue.detected(Math.max(d, in.multiple() * d), d);
                    BlankThreshold t = BlankSettings.DEFAULTS.thresholdFor("Au", d).orElseThrow();
                    BlankThreshold ts = BlankSettings.DEFAULTS.thresholdFor("Au", d * f).orElseThrow();
                    assertEquals(BlankVerdict.judge(v, t, "g/t").verdict(),
                            BlankVerdict.judge(v.scaled(f), ts, "g/t").verdict());
                });
    }

    private static Map<String, List<Verdict>> byBatch(List<BatchVerdict> vs) {
        Map<String, List<Verdict>> m = new LinkedHashMap<>();
        for (BatchVerdict v : vs) {
            List<Verdict> l = new ArrayList<>();
            l.add(v.verdict());
            v.analytes().forEach(a -> l.add(a.verdict()));
            m.put(v.batch(), l);
        }
        return new java.util.TreeMap<>(m);
    }

    private static List<String> ids(ReassayList l) {
        return l.entries().stream().map(e -> e.sampleId() + "/" + e.analyte() + "/" + e.triggeredBy()).toList();
    }
}
