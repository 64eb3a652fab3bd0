package org.cupel.robust;

import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

/**
 * A stand-in for a report run in progress, in its own process: takes the operating-system lock on the lock
 * file named as its argument (the file a report run locks beside its output folder, docs/report.md), prints
 * "locked" and holds it until killed.
 */
public final class LockHolder {
    private LockHolder() {
    }

    public static void main(String[] args) throws Exception {
        try (FileChannel ch = FileChannel.open(Path.of(args[0]), StandardOpenOption.CREATE, StandardOpenOption.WRITE)) {
            ch.lock();
            System.out.println("locked");
            System.out.flush();
            Thread.sleep(Long.MAX_VALUE);
        }
    }
}
