package org.congener.trainer.publish;

/** A model version that must not go on the wire: a factor that is NaN or infinite, a count that does not add up. */
public final class InvalidModelException extends RuntimeException {
    public InvalidModelException(String message) {
        super(message);
    }
}
