package org.congener.core.interactions;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.congener.schemas.UsageEvent;

/**
 * The aggregated interactions of a data set together with the id indexes of its researchers and
 * compounds. Splits work on {@link #interactions()}; models train on {@link #toMatrix(Collection)}.
 */
public final class InteractionLog {
    private final IdIndex users;
    private final IdIndex items;
    private final List<Interaction> interactions;

    public InteractionLog(IdIndex users, IdIndex items, List<Interaction> interactions) {
        this.users = users;
        this.items = items;
        this.interactions = List.copyOf(interactions);
    }

    public IdIndex users() {
        return users;
    }

    public IdIndex items() {
        return items;
    }

    public List<Interaction> interactions() {
        return interactions;
    }

    /** A matrix over all known users and items holding only the given interactions. */
    public InteractionMatrix toMatrix(Collection<Interaction> subset) {
        InteractionMatrixBuilder builder = new InteractionMatrixBuilder(users.size(), items.size());
        for (Interaction i : subset) {
            builder.add(i.user(), i.item(), i.strength());
        }
        return builder.build();
    }

    /**
     * Aggregates usage events per (researcher, compound) with {@code weights}; decay is measured from
     * {@code referenceTime} (usually the latest event time). Items in {@code knownItems} get indexes
     * first, in that order, so a catalogue's compounds without events still have a column.
     */
    public static InteractionLog fromEvents(Iterable<UsageEvent> events, InteractionWeights weights,
                                            Instant referenceTime, Iterable<String> knownItems) {
        IdIndex users = new IdIndex();
        IdIndex items = new IdIndex();
        for (String item : knownItems) {
            items.indexOrAdd(item);
        }
        Map<Long, double[]> cells = new HashMap<>();
        List<Long> order = new ArrayList<>();
        for (UsageEvent e : events) {
            Instant at = Instant.parse(e.occurredAt());
            int u = users.indexOrAdd(e.researcherId());
            int i = items.indexOrAdd(e.compoundId());
            long key = ((long) u << 32) | i;
            double[] cell = cells.get(key);
            if (cell == null) {
                cell = new double[] {0.0, Long.MIN_VALUE};
                cells.put(key, cell);
                order.add(key);
            }
            cell[0] += weights.contribution(e.kind(), e.quantity(), at, referenceTime);
            cell[1] = Math.max(cell[1], at.toEpochMilli());
        }
        List<Interaction> out = new ArrayList<>(order.size());
        for (long key : order) {
            double[] cell = cells.get(key);
            out.add(new Interaction((int) (key >>> 32), (int) key, cell[0], (long) cell[1]));
        }
        return new InteractionLog(users, items, out);
    }
}
