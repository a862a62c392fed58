package org.congener.streams.api;

import java.io.IOException;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.Optional;

import org.apache.kafka.streams.state.HostInfo;
import org.congener.schemas.Json;
import org.congener.schemas.Suggestions;

/** Asks the instance that holds a researcher's list for it, over the same query API. */
final class RemoteSuggestions {

    /** Marks a forwarded request: the receiver answers from its own stores and never forwards again. */
    static final String FORWARDED_HEADER = "X-Congener-Forwarded";

    private static final Duration TIMEOUT = Duration.ofSeconds(5);

    private final HttpClient http = HttpClient.newBuilder().connectTimeout(TIMEOUT).build();

    Optional<Suggestions> fetch(HostInfo owner, String researcherId) {
        String id = URLEncoder.encode(researcherId, StandardCharsets.UTF_8).replace("+", "%20");
        URI uri = URI.create("http://" + owner.host() + ":" + owner.port() + "/researchers/" + id + "/suggestions");
        HttpRequest request = HttpRequest.newBuilder(uri).timeout(TIMEOUT).header(FORWARDED_HEADER, "1").GET().build();
        HttpResponse<byte[]> response;
        try {
            response = http.send(request, HttpResponse.BodyHandlers.ofByteArray());
        } catch (IOException e) {
            throw new SuggestionQueries.NotReadyException("the instance holding researcher '" + researcherId
                    + "' at " + owner.host() + ":" + owner.port() + " does not answer: " + e.getMessage());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new SuggestionQueries.NotReadyException("interrupted while asking " + owner.host() + ":" + owner.port());
        }
        if (response.statusCode() == 404) {
            return Optional.empty();
        }
        if (response.statusCode() != 200) {
            throw new SuggestionQueries.NotReadyException("the instance holding researcher '" + researcherId
                    + "' at " + owner.host() + ":" + owner.port() + " answered " + response.statusCode());
        }
        try {
            return Optional.of(Json.mapper().readValue(response.body(), Suggestions.class));
        } catch (IOException e) {
            throw new IllegalStateException("unreadable answer from " + owner.host() + ":" + owner.port(), e);
        }
    }
}
