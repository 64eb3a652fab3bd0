package org.cupel.report;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Optional;

/**
 * The claim of one run on one output folder: an operating-system lock ({@link FileChannel#tryLock}) on the
 * hidden, empty file {@code .<name>.cupel-lock} beside the folder. The system releases the lock when the
 * process ends, however it ends, so a killed run never blocks the next one.
 *
 * <p>The file stays when the run is done. Deleting it would open a race: a second run may open the file just
 * before it is deleted and then lock the deleted file while a third run locks a new one under the same name,
 * and checking which file the name points to would mean opening it a second time, which on POSIX systems
 * releases the process's lock (see {@link FileChannel} on closing a channel). The file is written by nothing
 * and holds nothing; deleting it by hand between runs is harmless.
 */
final class OutputLock implements AutoCloseable {
    private final FileChannel channel;
    private final FileLock lock;

    private OutputLock(FileChannel channel, FileLock lock) {
        this.channel = channel;
        this.lock = lock;
    }

    /** The lock file of the output folder {@code name} in {@code parent}. */
    static Path file(Path parent, String name) {
        return parent.resolve("." + name + ".cupel-lock");
    }

    /** The lock, or empty when a live run holds it. */
    static Optional<OutputLock> tryAcquire(Path parent, String name) throws IOException {
        return tryLock(FileChannel.open(file(parent, name), StandardOpenOption.CREATE, StandardOpenOption.WRITE));
    }

    /**
     * Whether no live run holds the lock of {@code name}; the lock file is not created when it is missing
     * (then no run of this version is writing that output).
     */
    static boolean isFree(Path parent, String name) throws IOException {
        FileChannel channel;
        try {
            channel = FileChannel.open(file(parent, name), StandardOpenOption.WRITE);
        } catch (NoSuchFileException none) {
            return true;
        }
        Optional<OutputLock> held = tryLock(channel);
        if (held.isEmpty()) {
            return false;
        }
        held.get().close();
        return true;
    }

    private static Optional<OutputLock> tryLock(FileChannel channel) throws IOException {
        FileLock lock;
        try {
            lock = channel.tryLock();
        } catch (OverlappingFileLockException heldInThisJvm) {
            lock = null;
        } catch (IOException | RuntimeException e) {
            channel.close();
            throw e;
        }
        if (lock == null) {
            channel.close();
            return Optional.empty();
        }
        return Optional.of(new OutputLock(channel, lock));
    }

    @Override
    public void close() throws IOException {
        try {
            lock.release();
        } finally {
            channel.close();
        }
    }
}
