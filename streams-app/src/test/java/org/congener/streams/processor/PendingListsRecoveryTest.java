package org.congener.streams.processor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.List;
import java.util.Properties;

import org.apache.kafka.common.serialization.Serdes;
import org.apache.kafka.streams.processor.api.MockProcessorContext;
import org.apache.kafka.streams.processor.api.Record;
import org.apache.kafka.streams.state.KeyValueIterator;
import org.apache.kafka.streams.state.KeyValueStore;
import org.apache.kafka.streams.state.Stores;
import org.congener.core.interactions.InteractionWeights;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.InventoryEvent;
import org.congener.schemas.Researcher;
import org.congener.schemas.Suggestions;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.congener.streams.Fixtures;
import org.congener.streams.scoring.ColdStartScorer;
import org.congener.streams.scoring.HybridScorer;
import org.congener.streams.state.GroupPopularitySerde;
import org.congener.streams.state.InteractionProfileSerde;
import org.junit.jupiter.api.Test;

/**
 * A task whose last commit was taken while a batch waited: the events' profiles and pending marks are
 * in its stores, their lists nowhere. The next owner of the task (a new processor on the same stores,
 * as after a restore) publishes one list per marked researcher, carrying the marked event's id.
 */
class PendingListsRecoveryTest {

    private static final Duration LONG_WAIT = Duration.ofHours(1);

    @Test
    void shouldPublishTheListsAPreviousOwnerLeftPendingWhenTheNextOwnerStarts() {
        MockProcessorContext<String, byte[]> context = contextWithStores();

        SuggestionProcessor previousOwner = processor();
        previousOwner.init(context);
        previousOwner.process(event("e1", "ada", "c-ethanol"));
        previousOwner.process(event("e2", "ben", "c-acetone"));
        previousOwner.process(event("e3", "ada", "c-toluene"));
        assertTrue(context.forwarded().isEmpty(), "the batch waits: no list out yet");
        KeyValueStore<String, String> pending = context.getStateStore("pending");
        assertEquals(2, count(pending), "one mark per researcher with a list pending");
        // the previous owner goes away here without publishing: a crash after the commit, or the task moving

        SuggestionProcessor nextOwner = processor();
        nextOwner.init(context);
        List<MockProcessorContext.CapturedPunctuator> punctuators = context.scheduledPunctuators();
        punctuators.get(punctuators.size() - 1).getPunctuator().punctuate(context.currentSystemTimeMs());

        List<Suggestions> lists = context.forwarded().stream()
                .map(f -> Fixtures.TOPICS.suggestions().valueSerde().deserializer().deserialize("", (byte[]) f.record().value()))
                .toList();
        assertEquals(List.of("ada", "ben"), lists.stream().map(Suggestions::researcherId).sorted().toList());
        for (Suggestions list : lists) {
            assertEquals(list.researcherId().equals("ada") ? "e3" : "e2", list.causedByEventId(),
                    "the list carries the researcher's latest event");
            assertFalse(list.items().stream().anyMatch(s -> s.compoundId().equals("c-ethanol")
                    && list.researcherId().equals("ada")), "ada's own compound is never offered back");
        }
        assertEquals(0, count(pending), "no mark left once the lists are out");
        KeyValueStore<String, byte[]> latest = context.getStateStore("latest");
        assertTrue(latest.get("ada") != null && latest.get("ben") != null, "the query store holds both lists");
    }

    /**
     * Kafka Streams counts every wall-clock punctuation as work to commit, so the flush timer of a
     * partly filled batch must run only while events wait; otherwise an idle app would commit a
     * transaction every commit interval.
     */
    @Test
    void shouldKeepTheFlushTimerOnlyWhileEventsWait() {
        MockProcessorContext<String, byte[]> context = contextWithStores();

        SuggestionProcessor processor = processor();
        processor.init(context);
        assertTrue(context.scheduledPunctuators().isEmpty(), "nothing waits and nothing to recover: no timer");

        processor.process(event("e1", "ada", "c-ethanol"));
        processor.process(event("e2", "ben", "c-acetone"));
        List<MockProcessorContext.CapturedPunctuator> timers = context.scheduledPunctuators();
        assertEquals(1, timers.size(), "one timer for the waiting batch, however many events it holds");
        assertEquals(LONG_WAIT, timers.get(0).getInterval(), "due after the longest wait");
        assertFalse(timers.get(0).cancelled());

        timers.get(0).getPunctuator().punctuate(context.currentSystemTimeMs());
        assertEquals(2, context.forwarded().size(), "the flush publishes the batch");
        assertTrue(timers.get(0).cancelled(), "and stops the timer once nothing waits");

        processor.process(event("e3", "ada", "c-toluene"));
        timers = context.scheduledPunctuators();
        assertEquals(2, timers.size(), "the next waiting event starts a new timer");
        assertFalse(timers.get(1).cancelled());
    }

    /** A task's context holding the processor's four stores, in memory. */
    private static MockProcessorContext<String, byte[]> contextWithStores() {
        MockProcessorContext<String, byte[]> context = new MockProcessorContext<>(new Properties());
        context.setCurrentSystemTimeMs(1_800_000_000_000L);
        addStore(context, "interactions", new InteractionProfileSerde());
        addStore(context, "groups", new GroupPopularitySerde());
        addStore(context, "latest", Serdes.ByteArray());
        addStore(context, "pending", Serdes.String());
        return context;
    }

    private static SuggestionProcessor processor() {
        InMemoryTable<Researcher> researchers = new InMemoryTable<>();
        Fixtures.researchers().forEach(r -> researchers.accept(r.researcherId(), r));
        InMemoryTable<CatalogEntry> catalog = new InMemoryTable<>();
        Fixtures.catalog().forEach(c -> catalog.accept(c.compoundId(), c));
        SuggestionProcessor.Stores stores = new SuggestionProcessor.Stores("interactions", "groups", "latest",
                "pending", researchers, catalog, new InMemoryTable<InventoryEvent>());
        double halfLifeMs = Duration.ofDays(30).toMillis();
        return new SuggestionProcessor(stores, new HybridScorer(new ColdStartScorer(halfLifeMs)), () -> null,
                InteractionWeights.defaults(), halfLifeMs, 3, false, null,
                Fixtures.TOPICS.suggestions().valueSerde().serializer(),
                new SuggestionProcessor.Batching(8, LONG_WAIT));
    }

    private static Record<String, UsageEvent> event(String id, String researcher, String compound) {
        UsageEvent event = Fixtures.event(id, researcher, compound, UsageKind.ORDER, "2026-01-02T10:00:00Z");
        return new Record<>(researcher, event, 1_000L);
    }

    private static <V> void addStore(MockProcessorContext<String, byte[]> context, String name,
                                     org.apache.kafka.common.serialization.Serde<V> values) {
        KeyValueStore<String, V> store = Stores.keyValueStoreBuilder(Stores.inMemoryKeyValueStore(name),
                Serdes.String(), values).withLoggingDisabled().build();
        store.init(context.getStateStoreContext(), store);
        context.addStateStore(store);
    }

    private static int count(KeyValueStore<String, String> store) {
        int n = 0;
        try (KeyValueIterator<String, String> all = store.all()) {
            while (all.hasNext()) {
                all.next();
                n++;
            }
        }
        return n;
    }
}
