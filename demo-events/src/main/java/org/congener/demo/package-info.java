/** The demo scenario: an invented institute, its ontology, catalogue, researchers and a year of events. */
package org.congener.demo;
