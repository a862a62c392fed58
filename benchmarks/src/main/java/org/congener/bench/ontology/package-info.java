/** Benchmarks of the ontology engine: WordNet load and IC, one pair's similarity, the neighbour cache build. */
package org.congener.bench.ontology;
