package org.congener.schemas.serde;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.core.JsonProcessingException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.Predicate;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.apache.kafka.common.serialization.Deserializer;
import org.apache.kafka.common.serialization.Serializer;
import org.congener.schemas.Contribution;
import org.congener.schemas.Examples;
import org.congener.schemas.Json;
import org.congener.schemas.RecordSamples;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.Suggestion;
import org.congener.schemas.SuggestionSource;
import org.congener.schemas.Suggestions;
import org.congener.schemas.TopicName;
import org.congener.schemas.Topics;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The streaming writer against the mapper it stands in for: the same bytes for hand-made lists at
 * the edges, for every valid example file and for seeded corpora, and bytes that the
 * {@code suggestions} topic reads back to the same record whenever the list is within its schema.
 */
class SuggestionsJsonWriterTest {
    private static final long SEED = 20260314L;
    private static final int CORPUS_SIZE = 2000;
    private static final String TOPIC = "lab1.suggestions";
    private static final String AT = "2026-03-14T09:26:53.125Z";

    private final Serializer<Suggestions> writer = new SuggestionsJsonWriter();
    private final Deserializer<Suggestions> topicValues = new Topics("lab1.").suggestions().valueSerde().deserializer();

    // ---- hand-made lists ----

    static Stream<Arguments> listsWithinContract() {
        Suggestions sample = (Suggestions) RecordSamples.all().get(TopicName.SUGGESTIONS);
        return Stream.of(
                Arguments.of("sample: no model version, no shared term, empty contributors and hazard codes", sample),
                Arguments.of("no items, no causing event", list(null, List.of())),
                Arguments.of("quotes, backslashes, non-ASCII letters; control characters in the caution",
                        new Suggestions(SchemaIds.SUGGESTIONS, "r-0007", "m-7", SuggestionSource.HYBRID, "ord-1", AT,
                                List.of(new Suggestion(1, "cmp-1",
                                        "\"Velorin\" \\ bromide / ü α ß € 中 \uD83E\uDDEA", 0.5, 0.5, 0.5,
                                        List.of(new Contribution("cmp-2", 1.0)), "CGO:1",
                                        "α-\"velorin\"\\halide \u2028 \u00A0 \uFFFD", List.of("H302"), true)),
                                "Read the \"safety\" data sheet:\n\t\u0000\u0001\u001F\u007F\b\f\r C:\\lab\\ü α")),
                Arguments.of("doubles at the edges of their formatting", list("m-7", doubleEdges())),
                Arguments.of("the largest list the schema allows",
                        list("m-7", IntStream.rangeClosed(1, 1000)
                                .mapToObj(rank -> item(rank, rank / 1000.0)).toList())));
    }

    static Stream<Arguments> listsOutsideContract() {
        return Stream.of(
                Arguments.of("large and negative ranks", list("m-7", Stream.of(Integer.MAX_VALUE, Integer.MIN_VALUE,
                        1_000_001, 65_536, 0, -1).map(rank -> item(rank, 0.5)).toList())),
                Arguments.of("NaN and infinities", list("m-7", List.of(
                        new Suggestion(1, "cmp-1", "a", Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
                                List.of(new Contribution("cmp-2", Double.NaN)), null, null, List.of(), false)))),
                Arguments.of("control characters and lone surrogates in every string",
                        new Suggestions("\u0000\u0001\u001F", "r\n1", "m\t7", SuggestionSource.POPULARITY, "\uD800",
                                "\uDFFF\uD800", List.of(new Suggestion(1, "\u007F\u0080\u009F", "\b\f\r\u001B",
                                        0.0, 0.0, 0.0, List.of(new Contribution("\u2028\u2029", 0.0)), "\uFEFF",
                                        "\uFFFE\uFFFF", List.of("\u0000", "\uDBFF\uDC00"), true)), "\u0000")),
                Arguments.of("every nullable field null",
                        new Suggestions(null, null, null, null, null, null, null, null)),
                Arguments.of("null lists and null elements", list("m-7", Arrays.asList(null,
                        new Suggestion(2, null, null, 0.0, 0.0, 0.0, null, null, null, null, false),
                        new Suggestion(3, "cmp-3", "c", 0.0, 0.0, 0.0, Arrays.asList(null, new Contribution(null, 1.0)),
                                null, null, Arrays.asList(null, "H302", null), true)))),
                Arguments.of("empty strings and a linked list", new Suggestions("", "", "", SuggestionSource.HYBRID, "",
                        "", new LinkedList<>(List.of(new Suggestion(1, "", "", 0.0, 0.0, 0.0,
                                new LinkedList<>(), "", "", new LinkedList<>(List.of("")), false))), "")));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("listsWithinContract")
    void shouldWriteTheMapperBytesThatTheTopicReadsBackWhenAHandMadeListIsWithinContract(String how, Suggestions list) {
        byte[] written = writer.serialize(TOPIC, list);
        assertSameBytes(how, mapperBytes(list), written);
        assertEquals(list, topicValues.deserialize(TOPIC, written), how);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("listsOutsideContract")
    void shouldWriteTheMapperBytesWhenAHandMadeListIsOutsideTheContract(String how, Suggestions list) {
        assertSameBytes(how, mapperBytes(list), writer.serialize(TOPIC, list));
    }

    @Test
    void shouldLeaveNullFieldsOutAndWriteNullElementsAndNonFiniteNumbersAsTheMapperDoes() {
        Suggestion item = new Suggestion(1, "cmp-1", "a", Double.NaN, 0.25, Double.NEGATIVE_INFINITY,
                Arrays.asList(null, new Contribution("cmp-2", -0.0)), null, null, Arrays.asList("H302", null), true);
        String json = text(writer.serialize(TOPIC, list(null, List.of(item))));
        assertTrue(json.startsWith("{\"schema\":\"congener/suggestions/v1\",\"researcherId\":\"r-0007\","
                + "\"source\":\"HYBRID\",\"generatedAt\":"), json);
        assertTrue(json.contains("{\"rank\":1,\"compoundId\":\"cmp-1\",\"name\":\"a\",\"cfScore\":\"NaN\","
                + "\"semanticScore\":0.25,\"fusedScore\":\"-Infinity\","
                + "\"contributors\":[null,{\"compoundId\":\"cmp-2\",\"weight\":-0.0}],"
                + "\"hazardCodes\":[\"H302\",null],\"inStock\":true}"), json);
    }

    @Test
    void shouldWriteTheMapperBytesForEveryValidExampleFile() throws IOException {
        List<Path> files = Examples.files(TopicName.SUGGESTIONS, "valid-");
        assertTrue(files.size() >= 2, files::toString);
        for (Path file : files) {
            Suggestions list = Json.mapper().readValue(Examples.bytes(file), Suggestions.class);
            assertSameBytes(file.getFileName().toString(), mapperBytes(list), writer.serialize(TOPIC, list));
        }
    }

    @Test
    void shouldWriteNothingForNull() {
        assertNull(writer.serialize(TOPIC, null));
        assertNull(new SuggestionsJsonWriter().write(null));
    }

    // ---- seeded corpora ----

    @Test
    void shouldWriteTheMapperBytesThatTheTopicReadsBackForEachGeneratedValidList() {
        List<Suggestions> corpus = SuggestionsCorpus.withinContract(SEED, CORPUS_SIZE);
        List<String> mismatches = new ArrayList<>();
        List<byte[]> outputs = new ArrayList<>(corpus.size());
        for (int i = 0; i < corpus.size(); i++) {
            Suggestions list = corpus.get(i);
            byte[] expected = mapperBytes(list);
            byte[] written = writer.serialize(TOPIC, list);
            outputs.add(written);
            if (!Arrays.equals(expected, written)) {
                mismatches.add(difference("#" + i, expected, written));
            } else if (!list.equals(topicValues.deserialize(TOPIC, written))) {
                mismatches.add("#" + i + " reads back as a different list: " + text(written));
            }
        }
        assertNoMismatches(mismatches, SEED);
        assertCovers(outputs, Map.of(
                "no model version", json -> !json.contains("\"modelVersion\""),
                "no causing event", json -> !json.contains("\"causedByEventId\""),
                "no items", json -> json.contains("\"items\":[]"),
                "no contributors", json -> json.contains("\"contributors\":[]"),
                "no hazard codes", json -> json.contains("\"hazardCodes\":[]"),
                "no shared term", json -> json.contains("],\"hazardCodes\""),
                "escaped quote and backslash", json -> json.contains("\\\"") && json.contains("\\\\"),
                "escaped control character", json -> json.contains("\\u0000") && json.contains("\\n"),
                "exponent", json -> json.contains("E-") && json.contains("E2"),
                "more than the generator's buffer", json -> json.length() > 16_000));
    }

    @Test
    void shouldWriteTheMapperBytesForEachGeneratedListOfAnyValues() {
        List<Suggestions> corpus = SuggestionsCorpus.anything(SEED + 1, CORPUS_SIZE);
        List<String> mismatches = new ArrayList<>();
        List<byte[]> outputs = new ArrayList<>(corpus.size());
        for (int i = 0; i < corpus.size(); i++) {
            byte[] expected = mapperBytes(corpus.get(i));
            byte[] written = writer.serialize(TOPIC, corpus.get(i));
            outputs.add(written);
            if (!Arrays.equals(expected, written)) {
                mismatches.add(difference("#" + i, expected, written));
            }
        }
        assertNoMismatches(mismatches, SEED + 1);
        assertCovers(outputs, Map.of(
                "null items", json -> !json.contains("\"items\""),
                "null element", json -> json.contains("[null") && json.contains(",null"),
                "non-finite number", json -> json.contains("\"NaN\"") && json.contains("\"-Infinity\""),
                "escaped surrogate", json -> json.contains("\\uD800") || json.contains("\\uDFFF")
                        || json.contains("\\ud800") || json.contains("\\udfff") || json.contains("\"\\uD83E"),
                "escaped NUL", json -> json.contains("\\u0000"),
                "negative rank", json -> json.contains("\"rank\":-"),
                "no source", json -> !json.contains("\"source\"")));
    }

    // ---- helpers ----

    private static Suggestions list(String modelVersion, List<Suggestion> items) {
        return new Suggestions(SchemaIds.SUGGESTIONS, "r-0007", modelVersion, SuggestionSource.HYBRID,
                modelVersion == null ? null : "ord-2026-000481", AT, items, RecordSamples.CAUTION);
    }

    private static Suggestion item(int rank, double score) {
        return new Suggestion(rank, "cmp-" + rank, "Compound " + rank, score, score, score,
                List.of(new Contribution("cmp-0", score)), null, null, List.of("H225"), rank % 2 == 0);
    }

    /** One item per edge: 0, -0, the smallest and largest doubles, and the switches to and from an exponent. */
    private static List<Suggestion> doubleEdges() {
        double[][] scores = {
            {0.0, 0.0, -0.0, 1e-300},
            {-0.0, 1.0, 0.0, 1.0E22},
            {1e-300, Double.MIN_VALUE, 123456.789, -0.0},
            {1.0E22, 1e-300, Double.MIN_VALUE, -Double.MAX_VALUE},
            {123456.789, 0.1 + 0.2, Double.MAX_VALUE, Double.MIN_NORMAL},
            {Double.MIN_VALUE, Double.MIN_NORMAL, 1e7, 9999999.999999998},
            {1e-3, Math.nextDown(1.0), 9.999999999999998E-4, 1.0E21},
            {-1.0E23, 0.001, 9007199254740993.0, (double) 0.1f},
        };
        List<Suggestion> items = new ArrayList<>();
        for (double[] s : scores) {
            int rank = items.size() + 1;
            items.add(new Suggestion(rank, "cmp-" + rank, "Compound " + rank, s[0], s[1], s[2],
                    List.of(new Contribution("cmp-0", s[3]), new Contribution("cmp-00", -s[3])), "CGO:" + rank,
                    "term " + rank, List.of("H300+H310+H330", "H361fd"), true));
        }
        return items;
    }

    private static byte[] mapperBytes(Suggestions list) {
        try {
            return Json.mapper().writeValueAsBytes(list);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void assertSameBytes(String how, byte[] expected, byte[] written) {
        if (!Arrays.equals(expected, written)) {
            fail(difference(how, expected, written));
        }
    }

    private static void assertNoMismatches(List<String> mismatches, long seed) {
        assertTrue(mismatches.isEmpty(), () -> mismatches.size() + " of " + CORPUS_SIZE + " lists (seed " + seed
                + ") differ, first ones:\n" + String.join("\n", mismatches.stream().limit(10).toList()));
    }

    /** Each named shape turns up in at least one output, so the corpus does reach the cases it is for. */
    private static void assertCovers(List<byte[]> outputs, Map<String, Predicate<String>> shapes) {
        List<String> texts = outputs.stream().map(SuggestionsJsonWriterTest::text).toList();
        Map<String, Long> counts = new TreeMap<>();
        shapes.forEach((name, shape) -> counts.put(name, texts.stream().filter(shape).count()));
        assertTrue(counts.values().stream().allMatch(count -> count > 0), counts::toString);
    }

    /** Where two outputs part, with some text either side, characters outside printable ASCII shown as U+. */
    private static String difference(String how, byte[] expected, byte[] written) {
        int at = Arrays.mismatch(expected, written);
        int from = Math.max(0, at - 60);
        return how + ": first difference at byte " + at + " (" + expected.length + " and " + written.length
                + " bytes)\n    mapper: " + shown(expected, from, at + 60)
                + "\n    writer: " + shown(written, from, at + 60);
    }

    private static String shown(byte[] bytes, int from, int to) {
        String text = new String(bytes, from, Math.max(0, Math.min(to, bytes.length) - from), StandardCharsets.UTF_8);
        StringBuilder out = new StringBuilder();
        text.codePoints().forEach(c -> out.append(c >= 0x20 && c < 0x7F ? Character.toString(c)
                : String.format("<U+%04X>", c)));
        return out.toString();
    }

    private static String text(byte[] bytes) {
        return new String(bytes, StandardCharsets.UTF_8);
    }
}
