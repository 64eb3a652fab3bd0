package org.cupel.project;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;

/** Worker threads for work that runs beside the caller (analysis chains, lab files read ahead). */
public final class Workers {
    private Workers() {
    }

    /** Daemon threads named {@code name}, so a worker never keeps the JVM alive after the command ends. */
    public static ThreadFactory daemonThreads(String name) {
        return task -> {
            Thread t = new Thread(task, name);
            t.setDaemon(true);
            return t;
        };
    }

    /**
     * The result of work done on a worker thread, with what it threw unwrapped: an input error or an
     * out-of-memory on a worker must reach the command line exactly as it would from the calling thread.
     *
     * @param waitingFor what the caller waits for, in words, for the message when interrupted
     */
    public static <T> T result(Future<T> future, String waitingFor) {
        try {
            return future.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for " + waitingFor, e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException runtime) {
                throw runtime;
            }
            if (e.getCause() instanceof Error error) {
                throw error;
            }
            throw new IllegalStateException(e.getCause());
        }
    }
}
