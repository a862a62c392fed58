package org.congener.broker;

import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.extension.BeforeAllCallback;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * JUnit 5 extension that gives every test class of one JVM the same embedded broker, started on first
 * use and stopped when the test run ends (JUnit closes it from the root store; a JVM shutdown hook
 * covers runs that end otherwise). Tests isolate themselves by topic prefix and application id, never
 * by a broker of their own.
 *
 * <pre>{@code
 * @ExtendWith(SharedBroker.class)
 * class MyTest {
 *     String prefix = SharedBroker.uniquePrefix("my-test");
 *     ... SharedBroker.bootstrapServers() ...
 * }
 * }</pre>
 */
public final class SharedBroker implements BeforeAllCallback {

    private static final AtomicInteger SEQUENCE = new AtomicInteger();
    private static EmbeddedKafkaBroker broker;

    @Override
    public void beforeAll(ExtensionContext context) {
        ExtensionContext.Store root = context.getRoot().getStore(ExtensionContext.Namespace.GLOBAL);
        root.getOrComputeIfAbsent(SharedBroker.class.getName(), key -> new Closer(), Closer.class);
        broker();
    }

    /** The broker, started on the first call. */
    public static synchronized EmbeddedKafkaBroker broker() {
        if (broker == null) {
            EmbeddedKafkaBroker started = EmbeddedKafkaBroker.start();
            Runtime.getRuntime().addShutdownHook(new Thread(started::close, "shared-broker-stop"));
            broker = started;
        }
        return broker;
    }

    public static String bootstrapServers() {
        return broker().bootstrapServers();
    }

    /** A topic-name prefix no other test of this JVM gets, such as {@code t7-round-trip-}. */
    public static String uniquePrefix(String testName) {
        return "t" + SEQUENCE.incrementAndGet() + "-" + testName + "-";
    }

    /** A Kafka Streams {@code application.id} (and consumer group) no other test of this JVM gets. */
    public static String uniqueApplicationId(String testName) {
        return "app-" + SEQUENCE.incrementAndGet() + "-" + testName;
    }

    private static synchronized void stop() {
        if (broker != null) {
            broker.close();
            broker = null;
        }
    }

    /** Closed by JUnit once, after the last test of the run. */
    private static final class Closer implements AutoCloseable {
        @Override
        public void close() {
            stop();
        }
    }
}
