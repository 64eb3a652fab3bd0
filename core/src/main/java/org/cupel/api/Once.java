package org.cupel.api;

import java.util.function.Supplier;

/**
 * A result computed at most once: by the first thread that asks for it, while any other thread that asks
 * meanwhile waits for the same result. What the work throws reaches the caller and nothing is kept, so a
 * later call tries again. The wall time of the computation is kept with the result.
 */
final class Once<T> {
    private final Supplier<T> work;
    private T value;
    private boolean done;
    private long startNanos;
    private long endNanos;

    Once(Supplier<T> work) {
        this.work = work;
    }

    synchronized T get() {
        if (!done) {
            long start = System.nanoTime();
            T computed = work.get();
            offer(computed, start, System.nanoTime());
        }
        return value;
    }

    synchronized boolean done() {
        return done;
    }

    /**
     * Keeps {@code computed}, worked out elsewhere between the two times (the analyses side by side), unless a
     * result is already kept: both are the same, since every analysis is deterministic.
     */
    synchronized void offer(T computed, long start, long end) {
        if (!done) {
            value = computed;
            startNanos = start;
            endNanos = end;
            done = true;
        }
    }

    /** Wall time of the computation in milliseconds; 0 while nothing is kept. */
    synchronized long millis() {
        return done ? (endNanos - startNanos) / 1_000_000 : 0;
    }
}
