package org.cupel.assay;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * The index must number strings exactly as an insertion-ordered map does, through growth of its table and
 * with adds of present strings and look-ups of absent ones mixed in.
 */
class IdIndexProperties {

    @Property(tries = 500)
    void numbersStringsAsAnInsertionOrderedMapDoes(@ForAll("operations") List<String> ops) {
        IdIndex index = new IdIndex(4);
        Map<String, Integer> reference = new LinkedHashMap<>();
        for (String op : ops) {
            String key = op.substring(1);
            if (op.charAt(0) == '+') {
                Integer prior = reference.putIfAbsent(key, reference.size());
                assertEquals(prior == null ? reference.size() - 1 : -1 - prior, index.add(key), op);
            } else {
                assertEquals(reference.getOrDefault(key, -1), index.indexOf(key), op);
            }
        }
        assertEquals(reference.size(), index.size());
        reference.forEach((k, n) -> {
            assertEquals(n, index.indexOf(k));
            assertEquals(k, index.get(n));
        });
    }

    /** Adds ("+ID") and look-ups ("?ID"): first a sorted run of adds and look-ups, as registers list IDs, then any mix. */
    @Provide
    Arbitrary<List<String>> operations() {
        Arbitrary<String> any = Arbitraries.integers().between(0, 1000).map(n -> "S" + String.format("%04d", n));
        Arbitrary<List<String>> sortedRun = Arbitraries.integers().between(0, 1000).set().ofMaxSize(60)
                .map(set -> set.stream().sorted().flatMap(n -> java.util.stream.Stream.of(
                        "?S" + String.format("%04d", n), "+S" + String.format("%04d", n))).toList());
        Arbitrary<String> op = Arbitraries.frequencyOf(
                net.jqwik.api.Tuple.of(2, any.map(k -> "+" + k)),
                net.jqwik.api.Tuple.of(3, any.map(k -> "?" + k)));
        return net.jqwik.api.Combinators.combine(sortedRun, op.list().ofMaxSize(80)).as((run, mix) -> {
            List<String> all = new java.util.ArrayList<>(run);
            all.addAll(mix);
            return all;
        });
    }
}
