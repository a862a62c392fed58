package org.congener.schemas.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.lang.reflect.RecordComponent;
import java.util.Arrays;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.congener.schemas.Contribution;
import org.congener.schemas.FusionRule;
import org.congener.schemas.InventoryKind;
import org.congener.schemas.Json;
import org.congener.schemas.Neighbour;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.Suggestion;
import org.congener.schemas.SuggestionSource;
import org.congener.schemas.TopicName;
import org.congener.schemas.UsageKind;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** The schema documents agree with the Java records and enums, so neither can drift from the other. */
class SchemaFilesTest {

    @ParameterizedTest
    @EnumSource(TopicName.class)
    void shouldDeclareDialectIdTitleAndDescriptionWhenLoadedForAnyTopic(TopicName topic) {
        JsonNode schema = schemaOf(topic);
        assertEquals("https://json-schema.org/draft/2020-12/schema", schema.get("$schema").asText());
        assertEquals(SchemaIds.schemaUri(SchemaIds.of(topic)), schema.get("$id").asText());
        assertEquals(SchemaValidator.forTopic(topic).schemaUri(), schema.get("$id").asText());
        assertFalse(schema.path("title").asText().isBlank());
        assertFalse(schema.path("description").asText().isBlank());
        assertEquals(false, schema.get("additionalProperties").booleanValue());
    }

    @ParameterizedTest
    @EnumSource(TopicName.class)
    void shouldRequireTheSchemaFieldToBeTheRecordsIdentifier(TopicName topic) {
        JsonNode schema = schemaOf(topic);
        assertEquals(SchemaIds.of(topic), schema.at("/properties/schema/const").asText());
        Set<String> required = names(schema.get("required"));
        assertEquals(true, required.contains("schema"), required::toString);
    }

    @ParameterizedTest
    @EnumSource(TopicName.class)
    void shouldDescribeExactlyTheRecordComponentsOfTheTopicsValue(TopicName topic) {
        assertEquals(componentsOf(topic.valueType()), names(schemaOf(topic).get("properties")));
    }

    @Test
    void shouldDescribeExactlyTheComponentsOfNestedRecords() {
        assertEquals(componentsOf(Suggestion.class),
                names(schemaOf(TopicName.SUGGESTIONS).at("/properties/items/items/properties")));
        assertEquals(componentsOf(Neighbour.class),
                names(schemaOf(TopicName.ITEM_NEIGHBOURS).at("/properties/neighbours/items/properties")));
        assertEquals(componentsOf(Contribution.class),
                names(document("common").at("/$defs/contribution/properties")));
    }

    @Test
    void shouldListTheJavaEnumNamesAsAllowedKinds() {
        assertEquals(enumNames(UsageKind.class),
                names(schemaOf(TopicName.USAGE_EVENTS).at("/properties/kind/enum")));
        assertEquals(enumNames(InventoryKind.class),
                names(schemaOf(TopicName.INVENTORY_EVENTS).at("/properties/kind/enum")));
        assertEquals(enumNames(FusionRule.class),
                names(schemaOf(TopicName.MODEL_MANIFESTS).at("/properties/fusionRule/enum")));
        assertEquals(enumNames(SuggestionSource.class),
                names(schemaOf(TopicName.SUGGESTIONS).at("/properties/source/enum")));
    }

    private static JsonNode schemaOf(TopicName topic) {
        return document(SchemaIds.valueName(SchemaIds.of(topic)));
    }

    private static JsonNode document(String name) {
        String resource = SchemaFiles.resourceOf(name);
        try (InputStream in = SchemaFilesTest.class.getResourceAsStream(resource)) {
            assertNotNull(in, resource);
            return Json.mapper().readTree(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Set<String> componentsOf(Class<?> recordType) {
        return Arrays.stream(recordType.getRecordComponents()).map(RecordComponent::getName)
                .collect(Collectors.toCollection(TreeSet::new));
    }

    private static Set<String> enumNames(Class<? extends Enum<?>> type) {
        return Arrays.stream(type.getEnumConstants()).map(Enum::name).collect(Collectors.toCollection(TreeSet::new));
    }

    /** Field names of an object node, or the texts of an array node. */
    private static Set<String> names(JsonNode node) {
        Set<String> names = new TreeSet<>();
        if (node.isArray()) {
            node.forEach(n -> names.add(n.asText()));
        } else {
            node.fieldNames().forEachRemaining(names::add);
        }
        return names;
    }
}
