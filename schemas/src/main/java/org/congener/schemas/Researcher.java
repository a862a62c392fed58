package org.congener.schemas;

import java.util.List;

/**
 * A person who may order. Key on the compacted {@code researchers} topic: {@code researcherId}.
 *
 * @param authorisations restriction tags this researcher is cleared for
 * @param alertOptIn     whether arrival alerts may be sent to this researcher
 */
public record Researcher(String schema, String researcherId, String name, String groupId,
                         List<String> authorisations, boolean alertOptIn) {
}
