package org.cupel.project;

/**
 * A problem with the input that stops the run: an unreadable file, a table without an ID column, a
 * config that does not parse. The message is one sentence naming the file (and line and column where
 * they apply), what was expected, and how to fix it. The CLI prints it and exits with code 2.
 */
public class InputException extends RuntimeException {
    public InputException(String message) {
        super(message);
    }

    public InputException(String message, Throwable cause) {
        super(message, cause);
    }
}
