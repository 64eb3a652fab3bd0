package org.cupel.duplicates;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Supplier;
import org.cupel.project.Workers;

/**
 * A computation handed to a spare core while the caller does other work, and taken back by the caller when no
 * spare thread has started it by the time its result is needed ({@link #join}). The statistics of one
 * duplicate set (Thompson–Howarth, bias, precision, batches) are independent of each other, and on a pairs file
 * of millions of rows one thread computing them in turn left the second core idle.
 *
 * <p>Whoever runs the work, it is the same pure function of its inputs, so results do not depend on timing or on
 * the number of cores. There is one spare thread per core beyond the first (none on one core: the caller then
 * does everything, in order). When the analyses of a project already keep every core busy, the spare threads are
 * busy or their queue is long, and the caller simply does its own work: a task nobody has started is claimed at
 * {@link #join} and run in place, so a caller never waits for work queued behind another's, and nested use
 * cannot deadlock (a thread only ever waits for a task that another thread is running).
 */
final class SideTask<T> {
    private static final ExecutorService SPARE = spareThreads();

    private final Supplier<T> work;
    private final AtomicBoolean claimed = new AtomicBoolean();
    private final CompletableFuture<T> result = new CompletableFuture<>();

    private SideTask(Supplier<T> work) {
        this.work = work;
    }

    /** How work is started: {@link SideTask#start}, or {@link SideTask#inPlace} for one thread. */
    interface Starter {
        <T> SideTask<T> start(Supplier<T> work);
    }

    /** Starts {@code work} on a spare thread when one is free soon enough; see {@link #join}. */
    static <T> SideTask<T> start(Supplier<T> work) {
        SideTask<T> task = new SideTask<>(work);
        if (SPARE != null) {
            SPARE.execute(task::runUnlessClaimed);
        }
        return task;
    }

    /** Runs {@code work} on the calling thread only: the same result as {@link #start}, for comparison. */
    static <T> SideTask<T> inPlace(Supplier<T> work) {
        return new SideTask<>(work);
    }

    /**
     * The result: computed here when no spare thread has started the work, else awaited. What the work threw
     * is rethrown as it was (an input error or an out-of-memory reaches the command line as from the caller).
     */
    T join() {
        runUnlessClaimed();
        return Workers.result(result, "a duplicate statistic");
    }

    private void runUnlessClaimed() {
        if (claimed.compareAndSet(false, true)) {
            try {
                result.complete(work.get());
            } catch (Throwable t) {
                result.completeExceptionally(t);
            }
        }
    }

    private static ExecutorService spareThreads() {
        int spare = Runtime.getRuntime().availableProcessors() - 1;
        return spare < 1 ? null : Executors.newFixedThreadPool(spare, Workers.daemonThreads("cupel-side"));
    }
}
