package org.congener.cli.demo;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.Map;

import org.apache.kafka.common.utils.Utils;
import org.congener.broker.EmbeddedKafkaBroker;
import org.congener.broker.FreePorts;
import org.congener.broker.TopicAdmin;
import org.congener.demo.DemoData;
import org.congener.streams.StreamsApp;
import org.congener.streams.config.AppConfig;

/**
 * Everything {@code congener demo} runs on this machine: the embedded broker, the topics and the
 * streams app with its query API. {@link #close()} stops them in reverse order (query API and Kafka
 * Streams, then the broker) and removes a temp data folder.
 */
public final class DemoRuntime implements AutoCloseable {

    static final String REPLAYED_MARKER = "replayed";

    private final Path dataDir;
    private final boolean tempDataDir;
    private final EmbeddedKafkaBroker broker;
    private final AppConfig config;
    private final boolean hadEarlierReplay;
    private StreamsApp app;
    private boolean closed;

    private DemoRuntime(Path dataDir, boolean tempDataDir, EmbeddedKafkaBroker broker, AppConfig config,
                        boolean hadEarlierReplay) {
        this.dataDir = dataDir;
        this.tempDataDir = tempDataDir;
        this.broker = broker;
        this.config = config;
        this.hadEarlierReplay = hadEarlierReplay;
    }

    /**
     * Starts the broker and creates the topics; the streams app starts with {@link #startStreamsApp}.
     *
     * @param dataDir   folder to keep data in, or null for a temp folder deleted on close
     * @param kafkaPort broker port, 0 for a free one
     * @param settings  streams app settings; bootstrap servers and state folder are set here
     */
    public static DemoRuntime start(Path dataDir, int kafkaPort, AppConfig settings, PrintStream out) throws IOException {
        if (settings.httpPort() > 0 && FreePorts.isTaken(settings.httpPort())) {
            throw new IllegalStateException("port " + settings.httpPort() + " on 127.0.0.1 is already in use"
                    + " (needed for the query API); stop what uses it or choose another with --http-port");
        }
        boolean temp = dataDir == null;
        Path dir = temp ? Files.createTempDirectory("congener-demo-") : dataDir.toAbsolutePath();
        if (!temp && Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new IllegalStateException("--data-dir " + dir + " is a file, not a folder");
        }
        Files.createDirectories(dir);
        boolean earlier = Files.exists(dir.resolve(REPLAYED_MARKER));
        out.println("data under " + dir + (temp ? " (a temp folder, deleted at exit; keep data with --data-dir DIR)"
                : " (kept after exit)"));

        EmbeddedKafkaBroker broker;
        try {
            broker = EmbeddedKafkaBroker.builder()
                    .dataDir(dir.resolve("kafka"))
                    .port(kafkaPort)
                    // the demo replays a whole year: keep old records, accept the year's later dates
                    .property("log.retention.ms", "-1")
                    .property("log.message.timestamp.after.max.ms", String.valueOf(Long.MAX_VALUE))
                    .start();
        } catch (RuntimeException e) {
            if (temp) {
                deleteQuietly(dir);
            }
            throw e;
        }
        Map<String, String> fixed = new LinkedHashMap<>();
        fixed.put(AppConfig.BOOTSTRAP_SERVERS, broker.bootstrapServers());
        fixed.put(AppConfig.STATE_DIR, dir.resolve("streams-state").toString());
        if (settings.ontologyFile() == null) {
            // the demo's own ontology, so that each suggestion can name the class it shares with the researcher's compounds
            Path ontology = dir.resolve("demo-ontology.obo");
            Files.writeString(ontology, DemoData.ontologyObo(), StandardCharsets.UTF_8);
            fixed.put(AppConfig.ONTOLOGY_FILE, ontology.toString());
        }
        AppConfig config = settings.with(fixed);
        DemoRuntime runtime = new DemoRuntime(dir, temp, broker, config, earlier);
        try {
            out.println("kafka broker (KRaft, single node) on " + broker.bootstrapServers());
            TopicAdmin.Outcome topics = TopicAdmin.createAll(broker.bootstrapServers(), config.topicPrefix(),
                    config.topicPartitions(), (short) 1);
            out.printf("topics: %d created, %d already there (%d partitions each)%n", topics.created().size(),
                    topics.existing().size(), config.topicPartitions());
        } catch (RuntimeException e) {
            runtime.close();
            throw e;
        }
        return runtime;
    }

    /** Starts Kafka Streams and the query API and waits until the app is RUNNING. */
    public StreamsApp startStreamsApp(Duration timeout) throws InterruptedException {
        app = StreamsApp.start(config);
        if (!app.awaitRunning(timeout)) {
            throw new IllegalStateException("the streams app did not reach RUNNING within " + timeout.toSeconds()
                    + " s (state " + app.kafkaStreams().state() + ")");
        }
        return app;
    }

    /** Notes that this folder's data has been replayed, so a later run on it does not replay twice. */
    public void markReplayed() throws IOException {
        if (!tempDataDir) {
            Files.writeString(dataDir.resolve(REPLAYED_MARKER), "demo events were replayed into this folder\n");
        }
    }

    public boolean hadEarlierReplay() {
        return hadEarlierReplay;
    }

    public String bootstrapServers() {
        return broker.bootstrapServers();
    }

    public AppConfig config() {
        return config;
    }

    public Path dataDir() {
        return dataDir;
    }

    @Override
    public synchronized void close() {
        if (closed) {
            return;
        }
        closed = true;
        if (app != null) {
            app.close();
        }
        broker.close();
        if (tempDataDir) {
            deleteQuietly(dataDir);
        }
    }

    private static void deleteQuietly(Path dir) {
        try {
            Utils.delete(dir.toFile());
        } catch (IOException e) {
            // a leftover temp folder is no reason to fail a shutdown
        }
    }
}
