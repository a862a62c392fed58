package org.congener.streams.api;

import java.util.Optional;

import org.congener.schemas.Suggestions;
import org.congener.streams.model.Alternatives;

/** What the query API reads; backed by the streams app's stores, or by a fake in tests. */
public interface SuggestionQueries {

    /**
     * The latest list of the researcher, empty when none was published yet.
     *
     * @param localOnly answer from this instance's stores only (the request was forwarded here)
     */
    Optional<Suggestions> latest(String researcherId, boolean localOnly);

    /** Whether the researcher is in the researchers table. */
    boolean isKnownResearcher(String researcherId);

    /** Whether the compound is in the catalogue. */
    default boolean isKnownCompound(String compoundId) {
        return false;
    }

    /**
     * Alternatives to a catalogued compound under the live version, filtered to active compounds
     * (and to those in stock when asked).
     *
     * @throws NotReadyException when no model version is live yet
     */
    default Alternatives.Lists alternatives(String compoundId, int n, boolean inStockOnly) {
        throw new NotReadyException("no model version is live yet; alternatives need one");
    }

    /** Whether the compound's latest inventory event has quantity on hand above zero. */
    default boolean isInStock(String compoundId) {
        return false;
    }

    /** The app's state for {@code /health}. */
    Health health();

    /** Most suggestions one list holds (the top-N setting). */
    int maxItems();

    /**
     * @param status      Kafka Streams state, e.g. RUNNING
     * @param serving     whether queries can be answered now
     * @param deadLetters usage events sent to the dead letters since start
     */
    record Health(String status, boolean serving, long deadLetters) {
    }

    /** The stores are not queryable now (starting, rebalancing); the API answers 503. */
    final class NotReadyException extends RuntimeException {
        public NotReadyException(String message) {
            super(message);
        }
    }
}
