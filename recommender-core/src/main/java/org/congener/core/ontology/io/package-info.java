/**
 * Readers that stream a file into an {@link org.congener.core.ontology.Ontology}: OBO 1.4 flat files
 * ({@link org.congener.core.ontology.io.OboReader}), tab-separated edge lists
 * ({@link org.congener.core.ontology.io.EdgeListReader}) and the WordNet noun database
 * ({@link org.congener.core.ontology.io.WordNetNounReader}).
 */
package org.congener.core.ontology.io;
