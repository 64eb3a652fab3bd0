package org.cupel.ingest;

import java.util.List;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.Supplier;
import java.util.function.ToLongFunction;
import org.cupel.project.InputException;
import org.cupel.project.Workers;

/**
 * Reads items on a worker thread a few ahead of the caller, who receives them strictly in list order.
 * Parsing a lab file (tokenizing, numbers, censoring codes) is independent of every other file and of the
 * register, while joining it into the sample table is not; so the worker starts on the first files as soon
 * as the reads are {@linkplain #start started}, while the caller still reads the register, and once the
 * caller is receiving, it reads the next unread item itself whenever the one it waits for is still being
 * read (the join takes about half as long as the parsing, so both cores parse). The loaded project, its
 * exceptions and their order are exactly those of a sequential read. A budget of input bytes bounds the items
 * read (or being read) but not yet received, so how many parsed files wait in memory.
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
    private final long[] sizes;
    private final long budget;
    private final Object lock = new Object();
    /** The items read and not yet received, by index; guarded by {@link #lock}. */
    private final Object[] done;
    /** The next item no thread has begun to read; guarded by {@link #lock}. */
    private int claimed;
    /** How many items the caller has received; guarded by {@link #lock}. */
    private int received;
    /** The input bytes of the items claimed and not yet received; guarded by {@link #lock}. */
    private long inFlight;
    private boolean closed;
    /**
     * What stopped the worker outside an item's outcome (out of memory while storing it, say); guarded by
     * {@link #lock}. The worker's claimed item will not come, so the caller throws this in its place.
     */
    private Throwable workerFailure;
    private Function<I, R> callerReader;

    private ReadAhead(List<I> items, Supplier<Function<I, R>> readers, ToLongFunction<I> size, long budget) {
        this.items = List.copyOf(items);
        this.readers = readers;
        this.sizes = this.items.stream().mapToLong(size).toArray();
        this.budget = budget;
        this.done = new Object[this.items.size()];
    }

    /**
     * Starts reading {@code items} on a worker thread (on two cores or more, and for two items or more).
     *
     * @param readers makes one reader per thread (readers keep scratch buffers, so are not shared)
     * @param size the input bytes of an item
     * @param budget how many input bytes may be read ahead of the caller (at least one item always may)
     */
    static <I, R> ReadAhead<I, R> start(List<I> items, Supplier<Function<I, R>> readers, ToLongFunction<I> size,
                                        long budget) {
        ReadAhead<I, R> reads = new ReadAhead<>(items, readers, size, budget);
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
                    inFlight -= sizes[k];
                    lock.notifyAll();
                    return unwrap(d);
                }
                if (workerFailure != null) {
                    throw rethrown(workerFailure);
                }
                if (mayClaim()) {
                    mine = claim();
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

    /**
     * The worker: reads the next unclaimed item while the budget allows. Whatever stops it reaches the caller,
     * never the thread's default handler (which would print a stack trace beside the command's own message).
     */
    private void work() {
        try {
            readAhead();
        } catch (Throwable t) {
            synchronized (lock) {
                workerFailure = t;
                lock.notifyAll();
            }
        }
    }

    private void readAhead() {
        Function<I, R> reader = readers.get();
        while (true) {
            int mine;
            synchronized (lock) {
                while (!closed && claimed < items.size() && !mayClaim()) {
                    waitOn();
                }
                if (closed || claimed >= items.size()) {
                    return;
                }
                mine = claim();
            }
            Done<I, R> d = read(reader, mine);
            synchronized (lock) {
                done[mine] = d;
                lock.notifyAll();
            }
        }
    }

    /** Whether an item is left and the budget allows reading it; the next item to receive always may be read. */
    private boolean mayClaim() {
        return claimed < items.size() && (claimed == received || inFlight + sizes[claimed] <= budget);
    }

    private int claim() {
        inFlight += sizes[claimed];
        return claimed++;
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
        if (d.thrown() != null) {
            throw rethrown(d.thrown());
        }
        return d.outcome();
    }

    private static RuntimeException rethrown(Throwable t) {
        if (t instanceof RuntimeException e) {
            throw e;
        }
        if (t instanceof Error e) {
            throw e;
        }
        throw new IllegalStateException(t);
    }
}
