package org.congener.trainer.service;

/** The trainer cannot do its job with what it was given (a missing topic, a broker that does not answer, …). */
public class TrainerException extends RuntimeException {
    public TrainerException(String message) {
        super(message);
    }

    public TrainerException(String message, Throwable cause) {
        super(message, cause);
    }
}
