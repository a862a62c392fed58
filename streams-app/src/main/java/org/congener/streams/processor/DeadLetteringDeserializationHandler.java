package org.congener.streams.processor;

import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.apache.kafka.clients.consumer.ConsumerRecord;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.streams.errors.DeserializationExceptionHandler;
import org.apache.kafka.streams.errors.ErrorHandlerContext;
import org.congener.schemas.DeadLetter;
import org.congener.schemas.DeadLetters;
import org.congener.schemas.Topic;
import org.congener.schemas.Topics;
import org.congener.schemas.validation.InvalidRecordException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * For a value Kafka Streams itself cannot deserialize (catalogue, researchers, stock, or the
 * suggestions table): logs topic, partition and offset, hands Kafka Streams a dead letter in
 * Congener's format to write to {@code dead-letters}, and carries on. Usage events never get here:
 * they are read as raw bytes by {@link UsageEventIntake}.
 *
 * <p>For the topics behind global tables and stores (catalogue, researchers, stock, the three model
 * topics) the log line is all that
 * remains: Kafka Streams 4.4 cannot write records handed back from its global thread (it fails with a
 * ClassCastException and the whole client stops), so the handler hands back none there. A skipped
 * model record leaves its version short of records, so that version never goes live.
 */
public final class DeadLetteringDeserializationHandler implements DeserializationExceptionHandler {

    /** Streams setting naming the topic prefix, so that the handler finds the dead-letter topic. */
    public static final String TOPIC_PREFIX_CONFIG = "congener.topic.prefix";

    private static final Logger LOG = LoggerFactory.getLogger(DeadLetteringDeserializationHandler.class);

    private Topic<DeadLetter> deadLetters = new Topics("").deadLetters();
    private Set<String> globalTableTopics = globalTableTopics(new Topics(""));

    @Override
    public void configure(Map<String, ?> configs) {
        Object prefix = configs.get(TOPIC_PREFIX_CONFIG);
        Topics topics = new Topics(prefix == null ? "" : prefix.toString());
        deadLetters = topics.deadLetters();
        globalTableTopics = globalTableTopics(topics);
    }

    private static Set<String> globalTableTopics(Topics topics) {
        return Set.of(topics.catalog().name(), topics.researchers().name(), topics.inventoryEvents().name(),
                topics.modelItemFactors().name(), topics.itemNeighbours().name(), topics.modelManifests().name());
    }

    @Override
    public Response handleError(ErrorHandlerContext context, ConsumerRecord<byte[], byte[]> record, Exception exception) {
        String reason = exception instanceof InvalidRecordException invalid ? invalid.reason()
                : exception.getMessage() == null ? exception.getClass().getSimpleName() : exception.getMessage();
        if (globalTableTopics.contains(record.topic())) {
            LOG.warn("skipped unreadable record of {} partition {} offset {}: {}", record.topic(), record.partition(),
                    record.offset(), reason);
            return Response.resume();
        }
        LOG.warn("dead letter from {} partition {} offset {}: {}", record.topic(), record.partition(), record.offset(),
                reason);
        DeadLetter letter = DeadLetters.of(record.topic(), record.partition(), record.offset(), reason,
                record.value(), Instant.now());
        byte[] value = deadLetters.valueSerde().serializer().serialize(deadLetters.name(), letter);
        return Response.resume(List.of(new ProducerRecord<>(deadLetters.name(), record.key(), value)));
    }
}
