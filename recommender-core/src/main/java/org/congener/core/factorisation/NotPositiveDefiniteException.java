package org.congener.core.factorisation;

/** The k × k system of a half-step could not be factorised (happens only with λ = 0 and too few data). */
public final class NotPositiveDefiniteException extends ArithmeticException {
    public NotPositiveDefiniteException(String message) {
        super(message);
    }
}
