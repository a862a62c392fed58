package org.congener.trainer.publish;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Properties;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.common.serialization.ByteArraySerializer;
import org.apache.kafka.common.serialization.StringSerializer;
import org.congener.schemas.ItemFactors;
import org.congener.schemas.ModelChecksum;
import org.congener.schemas.ItemNeighbours;
import org.congener.schemas.ModelManifest;
import org.congener.schemas.TopicName;
import org.congener.schemas.Topics;
import org.congener.schemas.validation.InvalidRecordException;
import org.congener.schemas.serde.ValidatingJsonSerde;

/**
 * Writes model versions to the broker, each change in ONE Kafka transaction, so a consumer reading
 * {@code read_committed} sees a version whole or not at all:
 * <ul>
 *   <li>publish: all factor records, all neighbour records, the manifest under {@code <version>}, then
 *       the same manifest under {@code current};</li>
 *   <li>rollback: an older version's manifest again under {@code current};</li>
 *   <li>retention: tombstones for every record of versions that are dropped.</li>
 * </ul>
 * The transactional id is fixed per topic prefix, so a restarted trainer fences a crashed one and the
 * broker aborts what the crashed one left open.
 */
public final class ModelPublisher implements AutoCloseable {
    private static final ValidatingJsonSerde<ItemFactors> FACTORS =
            ValidatingJsonSerde.validatingWrites(TopicName.MODEL_ITEM_FACTORS, ItemFactors.class);
    private static final ValidatingJsonSerde<ItemNeighbours> NEIGHBOURS =
            ValidatingJsonSerde.validatingWrites(TopicName.ITEM_NEIGHBOURS, ItemNeighbours.class);
    private static final ValidatingJsonSerde<ModelManifest> MANIFESTS =
            ValidatingJsonSerde.validatingWrites(TopicName.MODEL_MANIFESTS, ModelManifest.class);

    private final Topics topics;
    private final KafkaProducer<String, byte[]> producer;
    private final PublishHook hook;

    public ModelPublisher(String bootstrapServers, Topics topics, PublishHook hook) {
        this.topics = topics;
        this.hook = hook;
        Properties p = new Properties();
        p.put(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrapServers);
        p.put(ProducerConfig.TRANSACTIONAL_ID_CONFIG, transactionalId(topics));
        p.put(ProducerConfig.ENABLE_IDEMPOTENCE_CONFIG, "true");
        p.put(ProducerConfig.ACKS_CONFIG, "all");
        p.put(ProducerConfig.KEY_SERIALIZER_CLASS_CONFIG, StringSerializer.class.getName());
        p.put(ProducerConfig.VALUE_SERIALIZER_CLASS_CONFIG, ByteArraySerializer.class.getName());
        this.producer = new KafkaProducer<>(p);
        producer.initTransactions();
    }

    public static String transactionalId(Topics topics) {
        return "congener-trainer-" + (topics.prefix().isEmpty() ? "default" : topics.prefix());
    }

    /** The contract's checksum ({@link ModelChecksum}); refuses NaN or infinite factors first. */
    public static String checksum(List<ItemFactors> factors) {
        factors.forEach(ModelPublisher::serialiseFactors);
        return ModelChecksum.of(factors);
    }

    /** Publishes {@code version} and makes it live, or throws and leaves the live version as it was. */
    public void publish(ModelVersion version) {
        // everything is serialised (and validated) before the transaction starts: a NaN never opens one
        List<ProducerRecord<String, byte[]>> records = new ArrayList<>();
        for (ItemFactors f : sortedFactors(version.factors())) {
            records.add(new ProducerRecord<>(topics.modelItemFactors().name(),
                    VersionNames.recordKey(version.version(), f.compoundId()), serialiseFactors(f)));
        }
        for (ItemNeighbours n : version.neighbours()) {
            records.add(new ProducerRecord<>(topics.itemNeighbours().name(),
                    VersionNames.recordKey(version.version(), n.compoundId()), serialise(NEIGHBOURS, n)));
        }
        byte[] manifest = serialise(MANIFESTS, version.manifest());
        records.add(new ProducerRecord<>(topics.modelManifests().name(), version.version(), manifest));
        records.add(new ProducerRecord<>(topics.modelManifests().name(), VersionNames.CURRENT, manifest));
        inTransaction(records);
    }

    /** Writes {@code manifest} (an older version's, read from its own key) under {@code current}. */
    public void makeCurrent(ModelManifest manifest) {
        inTransaction(List.of(new ProducerRecord<>(topics.modelManifests().name(), VersionNames.CURRENT,
                serialise(MANIFESTS, manifest))));
    }

    /** Tombstones for the given factor and neighbour record keys and the manifests of {@code versions}. */
    public void delete(List<String> versions, List<String> factorKeys, List<String> neighbourKeys) {
        List<ProducerRecord<String, byte[]>> records = new ArrayList<>();
        factorKeys.forEach(k -> records.add(new ProducerRecord<>(topics.modelItemFactors().name(), k, null)));
        neighbourKeys.forEach(k -> records.add(new ProducerRecord<>(topics.itemNeighbours().name(), k, null)));
        versions.forEach(v -> records.add(new ProducerRecord<>(topics.modelManifests().name(), v, null)));
        if (!records.isEmpty()) {
            inTransaction(records);
        }
    }

    private void inTransaction(List<ProducerRecord<String, byte[]>> records) {
        producer.beginTransaction();
        try {
            int sent = 0;
            for (ProducerRecord<String, byte[]> r : records) {
                producer.send(r);
                hook.afterRecord(++sent);
            }
            producer.commitTransaction();
        } catch (RuntimeException e) {
            try {
                producer.abortTransaction();
            } catch (RuntimeException abortFailure) {
                e.addSuppressed(abortFailure);
            }
            throw e;
        }
    }

    private static List<ItemFactors> sortedFactors(List<ItemFactors> factors) {
        return factors.stream().sorted(Comparator.comparing(ItemFactors::compoundId)).toList();
    }

    private static byte[] serialiseFactors(ItemFactors f) {
        for (int i = 0; i < f.factors().length; i++) {
            if (!Float.isFinite(f.factors()[i])) {
                throw new InvalidModelException("factor " + i + " of " + f.compoundId() + " in " + f.version()
                        + " is " + f.factors()[i] + "; a model with NaN or infinite factors is never published");
            }
        }
        return serialise(FACTORS, f);
    }

    private static <T> byte[] serialise(ValidatingJsonSerde<T> serde, T value) {
        try {
            return serde.write(value);
        } catch (InvalidRecordException e) {
            throw new InvalidModelException("refused to publish: " + e.getMessage());
        }
    }

    @Override
    public void close() {
        producer.close();
    }

}
