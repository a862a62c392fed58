package org.congener.trainer.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.congener.broker.SharedBroker;
import org.congener.schemas.ItemFactors;
import org.congener.schemas.ModelManifest;
import org.congener.trainer.publish.ModelPublisher;
import org.congener.trainer.publish.PublishHook;
import org.congener.trainer.publish.Rollback;
import org.congener.trainer.registry.PublishedModels;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;

@ExtendWith(SharedBroker.class)
class TrainerServiceTest {

    @TempDir
    Path dir;

    @Test
    void shouldPublishWholeVersionWithMatchingChecksumWhenNothingIsLive() {
        TrainerFixture f = new TrainerFixture("first-publish");
        f.produce(TrainerFixture.events(30, 25, 7));

        TrainingOutcome outcome = f.service(TrainerFixture.settings(8, 0.0).withReportDir(dir),
                TrainerFixture.ontology(), PublishHook.NONE).runOnce();

        assertEquals("v0001", outcome.version());
        PublishedModels published = f.published();
        assertEquals("v0001", published.liveVersion());
        assertTrue(published.complete("v0001"));
        ModelManifest m = published.current();
        assertEquals(8, m.rank());
        assertEquals(64, m.gram().size());
        assertTrue(m.neighbourCount() > 0);
        assertTrue(m.offlineMetrics().containsKey("ndcg@10"));
        for (String key : List.of("fusion.weight", "fusion.k", "fusion.epsilon", "als.confidence",
                "als.regularisation", "als.cgSteps", "weight.ORDER", "weight.WITHDRAWAL", "weight.USAGE_LOG",
                "weight.VIEW", "weight.quantityScale", "weight.halfLifeDays")) {
            assertTrue(m.fusionWeights().containsKey(key), key);
        }
        List<ItemFactors> factors = new ArrayList<>();
        new TopicSnapshotReader(f.bootstrap, Duration.ofSeconds(30), f.log::add)
                .read(f.topics.modelItemFactors(), n -> { }).records().forEach(r -> factors.add(r.value()));
        factors.sort(Comparator.comparing(ItemFactors::compoundId));
        assertEquals(m.itemCount(), factors.size());
        assertEquals(m.checksum(), ModelPublisher.checksum(factors));
        assertTrue(Files.isRegularFile(dir.resolve("v0001/report.html")));
        assertTrue(f.log.stream().anyMatch(l -> l.startsWith("gate publish")), f.log::toString);
    }

    @Test
    void shouldRefuseRankOneModelAndSayWhyWhenLiveIsBetter() throws Exception {
        TrainerFixture f = new TrainerFixture("gate-rank-one");
        f.produce(TrainerFixture.events(40, 25, 11));
        // without the ontology only plain ALS is servable, so rank alone decides
        assertEquals("v0001", f.service(TrainerFixture.settings(8, 0.0), null, PublishHook.NONE).runOnce().version());

        TrainingOutcome refused = f.service(TrainerFixture.settings(1, 0.0).withReportDir(dir), null,
                PublishHook.NONE).runOnce();

        assertNull(refused.version());
        GateDecision gate = refused.gate();
        assertFalse(gate.publish());
        assertEquals("v0001", gate.liveVersion());
        assertTrue(gate.candidateFigure() < gate.liveFigure(), gate::reason);
        assertTrue(gate.reason().startsWith("refused: candidate ndcg@10"), gate::reason);
        assertTrue(f.log.stream().anyMatch(l -> l.startsWith("gate refused")), f.log::toString);
        assertEquals("v0001", f.published().liveVersion());
        try (var reports = Files.list(dir)) {
            Path report = reports.findFirst().orElseThrow().resolve("report.json");
            String json = Files.readString(report);
            assertTrue(json.contains("\"gateDecision\" : \"refused\""), json);
            assertTrue(json.contains("\"gateLive\""), json);
        }
    }

    @Test
    void shouldLeaveLiveVersionUnchangedWhenPublishStopsHalfWayAndPublishCleanlyNextRun() {
        TrainerFixture f = new TrainerFixture("crash-publish");
        f.produce(TrainerFixture.events(30, 25, 13));
        f.service(TrainerFixture.settings(8, 0.05), TrainerFixture.ontology(), PublishHook.NONE).runOnce();
        ModelManifest before = f.published().current();

        PublishHook crash = sent -> {
            if (sent == 10) {
                throw new IllegalStateException("trainer stopped while publishing");
            }
        };
        assertThrows(IllegalStateException.class,
                () -> f.service(TrainerFixture.settings(8, 0.05), TrainerFixture.ontology(), crash).runOnce());

        PublishedModels after = f.published();
        assertEquals(before, after.current());
        assertEquals(List.of("v0001"), List.copyOf(after.versions().keySet()));
        assertEquals(0, after.factorCount("v0002"), "no record of the stopped publish is visible");

        TrainingOutcome next = f.service(TrainerFixture.settings(8, 0.05), TrainerFixture.ontology(),
                PublishHook.NONE).runOnce();
        assertEquals("v0002", next.version());
        PublishedModels cleaned = f.published();
        assertEquals("v0002", cleaned.liveVersion());
        assertTrue(cleaned.complete("v0002"));
    }

    @Test
    void shouldKeepLastVersionsAndRollBackToAnOlderOne() {
        TrainerFixture f = new TrainerFixture("retention-rollback");
        f.produce(TrainerFixture.events(25, 20, 17));
        TrainerSettings keepTwo = TrainerFixture.settings(4, 0.05).withKeepVersions(2);
        for (int i = 0; i < 3; i++) {
            f.service(keepTwo, TrainerFixture.ontology(), PublishHook.NONE).runOnce();
        }
        PublishedModels published = f.published();
        assertEquals(List.of("v0002", "v0003"), List.copyOf(published.versions().keySet()));
        assertEquals(0, published.factorCount("v0001"));
        assertEquals(0, published.neighbourCount("v0001"));
        assertEquals("v0003", published.liveVersion());

        try (ModelPublisher publisher = new ModelPublisher(f.bootstrap, f.topics, PublishHook.NONE)) {
            Rollback.to("v0002", published, publisher);
            assertThrows(IllegalArgumentException.class, () -> Rollback.to("v0001", f.published(), publisher));
        }
        PublishedModels rolled = f.published();
        assertEquals("v0002", rolled.liveVersion());
        assertEquals(published.versions().get("v0002"), rolled.current());
    }
}
