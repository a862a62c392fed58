/**
 * Information-content similarity of terms (Resnik 1995, Lin 1998, Jiang &amp; Conrath 1997) and of compounds
 * that map to several terms (maximum, best-match average).
 */
package org.congener.core.ontology.similarity;
