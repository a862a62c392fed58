package org.congener.core.factorisation;

/** An iterative solver reached its step cap with the residual still above its tolerance. */
public final class NoConvergenceException extends ArithmeticException {
    public NoConvergenceException(String message) {
        super(message);
    }
}
