package org.congener.streams.config;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.common.config.AbstractConfig;
import org.apache.kafka.common.config.ConfigDef;
import org.apache.kafka.common.config.ConfigDef.Importance;
import org.apache.kafka.common.config.ConfigDef.Range;
import org.apache.kafka.common.config.ConfigDef.Type;
import org.apache.kafka.common.config.ConfigDef.ValidString;
import org.apache.kafka.streams.StreamsConfig;
import org.congener.streams.processor.DeadLetteringDeserializationHandler;
import org.congener.streams.processor.DeadLetteringProcessingHandler;

/**
 * Every setting of the streams app, declared once with key, type, default, validator and doc
 * ({@link #DEFINITION}); the configuration reference in {@code docs/runtime.md} is generated from it.
 * Values are loaded by {@link ConfigLoader} (file, then environment, then flags).
 */
public final class AppConfig extends AbstractConfig {

    public static final String BOOTSTRAP_SERVERS = "bootstrap.servers";
    public static final String TOPIC_PREFIX = "topic.prefix";
    public static final String APPLICATION_ID = "application.id";
    public static final String STATE_DIR = "state.dir";
    public static final String PROCESSING_GUARANTEE = "processing.guarantee";
    public static final String STREAM_THREADS = "num.stream.threads";
    public static final String COMMIT_INTERVAL_MS = "commit.interval.ms";
    public static final String PRODUCER_LINGER_MS = "producer.linger.ms";
    public static final String PRODUCER_COMPRESSION = "producer.compression.type";
    public static final String PRODUCER_BATCH_BYTES = "producer.batch.size";
    public static final String HTTP_HOST = "http.host";
    public static final String HTTP_PORT = "http.port";
    public static final String HTTP_ADVERTISED_ADDRESS = "http.advertised.address";
    public static final String TOP_N = "suggestions.top.n";
    public static final String POPULARITY_HALF_LIFE_HOURS = "popularity.half.life.hours";
    public static final String IN_STOCK_ONLY = "suggestions.in.stock.only";
    public static final String ONTOLOGY_FILE = "ontology.file";
    public static final String BATCH_EVENTS = "scoring.batch.events";
    public static final String BATCH_WAIT_MS = "scoring.batch.wait.ms";
    public static final String TOPIC_PARTITIONS = "topic.partitions";
    public static final String TOPIC_REPLICATION_FACTOR = "topic.replication.factor";

    public static final String DEFAULT_BOOTSTRAP_SERVERS = "127.0.0.1:9092";
    public static final String DEFAULT_APPLICATION_ID = "congener-streams";
    public static final int DEFAULT_HTTP_PORT = 7070;
    public static final int DEFAULT_TOP_N = 10;
    public static final int DEFAULT_PARTITIONS = 4;

    public static final ConfigDef DEFINITION = new ConfigDef()
            .define(BOOTSTRAP_SERVERS, Type.LIST, DEFAULT_BOOTSTRAP_SERVERS, ConfigDef.ValidList.anyNonDuplicateValues(false, false),
                    Importance.HIGH, "Kafka brokers to connect to, as host:port pairs separated by commas.")
            .define(TOPIC_PREFIX, Type.STRING, "", new TopicPrefixValidator(), Importance.MEDIUM,
                    "Prefix put before every topic name, so that several deployments can share one cluster"
                            + " (letters, digits, '.', '_' and '-').")
            .define(APPLICATION_ID, Type.STRING, DEFAULT_APPLICATION_ID, new ConfigDef.NonEmptyString(), Importance.HIGH,
                    "Kafka Streams application id: names the consumer group, internal topics and state folder."
                            + " Instances with the same id share the work.")
            .define(STATE_DIR, Type.STRING, "congener-state", new ConfigDef.NonEmptyString(), Importance.MEDIUM,
                    "Folder for the RocksDB state stores; relative paths start at the working directory.")
            .define(PROCESSING_GUARANTEE, Type.STRING, StreamsConfig.EXACTLY_ONCE_V2,
                    ValidString.in(StreamsConfig.EXACTLY_ONCE_V2, StreamsConfig.AT_LEAST_ONCE), Importance.HIGH,
                    "exactly_once_v2 (needs at least 3 brokers in production, or a single-node broker whose"
                            + " transaction log has replication 1) or at_least_once.")
            .define(STREAM_THREADS, Type.INT, 1, Range.between(1, 64), Importance.MEDIUM,
                    "Stream threads in this instance; more than the input partitions leaves threads idle.")
            .define(COMMIT_INTERVAL_MS, Type.LONG, 25L, Range.between(1L, 600_000L), Importance.LOW,
                    "How often processing progress is committed, in milliseconds; under exactly-once it is"
                            + " also how long a suggestion may wait before readers see it. A task commits only"
                            + " when it has processed something, so a quiet app does not commit at all.")
            .define(PRODUCER_LINGER_MS, Type.INT, 5, Range.between(0, 1_000), Importance.LOW,
                    "How long, in milliseconds, the stream threads' producer waits to fill a batch before"
                            + " sending it (Kafka Streams' own default is 100). Under exactly-once every commit"
                            + " first waits for all records not yet sent; a short wait sends them while the next"
                            + " events are processed, which keeps each commit short.")
            .define(PRODUCER_BATCH_BYTES, Type.INT, 16_384, Range.between(1_024, 16 * 1024 * 1024), Importance.LOW,
                    "Largest batch, in bytes, the stream threads' producer sends to one partition in one go"
                            + " (Kafka's default). At each commit the stores' caches write a commit interval's"
                            + " lists and profiles at once, hundreds of kilobytes, which small batches split into"
                            + " many requests: 262144 cut the brokers' and the producer's CPU per event by a"
                            + " quarter in the end-to-end benchmark, without a better latency.")
            .define(PRODUCER_COMPRESSION, Type.STRING, "none",
                    ValidString.in("none", "gzip", "snappy", "lz4", "zstd"), Importance.LOW,
                    "Compression of what the stream threads write: suggestion lists, store changelogs and"
                            + " dead letters (none, gzip, snappy, lz4 or zstd). lz4 cuts the lists' bytes to"
                            + " about a third, for a network or disks that are short of bandwidth, at the cost"
                            + " of stream-thread CPU; with the broker on the same host it does not pay.")
            .define(HTTP_HOST, Type.STRING, "127.0.0.1", new ConfigDef.NonEmptyString(), Importance.MEDIUM,
                    "Address the query API listens on. Keep 127.0.0.1 unless a proxy in front of it"
                            + " handles access control.")
            .define(HTTP_PORT, Type.INT, DEFAULT_HTTP_PORT, Range.between(0, 65535), Importance.MEDIUM,
                    "Port of the query API; 0 picks a free port.")
            .define(HTTP_ADVERTISED_ADDRESS, Type.STRING, "", new AdvertisedAddressValidator(), Importance.MEDIUM,
                    "host:port at which other instances reach this instance's query API, to forward a query for"
                            + " a researcher whose list lives there; empty means http.host and the bound port."
                            + " Set it when http.host is 0.0.0.0 (e.g. streams:7070 in docker compose).")
            .define(TOP_N, Type.INT, DEFAULT_TOP_N, Range.between(1, 100), Importance.MEDIUM,
                    "Suggestions kept and published per researcher.")
            .define(IN_STOCK_ONLY, Type.BOOLEAN, false, Importance.LOW,
                    "Suggest only compounds whose latest inventory event has quantity on hand above zero.")
            .define(ONTOLOGY_FILE, Type.STRING, "", Importance.LOW,
                    "OBO file of the compound ontology; when set, each suggestion names the most informative"
                            + " class it shares with the past compound that contributed most. Empty: none named.")
            .define(POPULARITY_HALF_LIFE_HOURS, Type.DOUBLE, 720.0, Range.between(0.001, 1.0e6), Importance.LOW,
                    "Half-life, in hours of event time, of an event's weight in the group-popularity baseline"
                            + " (720 h = 30 days).")
            .define(BATCH_EVENTS, Type.INT, 32, Range.between(1, 1024), Importance.LOW,
                    "Usage events scored together, with one pass over the model's item factors for all of"
                            + " them; each event still gets its own list. 1 publishes each list while its event"
                            + " is processed.")
            .define(BATCH_WAIT_MS, Type.LONG, 5L, Range.between(1L, 10_000L), Importance.LOW,
                    "Longest wall-clock wait, in milliseconds, before a partly filled batch is scored and its"
                            + " lists published; under exactly-once readers see them at the next commit.")
            .define(TOPIC_PARTITIONS, Type.INT, DEFAULT_PARTITIONS, Range.between(1, 1000), Importance.LOW,
                    "Partitions of each topic when Congener creates its topics.")
            .define(TOPIC_REPLICATION_FACTOR, Type.SHORT, (short) 1, Range.between(1, 7), Importance.LOW,
                    "Replicas of each topic when Congener creates its topics; use 3 on a 3-broker cluster.");

    AppConfig(Map<String, ?> values) {
        super(DEFINITION, values, false);
    }

    /** All defaults; handy for tests and the embedded demo. */
    public static AppConfig defaults() {
        return new AppConfig(Map.of());
    }

    /** A copy with some settings replaced (values as they would appear in a file). */
    public AppConfig with(Map<String, String> overrides) {
        Map<String, Object> values = new java.util.HashMap<>(originals());
        values.putAll(overrides);
        return new AppConfig(values);
    }

    public List<String> bootstrapServers() {
        return getList(BOOTSTRAP_SERVERS);
    }

    public String topicPrefix() {
        return getString(TOPIC_PREFIX);
    }

    public String applicationId() {
        return getString(APPLICATION_ID);
    }

    public int producerLingerMs() {
        return getInt(PRODUCER_LINGER_MS);
    }

    public Path stateDir() {
        return Path.of(getString(STATE_DIR));
    }

    public String processingGuarantee() {
        return getString(PROCESSING_GUARANTEE);
    }

    public int streamThreads() {
        return getInt(STREAM_THREADS);
    }

    public long commitIntervalMs() {
        return getLong(COMMIT_INTERVAL_MS);
    }

    public String httpHost() {
        return getString(HTTP_HOST);
    }

    public int httpPort() {
        return getInt(HTTP_PORT);
    }

    /** Where other instances reach this one's query API; empty when it should be derived from the bound port. */
    public String httpAdvertisedAddress() {
        return getString(HTTP_ADVERTISED_ADDRESS);
    }

    /** The ontology file, or null when none is configured. */
    public java.nio.file.Path ontologyFile() {
        String file = getString(ONTOLOGY_FILE);
        return file.isBlank() ? null : java.nio.file.Path.of(file);
    }

    public boolean inStockOnly() {
        return getBoolean(IN_STOCK_ONLY);
    }

    public int topN() {
        return getInt(TOP_N);
    }

    public java.time.Duration popularityHalfLife() {
        return java.time.Duration.ofMillis(Math.round(getDouble(POPULARITY_HALF_LIFE_HOURS) * 3_600_000.0));
    }

    public int batchEvents() {
        return getInt(BATCH_EVENTS);
    }

    public long batchWaitMs() {
        return getLong(BATCH_WAIT_MS);
    }

    public int topicPartitions() {
        return getInt(TOPIC_PARTITIONS);
    }

    public int producerBatchBytes() {
        return getInt(PRODUCER_BATCH_BYTES);
    }

    public String producerCompression() {
        return getString(PRODUCER_COMPRESSION);
    }

    public short topicReplicationFactor() {
        return getShort(TOPIC_REPLICATION_FACTOR);
    }

    /** Kafka Streams settings derived from these. */
    public Map<String, Object> streamsProperties() {
        Map<String, Object> p = new java.util.HashMap<>();
        p.put(StreamsConfig.BOOTSTRAP_SERVERS_CONFIG, String.join(",", bootstrapServers()));
        p.put(StreamsConfig.APPLICATION_ID_CONFIG, applicationId());
        p.put(StreamsConfig.STATE_DIR_CONFIG, stateDir().toAbsolutePath().toString());
        p.put(StreamsConfig.PROCESSING_GUARANTEE_CONFIG, processingGuarantee());
        p.put(StreamsConfig.NUM_STREAM_THREADS_CONFIG, streamThreads());
        p.put(StreamsConfig.COMMIT_INTERVAL_MS_CONFIG, commitIntervalMs());
        p.put(StreamsConfig.consumerPrefix(ConsumerConfig.FETCH_MAX_WAIT_MS_CONFIG), 50);
        p.put(StreamsConfig.producerPrefix(ProducerConfig.LINGER_MS_CONFIG), producerLingerMs());
        p.put(StreamsConfig.producerPrefix(ProducerConfig.COMPRESSION_TYPE_CONFIG), producerCompression());
        p.put(StreamsConfig.producerPrefix(ProducerConfig.BATCH_SIZE_CONFIG), producerBatchBytes());
        p.put(StreamsConfig.DESERIALIZATION_EXCEPTION_HANDLER_CLASS_CONFIG, DeadLetteringDeserializationHandler.class);
        p.put(StreamsConfig.PROCESSING_EXCEPTION_HANDLER_CLASS_CONFIG, DeadLetteringProcessingHandler.class);
        p.put(DeadLetteringDeserializationHandler.TOPIC_PREFIX_CONFIG, topicPrefix());
        return p;
    }

    /** Empty, or host:port with a port from 1 to 65535. */
    static final class AdvertisedAddressValidator implements ConfigDef.Validator {
        @Override
        public void ensureValid(String name, Object value) {
            String address = (String) value;
            if (address == null || address.isEmpty()) {
                return;
            }
            int colon = address.lastIndexOf(':');
            boolean valid = colon > 0;
            if (valid) {
                try {
                    int port = Integer.parseInt(address.substring(colon + 1));
                    valid = port >= 1 && port <= 65535;
                } catch (NumberFormatException e) {
                    valid = false;
                }
            }
            if (!valid) {
                throw new org.apache.kafka.common.config.ConfigException(name, value, "must be host:port");
            }
        }

        @Override
        public String toString() {
            return "empty or host:port";
        }
    }

    /** A topic prefix must keep topic names legal: Kafka allows [a-zA-Z0-9._-] only. */
    static final class TopicPrefixValidator implements ConfigDef.Validator {
        @Override
        public void ensureValid(String name, Object value) {
            String prefix = (String) value;
            if (prefix != null && !prefix.matches("[a-zA-Z0-9._-]*")) {
                throw new org.apache.kafka.common.config.ConfigException(name, value,
                        "only letters, digits, '.', '_' and '-' are allowed in topic names");
            }
        }

        @Override
        public String toString() {
            return "[a-zA-Z0-9._-]*";
        }
    }
}
