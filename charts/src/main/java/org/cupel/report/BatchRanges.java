package org.cupel.report;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Batch IDs listed compactly for a reader: the IDs in natural order (text before the trailing number, then
 * the number), and every run of three or more consecutive numbers under one prefix written as its first and
 * last ID with an en dash ("OAL-00001–OAL-00005"). A run names exactly the IDs listed: a number missing from
 * the list breaks it. Two consecutive IDs stay two IDs ("OAL-00001, OAL-00002"), which is no longer written
 * as a range.
 */
public final class BatchRanges {
    private static final int SHORTEST_RANGE = 3;

    private BatchRanges() {
    }

    /** The IDs as a comma-separated list with ranges; duplicates are listed once. */
    public static String compact(List<String> ids) {
        List<Id> sorted = ids.stream().distinct().map(Id::of)
                .sorted(Comparator.comparing(Id::prefix).thenComparing(Id::number, Comparator.nullsFirst(
                        Comparator.naturalOrder())).thenComparing(Id::text)).toList();
        List<String> parts = new ArrayList<>();
        int i = 0;
        while (i < sorted.size()) {
            int j = i;
            while (j + 1 < sorted.size() && sorted.get(j).precedes(sorted.get(j + 1))) {
                j++;
            }
            if (j - i + 1 >= SHORTEST_RANGE) {
                parts.add(sorted.get(i).text() + "–" + sorted.get(j).text());
            } else {
                for (int k = i; k <= j; k++) {
                    parts.add(sorted.get(k).text());
                }
            }
            i = j + 1;
        }
        return String.join(", ", parts);
    }

    /** An ID split into the text before its trailing digits and their value (null when it has none). */
    private record Id(String text, String prefix, String digits, BigInteger number) {
        static Id of(String text) {
            int end = text.length();
            int start = end;
            while (start > 0 && Character.isDigit(text.charAt(start - 1)) && text.charAt(start - 1) < 128) {
                start--;
            }
            String digits = text.substring(start);
            return new Id(text, text.substring(0, start), digits, digits.isEmpty() ? null : new BigInteger(digits));
        }

        /**
         * Whether {@code next} follows this ID directly: same prefix, number one more, and written alike (the
         * same number of digits, or neither padded with a leading zero: "B9" is followed by "B10", "B09" by
         * "B10", not by "B010").
         */
        boolean precedes(Id next) {
            return number != null && next.number != null && prefix.equals(next.prefix)
                    && number.add(BigInteger.ONE).equals(next.number)
                    && (digits.length() == next.digits.length() || !padded() && !next.padded());
        }

        private boolean padded() {
            return digits.length() > 1 && digits.charAt(0) == '0';
        }
    }
}
