package org.congener.streams.state;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.LinkedHashMap;
import java.util.Map;

import org.apache.kafka.common.serialization.Deserializer;
import org.apache.kafka.common.serialization.Serde;
import org.apache.kafka.common.serialization.Serializer;

/**
 * Binary form of {@link GroupPopularity}: a format byte, the entry count, then per compound its id
 * (modified UTF-8), decayed value (float) and reference time (epoch ms, long).
 */
public final class GroupPopularitySerde implements Serde<GroupPopularity> {

    private static final byte FORMAT = 1;

    @Override
    public Serializer<GroupPopularity> serializer() {
        return (topic, value) -> value == null ? null : write(value);
    }

    @Override
    public Deserializer<GroupPopularity> deserializer() {
        return (topic, bytes) -> bytes == null ? null : read(bytes);
    }

    static byte[] write(GroupPopularity popularity) {
        ByteArrayOutputStream buffer = new ByteArrayOutputStream(16 + popularity.size() * 24);
        try (DataOutputStream out = new DataOutputStream(buffer)) {
            out.writeByte(FORMAT);
            out.writeInt(popularity.size());
            for (Map.Entry<String, GroupPopularity.Score> e : popularity.scores().entrySet()) {
                out.writeUTF(e.getKey());
                out.writeFloat(e.getValue().value());
                out.writeLong(e.getValue().asOfEpochMs());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return buffer.toByteArray();
    }

    static GroupPopularity read(byte[] bytes) {
        try (DataInputStream in = new DataInputStream(new ByteArrayInputStream(bytes))) {
            byte format = in.readByte();
            if (format != FORMAT) {
                throw new IllegalStateException("unknown group popularity format " + format);
            }
            int count = in.readInt();
            Map<String, GroupPopularity.Score> scores = new LinkedHashMap<>(Math.max(4, count * 2));
            for (int i = 0; i < count; i++) {
                scores.put(in.readUTF(), new GroupPopularity.Score(in.readFloat(), in.readLong()));
            }
            return new GroupPopularity(scores);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
