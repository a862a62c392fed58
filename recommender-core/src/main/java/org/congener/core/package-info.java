/** The recommender math, with no Kafka: ontology similarity, factorisation, fusion, metrics, splits. */
package org.congener.core;
