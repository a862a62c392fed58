package org.congener.streams.processor;

import java.util.Map;

import org.apache.kafka.common.MetricName;
import org.apache.kafka.common.metrics.Sensor;
import org.apache.kafka.common.metrics.stats.CumulativeCount;
import org.apache.kafka.streams.processor.api.ProcessorContext;

/**
 * Counts dead letters per task as the Kafka metric {@code congener:dead-letters-total}; it appears
 * among {@code KafkaStreams.metrics()} and over JMX like Kafka's own metrics.
 */
final class DeadLetterMetric {

    static final String GROUP = "congener";
    static final String NAME = "dead-letters-total";

    private final ProcessorContext<?, ?> context;
    private final Sensor sensor;

    private DeadLetterMetric(ProcessorContext<?, ?> context, Sensor sensor) {
        this.context = context;
        this.sensor = sensor;
    }

    static DeadLetterMetric register(ProcessorContext<?, ?> context) {
        String taskId = context.taskId().toString();
        Sensor sensor = context.metrics().addSensor("congener.dead-letters." + taskId, Sensor.RecordingLevel.INFO);
        sensor.add(new MetricName(NAME, GROUP, "Usage events sent to the dead-letter topic", Map.of("task-id", taskId)),
                new CumulativeCount());
        return new DeadLetterMetric(context, sensor);
    }

    void record() {
        sensor.record();
    }

    void close() {
        context.metrics().removeSensor(sensor);
    }
}
