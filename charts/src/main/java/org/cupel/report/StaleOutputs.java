package org.cupel.report;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The hidden folders a killed report run leaves beside its output folder: its temporary folder
 * ({@code .<name>.cupel-tmp-<pid>}, a dozen megabytes for the demo) and the previous report it had set aside
 * ({@code .<name>.cupel-old-<pid>}). The next run beside them deletes them, but only folders that are
 * certainly Cupel's and certainly abandoned: the name must be exactly of that form, the folder must hold
 * one of Cupel's marker files (or nothing at all), and no live run may hold the lock of that output name
 * ({@link OutputLock}; the running report holds its own). A live run that has not yet taken the lock has
 * no such folder either: it takes the lock before it creates its temporary folder.
 */
final class StaleOutputs {
    private static final Pattern OURS = Pattern.compile("\\.(.+)\\.cupel-(?:tmp|old)-\\d+");

    private StaleOutputs() {
    }

    /**
     * Deletes the leftovers in {@code parent}: those of {@code name} (whose lock the caller holds) and those
     * of other output names whose lock is free.
     */
    static void clean(Path parent, String name) throws IOException {
        for (Map.Entry<String, List<Path>> e : leftovers(parent).entrySet()) {
            if (e.getKey().equals(name)) {
                deleteAbandoned(e.getValue());
                continue;
            }
            if (OutputLock.isFree(parent, e.getKey())) {
                deleteAbandoned(e.getValue());
            }
        }
    }

    /** Folders named as Cupel's temporary or set-aside folders, by the output name they belong to. */
    private static Map<String, List<Path>> leftovers(Path parent) throws IOException {
        Map<String, List<Path>> byName = new LinkedHashMap<>();
        try (DirectoryStream<Path> s = Files.newDirectoryStream(parent)) {
            for (Path p : s) {
                Matcher m = OURS.matcher(p.getFileName().toString());
                if (m.matches() && Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)) {
                    byName.computeIfAbsent(m.group(1), k -> new ArrayList<>()).add(p);
                }
            }
        }
        return byName;
    }

    private static void deleteAbandoned(List<Path> folders) throws IOException {
        for (Path p : folders) {
            if (Files.exists(p.resolve(ReportWriter.MARKER)) || Files.exists(p.resolve(ReportWriter.PARTIAL_MARKER))
                    || isEmpty(p)) {
                ReportWriter.deleteTree(p);
            }
        }
    }

    static boolean isEmpty(Path dir) throws IOException {
        try (DirectoryStream<Path> s = Files.newDirectoryStream(dir)) {
            return !s.iterator().hasNext();
        }
    }
}
