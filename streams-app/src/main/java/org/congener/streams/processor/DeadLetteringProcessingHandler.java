package org.congener.streams.processor;

import java.time.Instant;
import java.util.List;
import java.util.Map;

import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.streams.errors.ErrorHandlerContext;
import org.apache.kafka.streams.errors.ProcessingExceptionHandler;
import org.apache.kafka.streams.processor.api.Record;
import org.congener.schemas.DeadLetter;
import org.congener.schemas.DeadLetters;
import org.congener.schemas.Topic;
import org.congener.schemas.Topics;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * When a processor throws on a record (a defect, not bad input: bad input is dead-lettered by
 * {@link UsageEventIntake}), logs it and hands Kafka Streams a dead letter holding the raw source
 * record with topic, partition and offset, then carries on with the next record. Without it, a
 * record that always fails would stop the stream thread again after every restart.
 */
public final class DeadLetteringProcessingHandler implements ProcessingExceptionHandler {

    private static final Logger LOG = LoggerFactory.getLogger(DeadLetteringProcessingHandler.class);

    private Topic<DeadLetter> deadLetters = new Topics("").deadLetters();

    @Override
    public void configure(Map<String, ?> configs) {
        Object prefix = configs.get(DeadLetteringDeserializationHandler.TOPIC_PREFIX_CONFIG);
        deadLetters = new Topics(prefix == null ? "" : prefix.toString()).deadLetters();
    }

    @Override
    public Response handleError(ErrorHandlerContext context, Record<?, ?> record, Exception exception) {
        String reason = "processing failed in " + context.processorNodeId() + ": " + exception;
        LOG.error("dead letter from {} partition {} offset {}: {}", context.topic(), context.partition(),
                context.offset(), reason, exception);
        String topic = context.topic() == null ? "unknown" : context.topic();
        DeadLetter letter = DeadLetters.of(topic, context.partition(), context.offset(), reason,
                context.sourceRawValue(), Instant.now());
        byte[] value = deadLetters.valueSerde().serializer().serialize(deadLetters.name(), letter);
        return Response.resume(List.of(new ProducerRecord<>(deadLetters.name(), context.sourceRawKey(), value)));
    }
}
