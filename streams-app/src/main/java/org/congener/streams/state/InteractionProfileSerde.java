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
 * and a flags byte (bit 0: used) — about 20 bytes per compound plus the id; then (format 2) the
 * vector's rank (short, 0 for none) and, when there is one, its version (modified UTF-8) and the
 * factors as floats. Format 1, without the vector, is still read, so stores written before it load.
 */
public final class InteractionProfileSerde implements Serde<InteractionProfile> {

    private static final byte FORMAT_WITHOUT_VECTOR = 1;
    private static final byte FORMAT = 2;

    @Override
    public Serializer<InteractionProfile> serializer() {
        return (topic, profile) -> profile == null ? null : write(profile);
    }

    @Override
    public Deserializer<InteractionProfile> deserializer() {
        return (topic, bytes) -> bytes == null ? null : read(bytes);
    }

    static byte[] write(InteractionProfile profile) {
        ByteArrayOutputStream buffer = new ByteArrayOutputStream(16 + profile.size() * 32 + 4 * 64 + 16);
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
            String version = profile.vectorVersion();
            float[] vector = profile.vectorUnder(version);
            if (vector == null) {
                out.writeShort(0);
            } else {
                out.writeShort(vector.length);
                out.writeUTF(version);
                for (float v : vector) {
                    out.writeFloat(v);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return buffer.toByteArray();
    }

    static InteractionProfile read(byte[] bytes) {
        try (DataInputStream in = new DataInputStream(new ByteArrayInputStream(bytes))) {
            byte format = in.readByte();
            if (format != FORMAT && format != FORMAT_WITHOUT_VECTOR) {
                throw new IllegalStateException("unknown interaction profile format " + format);
            }
            int count = in.readInt();
            Map<String, InteractionProfile.Entry> entries = new LinkedHashMap<>(Math.max(4, count * 2));
            for (int i = 0; i < count; i++) {
                String id = in.readUTF();
                entries.put(id, new InteractionProfile.Entry(id, in.readFloat(), in.readInt(), in.readLong(),
                        (in.readByte() & 1) != 0));
            }
            if (format == FORMAT_WITHOUT_VECTOR) {
                return new InteractionProfile(entries, null, null);
            }
            int rank = in.readUnsignedShort();
            if (rank == 0) {
                return new InteractionProfile(entries, null, null);
            }
            String version = in.readUTF();
            float[] vector = new float[rank];
            for (int f = 0; f < rank; f++) {
                vector[f] = in.readFloat();
            }
            return new InteractionProfile(entries, version, vector);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
