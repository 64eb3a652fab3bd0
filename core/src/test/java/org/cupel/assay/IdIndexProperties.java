package org.cupel.assay;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * The index must number strings exactly as an insertion-ordered map does, through growth of its table and
 * with adds of present strings and look-ups of absent ones mixed in.
 */
class IdIndexProperties {

    @Test
    void numbersStringsAsAnInsertionOrderedMapDoes() {
        SeededTries.forAll(500, List.of(Gen.constant(List.of())), OPERATIONS, ops -> {
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
        });
    }

    private static String id(int n) {
        return "S" + String.format("%04d", n);
    }

    /** Two adds to three look-ups of any ID in S0000..S1000. */
    private static final Gen<String> MIXED = Gen.frequency(Gen.weight(2, Gen.ints(0, 1000).map(n -> "+" + id(n))),
            Gen.weight(3, Gen.ints(0, 1000).map(n -> "?" + id(n))));

    /** Adds ("+ID") and look-ups ("?ID"): first a sorted run of adds and look-ups, as registers list IDs, then any mix. */
    private static final Gen<List<String>> OPERATIONS = r -> {
        TreeSet<Integer> distinct = new TreeSet<>();
        int runLength = r.nextInt(61);
        while (distinct.size() < runLength) {
            distinct.add(r.nextInt(1001));
        }
        List<String> all = new ArrayList<>();
        for (int n : distinct) {
            all.add("?" + id(n));
            all.add("+" + id(n));
        }
        all.addAll(MIXED.list(0, 80).next(r));
        return all;
    };
}
