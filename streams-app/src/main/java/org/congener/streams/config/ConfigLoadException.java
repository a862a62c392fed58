package org.congener.streams.config;

/** A setting could not be used; the message is one line naming the source (file and line), key and value. */
public final class ConfigLoadException extends RuntimeException {

    public ConfigLoadException(String message) {
        super(message);
    }
}
