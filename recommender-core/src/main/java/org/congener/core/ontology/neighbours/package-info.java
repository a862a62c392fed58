/** The top-K most similar catalogue compounds of every catalogue compound, computed exactly once per model version. */
package org.congener.core.ontology.neighbours;
