package org.congener.trainer.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.congener.broker.SharedBroker;
import org.congener.schemas.FusionRule;
import org.congener.schemas.ItemFactors;
import org.congener.schemas.ModelManifest;
import org.congener.schemas.SchemaIds;
import org.congener.trainer.publish.InvalidModelException;
import org.congener.trainer.publish.ModelPublisher;
import org.congener.trainer.publish.ModelVersion;
import org.congener.trainer.publish.PublishHook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

@ExtendWith(SharedBroker.class)
class ModelPublisherTest {

    @Test
    void shouldRefuseFactorsWithNanOrInfinityWithTypedErrorAndWriteNothing() {
        TrainerFixture f = new TrainerFixture("nan-factors");
        for (float bad : new float[] {Float.NaN, Float.POSITIVE_INFINITY}) {
            List<ItemFactors> factors = List.of(
                    new ItemFactors(SchemaIds.ITEM_FACTORS, "v0001", "C00001", new float[] {0.5f, 0.1f}),
                    new ItemFactors(SchemaIds.ITEM_FACTORS, "v0001", "C00002", new float[] {bad, 0.2f}));
            ModelManifest manifest = new ModelManifest(SchemaIds.MODEL_MANIFEST, "v0001", "2026-01-01T00:00:00Z", 2,
                    0.1, 5.0, 2, 0, List.of(1.0, 0.0, 0.0, 1.0), FusionRule.CF_ONLY, Map.of(), Map.of(), "00");
            try (ModelPublisher publisher = new ModelPublisher(f.bootstrap, f.topics, PublishHook.NONE)) {
                InvalidModelException e = assertThrows(InvalidModelException.class,
                        () -> publisher.publish(new ModelVersion(manifest, factors, List.of())));
                assertTrue(e.getMessage().contains("C00002"), e.getMessage());
            }
        }
        assertEquals(0, f.published().versions().size());
        assertEquals(null, f.published().current());
    }
}
