package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;

/** Invariants of batch verdicts, re-assay lists and blank thresholds. */
class ControlProperties {

    @Provide
    Arbitrary<List<String>> batches() {
        return Arbitraries.strings().withChars('R', 'R', 'R', 'C', 'B', 'F').ofMinLength(1).ofMaxLength(25)
                .list().ofMinSize(1).ofMaxSize(5);
    }

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

    @Property(tries = 300)
    void verdictsAndReassayDoNotDependOnBatchOrOutcomeOrder(@ForAll("batches") List<String> codes,
                                                           @ForAll long seed) {
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
    }

    @Property(tries = 300)
    void reassayListNeverHoldsControlSamples(@ForAll("batches") List<String> codes, @ForAll long seed,
                                            @ForAll boolean wholeBatch) {
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < codes.size(); i++) {
            order.add(i);
        }
        SampleTable t = table(codes, order);
        ReassaySettings s = new ReassaySettings(wholeBatch ? ReassaySettings.Scope.WHOLE_BATCH
                : ReassaySettings.Scope.BRACKET);
        for (ReassayEntry e : ReassayList.build(t, outcomes(t, seed), s).entries()) {
            assertFalse(ReassayList.isControl(t.role(t.rowOf(e.sampleId()).getAsInt())), e.sampleId());
        }
    }

    @Property
    void scalingValueAndLimitTogetherLeavesTheVerdict(@ForAll @DoubleRange(min = 0.001, max = 10) @Scale(6) double dl,
                                                     @ForAll @DoubleRange(min = 0, max = 20) double multiple,
                                                     @ForAll @IntRange(min = -3, max = 4) int decade,
                                                     @ForAll boolean censored) {
        // Unit changes multiply by powers of ten (ppb ↔ ppm ↔ %), the scaling that matters here.
        double f = Math.pow(10, decade);
        AssayValue v = censored ? AssayValue.belowDetection(dl) : AssayValue.detected(Math.max(dl, multiple * dl), dl);
        BlankThreshold t = BlankSettings.DEFAULTS.thresholdFor("Au", dl).orElseThrow();
        BlankThreshold ts = BlankSettings.DEFAULTS.thresholdFor("Au", dl * f).orElseThrow();
        assertEquals(BlankVerdict.judge(v, t, "g/t").verdict(), BlankVerdict.judge(v.scaled(f), ts, "g/t").verdict());
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
