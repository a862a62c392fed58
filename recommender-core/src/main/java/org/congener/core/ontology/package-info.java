/**
 * Ontology graphs with dense int term ids: {@link org.congener.core.ontology.Ontology} (immutable) and the
 * {@link org.congener.core.ontology.OntologyBuilder} that readers feed. Readers live in {@code io},
 * information content in {@code ic}, similarity measures in {@code similarity}, the top-K neighbour cache in
 * {@code neighbours}. Nothing here depends on Kafka or on the factorisation code.
 */
package org.congener.core.ontology;
