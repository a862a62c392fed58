/**
 * Information content of ontology terms: intrinsic (from the graph alone) after Seco, Veale &amp; Hayes 2004
 * and after Sánchez, Batet &amp; Isern 2011, and corpus-based after Resnik 1995.
 */
package org.congener.core.ontology.ic;
