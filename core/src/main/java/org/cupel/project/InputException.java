package org.cupel.project;

/**
 * A problem with the input that stops the run: an unreadable file, a table without an ID column, a
 * config that does not parse. The message is one sentence naming the file (and line and column where
 * they apply), what was expected, and how to fix it. The CLI prints it and exits with code 2.
 */
public class InputException extends RuntimeException {
    /** Longer messages are cut in the middle: each echo is already cut ({@link MessageText}); this is the net. */
    static final int MAX_MESSAGE_CHARS = 2000;
    private static final int KEEP_HEAD = 1500;
    private static final int KEEP_TAIL = 400;

    public InputException(String message) {
        super(bounded(message));
    }

    public InputException(String message, Throwable cause) {
        super(bounded(message), cause);
    }

    /** The message, or its beginning and its end (where the fix is) with the count of characters left out. */
    static String bounded(String message) {
        if (message == null || message.length() <= MAX_MESSAGE_CHARS) {
            return message;
        }
        int cut = message.length() - KEEP_HEAD - KEEP_TAIL;
        return message.substring(0, KEEP_HEAD) + " … (" + String.format(java.util.Locale.ROOT, "%,d", cut)
                + " characters left out) … " + message.substring(message.length() - KEEP_TAIL);
    }
}
