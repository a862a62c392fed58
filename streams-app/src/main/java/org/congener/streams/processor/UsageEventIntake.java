package org.congener.streams.processor;

import java.time.Instant;
import java.time.format.DateTimeParseException;

import org.apache.kafka.common.serialization.Serde;
import org.apache.kafka.streams.processor.api.Processor;
import org.apache.kafka.streams.processor.api.ProcessorContext;
import org.apache.kafka.streams.processor.api.Record;
import org.apache.kafka.streams.processor.api.RecordMetadata;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.DeadLetter;
import org.congener.schemas.DeadLetters;
import org.congener.schemas.Researcher;
import org.congener.schemas.UsageEvent;
import org.congener.streams.serde.RecordRejectedException;
import org.congener.streams.serde.RecordSerdes;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Reads raw usage-event bytes, so that the source topic, partition and offset of a bad record are
 * known, and passes on either the parsed event or a dead letter, both under the original key. A record
 * is rejected when it does not parse or validate, when its key is missing or not its researcher (a
 * researcher's state lives with the partition their key hashes to, so an event under any other key
 * would be scored against the wrong state), when its time or quantity is unusable, or when its
 * researcher or compound is unknown. The app never stops on a bad record.
 */
public final class UsageEventIntake implements Processor<String, byte[], String, Intake> {

    private static final Logger LOG = LoggerFactory.getLogger(UsageEventIntake.class);

    private final Serde<UsageEvent> serde;
    private final InMemoryTable<Researcher> researchers;
    private final InMemoryTable<CatalogEntry> catalog;
    private ProcessorContext<String, Intake> context;
    private DeadLetterMetric deadLetters;

    public UsageEventIntake(Serde<UsageEvent> serde, InMemoryTable<Researcher> researchers,
                            InMemoryTable<CatalogEntry> catalog) {
        this.serde = serde;
        this.researchers = researchers;
        this.catalog = catalog;
    }

    @Override
    public void init(ProcessorContext<String, Intake> context) {
        this.context = context;
        this.deadLetters = DeadLetterMetric.register(context);
    }

    @Override
    public void process(Record<String, byte[]> record) {
        RecordMetadata source = context.recordMetadata().orElse(null);
        String topic = source == null ? "unknown" : source.topic();
        try {
            UsageEvent event = RecordSerdes.parse(serde, topic, record.value());
            check(record.key(), event);
            context.forward(record.withValue(Intake.accepted(event)));
        } catch (RecordRejectedException e) {
            int partition = source == null ? -1 : source.partition();
            long offset = source == null ? -1 : source.offset();
            LOG.warn("dead letter from {} partition {} offset {}: {}", topic, partition, offset, e.reason());
            DeadLetter letter = DeadLetters.of(topic, partition, offset, e.reason(), record.value(),
                    Instant.ofEpochMilli(context.currentSystemTimeMs()));
            deadLetters.record();
            context.forward(record.withValue(Intake.rejected(letter)));
        }
    }

    private Researcher check(String key, UsageEvent event) {
        if (event == null) {
            throw new RecordRejectedException("empty value: usage events have no tombstones");
        }
        try {
            Instant.parse(event.occurredAt());
        } catch (DateTimeParseException e) {
            throw new RecordRejectedException("occurredAt '" + event.occurredAt() + "' is not an ISO-8601 instant");
        }
        if (!(event.quantity() >= 0) || Double.isInfinite(event.quantity())) {
            throw new RecordRejectedException("quantity " + event.quantity() + " is not a finite number ≥ 0");
        }
        Researcher researcher = researchers.get(event.researcherId());
        if (researcher == null) {
            throw new RecordRejectedException("unknown researcher '" + event.researcherId() + "'");
        }
        if (catalog.get(event.compoundId()) == null) {
            throw new RecordRejectedException("unknown compound '" + event.compoundId() + "'");
        }
        // the routing defect last: an event wrong in content is reported for its content
        if (key == null) {
            throw new RecordRejectedException("no key: usage events are keyed by their researcher id ('"
                    + event.researcherId() + "')");
        }
        if (!key.equals(event.researcherId())) {
            throw new RecordRejectedException("key '" + key + "' is not the event's researcher '"
                    + event.researcherId() + "'");
        }
        return researcher;
    }

    @Override
    public void close() {
        if (deadLetters != null) {
            deadLetters.close();
        }
    }
}
