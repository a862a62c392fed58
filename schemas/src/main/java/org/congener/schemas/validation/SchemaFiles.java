package org.congener.schemas.validation;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.TopicName;

/** Reads the JSON Schema documents shipped in this jar, keyed by their {@code $id}. */
final class SchemaFiles {
    static final String FOLDER = "/org/congener/schemas/json/";
    static final String COMMON_NAME = "common";
    static final String COMMON_URI = "https://schemas.congener.org/common/v1";

    private SchemaFiles() {
    }

    /** The resource path of a value's schema, e.g. {@code /org/congener/schemas/json/usage-event.schema.json}. */
    static String resourceOf(String valueName) {
        return FOLDER + valueName + ".schema.json";
    }

    /** Every schema document: the shared definitions and one per topic value. */
    static Map<String, String> allByUri() {
        Map<String, String> byUri = new LinkedHashMap<>();
        byUri.put(COMMON_URI, read(resourceOf(COMMON_NAME)));
        for (TopicName topic : TopicName.values()) {
            String id = SchemaIds.of(topic);
            byUri.put(SchemaIds.schemaUri(id), read(resourceOf(SchemaIds.valueName(id))));
        }
        return byUri;
    }

    private static String read(String resource) {
        try (InputStream in = SchemaFiles.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("schema resource missing from the classpath: " + resource);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read schema resource " + resource, e);
        }
    }
}
