package org.cupel.config;

/** A project config that cannot be read or does not fit the expected settings; the message says where. */
public final class ConfigException extends RuntimeException {
    public ConfigException(String message, Throwable cause) {
        super(message, cause);
    }

    public ConfigException(String message) {
        super(message);
    }
}
