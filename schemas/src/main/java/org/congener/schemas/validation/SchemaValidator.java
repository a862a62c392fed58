package org.congener.schemas.validation;

import com.fasterxml.jackson.databind.JsonNode;
import com.networknt.schema.Error;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SchemaRegistryConfig;
import com.networknt.schema.SpecificationVersion;
import com.networknt.schema.path.PathType;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.TopicName;

/**
 * Checks one topic's values against its JSON Schema (draft 2020-12), then against the few rules
 * that relate two fields and so cannot be written in JSON Schema ({@link CrossFieldRules}).
 *
 * <p>All schemas are parsed once, on first use, and shared; {@link #check} is thread-safe.
 */
public final class SchemaValidator {
    private final TopicName topic;
    private final String schemaUri;
    private final Schema schema;
    private final List<CrossFieldRule> crossFieldRules;

    private SchemaValidator(TopicName topic, String schemaUri, Schema schema, List<CrossFieldRule> crossFieldRules) {
        this.topic = topic;
        this.schemaUri = schemaUri;
        this.schema = schema;
        this.crossFieldRules = crossFieldRules;
    }

    /** The validator of the values on {@code topic}. */
    public static SchemaValidator forTopic(TopicName topic) {
        return Loaded.BY_TOPIC.get(Objects.requireNonNull(topic, "topic"));
    }

    public TopicName topic() {
        return topic;
    }

    /** The {@code $id} of the schema this validator applies, e.g. {@code https://schemas.congener.org/usage-event/v1}. */
    public String schemaUri() {
        return schemaUri;
    }

    /**
     * Every broken rule of {@code value}; empty when the value is valid. The
     * cross-field rules run only on a value that passed the schema, so they may rely on its shape.
     */
    public List<Violation> check(JsonNode value) {
        Objects.requireNonNull(value, "value");
        List<Error> errors = schema.validate(value);
        if (!errors.isEmpty()) {
            List<Violation> violations = new ArrayList<>(errors.size());
            for (Error error : errors) {
                violations.add(ErrorTranslation.toViolation(error));
            }
            return violations;
        }
        if (crossFieldRules.isEmpty()) {
            return List.of();
        }
        List<Violation> violations = new ArrayList<>(0);
        for (CrossFieldRule rule : crossFieldRules) {
            rule.check(value, violations);
        }
        return violations;
    }

    /** Holder idiom: the JVM runs this once, on the first {@link #forTopic} call, and publishes it safely. */
    private static final class Loaded {
        static final Map<TopicName, SchemaValidator> BY_TOPIC = loadAll();

        private static Map<TopicName, SchemaValidator> loadAll() {
            SchemaRegistryConfig config = SchemaRegistryConfig.builder()
                    .pathType(PathType.JSON_POINTER)
                    // draft 2020-12 treats format as an annotation unless told to assert it
                    .formatAssertionsEnabled(true)
                    .build();
            Map<String, String> documents = SchemaFiles.allByUri();
            SchemaRegistry registry = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12,
                    builder -> builder.schemaRegistryConfig(config).schemas(documents));
            Map<TopicName, SchemaValidator> byTopic = new EnumMap<>(TopicName.class);
            for (TopicName topic : TopicName.values()) {
                String uri = SchemaIds.schemaUri(SchemaIds.of(topic));
                Schema schema = registry.getSchema(SchemaLocation.of(uri));
                // resolve every $ref now, not lazily on the first record of some stream thread
                schema.initializeValidators();
                byTopic.put(topic, new SchemaValidator(topic, uri, schema, CrossFieldRules.forTopic(topic)));
            }
            return byTopic;
        }
    }
}
