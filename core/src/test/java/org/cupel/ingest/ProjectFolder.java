package org.cupel.ingest;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.cupel.project.DataIssue;
import org.cupel.project.Project;

/** A project folder written file by file for a test, and the look-ups the input-safety tests share. */
final class ProjectFolder {
    private final Path dir;

    ProjectFolder(Path dir) {
        this.dir = dir;
    }

    Path dir() {
        return dir;
    }

    /** Writes {@code text} (UTF-8) at {@code relative}, creating folders; returns the file. */
    Path write(String relative, String text) {
        return write(relative, text.getBytes(StandardCharsets.UTF_8));
    }

    Path write(String relative, byte[] bytes) {
        try {
            Path p = dir.resolve(relative);
            Files.createDirectories(p.getParent());
            return Files.write(p, bytes);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The issues of {@code p} in {@code file} with {@code severity}. */
    static List<DataIssue> issues(Project p, String file, DataIssue.Severity severity) {
        return p.exceptions().withSeverity(severity).stream().filter(i -> i.where().file().equals(file)).toList();
    }
}
