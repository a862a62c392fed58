package org.congener.streams.state;

import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * What one researcher has done with each compound: summed interaction strength r_ui, number of
 * events, when last seen, and whether the researcher has actually used it (anything but a view).
 * Kept per researcher in a RocksDB store; see {@link InteractionProfileSerde} for the bytes.
 */
public final class InteractionProfile {

    /** One compound's line in the profile. */
    public record Entry(String compoundId, float strength, int events, long lastSeenEpochMs, boolean used) {
    }

    private final Map<String, Entry> entries;

    public InteractionProfile() {
        this.entries = new LinkedHashMap<>();
    }

    InteractionProfile(Map<String, Entry> entries) {
        this.entries = entries;
    }

    /** Adds one event with weight {@code weight}; modifies this profile. */
    public void add(String compoundId, float weight, long occurredEpochMs, boolean used) {
        entries.merge(compoundId, new Entry(compoundId, weight, 1, occurredEpochMs, used),
                (old, now) -> new Entry(compoundId, old.strength() + weight, old.events() + 1,
                        Math.max(old.lastSeenEpochMs(), occurredEpochMs), old.used() || used));
    }

    public Entry get(String compoundId) {
        return entries.get(compoundId);
    }

    /** Whether the researcher ordered, withdrew or logged usage of the compound (views do not count). */
    public boolean hasUsed(String compoundId) {
        Entry entry = entries.get(compoundId);
        return entry != null && entry.used();
    }

    public Collection<Entry> entries() {
        return Collections.unmodifiableCollection(entries.values());
    }

    public int size() {
        return entries.size();
    }
}
