package org.congener.schemas;

import java.util.List;

/**
 * A compound the institute can order. Key on the compacted {@code catalog} topic: {@code compoundId}.
 *
 * @param termIds         ontology terms the compound is an instance of (at least one)
 * @param restrictionTags tags such as {@code toxic-gas} or {@code controlled-precursor}; a researcher
 *                        must hold an authorisation for every tag to be offered the compound
 * @param hazardCodes     GHS hazard statement codes (H200–H499), e.g. {@code H225}
 * @param active          false once the compound is withdrawn from the catalogue
 */
public record CatalogEntry(String schema, String compoundId, String name, List<String> termIds,
                           List<String> restrictionTags, List<String> hazardCodes, boolean active) {
}
