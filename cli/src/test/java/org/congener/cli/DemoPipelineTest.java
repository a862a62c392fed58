package org.congener.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.function.Function;
import java.util.stream.Collectors;

import org.congener.broker.SharedBroker;
import org.congener.cli.demo.ReplayScenario;
import org.congener.cli.demo.StandardScenario;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.DeadLetter;
import org.congener.schemas.Researcher;
import org.congener.schemas.Suggestion;
import org.congener.schemas.SuggestionSource;
import org.congener.schemas.Suggestions;
import org.congener.schemas.Topics;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.congener.streams.SafetyCaution;
import org.congener.trainer.service.TopicSnapshotReader;
import org.congener.trainer.service.TrainingOutcome;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo scenario through the whole pipeline, as {@code congener demo --replay-only} runs it (streams
 * app, history, a first version trained on it, the rest replayed while the trainer runs again), then
 * everything on the {@code suggestions} topic read back with {@code read_committed} and {@code assign()}
 * and checked against the scenario and against the model versions on the broker.
 */
@ExtendWith(SharedBroker.class)
class DemoPipelineTest {

    /**
     * The first half of the demo year, as {@code congener demo --limit} replays it: long enough for the
     * background trainer to publish a second version while lists are being scored, short enough for a
     * 2-core CI machine (the whole year takes about three minutes there, mostly the stream and the
     * trainer sharing the cores).
     */
    private static final int USAGE_EVENTS = 10_000;
    /** Sampled for the batch comparison: the heaviest and lightest users and a seeded draw of the others. */
    private static final int HEAVY = 5;
    private static final int LIGHT = 5;
    private static final int OTHERS = 20;
    private static final long SAMPLE_SEED = 20_260_101L;
    /**
     * Both sides fold in the same float strengths with the same core code, so scores should agree to
     * the last bits; this leaves room for summing in another order (about 1e-16) or for strengths kept
     * in double (about 1e-7), and none for another fold-in, fusion or set of interactions.
     */
    private static final double RELATIVE_TOLERANCE = 1e-5;
    private static final Duration READ_TIMEOUT = Duration.ofMinutes(2);

    @TempDir
    static Path dir;

    private static DemoPipelineRun.Result run;
    private static List<TopicSnapshotReader.KeyedValue<Suggestions>> lists;
    private static List<DeadLetter> deadLetters;
    private static Map<String, PublishedVersion> versions;
    private static Map<String, Researcher> researchers;
    private static Map<String, CatalogEntry> catalog;
    private static Map<String, UsageEvent> eventsById;

    @BeforeAll
    static void replayTheDemoThroughThePipeline() throws Exception {
        String prefix = SharedBroker.uniquePrefix("demo-pipeline");
        String bootstrap = SharedBroker.bootstrapServers();
        ReplayScenario scenario = StandardScenario.load().limitedTo(USAGE_EVENTS);
        run = DemoPipelineRun.run(bootstrap, prefix, SharedBroker.uniqueApplicationId("demo-pipeline"), scenario,
                dir, System.out);
        assertEquals(run.sent().usageTopicRecords(), run.counts().total(),
                "every usage-topic record gave one list or one dead letter within the wait");
        assertFalse(run.config().inStockOnly(), "the demo offers compounds out of stock too; the batch side does");

        Topics topics = new Topics(prefix);
        TopicSnapshotReader reader = new TopicSnapshotReader(bootstrap, READ_TIMEOUT, line -> { });
        TopicSnapshotReader.Snapshot<Suggestions> suggestions = reader.read(topics.suggestions(), n -> { });
        assertEquals(0, suggestions.skipped(), "every list on the topic reads against its schema");
        lists = suggestions.records();
        TopicSnapshotReader.Snapshot<DeadLetter> letters = reader.read(topics.deadLetters(), n -> { });
        assertEquals(0, letters.skipped(), "every dead letter reads against its schema");
        deadLetters = letters.records().stream().map(TopicSnapshotReader.KeyedValue::value).toList();
        versions = PublishedVersion.readAll(bootstrap, topics, READ_TIMEOUT);

        researchers = scenario.researchers().stream().collect(Collectors.toMap(Researcher::researcherId, r -> r));
        catalog = scenario.catalog().stream().collect(Collectors.toMap(CatalogEntry::compoundId, c -> c));
        eventsById = scenario.usageEvents().stream().collect(Collectors.toMap(UsageEvent::eventId, e -> e));
        System.out.printf("demo pipeline: %,d usage events, %,d broken lines, %,d lists, %,d dead letters,"
                        + " versions %s, lists by version %s, %.1f s%n", run.sent().usageEvents(), run.sent().badLines(),
                lists.size(), deadLetters.size(), publishedVersions(), listsByVersion(), run.took().toMillis() / 1000.0);
    }

    @Test
    void shouldPublishTheBatchTopNOfEachSampledResearcherWhenTheDemoIsReplayed() {
        Map<String, List<UsageEvent>> accepted = acceptedEventsByResearcher();
        // per researcher: the last list, and the last list under each version that scored one
        Map<String, Suggestions> lastList = new HashMap<>();
        Map<String, Map<String, Suggestions>> lastByVersion = new HashMap<>();
        for (TopicSnapshotReader.KeyedValue<Suggestions> record : lists) {
            Suggestions s = record.value();
            lastList.put(s.researcherId(), s);
            if (s.modelVersion() != null) {
                lastByVersion.computeIfAbsent(s.researcherId(), r -> new TreeMap<>()).put(s.modelVersion(), s);
            }
        }
        for (Map.Entry<String, Suggestions> last : lastList.entrySet()) {
            List<UsageEvent> own = accepted.get(last.getKey());
            assertEquals(own.get(own.size() - 1).eventId(), last.getValue().causedByEventId(),
                    "the last list of " + last.getKey() + " comes from their last event");
        }

        List<String> sample = sample(accepted, lastList);
        List<String> mismatches = new ArrayList<>();
        int compared = 0;
        double largestScoreGap = 0;
        Set<String> versionsCompared = new TreeSet<>();
        for (String researcherId : sample) {
            for (Suggestions streamed : lastByVersion.get(researcherId).values()) {
                PublishedVersion version = versions.get(streamed.modelVersion());
                assertTrue(version != null && version.complete(),
                        "version " + streamed.modelVersion() + " is complete on the broker");
                List<UsageEvent> upToCause = upTo(accepted.get(researcherId), streamed.causedByEventId());
                Set<String> used = usedCompounds(upToCause);
                Researcher researcher = researchers.get(researcherId);
                PublishedVersion.Batch batch = version.topN(upToCause,
                        id -> mayBeOffered(researcher, catalog.get(id), used), run.config().topN());
                String where = researcherId + " after " + streamed.causedByEventId() + " (" + upToCause.size()
                        + " events) under " + streamed.modelVersion();
                List<String> streamedIds = streamed.items().stream().map(Suggestion::compoundId).toList();
                if (!batch.ids().equals(streamedIds)) {
                    mismatches.add(where + ": stream " + streamedIds + ", batch " + batch.ids());
                }
                double cfScale = streamed.items().stream().mapToDouble(i -> Math.abs(i.cfScore())).max().orElse(0);
                double semanticScale = streamed.items().stream().mapToDouble(i -> Math.abs(i.semanticScore())).max().orElse(0);
                double fusedScale = streamed.items().stream().mapToDouble(i -> Math.abs(i.fusedScore())).max().orElse(0);
                for (Suggestion item : streamed.items()) {
                    PublishedVersion.Ranked b = batch.all().get(item.compoundId());
                    if (b == null) {
                        mismatches.add(where + ": " + item.compoundId() + " is not in the version");
                        continue;
                    }
                    double gap = Math.max(relativeGap(item.fusedScore(), b.fused(), fusedScale),
                            Math.max(relativeGap(item.cfScore(), b.cf(), cfScale),
                                    relativeGap(item.semanticScore(), b.semantic(), semanticScale)));
                    largestScoreGap = Math.max(largestScoreGap, gap);
                    if (gap > RELATIVE_TOLERANCE) {
                        mismatches.add(where + ": scores of " + item.compoundId() + " stream (" + item.cfScore() + ", "
                                + item.semanticScore() + ", " + item.fusedScore() + "), batch (" + b.cf() + ", "
                                + b.semantic() + ", " + b.fused() + ")");
                    }
                }
                versionsCompared.add(streamed.modelVersion());
                compared++;
            }
        }
        System.out.printf("stream against batch: %d lists of %d researchers under %s; largest relative score gap %.3g%n",
                compared, sample.size(), versionsCompared, largestScoreGap);
        assertTrue(mismatches.isEmpty(), mismatches.size() + " differences:\n" + String.join("\n", mismatches));
    }

    @Test
    void shouldNeverOfferAnUnauthorisedInactiveOrAlreadyUsedCompoundWhenTheDemoIsReplayed() {
        Map<String, List<UsageEvent>> accepted = acceptedEventsByResearcher();
        // position of each event in its researcher's sequence, and where each compound was first used
        Map<String, Integer> positionOf = new HashMap<>();
        Map<String, Map<String, Integer>> firstUse = new HashMap<>();
        accepted.forEach((researcherId, events) -> {
            Map<String, Integer> first = new HashMap<>();
            for (int p = 0; p < events.size(); p++) {
                positionOf.put(events.get(p).eventId(), p);
                if (events.get(p).kind() != UsageKind.VIEW) {
                    first.putIfAbsent(events.get(p).compoundId(), p);
                }
            }
            firstUse.put(researcherId, first);
        });

        List<String> violations = new ArrayList<>();
        Set<String> causes = new HashSet<>();
        int checked = 0;
        int offered = 0;
        for (TopicSnapshotReader.KeyedValue<Suggestions> record : lists) {
            Suggestions s = record.value();
            checked++;
            causes.add(s.causedByEventId());
            UsageEvent cause = eventsById.get(s.causedByEventId());
            Researcher researcher = researchers.get(s.researcherId());
            if (cause == null || researcher == null || !cause.researcherId().equals(s.researcherId())
                    || !s.researcherId().equals(record.key())) {
                violations.add("list at " + record.partition() + "@" + record.offset() + " of " + record.key()
                        + " names researcher " + s.researcherId() + " and cause " + s.causedByEventId());
                continue;
            }
            int at = positionOf.get(cause.eventId());
            for (Suggestion item : s.items()) {
                offered++;
                CatalogEntry entry = catalog.get(item.compoundId());
                Integer usedAt = firstUse.get(s.researcherId()).get(item.compoundId());
                String where = s.researcherId() + " after " + s.causedByEventId() + " was offered " + item.compoundId();
                if (entry == null) {
                    violations.add(where + ", which is not in the catalogue");
                } else if (!entry.active()) {
                    violations.add(where + ", which is inactive");
                } else if (!researcher.authorisations().containsAll(entry.restrictionTags())) {
                    violations.add(where + " with tags " + entry.restrictionTags() + " beyond " + researcher.authorisations());
                } else if (usedAt != null && usedAt <= at) {
                    violations.add(where + ", used at their event " + accepted.get(s.researcherId()).get(usedAt).eventId());
                }
            }
        }
        System.out.printf("authorisations: %,d lists with %,d offers checked, %d violations%n", checked, offered,
                violations.size());
        assertTrue(violations.isEmpty(), violations.size() + " violations, first ones:\n"
                + String.join("\n", violations.subList(0, Math.min(20, violations.size()))));
        int acceptedEvents = run.sent().usageTopicRecords() - deadLetters.size();
        assertEquals(acceptedEvents, checked, "one list per accepted usage event");
        assertEquals(checked, causes.size(), "no accepted event produced two lists");
        assertTrue(offered > checked, "the lists offer compounds at all");
    }

    @Test
    void shouldCarryTheCautionOnEveryListAndNameAPublishedVersionOnceOneIsLiveWhenTheDemoIsReplayed() {
        Set<String> published = publishedVersions();
        assertTrue(published.size() >= 2, "a second version went live during the replay: " + run.outcomes());
        TrainingOutcome first = run.outcomes().get(0);
        assertTrue(first.published(), "the run before the replay published a version: " + first);
        assertEquals(run.scenario().historySize(), first.events(), "the first version was trained on the history alone");

        Map<String, String> firstVersionedCause = new HashMap<>();
        List<String> problems = new ArrayList<>();
        int versioned = 0;
        for (TopicSnapshotReader.KeyedValue<Suggestions> record : lists) {
            Suggestions s = record.value();
            if (!SafetyCaution.TEXT.equals(s.caution())) {
                problems.add(s.causedByEventId() + ": caution '" + s.caution() + "'");
            }
            if (s.modelVersion() != null) {
                versioned++;
                firstVersionedCause.putIfAbsent(s.researcherId(), s.causedByEventId());
                if (!published.contains(s.modelVersion()) || s.source() != SuggestionSource.HYBRID) {
                    problems.add(s.causedByEventId() + ": version " + s.modelVersion() + " from " + s.source()
                            + ", published " + published);
                }
            } else if (s.source() == SuggestionSource.HYBRID) {
                problems.add(s.causedByEventId() + ": a model-scored list that names no version");
            } else if (firstVersionedCause.containsKey(s.researcherId())) {
                problems.add(s.causedByEventId() + ": no version named after " + s.researcherId()
                        + " was scored under one at " + firstVersionedCause.get(s.researcherId()));
            }
        }
        assertTrue(problems.isEmpty(), problems.size() + " problems, first ones:\n"
                + String.join("\n", problems.subList(0, Math.min(20, problems.size()))));
        assertNotEquals(0, versioned, "lists are scored under a model version");
    }

    /** The heaviest and lightest users by accepted events, and a seeded draw of the others. */
    private static List<String> sample(Map<String, List<UsageEvent>> accepted, Map<String, Suggestions> lastList) {
        List<String> pool = new ArrayList<>(lastList.keySet().stream()
                .filter(r -> lastList.get(r).modelVersion() != null)
                .toList());
        pool.sort(Comparator.comparingInt((String r) -> accepted.get(r).size()).reversed()
                .thenComparing(Function.identity()));
        assertTrue(pool.size() >= HEAVY + LIGHT + OTHERS, "enough researchers whose last list names a version: " + pool.size());
        List<String> sample = new ArrayList<>(pool.subList(0, HEAVY));
        sample.addAll(pool.subList(pool.size() - LIGHT, pool.size()));
        List<String> middle = new ArrayList<>(pool.subList(HEAVY, pool.size() - LIGHT));
        Collections.shuffle(middle, new Random(SAMPLE_SEED));
        sample.addAll(middle.subList(0, OTHERS));
        System.out.printf("sample: %d researchers with %d to %d accepted events%n", sample.size(),
                accepted.get(pool.get(pool.size() - 1)).size(), accepted.get(pool.get(0)).size());
        return sample;
    }

    /** Each researcher's events that produced a list, in the order the replay sent them. */
    private static Map<String, List<UsageEvent>> acceptedEventsByResearcher() {
        Set<String> causes = lists.stream().map(r -> r.value().causedByEventId()).collect(Collectors.toSet());
        Map<String, List<UsageEvent>> out = new LinkedHashMap<>();
        for (UsageEvent e : run.scenario().usageEvents()) {
            if (causes.contains(e.eventId())) {
                out.computeIfAbsent(e.researcherId(), r -> new ArrayList<>()).add(e);
            }
        }
        return out;
    }

    private static List<UsageEvent> upTo(List<UsageEvent> events, String eventId) {
        for (int i = 0; i < events.size(); i++) {
            if (events.get(i).eventId().equals(eventId)) {
                return events.subList(0, i + 1);
            }
        }
        throw new AssertionError("event " + eventId + " is not among the researcher's accepted events");
    }

    /** Ordered, withdrawn or logged: everything but a view. */
    private static Set<String> usedCompounds(List<UsageEvent> events) {
        return events.stream().filter(e -> e.kind() != UsageKind.VIEW).map(UsageEvent::compoundId)
                .collect(Collectors.toSet());
    }

    private static boolean mayBeOffered(Researcher researcher, CatalogEntry entry, Set<String> used) {
        return entry != null && entry.active() && researcher.authorisations().containsAll(entry.restrictionTags())
                && !used.contains(entry.compoundId());
    }

    /** |a − b| relative to the larger of the two, or to the list's scale when both are near zero. */
    private static double relativeGap(double a, double b, double listScale) {
        double scale = Math.max(listScale, Math.max(Math.abs(a), Math.abs(b)));
        return scale == 0 ? 0 : Math.abs(a - b) / scale;
    }

    private static Set<String> publishedVersions() {
        return run.outcomes().stream().filter(TrainingOutcome::published).map(TrainingOutcome::version)
                .collect(Collectors.toCollection(TreeSet::new));
    }

    private static Map<String, Long> listsByVersion() {
        return lists.stream().collect(Collectors.groupingBy(r -> String.valueOf(r.value().modelVersion()),
                TreeMap::new, Collectors.counting()));
    }
}
