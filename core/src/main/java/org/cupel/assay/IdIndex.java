package org.cupel.assay;

import java.util.Arrays;

/**
 * Distinct strings (sample IDs) numbered in the order added, with the number of each found by open
 * addressing with linear probing over the strings' own hash codes (Knuth, 1998, The Art of Computer
 * Programming vol. 3, section 6.4, algorithm L). A million IDs cost a long array and one String array
 * instead of a million map entries and boxed integers.
 *
 * <p>Which slots are used is kept apart, one bit a slot: the table of a million IDs (32 MB) is far larger
 * than the processor's caches, so reading a slot is a cache miss, while the bits (512 kB) stay cached. A
 * new ID, as nearly every register row is, mostly lands on an unused slot, found from its bit alone.
 */
public final class IdIndex {
    private String[] keys;
    private int size;
    /** A used slot holds {@code hash << 32 | number}, so that a probe reads one array. */
    private long[] slots;
    /** Bit {@code s} set when slot {@code s} is used. */
    private long[] used;

    /** @param expected how many strings are expected (a hint) */
    public IdIndex(int expected) {
        keys = new String[Math.max(16, expected)];
        allocate(Integer.highestOneBit(Math.max(16, expected) * 2 - 1) << 1);
    }

    public int size() {
        return size;
    }

    /** The string numbered {@code i}. */
    public String get(int i) {
        return keys[i];
    }

    /** The number of {@code key}, or -1 when it was not added. */
    public int indexOf(String key) {
        int s = slotOf(key, spread(key.hashCode()));
        return isUsed(s) ? (int) slots[s] : -1;
    }

    /**
     * The number of {@code key}, or -1, trying {@code guess} first: lab rows mostly come in register order,
     * so the entry after the last one found usually matches, and comparing it reads memory in order where a
     * hash probe into a table of a million IDs is a cache miss.
     */
    public int indexOf(String key, int guess) {
        if (guess >= 0 && guess < size && keys[guess].equals(key)) {
            return guess;
        }
        return indexOf(key);
    }

    /** Adds {@code key} and returns its number; when it is already present, returns {@code -1 - its number}. */
    public int add(String key) {
        if ((size + 1) * 10L > slots.length * 7L) {
            rehash(slots.length * 2);
        }
        int h = spread(key.hashCode());
        int s = slotOf(key, h);
        if (isUsed(s)) {
            return -1 - (int) slots[s];
        }
        if (size == keys.length) {
            keys = Arrays.copyOf(keys, size * 2);
        }
        keys[size] = key;
        slots[s] = (long) h << 32 | size;
        used[s >>> 6] |= 1L << s;
        return size++;
    }

    /** The slot holding {@code key}, else the empty slot where it would go. */
    private int slotOf(String key, int h) {
        int mask = slots.length - 1;
        for (int s = h & mask; ; s = (s + 1) & mask) {
            if (!isUsed(s)) {
                return s;
            }
            long slot = slots[s];
            if ((int) (slot >>> 32) == h && keys[(int) slot].equals(key)) {
                return s;
            }
        }
    }

    private boolean isUsed(int s) {
        return (used[s >>> 6] & 1L << s) != 0;
    }

    private void allocate(int capacity) {
        slots = new long[capacity];
        used = new long[Math.max(1, capacity >>> 6)];
    }

    private void rehash(int capacity) {
        allocate(capacity);
        int mask = capacity - 1;
        for (int k = 0; k < size; k++) {
            int h = spread(keys[k].hashCode());
            int s = h & mask;
            while (isUsed(s)) {
                s = (s + 1) & mask;
            }
            slots[s] = (long) h << 32 | k;
            used[s >>> 6] |= 1L << s;
        }
    }

    /** Mixes the high bits into the low ones, which choose the slot (String hashes of similar IDs differ little). */
    private static int spread(int h) {
        int x = h * 0x9E3779B9;
        return x ^ (x >>> 16);
    }
}
