package org.cupel.project;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.DirectoryNotEmptyException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;

/**
 * The operating system's refusal of a file operation, in words: which file and why ("permission denied",
 * "no such file or folder", "a file is in the way"), without Java's exception names. A refused file is the
 * user's to fix (a path, a permission, a full disk), not a bug, so these end as input errors (exit code 2).
 */
public final class FileProblems {
    private FileProblems() {
    }

    /** {@code <file>: <why>} for a file-system error, else the error's own text. */
    public static String describe(IOException e) {
        if (!(e instanceof FileSystemException f)) {
            return e.getMessage() == null ? "input/output error" : e.getMessage();
        }
        String other = f.getOtherFile() == null ? "" : " → " + f.getOtherFile();
        String file = f.getFile() == null ? "" : f.getFile() + other;
        String why;
        if (f instanceof AccessDeniedException) {
            why = "permission denied";
        } else if (f instanceof NoSuchFileException) {
            why = "no such file or folder";
        } else if (f instanceof NotDirectoryException) {
            why = "not a folder";
        } else if (f instanceof FileAlreadyExistsException) {
            why = "a file or folder of that name is in the way";
        } else if (f instanceof DirectoryNotEmptyException) {
            why = "the folder is not empty";
        } else {
            why = f.getReason() == null ? "the operating system refused it" : f.getReason();
        }
        return file.isEmpty() ? why : file + ": " + why;
    }
}
