package org.congener.core.interactions;

import java.time.Duration;
import java.time.Instant;
import java.util.EnumMap;
import java.util.Map;
import org.congener.schemas.UsageKind;

/**
 * How one usage event adds to the interaction strength r_ui of its researcher and compound:
 * <pre>
 *   contribution = w(kind) · (1 + β · ln(1 + quantity)) · 2^(−age / halfLife)
 * </pre>
 * with age = referenceTime − occurredAt (never negative). β = 0 ignores quantities; a null half-life
 * switches decay off. The defaults (order 1, withdrawal 0.6, usage-log 0.4, view 0.1, β = 0.25, no
 * decay) are common practice for implicit feedback (a purchase says more than a view), not fitted.
 *
 * @param kindWeights   weight per event kind, each finite and non-negative
 * @param quantityScale β above, finite and non-negative
 * @param halfLife      half-life of the decay, positive, or null for none
 */
public record InteractionWeights(Map<UsageKind, Double> kindWeights, double quantityScale, Duration halfLife) {

    public InteractionWeights {
        kindWeights = Map.copyOf(kindWeights);
        for (UsageKind kind : UsageKind.values()) {
            Double w = kindWeights.get(kind);
            if (w == null || !Double.isFinite(w) || w < 0) {
                throw new IllegalArgumentException("weight of " + kind + " must be given, finite and >= 0: " + w);
            }
        }
        if (!Double.isFinite(quantityScale) || quantityScale < 0) {
            throw new IllegalArgumentException("quantity scale must be finite and >= 0: " + quantityScale);
        }
        if (halfLife != null && (halfLife.isNegative() || halfLife.isZero())) {
            throw new IllegalArgumentException("half-life must be positive: " + halfLife);
        }
    }

    public static InteractionWeights defaults() {
        Map<UsageKind, Double> w = new EnumMap<>(UsageKind.class);
        w.put(UsageKind.ORDER, 1.0);
        w.put(UsageKind.WITHDRAWAL, 0.6);
        w.put(UsageKind.USAGE_LOG, 0.4);
        w.put(UsageKind.VIEW, 0.1);
        return new InteractionWeights(w, 0.25, null);
    }

    public InteractionWeights withHalfLife(Duration newHalfLife) {
        return new InteractionWeights(kindWeights, quantityScale, newHalfLife);
    }

    /** The contribution of one event, as in the class comment. */
    public double contribution(UsageKind kind, double quantity, Instant occurredAt, Instant referenceTime) {
        double q = Math.max(0.0, quantity);
        double strength = kindWeights.get(kind) * (1.0 + quantityScale * Math.log1p(q));
        if (halfLife != null) {
            double ageSeconds = Math.max(0.0, Duration.between(occurredAt, referenceTime).toMillis() / 1000.0);
            strength *= Math.pow(2.0, -ageSeconds / (halfLife.toMillis() / 1000.0));
        }
        return strength;
    }
}
