package org.congener.demo;

import org.congener.schemas.InventoryEvent;
import org.congener.schemas.InventoryKind;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.PriorityQueue;

/**
 * Simulates the stores alongside the usage events. An opening stocktake at New Year, deliveries a
 * few working days after each order, stock drawn down by withdrawals; a compound that runs out is
 * reported depleted, and the stores re-order most such compounds themselves (the rest come back
 * only when a researcher orders them). Quarterly stocktakes correct a few counts.
 * Stock is kept in thousandths of the unit so that the arithmetic is exact.
 */
final class InventorySimulator {

    static final double OPENING_STOCK_CHANCE = 0.85;
    static final double STORE_REORDER_CHANCE = 0.7;
    static final double STOCKTAKE_CORRECTION_CHANCE = 0.12;
    /** Days of the quarterly stocktakes (0-based day of 2026): 31 Mar, 30 Jun, 30 Sep, 18 Dec. */
    private static final int[] STOCKTAKE_DAYS = {89, 180, 272, 351};

    private final CompoundIndex index;
    private final String[] locations;

    InventorySimulator(CompoundIndex index) {
        this.index = index;
        this.locations = new String[index.size()];
        for (int i = 0; i < index.size(); i++) {
            locations[i] = StoreLocations.of(index.compound(i), index.ancestorsOf(i));
        }
    }

    List<InventoryEvent> simulate(List<UsageEvent> usage, DemoRandom random) {
        long[] stock = new long[index.size()];
        boolean[] reorderPending = new boolean[index.size()];
        List<Draft> out = new ArrayList<>();
        PriorityQueue<Action> queue = new PriorityQueue<>(
                Comparator.comparingLong(Action::epochSecond).thenComparingLong(Action::sequence));
        long[] sequence = {0};

        long opening = DemoYear.START_EPOCH_SECOND + 6 * 3600;
        for (int c = 0; c < index.size(); c++) {
            if (index.compound(c).active() && random.chance(OPENING_STOCK_CHANCE)) {
                stock[c] = QuantityModel.orderPack(index.compound(c).form(), random) * random.between(1, 4);
                out.add(new Draft(opening, out.size(), c, InventoryKind.ADJUSTED, stock[c]));
            }
        }
        for (int day : STOCKTAKE_DAYS) {
            queue.add(new Action(DemoYear.START_EPOCH_SECOND + day * 86_400L + 17 * 3600, sequence[0]++, -1, 0));
        }

        for (UsageEvent event : usage) {
            long now = Instant.parse(event.occurredAt()).getEpochSecond();
            drain(queue, now, stock, reorderPending, out, random);
            int c = Integer.parseInt(event.compoundId().substring(1)) - 1;
            long amount = Math.round(event.quantity() * 1000.0);
            if (event.kind() == UsageKind.ORDER) {
                long arrival = deliveryMoment(now, random.between(1, 8), random);
                if (arrival < DemoYear.END_EPOCH_SECOND) {
                    queue.add(new Action(arrival, sequence[0]++, c, amount));
                }
            } else if (event.kind() == UsageKind.WITHDRAWAL && stock[c] > 0) {
                stock[c] -= Math.min(stock[c], amount);
                if (stock[c] == 0) {
                    out.add(new Draft(now + 60, out.size(), c, InventoryKind.DEPLETED, 0));
                    if (!reorderPending[c] && random.chance(STORE_REORDER_CHANCE)) {
                        long arrival = deliveryMoment(now, random.between(3, 40), random);
                        if (arrival < DemoYear.END_EPOCH_SECOND) {
                            reorderPending[c] = true;
                            long pack = QuantityModel.orderPack(index.compound(c).form(), random) * random.between(1, 3);
                            queue.add(new Action(arrival, sequence[0]++, c, pack));
                        }
                    }
                }
            }
        }
        drain(queue, DemoYear.END_EPOCH_SECOND - 1, stock, reorderPending, out, random);

        out.sort(Comparator.comparingLong(Draft::epochSecond).thenComparingInt(Draft::sequence));
        List<InventoryEvent> events = new ArrayList<>(out.size());
        for (int i = 0; i < out.size(); i++) {
            Draft d = out.get(i);
            events.add(new InventoryEvent(SchemaIds.INVENTORY_EVENT, String.format(Locale.ROOT, "I%06d", i + 1),
                    CatalogueBuilder.compoundId(d.compound()), d.kind(), d.milliOnHand() / 1000.0,
                    index.compound(d.compound()).form().unit(), locations[d.compound()], DemoYear.iso(d.epochSecond())));
        }
        return List.copyOf(events);
    }

    /** Carries out every queued delivery and stocktake due by {@code now}. */
    private void drain(PriorityQueue<Action> queue, long now, long[] stock, boolean[] reorderPending,
                       List<Draft> out, DemoRandom random) {
        while (!queue.isEmpty() && queue.peek().epochSecond() <= now) {
            Action action = queue.poll();
            if (action.compound() < 0) {
                stocktake(action.epochSecond(), stock, out, random);
            } else {
                int c = action.compound();
                stock[c] += action.milliAmount();
                reorderPending[c] = false;
                out.add(new Draft(action.epochSecond(), out.size(), c, InventoryKind.RECEIVED, stock[c]));
            }
        }
    }

    /** A stocktake finds small losses (evaporation, spills, unlogged use) in a few counts. */
    private void stocktake(long moment, long[] stock, List<Draft> out, DemoRandom random) {
        for (int c = 0; c < stock.length; c++) {
            if (stock[c] > 0 && random.chance(STOCKTAKE_CORRECTION_CHANCE)) {
                double factor = 0.88 + 0.14 * random.uniform();
                long counted = Math.max(0, Math.round(stock[c] * factor / 1000.0) * 1000);
                if (counted != stock[c]) {
                    stock[c] = counted;
                    out.add(new Draft(moment + c, out.size(), c,
                            counted == 0 ? InventoryKind.DEPLETED : InventoryKind.ADJUSTED, counted));
                }
            }
        }
    }

    /** {@code days} calendar days later, moved off the weekend, during goods-in hours (08:00–15:00). */
    private static long deliveryMoment(long from, int days, DemoRandom random) {
        long dayStart = Math.floorDiv(from, 86_400L) * 86_400L + days * 86_400L;
        while (DemoYear.isWeekend(dayStart)) {
            dayStart += 86_400L;
        }
        return dayStart + 8 * 3600 + random.below(7 * 3600);
    }

    private record Draft(long epochSecond, int sequence, int compound, InventoryKind kind, long milliOnHand) {
    }

    private record Action(long epochSecond, long sequence, int compound, long milliAmount) {
    }
}
