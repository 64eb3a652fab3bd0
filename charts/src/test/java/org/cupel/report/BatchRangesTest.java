package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/** Batch lists written compactly; expected strings are worked by hand from the IDs given. */
class BatchRangesTest {

    @Test
    void consecutiveRunsOfThreeOrMoreBecomeRanges() {
        // The demo's accepted batches: 1, 2 | 4–7 | 10 | 13, 14 | 19.
        List<String> ids = List.of("OAL-00001", "OAL-00002", "OAL-00004", "OAL-00005", "OAL-00006", "OAL-00007",
                "OAL-00010", "OAL-00013", "OAL-00014", "OAL-00019");
        assertEquals("OAL-00001, OAL-00002, OAL-00004–OAL-00007, OAL-00010, OAL-00013, OAL-00014, OAL-00019",
                BatchRanges.compact(ids));
        assertEquals("BFA-U0001–BFA-U0005", BatchRanges.compact(List.of("BFA-U0003", "BFA-U0001", "BFA-U0002",
                "BFA-U0005", "BFA-U0004")));
    }

    @Test
    void prefixesPaddingAndIdsWithoutNumbersKeepRunsHonest() {
        // Different prefixes never join; B9 → B10 joins (neither padded), B09 → B010 does not (written
        // differently); an ID without a trailing number stands alone, first in its prefix.
        assertEquals("A1, A2, B8–B10", BatchRanges.compact(List.of("B10", "A1", "B9", "A2", "B8")));
        assertEquals("B08, B09, B010", BatchRanges.compact(List.of("B08", "B09", "B010")));
        assertEquals("JOB, JOB-1, JOB-2, X", BatchRanges.compact(List.of("X", "JOB-2", "JOB", "JOB-1")));
        assertEquals("J1–J3", BatchRanges.compact(List.of("J1", "J2", "J2", "J3")), "a repeated ID counts once");
        assertEquals("", BatchRanges.compact(List.of()));
    }

    @Test
    void everyListedIdIsRecoveredFromTheCompactText() {
        // Property: expanding the ranges of the compact text gives back the distinct IDs, whatever their order.
        SeededTries.forAll(300, Gen.ints(1, 40).list(0, 25), numbers -> {
            List<String> ids = new ArrayList<>(numbers.stream().map(n -> "J-" + String.format(java.util.Locale.ROOT, "%03d", n)).toList());
            Collections.shuffle(ids, new Random(numbers.size()));
            List<String> back = new ArrayList<>();
            for (String part : BatchRanges.compact(ids).split(", ")) {
                if (part.isEmpty()) {
                    continue;
                }
                String[] ends = part.split("–");
                int from = Integer.parseInt(ends[0].substring(2));
                int to = Integer.parseInt(ends[ends.length - 1].substring(2));
                for (int n = from; n <= to; n++) {
                    back.add("J-" + String.format(java.util.Locale.ROOT, "%03d", n));
                }
            }
            assertEquals(ids.stream().distinct().sorted().toList(), back);
        });
    }
}
