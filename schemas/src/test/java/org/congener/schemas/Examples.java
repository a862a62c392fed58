package org.congener.schemas;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

/** The example files under {@code src/test/resources/examples/<value name>/}. */
public final class Examples {
    private Examples() {
    }

    public static Path folderOf(TopicName topic) {
        String name = SchemaIds.valueName(SchemaIds.of(topic));
        URL url = Examples.class.getResource("/examples/" + name);
        if (url == null) {
            throw new IllegalStateException("no example folder for " + name);
        }
        try {
            return Path.of(url.toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    public static List<Path> files(TopicName topic, String prefix) {
        try (Stream<Path> files = Files.list(folderOf(topic))) {
            return files.filter(p -> p.getFileName().toString().startsWith(prefix)).sorted().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public static JsonNode read(Path file) {
        try {
            return Json.mapper().readTree(file.toFile());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public static byte[] bytes(Path file) {
        try {
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The typical valid example of a topic's value, as bytes. */
    public static byte[] typical(TopicName topic) {
        return bytes(folderOf(topic).resolve("valid-typical.json"));
    }
}
