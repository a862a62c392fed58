package org.congener.demo;

import java.util.List;

/**
 * A research group of the demo institute, as written to {@code groups.json}.
 *
 * @param interests ontology term ids of the group's favourite branches, strongest first
 */
public record DemoGroup(String groupId, String name, List<String> interests) {
}
