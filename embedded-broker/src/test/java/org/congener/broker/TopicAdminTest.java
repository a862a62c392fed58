package org.congener.broker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Set;

import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.AdminClientConfig;
import org.apache.kafka.clients.admin.Config;
import org.apache.kafka.clients.admin.TopicDescription;
import org.apache.kafka.common.config.ConfigResource;
import org.apache.kafka.common.config.TopicConfig;
import org.congener.schemas.TopicName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

@ExtendWith(SharedBroker.class)
class TopicAdminTest {

    @Test
    void shouldCreateEveryTopicWithPrefixAndCompactTheCompactedOnes() throws Exception {
        String prefix = SharedBroker.uniquePrefix("topics");
        TopicAdmin.Outcome outcome = TopicAdmin.createAll(SharedBroker.bootstrapServers(), prefix, 3, (short) 1);
        assertEquals(TopicName.values().length, outcome.created().size());
        assertEquals(List.of(), outcome.existing());

        try (Admin admin = Admin.create(Map.of(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG,
                SharedBroker.bootstrapServers()))) {
            Set<String> names = TopicAdmin.allNames(prefix);
            Map<String, TopicDescription> descriptions = admin.describeTopics(names).allTopicNames().get();
            for (TopicName topic : TopicName.values()) {
                String name = topic.withPrefix(prefix);
                assertEquals(3, descriptions.get(name).partitions().size(), name);
                ConfigResource resource = new ConfigResource(ConfigResource.Type.TOPIC, name);
                Config config = admin.describeConfigs(List.of(resource)).all().get().get(resource);
                String policy = config.get(TopicConfig.CLEANUP_POLICY_CONFIG).value();
                assertEquals(topic.compacted() ? "compact" : "delete", policy, name);
            }
        }
    }

    @Test
    void shouldReportExistingTopicsWhenRunTwice() {
        String prefix = SharedBroker.uniquePrefix("topics-again");
        TopicAdmin.createAll(SharedBroker.bootstrapServers(), prefix, 1, (short) 1);
        TopicAdmin.Outcome again = TopicAdmin.createAll(SharedBroker.bootstrapServers(), prefix, 1, (short) 1);
        assertEquals(List.of(), again.created());
        assertEquals(TopicName.values().length, again.existing().size());
        assertTrue(again.existing().contains(TopicName.CATALOG.withPrefix(prefix)));
    }
}
