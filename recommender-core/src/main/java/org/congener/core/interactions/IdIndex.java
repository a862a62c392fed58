package org.congener.core.interactions;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Dense integer indexes for string ids, in order of first appearance. Not thread-safe while growing. */
public final class IdIndex {
    private final Map<String, Integer> indexOf = new HashMap<>();
    private final List<String> ids = new ArrayList<>();

    /** Returns the index of {@code id}, giving it the next free index when it is new. */
    public int indexOrAdd(String id) {
        Integer existing = indexOf.get(id);
        if (existing != null) {
            return existing;
        }
        int next = ids.size();
        indexOf.put(id, next);
        ids.add(id);
        return next;
    }

    /** Returns the index of {@code id}, or -1 when it is unknown. */
    public int indexOf(String id) {
        Integer existing = indexOf.get(id);
        return existing == null ? -1 : existing;
    }

    public String id(int index) {
        return ids.get(index);
    }

    public int size() {
        return ids.size();
    }

    public List<String> ids() {
        return Collections.unmodifiableList(ids);
    }
}
