package org.congener.streams.config;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ConfigLoaderTest {

    @TempDir
    Path dir;

    @Test
    void shouldUseSafeDefaultsWhenNothingIsGiven() {
        AppConfig config = ConfigLoader.load(null, Map.of(), Map.of());
        assertEquals("exactly_once_v2", config.processingGuarantee());
        assertEquals("127.0.0.1", config.httpHost());
        assertEquals(List.of("127.0.0.1:9092"), config.bootstrapServers());
        assertEquals("", config.topicPrefix());
        assertEquals(10, config.topN());
    }

    @Test
    void shouldLetEnvironmentOverrideFileAndFlagsOverrideEnvironment() throws Exception {
        Path file = write("http.port = 8001\nsuggestions.top.n=5\ntopic.prefix=lab.\n");
        AppConfig config = ConfigLoader.load(file,
                Map.of("CONGENER_HTTP_PORT", "8002", "CONGENER_SUGGESTIONS_TOP_N", "7", "PATH", "/bin"),
                Map.of(AppConfig.HTTP_PORT, "8003"));
        assertEquals(8003, config.httpPort(), "flag wins");
        assertEquals(7, config.topN(), "environment beats file");
        assertEquals("lab.", config.topicPrefix(), "file beats default");
    }

    @Test
    void shouldNameFileLineAndKeyWhenKeyIsUnknown() throws Exception {
        Path file = write("# comment\nhttp.port=8001\n\nhttp.prot=8002\n");
        ConfigLoadException e = assertThrows(ConfigLoadException.class,
                () -> ConfigLoader.load(file, Map.of(), Map.of()));
        assertTrue(e.getMessage().startsWith(file + " line 4: unknown setting 'http.prot'"), e.getMessage());
        assertFalse(e.getMessage().contains("\n"));
    }

    @Test
    void shouldNameFileLineKeyAndValueWhenValueIsBad() throws Exception {
        Path file = write("topic.prefix=lab-\nprocessing.guarantee=twice\n");
        ConfigLoadException e = assertThrows(ConfigLoadException.class,
                () -> ConfigLoader.load(file, Map.of(), Map.of()));
        assertTrue(e.getMessage().startsWith(file + " line 2: bad value 'twice' for processing.guarantee"),
                e.getMessage());
        assertTrue(e.getMessage().contains("exactly_once_v2"), "lists what is allowed: " + e.getMessage());
    }

    @Test
    void shouldRejectNumberOutOfRangeWhenGivenAsFlag() {
        ConfigLoadException e = assertThrows(ConfigLoadException.class,
                () -> ConfigLoader.load(null, Map.of(), Map.of(AppConfig.HTTP_PORT, "70000")));
        assertTrue(e.getMessage().contains("'70000'") && e.getMessage().contains("http.port"), e.getMessage());
    }

    @Test
    void shouldNameVariableWhenEnvironmentValueIsNotANumber() {
        ConfigLoadException e = assertThrows(ConfigLoadException.class,
                () -> ConfigLoader.load(null, Map.of("CONGENER_NUM_STREAM_THREADS", "two"), Map.of()));
        assertTrue(e.getMessage().startsWith("environment variable CONGENER_NUM_STREAM_THREADS: bad value 'two'"),
                e.getMessage());
    }

    @Test
    void shouldSayFileIsMissingWhenItDoesNotExist() {
        Path missing = dir.resolve("nope.properties");
        ConfigLoadException e = assertThrows(ConfigLoadException.class,
                () -> ConfigLoader.load(missing, Map.of(), Map.of()));
        assertEquals("config file " + missing + " does not exist", e.getMessage());
    }

    @Test
    void shouldPassCompressionToTheStreamThreadsProducerOnly() throws Exception {
        Path file = write("producer.compression.type=lz4\n");
        Map<String, Object> streams = ConfigLoader.load(file, Map.of(), Map.of()).streamsProperties();
        assertEquals("lz4", streams.get("producer.compression.type"));
        assertFalse(streams.containsKey("compression.type"), "the consumer and admin take no compression");
        assertEquals("none", ConfigLoader.load(null, Map.of(), Map.of()).streamsProperties()
                .get("producer.compression.type"));
    }

    @Test
    void shouldPassTheBatchSizeToTheStreamThreadsProducer() {
        assertEquals(16_384, ConfigLoader.load(null, Map.of(), Map.of()).streamsProperties()
                .get("producer.batch.size"));
        assertEquals(262_144, ConfigLoader.load(null, Map.of("CONGENER_PRODUCER_BATCH_SIZE", "262144"), Map.of())
                .streamsProperties().get("producer.batch.size"));
        assertThrows(ConfigLoadException.class,
                () -> ConfigLoader.load(null, Map.of(), Map.of(AppConfig.PRODUCER_BATCH_BYTES, "100")));
    }

    @Test
    void shouldListTheCodecsWhenCompressionIsUnknown() {
        ConfigLoadException e = assertThrows(ConfigLoadException.class,
                () -> ConfigLoader.load(null, Map.of(), Map.of(AppConfig.PRODUCER_COMPRESSION, "brotli")));
        assertTrue(e.getMessage().contains("'brotli'") && e.getMessage().contains("producer.compression.type")
                && e.getMessage().contains("zstd"), e.getMessage());
    }

    @Test
    void shouldRejectTopicPrefixThatMakesIllegalTopicNames() {
        assertThrows(ConfigLoadException.class,
                () -> ConfigLoader.load(null, Map.of(), Map.of(AppConfig.TOPIC_PREFIX, "lab/")));
    }

    private Path write(String text) throws Exception {
        Path file = dir.resolve("congener.properties");
        Files.writeString(file, text);
        return file;
    }
}
