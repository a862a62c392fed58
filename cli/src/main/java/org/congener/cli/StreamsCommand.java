package org.congener.cli;

import java.nio.file.Path;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;

import org.congener.broker.TopicAdmin;
import org.congener.streams.SafetyCaution;
import org.congener.streams.StreamsApp;
import org.congener.streams.config.AppConfig;
import org.congener.streams.config.ConfigLoader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code congener streams}: runs the streams app and its query API against a Kafka cluster until stopped. */
@Command(name = "streams",
        mixinStandardHelpOptions = true,
        description = {"Runs the suggestion topology and the query API against a Kafka cluster until Ctrl-C.",
                "Settings: --config FILE, then CONGENER_* environment variables, then these flags;"
                        + " see docs/runtime.md for every key."})
public final class StreamsCommand implements Callable<Integer> {

    @Option(names = "--config", paramLabel = "FILE", description = "properties file with settings (keys as in docs/runtime.md)")
    Path configFile;

    @Option(names = "--bootstrap-servers", paramLabel = "HOST:PORT,...", description = "Kafka brokers (bootstrap.servers)")
    String bootstrapServers;

    @Option(names = "--topic-prefix", paramLabel = "PREFIX", description = "prefix of every topic name (topic.prefix)")
    String topicPrefix;

    @Option(names = "--application-id", paramLabel = "ID", description = "Kafka Streams application id (application.id)")
    String applicationId;

    @Option(names = "--state-dir", paramLabel = "DIR", description = "folder of the RocksDB stores (state.dir)")
    String stateDir;

    @Option(names = "--http-host", paramLabel = "HOST", description = "address of the query API (http.host)")
    String httpHost;

    @Option(names = "--http-port", paramLabel = "PORT", description = "port of the query API (http.port)")
    String httpPort;

    @Option(names = "--set", paramLabel = "KEY=VALUE", description = "any other setting; may be repeated")
    Map<String, String> settings = new LinkedHashMap<>();

    @Option(names = "--create-topics", description = "create missing topics first (topic.partitions, topic.replication.factor)")
    boolean createTopics;

    @Override
    public Integer call() throws InterruptedException {
        AppConfig config = ConfigLoader.load(configFile, System.getenv(), flags());
        if (createTopics) {
            TopicAdmin.Outcome outcome = TopicAdmin.createAll(String.join(",", config.bootstrapServers()),
                    config.topicPrefix(), config.topicPartitions(), config.topicReplicationFactor());
            System.out.printf("topics: %d created, %d already there%n", outcome.created().size(), outcome.existing().size());
        }
        StreamsApp app = StreamsApp.start(config);
        CountDownLatch stopped = new CountDownLatch(1);
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            System.out.println("stopping: query API, then Kafka Streams ...");
            app.close();
            stopped.countDown();
        }, "congener-streams-stop"));
        System.out.println("streams app " + config.applicationId() + " on " + String.join(",", config.bootstrapServers())
                + ", topic prefix '" + config.topicPrefix() + "'");
        System.out.println("query API: " + app.baseUrl() + "/researchers/{id}/suggestions?n=5 and " + app.baseUrl() + "/health");
        System.out.println(SafetyCaution.TEXT);
        if (app.awaitRunning(Duration.ofMinutes(2))) {
            System.out.println("running; Ctrl-C stops");
        } else {
            System.out.println("not running yet (state " + app.kafkaStreams().state() + "); still trying, Ctrl-C stops");
        }
        stopped.await();
        return 0;
    }

    Map<String, String> flags() {
        Map<String, String> flags = new LinkedHashMap<>(settings);
        put(flags, AppConfig.BOOTSTRAP_SERVERS, bootstrapServers);
        put(flags, AppConfig.TOPIC_PREFIX, topicPrefix);
        put(flags, AppConfig.APPLICATION_ID, applicationId);
        put(flags, AppConfig.STATE_DIR, stateDir);
        put(flags, AppConfig.HTTP_HOST, httpHost);
        put(flags, AppConfig.HTTP_PORT, httpPort);
        return flags;
    }

    private static void put(Map<String, String> flags, String key, String value) {
        if (value != null) {
            flags.put(key, value);
        }
    }
}
