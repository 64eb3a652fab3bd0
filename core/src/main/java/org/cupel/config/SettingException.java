package org.cupel.config;

import java.util.List;

/**
 * A settings record's refusal of one value, naming the key (its path within the section, for example
 * {@code detectionLimits}, {@code Au}) so that the config can point at its line and column. The message says
 * what the value must be and how to fix it, in the user's words.
 */
public final class SettingException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;
    private final List<String> key;

    /**
     * @param message what the value must be and how to fix it
     * @param key the path of the key within its section
     */
    public SettingException(String message, String... key) {
        super(message);
        this.key = List.of(key);
    }

    /** The path of the key within its section. */
    public List<String> key() {
        return key;
    }
}
