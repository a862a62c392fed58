package org.congener.streams.scoring;

import java.util.EnumMap;
import java.util.Map;

import org.congener.schemas.UsageKind;

/**
 * Weight of one event of each kind in the interaction strength r_ui. An order or a usage-log entry says
 * more about a researcher's work than a catalogue view; ranking acts above views is common practice in
 * implicit-feedback recommenders, the values themselves are our defaults.
 */
public final class InteractionWeights {

    private final Map<UsageKind, Float> weights;

    public InteractionWeights(Map<UsageKind, Float> weights) {
        for (UsageKind kind : UsageKind.values()) {
            Float w = weights.get(kind);
            if (w == null || !(w >= 0) || Float.isInfinite(w)) {
                throw new IllegalArgumentException("weight of " + kind + " must be a finite number ≥ 0, got " + w);
            }
        }
        this.weights = new EnumMap<>(weights);
    }

    public static InteractionWeights defaults() {
        return new InteractionWeights(Map.of(UsageKind.ORDER, 3f, UsageKind.WITHDRAWAL, 2f,
                UsageKind.USAGE_LOG, 2f, UsageKind.VIEW, 0.5f));
    }

    public float of(UsageKind kind) {
        return weights.get(kind);
    }

    /** Views are interest, not use: a viewed compound may still be suggested. */
    public static boolean isUse(UsageKind kind) {
        return kind != UsageKind.VIEW;
    }
}
