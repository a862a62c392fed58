package org.congener.demo;

import java.util.List;

/**
 * One hand-written line of {@code source/compounds.txt} before it gets a catalogue id.
 *
 * @param form how it is stocked, which fixes its unit and pack sizes
 */
record SourceCompound(String name, PhysicalForm form, List<String> termIds, List<String> restrictionTags,
                      List<String> hazardCodes, boolean active) {
}
