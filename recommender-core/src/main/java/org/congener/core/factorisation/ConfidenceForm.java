package org.congener.core.factorisation;

/**
 * Confidence c_ui in an observed preference, from the interaction strength r_ui; Hu, Koren &amp;
 * Volinsky 2008, section 4 (both forms are given there).
 */
public enum ConfidenceForm {
    /** c = 1 + α·r */
    LINEAR,
    /** c = 1 + α·ln(1 + r/ε) */
    LOG;

    public double confidence(double strength, double alpha, double epsilon) {
        return switch (this) {
            case LINEAR -> 1.0 + alpha * strength;
            case LOG -> 1.0 + alpha * Math.log1p(strength / epsilon);
        };
    }
}
