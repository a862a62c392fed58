package org.congener.broker;

/** The embedded broker could not start; the message is one line meant for the person at the terminal. */
public final class BrokerStartException extends RuntimeException {

    public BrokerStartException(String message) {
        super(message);
    }

    public BrokerStartException(String message, Throwable cause) {
        super(message, cause);
    }
}
