package org.congener.cli;

import java.time.Duration;
import org.congener.schemas.Topics;
import org.congener.trainer.registry.ModelRegistry;
import org.congener.trainer.service.TopicSnapshotReader;
import picocli.CommandLine.Option;

/** The flags that say which broker and which topics the model commands talk to. */
final class TrainerConnection {
    @Option(names = "--bootstrap-servers", required = true, paramLabel = "HOST:PORT,...",
            description = "Kafka brokers to read the history from and publish to")
    String bootstrapServers;

    @Option(names = "--topic-prefix", paramLabel = "PREFIX", defaultValue = "${env:CONGENER_TOPIC_PREFIX:-}",
            description = "prefix of every topic name (default: CONGENER_TOPIC_PREFIX, else none)")
    String topicPrefix;

    @Option(names = "--read-timeout", paramLabel = "SECONDS", defaultValue = "120",
            description = "longest wait to read one topic to its end (default: ${DEFAULT-VALUE})")
    int readTimeoutSeconds;

    Topics topics() {
        return new Topics(topicPrefix);
    }

    Duration readTimeout() {
        return Duration.ofSeconds(readTimeoutSeconds);
    }

    ModelRegistry registry(java.util.function.Consumer<String> log) {
        return new ModelRegistry(new TopicSnapshotReader(bootstrapServers, readTimeout(), log), topics());
    }
}
