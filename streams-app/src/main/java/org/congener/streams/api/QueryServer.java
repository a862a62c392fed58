package org.congener.streams.api;

import java.io.IOException;
import java.io.OutputStream;
import java.net.BindException;
import java.net.InetSocketAddress;
import java.net.URI;
import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpServer;
import org.congener.schemas.Json;
import org.congener.schemas.Suggestions;
import org.congener.streams.SafetyCaution;
import org.congener.streams.model.Alternatives;

/**
 * The query API on the JDK's HTTP server:
 * <ul>
 *   <li>{@code GET /researchers/{id}/suggestions?n=&inStock=} — the latest list, at most n items
 *       (default all); with inStock=true only its items in stock now, in the list's order (so possibly
 *       fewer than n: the list is the top-N of everything the researcher may order, and a list of
 *       in-stock compounds only is the instance setting {@code suggestions.in.stock.only});</li>
 *   <li>{@code GET /compounds/{id}/alternatives?n=&inStock=} — similar active compounds by ontology and
 *       by co-use under the live version (n from 1 to 50, default 10; inStock true or false);</li>
 *   <li>{@code GET /health} — the app's state.</li>
 * </ul>
 * Answers are JSON and all carry {@code caution}. Unknown researcher or resource → 404, bad parameter
 * → 400, other methods → 405, stores not ready → 503.
 */
public final class QueryServer implements AutoCloseable {

    private static final Pattern SUGGESTIONS_PATH = Pattern.compile("^/researchers/([^/]+)/suggestions/?$");
    private static final Pattern ALTERNATIVES_PATH = Pattern.compile("^/compounds/([^/]+)/alternatives/?$");
    private static final int MAX_ALTERNATIVES = 50;
    private static final ObjectMapper JSON = Json.mapper();

    private final HttpServer server;
    private final ExecutorService executor;
    private final SuggestionQueries queries;

    private QueryServer(HttpServer server, ExecutorService executor, SuggestionQueries queries) {
        this.server = server;
        this.executor = executor;
        this.queries = queries;
    }

    /** Starts listening on {@code host:port} (port 0: a free one). */
    public static QueryServer start(String host, int port, SuggestionQueries queries) {
        HttpServer server;
        try {
            server = HttpServer.create(new InetSocketAddress(host, port), 0);
        } catch (BindException e) {
            throw new IllegalStateException("port " + port + " on " + host
                    + " is already in use (needed for the query API); stop what uses it or choose another port", e);
        } catch (IOException e) {
            throw new IllegalStateException("cannot open the query API on " + host + ":" + port + ": " + e.getMessage(), e);
        }
        ExecutorService executor = Executors.newFixedThreadPool(2, runnable -> {
            Thread thread = new Thread(runnable, "congener-query-api");
            thread.setDaemon(true);
            return thread;
        });
        QueryServer queryServer = new QueryServer(server, executor, queries);
        server.createContext("/", queryServer::handle);
        server.setExecutor(executor);
        server.start();
        return queryServer;
    }

    public int port() {
        return server.getAddress().getPort();
    }

    /** {@code http://host:port}, as a browser or curl would use it. */
    public String baseUrl() {
        InetSocketAddress address = server.getAddress();
        return "http://" + address.getHostString() + ":" + address.getPort();
    }

    @Override
    public void close() {
        server.stop(0);
        executor.shutdownNow();
    }

    private void handle(HttpExchange exchange) throws IOException {
        try (exchange) {
            Response response;
            try {
                response = route(exchange);
            } catch (BadRequest e) {
                response = error(400, e.getMessage());
            } catch (SuggestionQueries.NotReadyException e) {
                response = error(503, e.getMessage());
            } catch (RuntimeException e) {
                response = error(500, "internal error: " + e.getMessage());
            }
            send(exchange, response);
        }
    }

    private Response route(HttpExchange exchange) {
        URI uri = exchange.getRequestURI();
        String path = uri.getRawPath();
        if (!"GET".equals(exchange.getRequestMethod())) {
            return error(405, "only GET is supported");
        }
        if (path.equals("/health")) {
            return health();
        }
        Matcher matcher = SUGGESTIONS_PATH.matcher(path);
        if (matcher.matches()) {
            String researcherId = URLDecoder.decode(matcher.group(1), StandardCharsets.UTF_8);
            boolean forwarded = exchange.getRequestHeaders().getFirst(RemoteSuggestions.FORWARDED_HEADER) != null;
            return suggestions(researcherId, uri.getRawQuery(), forwarded);
        }
        Matcher alternatives = ALTERNATIVES_PATH.matcher(path);
        if (alternatives.matches()) {
            return alternatives(URLDecoder.decode(alternatives.group(1), StandardCharsets.UTF_8), uri.getRawQuery());
        }
        return error(404, "no such resource: " + path
                + " (try /researchers/{id}/suggestions, /compounds/{id}/alternatives or /health)");
    }

    private Response health() {
        SuggestionQueries.Health health = queries.health();
        Map<String, Object> body = new LinkedHashMap<>();
        body.put("status", health.status());
        body.put("serving", health.serving());
        body.put("deadLetters", health.deadLetters());
        body.put("caution", SafetyCaution.TEXT);
        return new Response(health.serving() ? 200 : 503, body);
    }

    private Response suggestions(String researcherId, String rawQuery, boolean forwarded) {
        ListParams params = ListParams.parse(rawQuery, queries.maxItems(), queries.maxItems());
        int n = params.n();
        boolean inStock = params.inStock();
        if (!queries.isKnownResearcher(researcherId)) {
            return error(404, "unknown researcher '" + researcherId + "'");
        }
        Optional<Suggestions> latest = queries.latest(researcherId, forwarded);
        if (latest.isEmpty()) {
            return error(404, "no suggestions yet for researcher '" + researcherId
                    + "': they appear after the researcher's first usage event");
        }
        Suggestions s = latest.get();
        List<org.congener.schemas.Suggestion> items = s.items().stream()
                .filter(item -> !inStock || queries.isInStock(item.compoundId()))
                .limit(n)
                .toList();
        return new Response(200, new Suggestions(s.schema(), s.researcherId(), s.modelVersion(), s.source(),
                s.causedByEventId(), s.generatedAt(), items, SafetyCaution.TEXT));
    }

    private Response alternatives(String compoundId, String rawQuery) {
        ListParams params = ListParams.parse(rawQuery, 10, MAX_ALTERNATIVES);
        int n = params.n();
        boolean inStock = params.inStock();
        if (!queries.isKnownCompound(compoundId)) {
            return error(404, "unknown compound '" + compoundId + "'");
        }
        Alternatives.Lists lists = queries.alternatives(compoundId, n, inStock);
        Map<String, Object> body = new LinkedHashMap<>();
        body.put("compoundId", lists.compoundId());
        body.put("modelVersion", lists.modelVersion());
        body.put("inStockOnly", inStock);
        body.put("byOntology", lists.byOntology());
        body.put("byCoUse", lists.byCoUse());
        body.put("caution", SafetyCaution.TEXT);
        return new Response(200, body);
    }

    /** The parameters both list requests take: how many items, and in stock only or not. */
    private record ListParams(int n, boolean inStock) {

        /** @throws BadRequest naming the parameter and value that cannot be used */
        static ListParams parse(String rawQuery, int defaultN, int maxN) {
            Map<String, String> params;
            try {
                params = parseQuery(rawQuery);
            } catch (IllegalArgumentException e) {
                throw new BadRequest(e.getMessage());
            }
            for (String name : params.keySet()) {
                if (!name.equals("n") && !name.equals("inStock")) {
                    throw new BadRequest("unknown parameter '" + name + "' (n and inStock are supported)");
                }
            }
            int n = defaultN;
            String value = params.get("n");
            if (value != null) {
                try {
                    n = Integer.parseInt(value);
                } catch (NumberFormatException e) {
                    n = -1;
                }
                if (n < 1 || n > maxN) {
                    throw new BadRequest("n must be a whole number from 1 to " + maxN + ", got '" + value + "'");
                }
            }
            String stock = params.getOrDefault("inStock", "false");
            if (!stock.equals("true") && !stock.equals("false")) {
                throw new BadRequest("inStock must be true or false, got '" + stock + "'");
            }
            return new ListParams(n, stock.equals("true"));
        }
    }

    /** A request whose parameters cannot be used: answered 400 with the message. */
    private static final class BadRequest extends RuntimeException {
        BadRequest(String message) {
            super(message);
        }
    }

    static Map<String, String> parseQuery(String rawQuery) {
        Map<String, String> params = new LinkedHashMap<>();
        if (rawQuery == null || rawQuery.isEmpty()) {
            return params;
        }
        for (String pair : rawQuery.split("&")) {
            if (pair.isEmpty()) {
                continue;
            }
            int eq = pair.indexOf('=');
            String name = URLDecoder.decode(eq < 0 ? pair : pair.substring(0, eq), StandardCharsets.UTF_8);
            String value = eq < 0 ? "" : URLDecoder.decode(pair.substring(eq + 1), StandardCharsets.UTF_8);
            if (params.put(name, value) != null) {
                throw new IllegalArgumentException("parameter '" + name + "' given twice");
            }
        }
        return params;
    }

    private static Response error(int status, String message) {
        Map<String, Object> body = new LinkedHashMap<>();
        body.put("status", status);
        body.put("error", message);
        body.put("caution", SafetyCaution.TEXT);
        return new Response(status, body);
    }

    private static void send(HttpExchange exchange, Response response) throws IOException {
        byte[] bytes = JSON.writerWithDefaultPrettyPrinter().writeValueAsBytes(response.body());
        exchange.getResponseHeaders().set("Content-Type", "application/json; charset=utf-8");
        exchange.getResponseHeaders().set("Cache-Control", "no-store");
        exchange.sendResponseHeaders(response.status(), bytes.length);
        try (OutputStream out = exchange.getResponseBody()) {
            out.write(bytes);
        }
    }

    private record Response(int status, Object body) {
    }
}
