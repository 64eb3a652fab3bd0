package org.cupel.assay;

import java.util.Arrays;

/**
 * Distinct strings (sample IDs) numbered in the order added, with the number of each found by open
 * addressing with linear probing over the strings' own hash codes (Knuth, 1998, The Art of Computer
 * Programming vol. 3, section 6.4, algorithm L). A million IDs cost two int arrays and one String array
 * instead of a million map entries and boxed integers.
 */
public final class IdIndex {
    private static final int EMPTY = -1;
    private String[] keys;
    private int size;
    private int[] slots;
    private int[] hashes;

    /** @param expected how many strings are expected (a hint) */
    public IdIndex(int expected) {
        keys = new String[Math.max(16, expected)];
        int capacity = Integer.highestOneBit(Math.max(16, expected) * 2 - 1) << 1;
        slots = new int[capacity];
        hashes = new int[capacity];
        Arrays.fill(slots, EMPTY);
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
        int h = spread(key.hashCode());
        int mask = slots.length - 1;
        for (int s = h & mask; ; s = (s + 1) & mask) {
            int k = slots[s];
            if (k == EMPTY) {
                return -1;
            }
            if (hashes[s] == h && keys[k].equals(key)) {
                return k;
            }
        }
    }

    /** Adds {@code key}, which must not be present yet, and returns its number. */
    public int add(String key) {
        if (size == keys.length) {
            keys = Arrays.copyOf(keys, size * 2);
        }
        if ((size + 1) * 10L > slots.length * 7L) {
            rehash(slots.length * 2);
        }
        keys[size] = key;
        insert(spread(key.hashCode()), size);
        return size++;
    }

    /** The strings in the order added. */
    public String[] toArray() {
        return Arrays.copyOf(keys, size);
    }

    private void insert(int h, int k) {
        int mask = slots.length - 1;
        int s = h & mask;
        while (slots[s] != EMPTY) {
            s = (s + 1) & mask;
        }
        slots[s] = k;
        hashes[s] = h;
    }

    private void rehash(int capacity) {
        slots = new int[capacity];
        hashes = new int[capacity];
        Arrays.fill(slots, EMPTY);
        for (int k = 0; k < size; k++) {
            insert(spread(keys[k].hashCode()), k);
        }
    }

    /** Mixes the high bits into the low ones, which choose the slot (String hashes of similar IDs differ little). */
    private static int spread(int h) {
        int x = h * 0x9E3779B9;
        return x ^ (x >>> 16);
    }
}
