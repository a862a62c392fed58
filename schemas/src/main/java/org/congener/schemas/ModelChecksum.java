package org.congener.schemas;

import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Collection;
import java.util.Comparator;
import java.util.HexFormat;
import java.util.List;

import org.congener.schemas.serde.ValidatingJsonSerde;

/**
 * The checksum a model manifest carries: hex SHA-256 over the JSON values of the version's factor
 * records, in compound-id order. The trainer writes it; every streams instance recomputes it before a
 * version goes live, so a version whose factor records were altered or mixed up never scores anyone.
 * Both sides serialise the records with the topic's own serde, so equal records give equal bytes.
 */
public final class ModelChecksum {

    private static final ValidatingJsonSerde<ItemFactors> FACTORS =
            ValidatingJsonSerde.of(TopicName.MODEL_ITEM_FACTORS, ItemFactors.class);

    private ModelChecksum() {
    }

    public static String of(Collection<ItemFactors> factors) {
        List<ItemFactors> sorted = factors.stream().sorted(Comparator.comparing(ItemFactors::compoundId)).toList();
        MessageDigest sha;
        try {
            sha = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
        for (ItemFactors f : sorted) {
            sha.update(FACTORS.write(f));
        }
        return HexFormat.of().formatHex(sha.digest());
    }
}
