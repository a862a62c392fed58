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
 * Binary form of an {@link InteractionProfile}: a format byte, the entry count, then per entry the
 * compound id (modified UTF-8, short), strength (float), event count (int), last seen (epoch ms, long)
 * and a flags byte (bit 0: used). About 20 bytes per compound plus the id.
 */
public final class InteractionProfileSerde implements Serde<InteractionProfile> {

    private static final byte FORMAT = 1;

    @Override
    public Serializer<InteractionProfile> serializer() {
        return (topic, profile) -> profile == null ? null : write(profile);
    }

    @Override
    public Deserializer<InteractionProfile> deserializer() {
        return (topic, bytes) -> bytes == null ? null : read(bytes);
    }

    static byte[] write(InteractionProfile profile) {
        ByteArrayOutputStream buffer = new ByteArrayOutputStream(16 + profile.size() * 32);
        try (DataOutputStream out = new DataOutputStream(buffer)) {
            out.writeByte(FORMAT);
            out.writeInt(profile.size());
            for (InteractionProfile.Entry e : profile.entries()) {
                out.writeUTF(e.compoundId());
                out.writeFloat(e.strength());
                out.writeInt(e.events());
                out.writeLong(e.lastSeenEpochMs());
                out.writeByte(e.used() ? 1 : 0);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return buffer.toByteArray();
    }

    static InteractionProfile read(byte[] bytes) {
        try (DataInputStream in = new DataInputStream(new ByteArrayInputStream(bytes))) {
            byte format = in.readByte();
            if (format != FORMAT) {
                throw new IllegalStateException("unknown interaction profile format " + format);
            }
            int count = in.readInt();
            Map<String, InteractionProfile.Entry> entries = new LinkedHashMap<>(Math.max(4, count * 2));
            for (int i = 0; i < count; i++) {
                String id = in.readUTF();
                entries.put(id, new InteractionProfile.Entry(id, in.readFloat(), in.readInt(), in.readLong(),
                        (in.readByte() & 1) != 0));
            }
            return new InteractionProfile(entries);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
