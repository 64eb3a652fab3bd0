package org.cupel.ingest;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Optional;
import org.cupel.config.CupelConfig;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;

/**
 * Which files of a project folder Cupel reads. A symbolic link (the file itself, or a folder on its way)
 * is followed when its target lies inside the project folder; one that leads outside is refused unless
 * {@code ingest.followLinksOutsideProject} is true, so that a project received from someone else, or
 * unpacked from an archive, cannot make Cupel read a file elsewhere on the machine and echo it in a
 * message. A link to nothing, a folder or a device where a file is expected is named, never skipped.
 */
public final class ProjectFiles {
    private final Path folder;
    private final boolean outsideAllowed;
    private Path root;

    private ProjectFiles(Path folder, boolean outsideAllowed) {
        this.folder = folder;
        this.outsideAllowed = outsideAllowed;
    }

    /** The files of {@code folder} under the link setting of {@code config}. */
    public static ProjectFiles of(Path folder, CupelConfig config) {
        return new ProjectFiles(folder, IngestSettings.from(config).followLinksOutsideProject());
    }

    /** The files of {@code folder}, links followed only inside it (for {@code cupel.yaml}, which holds the setting). */
    public static ProjectFiles insideOnly(Path folder) {
        return new ProjectFiles(folder, false);
    }

    /** The project folder. */
    public Path folder() {
        return folder;
    }

    /**
     * The file {@code name} (relative to the project folder) when there is one Cupel may read, empty when
     * nothing of that name exists.
     *
     * @throws InputException when something of that name exists but cannot be read as the file
     */
    public Optional<Path> optional(String name) {
        Path p = folder.resolve(name);
        if (!Files.exists(p, LinkOption.NOFOLLOW_LINKS)) {
            return Optional.empty();
        }
        refusal(p, name).ifPresent(why -> {
            throw new InputException(why);
        });
        return Optional.of(p);
    }

    /**
     * Why the entry {@code p} (named {@code name} in messages) cannot be read as a file, or empty when it can:
     * a link to nothing, a link leading outside the project when that is not allowed, or not a regular file.
     * The sentence names the file, what was expected and how to fix it.
     */
    public Optional<String> refusal(Path p, String name) {
        Path real;
        try {
            real = p.toRealPath();
        } catch (NoSuchFileException e) {
            return Optional.of(name + ": a link to a file that does not exist (" + target(p) + "), expected the file "
                    + "itself; restore the file or remove the link.");
        } catch (IOException e) {
            return Optional.of(name + ": the file could not be opened (" + MessageText.clip(String.valueOf(
                    e.getMessage())) + "); check its permissions.");
        }
        if (!outsideAllowed && !real.startsWith(root())) {
            return Optional.of(name + ": a link that leads outside the project folder (to " + MessageText.clip(
                    real.toString()) + "), which Cupel does not follow; copy the file into the project, or set "
                    + "ingest.followLinksOutsideProject: true in cupel.yaml.");
        }
        if (Files.isDirectory(real)) {
            return Optional.of(name + ": a folder, expected a file of that name; rename the folder or put the file "
                    + "there.");
        }
        if (!Files.isRegularFile(real)) {
            return Optional.of(name + ": not a regular file (a device or pipe), expected a table file; replace it "
                    + "with the file.");
        }
        return Optional.empty();
    }

    /** The project folder with every link resolved, found once. */
    private Path root() {
        if (root == null) {
            try {
                root = folder.toRealPath();
            } catch (IOException e) {
                root = folder.toAbsolutePath().normalize();
            }
        }
        return root;
    }

    private static String target(Path link) {
        try {
            return "to " + MessageText.clip(Files.readSymbolicLink(link).toString());
        } catch (IOException | UnsupportedOperationException e) {
            return "through a link in its path";
        }
    }
}
