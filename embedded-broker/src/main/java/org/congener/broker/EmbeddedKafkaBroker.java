package org.congener.broker;

import java.io.File;
import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.net.BindException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Properties;
import java.util.concurrent.TimeUnit;

import kafka.server.KafkaConfig;
import kafka.server.KafkaRaftServer;
import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.AdminClientConfig;
import org.apache.kafka.common.Uuid;
import org.apache.kafka.common.utils.Time;
import org.apache.kafka.common.utils.Utils;
import org.apache.kafka.metadata.storage.Formatter;
import org.apache.kafka.server.common.MetadataVersion;

/**
 * A real single-node Kafka broker in KRaft mode (combined broker and controller), running in this JVM
 * and listening on 127.0.0.1 only.
 *
 * <p>Storage is formatted on first start and reused afterwards, so a broker started again on the same
 * data folder keeps its topics and records. A folder the broker created itself (the default, a temp
 * folder) is deleted on {@link #close()}; a folder the caller named is kept.
 *
 * <p>{@code KafkaRaftServer} and {@code Formatter} are internal Kafka classes: the build pins one Kafka
 * version for every Kafka artifact.
 */
public final class EmbeddedKafkaBroker implements AutoCloseable {

    private static final int NODE_ID = 1;
    private static final String CONTROLLER_LISTENER = "CONTROLLER";
    private static final Duration READY_TIMEOUT = Duration.ofSeconds(60);

    private final Path dataDir;
    private final boolean deleteDataDirOnClose;
    private final int port;
    private final int controllerPort;
    private final KafkaRaftServer server;
    private boolean closed;

    private EmbeddedKafkaBroker(Path dataDir, boolean deleteDataDirOnClose, int port, int controllerPort,
                                KafkaRaftServer server) {
        this.dataDir = dataDir;
        this.deleteDataDirOnClose = deleteDataDirOnClose;
        this.port = port;
        this.controllerPort = controllerPort;
        this.server = server;
    }

    public static Builder builder() {
        return new Builder();
    }

    /** Starts a broker on free ports with its data in a temp folder that is deleted on close. */
    public static EmbeddedKafkaBroker start() {
        return builder().start();
    }

    /** {@code 127.0.0.1:<port>}, for {@code bootstrap.servers}. */
    public String bootstrapServers() {
        return FreePorts.LOOPBACK + ":" + port;
    }

    public int port() {
        return port;
    }

    public int controllerPort() {
        return controllerPort;
    }

    public Path dataDir() {
        return dataDir;
    }

    /** Whether {@link #close()} deletes {@link #dataDir()} (true only for a temp folder the broker made). */
    public boolean deletesDataDirOnClose() {
        return deleteDataDirOnClose;
    }

    /** Stops the broker and waits for it; deletes the data folder when it was a temp folder. Idempotent. */
    @Override
    public synchronized void close() {
        if (closed) {
            return;
        }
        closed = true;
        server.shutdown();
        server.awaitShutdown();
        if (deleteDataDirOnClose) {
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

    /** Settings of a broker to start; every setting has a working default. */
    public static final class Builder {
        private Path dataDir;
        private int port;
        private int controllerPort;
        private final Map<String, String> overrides = new LinkedHashMap<>();

        private Builder() {
        }

        /** Folder for the broker's logs and metadata; created when missing and kept on close. */
        public Builder dataDir(Path dataDir) {
            this.dataDir = dataDir;
            return this;
        }

        /** Client port on 127.0.0.1; 0 (the default) picks a free one. */
        public Builder port(int port) {
            this.port = port;
            return this;
        }

        /** Controller port on 127.0.0.1; 0 (the default) picks a free one. */
        public Builder controllerPort(int controllerPort) {
            this.controllerPort = controllerPort;
            return this;
        }

        /** Any other broker setting, applied after the defaults. */
        public Builder property(String key, String value) {
            overrides.put(key, value);
            return this;
        }

        public EmbeddedKafkaBroker start() {
            checkFree(port, "broker");
            checkFree(controllerPort, "controller");
            int brokerPort = FreePorts.resolve(port);
            int ctrlPort = FreePorts.resolve(controllerPort);
            while (ctrlPort == brokerPort) {
                ctrlPort = FreePorts.pick();
            }
            boolean temp = dataDir == null;
            Path dir = temp ? createTempDir() : createDir(dataDir);
            KafkaConfig config = new KafkaConfig(brokerProperties(dir, brokerPort, ctrlPort), false);
            try {
                format(config);
                KafkaRaftServer server = new KafkaRaftServer(config, Time.SYSTEM);
                startOrExplain(server, brokerPort, ctrlPort);
                EmbeddedKafkaBroker broker = new EmbeddedKafkaBroker(dir, temp, brokerPort, ctrlPort, server);
                awaitReady(broker);
                return broker;
            } catch (RuntimeException e) {
                if (temp) {
                    deleteQuietly(dir);
                }
                throw e;
            }
        }

        private static void checkFree(int port, String role) {
            if (port > 0 && FreePorts.isTaken(port)) {
                throw portTaken(port, role);
            }
        }

        private static BrokerStartException portTaken(int port, String role) {
            return new BrokerStartException("port " + port + " on " + FreePorts.LOOPBACK + " is already in use"
                    + " (needed for the embedded Kafka " + role + "); stop what uses it or choose another port");
        }

        private Properties brokerProperties(Path dir, int brokerPort, int ctrlPort) {
            String host = FreePorts.LOOPBACK;
            Properties p = new Properties();
            p.put("process.roles", "broker,controller");
            p.put("node.id", String.valueOf(NODE_ID));
            p.put("controller.quorum.voters", NODE_ID + "@" + host + ":" + ctrlPort);
            p.put("listeners", "PLAINTEXT://" + host + ":" + brokerPort + "," + CONTROLLER_LISTENER + "://" + host + ":" + ctrlPort);
            p.put("advertised.listeners", "PLAINTEXT://" + host + ":" + brokerPort);
            p.put("controller.listener.names", CONTROLLER_LISTENER);
            p.put("inter.broker.listener.name", "PLAINTEXT");
            p.put("listener.security.protocol.map", "PLAINTEXT:PLAINTEXT," + CONTROLLER_LISTENER + ":PLAINTEXT");
            p.put("log.dirs", dir.resolve("logs").toString());
            // one node: every internal topic has exactly one replica
            p.put("offsets.topic.replication.factor", "1");
            p.put("transaction.state.log.replication.factor", "1");
            p.put("transaction.state.log.min.isr", "1");
            p.put("share.coordinator.state.topic.replication.factor", "1");
            p.put("share.coordinator.state.topic.min.isr", "1");
            // few partitions for the internal topics: a laptop broker starts and creates them faster
            p.put("offsets.topic.num.partitions", "5");
            p.put("transaction.state.log.num.partitions", "5");
            p.put("group.initial.rebalance.delay.ms", "0");
            p.put("auto.create.topics.enable", "false");
            // the default 128 MiB compaction buffer is sized for production brokers
            p.put("log.cleaner.dedupe.buffer.size", String.valueOf(8 * 1024 * 1024));
            p.putAll(overrides);
            return p;
        }

        private static void format(KafkaConfig config) {
            if (Files.exists(Path.of(config.metadataLogDir(), "meta.properties"))) {
                // formatted by an earlier start: keep its cluster id and data
                return;
            }
            Formatter formatter = new Formatter()
                    .setPrintStream(new PrintStream(OutputStream.nullOutputStream()))
                    .setNodeId(NODE_ID)
                    .setClusterId(Uuid.randomUuid().toString())
                    .setDirectories(config.logDirs())
                    .setMetadataLogDirectory(config.metadataLogDir())
                    .setControllerListenerName(CONTROLLER_LISTENER)
                    .setReleaseVersion(MetadataVersion.LATEST_PRODUCTION)
                    .setIgnoreFormatted(true);
            try {
                formatter.run();
            } catch (Exception e) {
                throw new BrokerStartException("cannot format Kafka storage under " + config.logDirs()
                        + ": " + e.getMessage(), e);
            }
        }

        private static void startOrExplain(KafkaRaftServer server, int brokerPort, int ctrlPort) {
            try {
                server.startup();
            } catch (RuntimeException e) {
                stopQuietly(server);
                if (hasCause(e, BindException.class)) {
                    // another process grabbed a port between the check and the bind
                    int taken = FreePorts.isTaken(brokerPort) ? brokerPort : ctrlPort;
                    throw portTaken(taken, taken == brokerPort ? "broker" : "controller");
                }
                throw new BrokerStartException("the embedded Kafka broker failed to start: " + e.getMessage(), e);
            }
        }

        private static void stopQuietly(KafkaRaftServer server) {
            try {
                server.shutdown();
                server.awaitShutdown();
            } catch (RuntimeException ignored) {
                // already failing; the start error is the one to report
            }
        }

        private static boolean hasCause(Throwable e, Class<? extends Throwable> type) {
            for (Throwable t = e; t != null; t = t.getCause()) {
                if (type.isInstance(t)) {
                    return true;
                }
            }
            return false;
        }

        /** The broker answers metadata requests only once it has registered with its controller. */
        private static void awaitReady(EmbeddedKafkaBroker broker) {
            Properties p = new Properties();
            p.put(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG, broker.bootstrapServers());
            try (Admin admin = Admin.create(p)) {
                admin.describeCluster().nodes().get(READY_TIMEOUT.toMillis(), TimeUnit.MILLISECONDS);
            } catch (Exception e) {
                broker.close();
                throw new BrokerStartException("the embedded Kafka broker did not become ready within "
                        + READY_TIMEOUT.toSeconds() + " s: " + e.getMessage(), e);
            }
        }

        private static Path createTempDir() {
            try {
                return Files.createTempDirectory("congener-kafka-");
            } catch (IOException e) {
                throw new UncheckedIOException("cannot create a temp folder for the broker", e);
            }
        }

        private static Path createDir(Path dir) {
            try {
                File file = dir.toFile();
                if (file.exists() && !file.isDirectory()) {
                    throw new BrokerStartException("broker data folder " + dir + " is a file, not a folder");
                }
                return Files.createDirectories(dir);
            } catch (IOException e) {
                throw new BrokerStartException("cannot create broker data folder " + dir + ": " + e.getMessage(), e);
            }
        }
    }
}
