package org.congener.core.factorisation;

/** How λ enters a half-step's system. */
public enum Regularisation {
    /** λ·I, as in Hu, Koren &amp; Volinsky 2008, eq. (3). */
    PLAIN,
    /**
     * λ·n_u·I with n_u the row's interaction count: Spark MLlib's weighting (after Zhou et al. 2008,
     * "ALS-WR"), offered so results compare with Spark's.
     */
    PER_INTERACTION;

    public double effectiveLambda(double lambda, int interactions) {
        return this == PLAIN ? lambda : lambda * interactions;
    }
}
