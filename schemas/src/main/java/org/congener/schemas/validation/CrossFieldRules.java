package org.congener.schemas.validation;

import com.fasterxml.jackson.databind.JsonNode;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.congener.schemas.TopicName;

/**
 * The rules that relate fields to each other, which JSON Schema cannot state. Each rule's name is
 * the {@link Violation#rule()} it reports and is listed in the schema's description and in
 * {@code docs/schemas.md}.
 */
final class CrossFieldRules {
    private CrossFieldRules() {
    }

    static List<CrossFieldRule> forTopic(TopicName topic) {
        return switch (topic) {
            case MODEL_MANIFESTS -> List.of(CrossFieldRules::numbersAreFinite, CrossFieldRules::gramIsRankSquared);
            case ITEM_NEIGHBOURS -> List.of(CrossFieldRules::numbersAreFinite,
                    CrossFieldRules::neighboursMostSimilarFirst, CrossFieldRules::neighboursAreOtherDistinctCompounds);
            case SUGGESTIONS -> List.of(CrossFieldRules::numbersAreFinite, CrossFieldRules::ranksRunFromOne);
            case DRIFT_METRICS -> List.of(CrossFieldRules::numbersAreFinite, CrossFieldRules::windowEndsAfterItStarts);
            default -> List.of(CrossFieldRules::numbersAreFinite);
        };
    }

    /**
     * finite: Jackson reads a literal beyond the double range (1e400) as infinity, which every
     * numeric rule of JSON Schema lets through. One cheap pass finds out whether there is any; only
     * then a second pass names the fields.
     */
    static void numbersAreFinite(JsonNode value, List<Violation> out) {
        if (allFinite(value)) {
            return;
        }
        reportNonFinite(value, "", out);
    }

    private static boolean allFinite(JsonNode node) {
        if (node.isFloatingPointNumber()) {
            return Double.isFinite(node.doubleValue());
        }
        if (node.isContainerNode()) {
            for (JsonNode child : node) {
                if (!allFinite(child)) {
                    return false;
                }
            }
        }
        return true;
    }

    private static void reportNonFinite(JsonNode node, String pointer, List<Violation> out) {
        if (node.isFloatingPointNumber() && !Double.isFinite(node.doubleValue())) {
            out.add(new Violation(pointer, node.toString(), "finite", "must be a finite number"));
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                reportNonFinite(node.get(i), pointer + "/" + i, out);
            }
        } else if (node.isObject()) {
            for (var field : node.properties()) {
                reportNonFinite(field.getValue(), ErrorTranslation.child(pointer, field.getKey()), out);
            }
        }
    }

    /** gramSize: YᵀY is rank × rank, stored row-major. */
    static void gramIsRankSquared(JsonNode manifest, List<Violation> out) {
        long rank = manifest.get("rank").asLong();
        int entries = manifest.get("gram").size();
        if (entries != rank * rank) {
            out.add(new Violation("/gram", entries + " entries", "gramSize",
                    "must hold rank² = " + rank * rank + " entries"));
        }
    }

    /** sortedDescending: a neighbour list is most similar first; ties keep any order. */
    static void neighboursMostSimilarFirst(JsonNode value, List<Violation> out) {
        JsonNode neighbours = value.get("neighbours");
        for (int i = 1; i < neighbours.size(); i++) {
            double previous = neighbours.get(i - 1).get("similarity").asDouble();
            JsonNode similarity = neighbours.get(i).get("similarity");
            if (similarity.asDouble() > previous) {
                out.add(new Violation("/neighbours/" + i + "/similarity", similarity.toString(), "sortedDescending",
                        "must be <= the previous neighbour's " + previous));
                return;
            }
        }
    }

    /** notSelf and uniqueNeighbours: each neighbour is another compound, listed once. */
    static void neighboursAreOtherDistinctCompounds(JsonNode value, List<Violation> out) {
        String self = value.get("compoundId").asText();
        JsonNode neighbours = value.get("neighbours");
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < neighbours.size(); i++) {
            JsonNode id = neighbours.get(i).get("compoundId");
            String pointer = "/neighbours/" + i + "/compoundId";
            if (id.asText().equals(self)) {
                out.add(new Violation(pointer, id.toString(), "notSelf", "must not be the compound itself"));
            } else if (!seen.add(id.asText())) {
                out.add(new Violation(pointer, id.toString(), "uniqueNeighbours", "must not repeat a neighbour"));
            }
        }
    }

    /** consecutiveRanks: the i-th item (from 0) has rank i + 1. */
    static void ranksRunFromOne(JsonNode value, List<Violation> out) {
        JsonNode items = value.get("items");
        for (int i = 0; i < items.size(); i++) {
            JsonNode rank = items.get(i).get("rank");
            if (rank.asInt() != i + 1) {
                out.add(new Violation("/items/" + i + "/rank", rank.toString(), "consecutiveRanks",
                        "must be " + (i + 1) + " at this position"));
                return;
            }
        }
    }

    /** windowOrder: a window has positive length. */
    static void windowEndsAfterItStarts(JsonNode value, List<Violation> out) {
        JsonNode end = value.get("windowEnd");
        try {
            Instant startAt = Instant.parse(value.get("windowStart").asText());
            Instant endAt = Instant.parse(end.asText());
            if (!endAt.isAfter(startAt)) {
                out.add(new Violation("/windowEnd", end.toString(), "windowOrder", "must be after windowStart"));
            }
        } catch (DateTimeParseException e) {
            // cannot happen after the schema's date-time check; reported rather than thrown all the same
            out.add(new Violation("/windowEnd", end.toString(), "format", "must be a valid date-time"));
        }
    }
}
