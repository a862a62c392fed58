package org.congener.streams.state;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Recency-weighted popularity of each compound among the members of one research group.
 *
 * <p>Each compound keeps one exponentially decayed sum, stored with the time it refers to:
 * p_g(j, t) = Σ_e w_e · 2^(−(t − t_e)/h) over the group's events e on compound j, with half-life h.
 * Adding an event and reading at another time both only rescale the stored value, so the state per
 * compound is one float and one timestamp (a time-decayed count; common practice).
 */
public final class GroupPopularity {

    /** Stored value: the decayed sum as of {@code asOfEpochMs}. */
    public record Score(float value, long asOfEpochMs) {
    }

    private final Map<String, Score> scores;

    public GroupPopularity() {
        this.scores = new LinkedHashMap<>();
    }

    GroupPopularity(Map<String, Score> scores) {
        this.scores = scores;
    }

    /** Adds weight {@code weight} at {@code epochMs}; modifies this object. */
    public void add(String compoundId, float weight, long epochMs, double halfLifeMs) {
        Score old = scores.get(compoundId);
        if (old == null) {
            scores.put(compoundId, new Score(weight, epochMs));
        } else if (epochMs >= old.asOfEpochMs()) {
            float decayed = (float) (old.value() * decay(epochMs - old.asOfEpochMs(), halfLifeMs));
            scores.put(compoundId, new Score(decayed + weight, epochMs));
        } else {
            // an event older than the stored reference time: decay it forward instead
            float added = (float) (weight * decay(old.asOfEpochMs() - epochMs, halfLifeMs));
            scores.put(compoundId, new Score(old.value() + added, old.asOfEpochMs()));
        }
    }

    /** p_g(j, t): the decayed popularity of {@code compoundId} at {@code epochMs}, 0 when never used. */
    public double at(String compoundId, long epochMs, double halfLifeMs) {
        Score score = scores.get(compoundId);
        if (score == null) {
            return 0;
        }
        return score.value() * decay(epochMs - score.asOfEpochMs(), halfLifeMs);
    }

    /** 2^(−Δt/h); a negative Δt (reading before the reference time) grows the value accordingly. */
    static double decay(long deltaMs, double halfLifeMs) {
        return Math.pow(2.0, -deltaMs / halfLifeMs);
    }

    public Map<String, Score> scores() {
        return Collections.unmodifiableMap(scores);
    }

    public int size() {
        return scores.size();
    }
}
