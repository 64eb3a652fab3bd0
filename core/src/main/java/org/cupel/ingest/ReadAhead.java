package org.cupel.ingest;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.Supplier;
import org.cupel.project.InputException;
import org.cupel.project.Workers;

/**
 * Reads items on a worker thread a few ahead of the caller, who receives them strictly in list order.
 * Parsing a lab file (tokenizing, numbers, censoring codes) is independent of every other file, while
 * joining it into the sample table is not; so one core parses the next files while the other joins the
 * current one, and the loaded project, its exceptions and their order are exactly those of a sequential
 * read. The window bounds how many parsed files wait in memory.
 *
 * @param <I> what is read (a path)
 * @param <R> what reading gives (a parsed file)
 */
final class ReadAhead<I, R> {
    /** What reading one item gave: a result, or the input error that the caller reports in its place. */
    record Outcome<I, R>(I item, R result, InputException error) {
    }

    private final Supplier<Function<I, R>> readers;
    private final int window;

    /**
     * @param readers makes one reader per worker thread (readers keep scratch buffers, so are not shared)
     * @param window how many items may be read ahead of the caller
     */
    ReadAhead(Supplier<Function<I, R>> readers, int window) {
        this.readers = readers;
        this.window = window;
    }

    /** Reads every item and hands each outcome to {@code sink} on the calling thread, in list order. */
    void readInOrder(List<I> items, Consumer<Outcome<I, R>> sink) {
        if (Runtime.getRuntime().availableProcessors() < 2 || items.size() < 2) {
            Function<I, R> reader = readers.get();
            items.forEach(item -> sink.accept(read(reader, item)));
            return;
        }
        ThreadLocal<Function<I, R>> perThread = ThreadLocal.withInitial(readers);
        ExecutorService worker = Executors.newSingleThreadExecutor(Workers.daemonThreads("cupel-read-ahead"));
        try {
            Deque<Future<Outcome<I, R>>> pending = new ArrayDeque<>();
            int next = 0;
            while (next < items.size() || !pending.isEmpty()) {
                while (next < items.size() && pending.size() < window) {
                    I item = items.get(next++);
                    pending.add(worker.submit(() -> read(perThread.get(), item)));
                }
                sink.accept(Workers.result(pending.removeFirst(), "lab files"));
            }
        } finally {
            worker.shutdownNow();
        }
    }

    private static <I, R> Outcome<I, R> read(Function<I, R> reader, I item) {
        try {
            return new Outcome<>(item, reader.apply(item), null);
        } catch (InputException e) {
            return new Outcome<>(item, null, e);
        }
    }
}
