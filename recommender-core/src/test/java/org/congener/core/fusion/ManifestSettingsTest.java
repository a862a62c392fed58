package org.congener.core.fusion;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.HashMap;
import java.util.Map;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.ConfidenceForm;
import org.congener.core.factorisation.Regularisation;
import org.congener.core.interactions.InteractionWeights;
import org.congener.schemas.FusionRule;
import org.junit.jupiter.api.Test;

class ManifestSettingsTest {

    @Test
    void shouldReadBackWhatWasWrittenWhenAllSettingsDifferFromDefaults() {
        FusionSettings fusion = new FusionSettings(FusionRule.BLEND, 0.3, 45, 0.01);
        AlsConfig als = AlsConfig.defaults().withConfidence(ConfidenceForm.LOG)
                .withRegularisation(Regularisation.PER_INTERACTION).withCgSteps(5);
        InteractionWeights weights = InteractionWeights.defaults().withHalfLife(Duration.ofDays(30));

        ManifestSettings read = ManifestSettings.read(ManifestSettings.write(fusion, als, weights));

        assertEquals(fusion, read.fusion());
        assertEquals(ConfidenceForm.LOG, read.foldIn().confidence());
        assertEquals(Regularisation.PER_INTERACTION, read.foldIn().regularisation());
        assertEquals(5, read.foldIn().cgSteps());
        assertEquals(weights, read.weights());
    }

    @Test
    void shouldWriteTheContractKeysWhenPublishing() {
        Map<String, Double> map = ManifestSettings.write(FusionSettings.rankFusion(60), AlsConfig.defaults(),
                InteractionWeights.defaults());
        for (String key : new String[] {"fusion.weight", "fusion.k", "fusion.epsilon", "als.confidence",
                "als.regularisation", "als.cgSteps", "weight.ORDER", "weight.WITHDRAWAL", "weight.USAGE_LOG",
                "weight.VIEW", "weight.quantityScale", "weight.halfLifeDays"}) {
            assertTrue(map.containsKey(key), key);
        }
        assertEquals(0.0, map.get("weight.halfLifeDays"));
        assertEquals(60.0, map.get("fusion.k"));
        assertNull(ManifestSettings.read(map).weights().halfLife());
    }

    @Test
    void shouldNameTheKeyWhenOneIsMissing() {
        Map<String, Double> map = new HashMap<>(ManifestSettings.write(FusionSettings.product(),
                AlsConfig.defaults(), InteractionWeights.defaults()));
        map.remove("weight.VIEW");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ManifestSettings.read(map));
        assertTrue(e.getMessage().contains("weight.VIEW"), e.getMessage());
    }

    @Test
    void shouldRejectAConfidenceCodeOutOfRange() {
        Map<String, Double> map = new HashMap<>(ManifestSettings.write(FusionSettings.product(),
                AlsConfig.defaults(), InteractionWeights.defaults()));
        map.put("als.confidence", 2.0);
        assertThrows(IllegalArgumentException.class, () -> ManifestSettings.read(map));
    }
}
