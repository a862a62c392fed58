package org.congener.core.factorisation;

/** Which solver an ALS half-step uses. */
public enum SolverKind {
    /** Build the k × k system and solve it exactly by Cholesky: O(n_u·k² + k³) per row. */
    CHOLESKY,
    /** A few conjugate-gradient steps from the previous row, never forming the system: O(s·(k² + n_u·k)). */
    CONJUGATE_GRADIENT
}
