package org.congener.streams;

import java.time.Duration;
import java.util.Map;
import java.util.Properties;

import org.apache.kafka.common.Metric;
import org.apache.kafka.common.MetricName;
import org.apache.kafka.streams.CloseOptions;
import org.apache.kafka.streams.KafkaStreams;
import org.apache.kafka.streams.StreamsBuilder;
import org.apache.kafka.streams.StreamsConfig;
import org.apache.kafka.streams.Topology;
import org.congener.core.ontology.io.OboReader;
import org.congener.streams.model.ModelAssembler;
import org.congener.streams.model.SharedTerms;
import org.apache.kafka.streams.errors.StreamsUncaughtExceptionHandler;
import org.apache.kafka.streams.state.HostInfo;
import org.congener.streams.api.QueryServer;
import org.congener.streams.api.StoreSuggestionQueries;
import org.congener.streams.config.AppConfig;
import org.congener.streams.scoring.SuggestionScorer;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The running streams app: the suggestion topology in Kafka Streams plus the query API. Only wiring;
 * the topology is {@link SuggestionTopology#build}.
 */
public final class StreamsApp implements AutoCloseable {

    private static final Logger LOG = LoggerFactory.getLogger(StreamsApp.class);
    private static final Duration CLOSE_TIMEOUT = Duration.ofSeconds(30);

    private final KafkaStreams streams;
    private final QueryServer server;
    private final ModelAssembler models;

    private StreamsApp(KafkaStreams streams, QueryServer server, ModelAssembler models) {
        this.streams = streams;
        this.server = server;
        this.models = models;
    }

    /** Starts Kafka Streams and the query API; returns without waiting for RUNNING. */
    public static StreamsApp start(AppConfig config) {
        return start(config, null);
    }

    /**
     * The same with {@code scorer} in place of the hybrid scorer (null: the hybrid scorer). The
     * end-to-end benchmark passes a scorer that offers nothing, to measure the platform alone: same
     * topics, serdes, stores, guarantee and threads, no scoring work.
     */
    public static StreamsApp start(AppConfig config, SuggestionScorer scorer) {
        StreamsBuilder builder = new StreamsBuilder();
        SuggestionTopology.Settings settings = SuggestionTopology.Settings.from(config);
        ModelAssembler models = scorer == null
                ? SuggestionTopology.build(builder, settings, sharedTerms(config))
                : SuggestionTopology.build(builder, settings, scorer, sharedTerms(config));
        Topology topology = builder.build();
        // open the port first: a taken port fails before Kafka Streams starts anything, and port 0
        // is bound to a real port that can go into application.server
        StoreSuggestionQueries queries = new StoreSuggestionQueries(config.topN());
        QueryServer server = QueryServer.start(config.httpHost(), config.httpPort(), queries);
        String advertised = config.httpAdvertisedAddress().isEmpty()
                ? config.httpHost() + ":" + server.port() : config.httpAdvertisedAddress();
        Properties props = new Properties();
        props.putAll(config.streamsProperties());
        props.put(StreamsConfig.APPLICATION_SERVER_CONFIG, advertised);
        KafkaStreams streams;
        try {
            streams = new KafkaStreams(topology, props);
        } catch (RuntimeException e) {
            server.close();
            throw e;
        }
        streams.setUncaughtExceptionHandler(exception -> {
            LOG.error("stream thread failed; replacing it", exception);
            return StreamsUncaughtExceptionHandler.StreamThreadExceptionResponse.REPLACE_THREAD;
        });
        queries.attach(streams, HostInfo.buildFromEndpoint(advertised), () -> deadLetters(streams), models);
        try {
            streams.start();
        } catch (RuntimeException e) {
            server.close();
            streams.close(CLOSE_TIMEOUT);
            throw e;
        }
        return new StreamsApp(streams, server, models);
    }

    /** The ontology of {@code ontology.file} for the "why" of suggestions, or null when none is set. */
    private static SharedTerms sharedTerms(AppConfig config) {
        java.nio.file.Path file = config.ontologyFile();
        if (file == null) {
            return null;
        }
        try {
            return new SharedTerms(new OboReader().read(file));
        } catch (java.io.IOException e) {
            throw new IllegalStateException("cannot read the ontology file " + file + ": " + e.getMessage(), e);
        }
    }

    /** Waits until Kafka Streams is RUNNING; false when the timeout passed first or it failed. */
    public boolean awaitRunning(Duration timeout) throws InterruptedException {
        long deadline = System.nanoTime() + timeout.toNanos();
        while (System.nanoTime() < deadline) {
            KafkaStreams.State state = streams.state();
            if (state == KafkaStreams.State.RUNNING) {
                return true;
            }
            if (state == KafkaStreams.State.ERROR || state == KafkaStreams.State.NOT_RUNNING
                    || state == KafkaStreams.State.PENDING_ERROR) {
                return false;
            }
            Thread.sleep(50);
        }
        return false;
    }

    /** The version this instance scores under now, or null before any is live. */
    public String liveModelVersion() {
        var live = models.live();
        return live == null ? null : live.version();
    }

    public KafkaStreams kafkaStreams() {
        return streams;
    }

    /** {@code http://host:port} of the query API. */
    public String baseUrl() {
        return server.baseUrl();
    }

    public int httpPort() {
        return server.port();
    }

    /** Usage events sent to the dead letters by this instance since it started. */
    public long deadLetterCount() {
        return deadLetters(streams);
    }

    static long deadLetters(KafkaStreams streams) {
        double total = 0;
        for (Map.Entry<MetricName, ? extends Metric> entry : streams.metrics().entrySet()) {
            MetricName name = entry.getKey();
            if (name.group().equals("congener") && name.name().equals("dead-letters-total")) {
                total += ((Number) entry.getValue().metricValue()).doubleValue();
            }
        }
        return Math.round(total);
    }

    /**
     * Stops the query API, then Kafka Streams (committing its work). The instance leaves its consumer
     * group, so that a restart with the same application id gets its tasks at once instead of after the
     * session timeout (45 s by default).
     */
    @Override
    public void close() {
        server.close();
        streams.close(CloseOptions.groupMembershipOperation(CloseOptions.GroupMembershipOperation.LEAVE_GROUP)
                .withTimeout(CLOSE_TIMEOUT));
    }
}
