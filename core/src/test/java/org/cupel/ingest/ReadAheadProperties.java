package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.locks.LockSupport;
import org.cupel.project.InputException;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * The caller receives every item's outcome in list order, exactly as a sequential read gives it, whoever read
 * it (the worker, or the caller while it waited) and whatever the window; an input error takes its item's
 * place; anything else thrown while reading reaches the caller at that item.
 */
class ReadAheadProperties {
    /** Items, how long reading each takes (microseconds, also its size), which fail, the budget. */
    record Case(int items, List<Integer> micros, int failEvery, int budget) {
    }

    private static final Gen<Case> CASES = r -> {
        int n = r.nextInt(0, 60);
        List<Integer> micros = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            micros.add(r.nextInt(4) == 0 ? r.nextInt(2000) : r.nextInt(50));
        }
        return new Case(n, micros, r.nextInt(2, 12), r.nextInt(0, 5000));
    };

    @Test
    void outcomesArriveInListOrderAsReadOneByOne() {
        SeededTries.forAll(60, CASES, c -> {
            List<Integer> items = new ArrayList<>();
            for (int i = 0; i < c.items(); i++) {
                items.add(i);
            }
            List<String> received = new ArrayList<>();
            try (ReadAhead<Integer, String> reads = ReadAhead.start(items, () -> i -> read(c, i),
                    i -> c.micros().get(i), c.budget())) {
                // The caller is busy for a while first, as with the register.
                LockSupport.parkNanos(r(c) * 1000L);
                reads.readInOrder(o -> received.add(o.item() + ":" + (o.error() == null ? o.result()
                        : "error " + o.error().getMessage())));
            }
            List<String> sequential = new ArrayList<>();
            for (int i : items) {
                try {
                    sequential.add(i + ":" + read(c, i));
                } catch (InputException e) {
                    sequential.add(i + ":error " + e.getMessage());
                }
            }
            assertEquals(sequential, received);
        });
    }

    @Test
    void aBugWhileReadingReachesTheCallerAtItsItem() {
        List<Integer> items = List.of(0, 1, 2, 3, 4, 5, 6, 7);
        IllegalStateException bug = new IllegalStateException("bug at 5");
        List<Integer> received = new ArrayList<>();
        try (ReadAhead<Integer, Integer> reads = ReadAhead.start(items, () -> i -> {
            if (i == 5) {
                throw bug;
            }
            return i;
        }, i -> 1, 2)) {
            assertSame(bug, assertThrows(IllegalStateException.class,
                    () -> reads.readInOrder(o -> received.add(o.result()))));
        }
        assertEquals(List.of(0, 1, 2, 3, 4), received);
    }

    /**
     * A failure of the worker outside an item (here its reader cannot be made; in practice, out of memory while
     * storing an outcome) never reaches the thread's default handler, which would print a stack trace beside
     * the command's one-sentence message: the caller throws it at the first item not yet read, or, when the
     * caller has read every item itself, the run completes.
     */
    @Test
    void aFailureOfTheWorkerReachesTheCallerNotTheThreadsHandler() throws Exception {
        List<Integer> items = List.of(0, 1, 2, 3, 4, 5, 6, 7);
        IllegalStateException noReader = new IllegalStateException("no reader on the worker");
        java.util.concurrent.CountDownLatch failed = new java.util.concurrent.CountDownLatch(1);
        List<Throwable> uncaught = new java.util.concurrent.CopyOnWriteArrayList<>();
        Thread.UncaughtExceptionHandler before = Thread.getDefaultUncaughtExceptionHandler();
        Thread.setDefaultUncaughtExceptionHandler((t, e) -> uncaught.add(e));
        try {
            List<Integer> received = new ArrayList<>();
            try (ReadAhead<Integer, Integer> reads = ReadAhead.start(items, () -> {
                if (Thread.currentThread().getName().equals("cupel-read-ahead")) {
                    failed.countDown();
                    throw noReader;
                }
                return i -> i;
            }, i -> 1, 2)) {
                failed.await(10, java.util.concurrent.TimeUnit.SECONDS);
                LockSupport.parkNanos(50_000_000L);
                try {
                    reads.readInOrder(o -> received.add(o.result()));
                    assertEquals(items, received, "the caller read every item itself");
                } catch (IllegalStateException e) {
                    assertSame(noReader, e);
                    assertEquals(items.subList(0, received.size()), received);
                }
            }
            LockSupport.parkNanos(50_000_000L);
            assertEquals(List.of(), uncaught);
        } finally {
            Thread.setDefaultUncaughtExceptionHandler(before);
        }
    }

    private static int r(Case c) {
        return c.micros().isEmpty() ? 0 : c.micros().get(0) * 5;
    }

    private static String read(Case c, int i) {
        LockSupport.parkNanos(c.micros().get(i) * 1000L);
        if (i % c.failEvery() == 1) {
            throw new InputException("file " + i + " cannot be read");
        }
        return "parsed " + i;
    }
}
