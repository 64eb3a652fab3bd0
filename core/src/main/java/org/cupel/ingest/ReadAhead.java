package org.cupel.ingest;

import java.util.List;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.Supplier;
import org.cupel.project.InputException;
import org.cupel.project.Workers;

/**
 * Reads items on a worker thread a few ahead of the caller, who receives them strictly in list order.
 * Parsing a lab file (tokenizing, numbers, censoring codes) is independent of every other file and of the
 * register, while joining it into the sample table is not; so the worker starts on the first files as soon
 * as the reads are {@linkplain #start started}, while the caller still reads the register, and once the
 * caller is receiving, it reads the next unread item itself whenever the one it waits for is still being
 * read (the join takes about half as long as the parsing, so both cores parse). The loaded project, its
 * exceptions and their order are exactly those of a sequential read. The window bounds how many items are
 * read but not yet received, so how many parsed files wait in memory.
 *
 * @param <I> what is read (a path)
 * @param <R> what reading gives (a parsed file)
 */
final class ReadAhead<I, R> implements AutoCloseable {
    /** What reading one item gave: a result, or the input error that the caller reports in its place. */
    record Outcome<I, R>(I item, R result, InputException error) {
    }

    /** An outcome, or what reading threw other than an input error (a bug, out of memory), for the caller. */
    private record Done<I, R>(Outcome<I, R> outcome, Throwable thrown) {
    }

    private final List<I> items;
    private final Supplier<Function<I, R>> readers;
    private final int window;
    private final Object lock = new Object();
    /** The items read and not yet received, by index; guarded by {@link #lock}. */
    private final Object[] done;
    /** The next item no thread has begun to read; guarded by {@link #lock}. */
    private int claimed;
    /** How many items the caller has received; guarded by {@link #lock}. */
    private int received;
    private boolean closed;
    private Function<I, R> callerReader;

    private ReadAhead(List<I> items, Supplier<Function<I, R>> readers, int window) {
        this.items = List.copyOf(items);
        this.readers = readers;
        this.window = Math.max(1, window);
        this.done = new Object[this.items.size()];
    }

    /**
     * Starts reading {@code items} on a worker thread (on two cores or more, and for two items or more).
     *
     * @param readers makes one reader per thread (readers keep scratch buffers, so are not shared)
     * @param window how many items may be read ahead of the caller
     */
    static <I, R> ReadAhead<I, R> start(List<I> items, Supplier<Function<I, R>> readers, int window) {
        ReadAhead<I, R> reads = new ReadAhead<>(items, readers, window);
        if (Runtime.getRuntime().availableProcessors() >= 2 && reads.items.size() >= 2) {
            Workers.daemonThreads("cupel-read-ahead").newThread(reads::work).start();
        }
        return reads;
    }

    /** Hands each item's outcome to {@code sink} on the calling thread, in list order. */
    void readInOrder(Consumer<Outcome<I, R>> sink) {
        for (int k = 0; k < items.size(); k++) {
            sink.accept(receive(k));
        }
    }

    /** Stops the worker after the item it is reading (the caller stopped early, e.g. on an input error). */
    @Override
    public void close() {
        synchronized (lock) {
            closed = true;
            lock.notifyAll();
        }
    }

    /** Item {@code k}, read by the worker or by this thread, which reads later items while it waits. */
    private Outcome<I, R> receive(int k) {
        while (true) {
            int mine;
            synchronized (lock) {
                if (done[k] != null) {
                    @SuppressWarnings("unchecked")
                    Done<I, R> d = (Done<I, R>) done[k];
                    done[k] = null;
                    received = k + 1;
                    lock.notifyAll();
                    return unwrap(d);
                }
                if (claimed < items.size() && claimed - k < window) {
                    mine = claimed++;
                } else {
                    waitOn();
                    continue;
                }
            }
            if (callerReader == null) {
                callerReader = readers.get();
            }
            Done<I, R> d = read(callerReader, mine);
            synchronized (lock) {
                done[mine] = d;
            }
        }
    }

    /** The worker: reads the next unclaimed item while fewer than {@link #window} wait unreceived. */
    private void work() {
        Function<I, R> reader = readers.get();
        while (true) {
            int mine;
            synchronized (lock) {
                while (!closed && claimed < items.size() && claimed - received >= window) {
                    waitOn();
                }
                if (closed || claimed >= items.size()) {
                    return;
                }
                mine = claimed++;
            }
            Done<I, R> d = read(reader, mine);
            synchronized (lock) {
                done[mine] = d;
                lock.notifyAll();
            }
        }
    }

    private void waitOn() {
        try {
            lock.wait();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for lab files", e);
        }
    }

    private Done<I, R> read(Function<I, R> reader, int k) {
        I item = items.get(k);
        try {
            return new Done<>(new Outcome<>(item, reader.apply(item), null), null);
        } catch (InputException e) {
            return new Done<>(new Outcome<>(item, null, e), null);
        } catch (RuntimeException | Error e) {
            return new Done<>(null, e);
        }
    }

    /** An error or out-of-memory on the worker reaches the command line exactly as from the calling thread. */
    private static <I, R> Outcome<I, R> unwrap(Done<I, R> d) {
        if (d.thrown() instanceof RuntimeException e) {
            throw e;
        }
        if (d.thrown() instanceof Error e) {
            throw e;
        }
        return d.outcome();
    }
}
