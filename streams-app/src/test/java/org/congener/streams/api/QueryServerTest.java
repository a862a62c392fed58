package org.congener.streams.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.Suggestion;
import org.congener.schemas.SuggestionSource;
import org.congener.schemas.Suggestions;
import org.congener.streams.SafetyCaution;
import org.congener.streams.model.Alternatives;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/** The HTTP layer on a real server on a free port, over fixed answers. */
class QueryServerTest {

    private final HttpClient http = HttpClient.newHttpClient();
    private final ObjectMapper json = new ObjectMapper();
    private boolean ready = true;
    private QueryServer server;

    @BeforeEach
    void start() {
        Map<String, Suggestions> lists = Map.of("ada", list("ada", 3));
        server = QueryServer.start("127.0.0.1", 0, new SuggestionQueries() {
            @Override
            public Optional<Suggestions> latest(String researcherId, boolean localOnly) {
                if (!ready) {
                    throw new NotReadyException("store latest-suggestions is not ready (streams state REBALANCING)");
                }
                return Optional.ofNullable(lists.get(researcherId));
            }

            @Override
            public boolean isKnownResearcher(String researcherId) {
                return researcherId.equals("ada") || researcherId.equals("ben") || researcherId.equals("a b");
            }

            @Override
            public Health health() {
                return ready ? new Health("RUNNING", true, 2) : new Health("REBALANCING", false, 2);
            }

            @Override
            public int maxItems() {
                return 3;
            }

            @Override
            public boolean isKnownCompound(String compoundId) {
                return compoundId.equals("c-1");
            }

            @Override
            public boolean isInStock(String compoundId) {
                return !compoundId.equals("c-1");
            }

            @Override
            public Alternatives.Lists alternatives(String compoundId, int n, boolean inStockOnly) {
                List<Alternatives.Alternative> all = List.of(new Alternatives.Alternative("c-2", 0.8),
                        new Alternatives.Alternative("c-3", 0.5));
                List<Alternatives.Alternative> first = all.subList(0, Math.min(n, all.size()));
                return new Alternatives.Lists(compoundId, "v0001", first, inStockOnly ? List.of() : first);
            }
        });
    }

    @AfterEach
    void stop() {
        server.close();
    }

    private static Suggestions list(String researcher, int n) {
        List<Suggestion> items = new java.util.ArrayList<>();
        for (int i = 1; i <= n; i++) {
            items.add(new Suggestion(i, "c-" + i, "compound " + i, 0, 0, 1.0 / i, List.of(), null, null,
                    List.of(), true));
        }
        return new Suggestions(SchemaIds.SUGGESTIONS, researcher, null, SuggestionSource.POPULARITY, "e-1",
                "2026-01-01T00:00:00Z", items, SafetyCaution.TEXT);
    }

    private HttpResponse<String> send(String method, String path) throws Exception {
        HttpRequest request = HttpRequest.newBuilder(URI.create(server.baseUrl() + path))
                .method(method, HttpRequest.BodyPublishers.noBody()).build();
        return http.send(request, HttpResponse.BodyHandlers.ofString());
    }

    private JsonNode body(HttpResponse<String> response) throws Exception {
        JsonNode body = json.readTree(response.body());
        assertEquals(SafetyCaution.TEXT, body.get("caution").asText(), "every answer carries the caution");
        assertTrue(response.headers().firstValue("Content-Type").orElse("").startsWith("application/json"));
        return body;
    }

    @Test
    void shouldKeepOnlyItemsInStockNowInListOrderWhenInStockIsAskedFor() throws Exception {
        HttpResponse<String> response = send("GET", "/researchers/ada/suggestions?inStock=true&n=3");
        assertEquals(200, response.statusCode());
        JsonNode items = body(response).get("items");
        assertEquals(2, items.size(), "c-1 is out of stock now");
        assertEquals("c-2", items.get(0).get("compoundId").asText());
        assertEquals("c-3", items.get(1).get("compoundId").asText());
        assertEquals(3, body(send("GET", "/researchers/ada/suggestions?inStock=false")).get("items").size());
        HttpResponse<String> bad = send("GET", "/researchers/ada/suggestions?inStock=maybe");
        assertEquals(400, bad.statusCode());
        assertTrue(body(bad).get("error").asText().contains("inStock must be true or false"));
    }

    @Test
    void shouldReturnFirstNItemsWhenNIsGiven() throws Exception {
        HttpResponse<String> response = send("GET", "/researchers/ada/suggestions?n=2");
        assertEquals(200, response.statusCode());
        JsonNode body = body(response);
        assertEquals(2, body.get("items").size());
        assertEquals("c-1", body.get("items").get(0).get("compoundId").asText());
    }

    @Test
    void shouldReturnWholeListWhenNIsAbsent() throws Exception {
        assertEquals(3, body(send("GET", "/researchers/ada/suggestions")).get("items").size());
    }

    @Test
    void shouldAnswer404WhenResearcherIsUnknownOrHasNoListYet() throws Exception {
        HttpResponse<String> unknown = send("GET", "/researchers/zed/suggestions");
        assertEquals(404, unknown.statusCode());
        assertEquals("unknown researcher 'zed'", body(unknown).get("error").asText());
        HttpResponse<String> noList = send("GET", "/researchers/ben/suggestions");
        assertEquals(404, noList.statusCode());
        assertTrue(body(noList).get("error").asText().startsWith("no suggestions yet for researcher 'ben'"));
        HttpResponse<String> encoded = send("GET", "/researchers/a%20b/suggestions");
        assertTrue(body(encoded).get("error").asText().contains("'a b'"), "path segment is decoded");
    }

    @Test
    void shouldAnswer400WhenParameterIsBadUnknownOrRepeated() throws Exception {
        for (String query : List.of("n=0", "n=4", "n=two", "n=", "size=2", "n=1&n=2")) {
            HttpResponse<String> response = send("GET", "/researchers/ada/suggestions?" + query);
            assertEquals(400, response.statusCode(), query);
            body(response);
        }
    }

    @Test
    void shouldAnswer404ForUnknownPathAnd405ForOtherMethods() throws Exception {
        assertEquals(404, send("GET", "/suggestions").statusCode());
        HttpResponse<String> post = send("POST", "/researchers/ada/suggestions");
        assertEquals(405, post.statusCode());
        body(post);
    }

    @Test
    void shouldAnswer503WhenStoresAreNotReady() throws Exception {
        ready = false;
        HttpResponse<String> response = send("GET", "/researchers/ada/suggestions");
        assertEquals(503, response.statusCode());
        assertTrue(body(response).get("error").asText().contains("REBALANCING"));
        HttpResponse<String> health = send("GET", "/health");
        assertEquals(503, health.statusCode());
        assertEquals("REBALANCING", body(health).get("status").asText());
    }

    @Test
    void shouldReportStateAndDeadLettersOnHealth() throws Exception {
        HttpResponse<String> health = send("GET", "/health");
        assertEquals(200, health.statusCode());
        JsonNode body = body(health);
        assertEquals("RUNNING", body.get("status").asText());
        assertEquals(2, body.get("deadLetters").asLong());
    }

    @Test
    void shouldAnswerBothAlternativeListsWithTheCautionWhenTheCompoundIsKnown() throws Exception {
        HttpResponse<String> response = send("GET", "/compounds/c-1/alternatives?n=1&inStock=true");
        assertEquals(200, response.statusCode());
        JsonNode body = body(response);
        assertEquals("v0001", body.get("modelVersion").asText());
        assertEquals(1, body.get("byOntology").size());
        assertEquals("c-2", body.get("byOntology").get(0).get("compoundId").asText());
        assertEquals(0, body.get("byCoUse").size());
        assertTrue(body.get("inStockOnly").asBoolean());
    }

    @Test
    void shouldAnswer404ForAnUnknownCompoundAnd400ForBadAlternativeParameters() throws Exception {
        HttpResponse<String> unknown = send("GET", "/compounds/c-9/alternatives");
        assertEquals(404, unknown.statusCode());
        assertEquals("unknown compound 'c-9'", body(unknown).get("error").asText());
        assertEquals(400, send("GET", "/compounds/c-1/alternatives?n=0").statusCode());
        assertEquals(400, send("GET", "/compounds/c-1/alternatives?n=x").statusCode());
        HttpResponse<String> badFlag = send("GET", "/compounds/c-1/alternatives?inStock=yes");
        assertEquals(400, badFlag.statusCode());
        assertEquals("inStock must be true or false, got 'yes'", body(badFlag).get("error").asText());
        assertEquals(400, send("GET", "/compounds/c-1/alternatives?colour=red").statusCode());
    }
}
