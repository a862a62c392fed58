package org.congener.streams.state;

import java.nio.ByteBuffer;

import org.apache.kafka.common.serialization.Deserializer;
import org.apache.kafka.common.serialization.Serde;
import org.apache.kafka.common.serialization.Serializer;

/**
 * Binary form of an {@link InteractionProfile}: a format byte, the entry count, then per entry the
 * compound id (modified UTF-8, short), strength (float), event count (int), last seen (epoch ms, long)
 * and a flags byte (bit 0: used) — about 20 bytes per compound plus the id; then (format 2) the
 * vector's rank (short, 0 for none) and, when there is one, its version (modified UTF-8) and the
 * factors as floats. Format 1, without the vector, is still read, so stores written before it load.
 * The layout is that of {@link java.io.DataOutputStream}; it is read and written on a byte buffer
 * (a profile is read and written at every event, and the stream classes lock per byte).
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
        String version = profile.vectorVersion();
        float[] vector = profile.vectorUnder(version);
        int size = 1 + 4 + 2;
        int entries = profile.size();
        for (int p = 0; p < entries; p++) {
            size += profile.idBytes(p) + 4 + 4 + 8 + 1;
        }
        if (vector != null) {
            size += ModifiedUtf8.length(version) + 4 * vector.length;
        }
        ByteBuffer out = ByteBuffer.allocate(size);
        out.put(FORMAT);
        out.putInt(entries);
        for (int p = 0; p < entries; p++) {
            profile.putId(out, p);
            out.putFloat(profile.strength(p));
            out.putInt(profile.events(p));
            out.putLong(profile.lastSeenEpochMs(p));
            out.put((byte) (profile.used(p) ? 1 : 0));
        }
        if (vector == null) {
            out.putShort((short) 0);
        } else {
            out.putShort((short) vector.length);
            ModifiedUtf8.put(out, version);
            for (float v : vector) {
                out.putFloat(v);
            }
        }
        return out.array();
    }

    static InteractionProfile read(byte[] bytes) {
        try {
            ByteBuffer in = ByteBuffer.wrap(bytes);
            byte format = in.get();
            if (format != FORMAT && format != FORMAT_WITHOUT_VECTOR) {
                throw new IllegalStateException("unknown interaction profile format " + format);
            }
            int count = in.getInt();
            // each entry takes at least 19 bytes, so a count beyond what is left cannot be read (and is not
            // allocated for)
            if (count < 0 || count > in.remaining() / 19) {
                throw new java.nio.BufferUnderflowException();
            }
            InteractionProfile profile = new InteractionProfile(count);
            for (int i = 0; i < count; i++) {
                int length = in.getShort() & 0xFFFF;
                int at = in.position();
                if (ModifiedUtf8.isPlainAscii(bytes, at, length)) {
                    // the id stays a range of these bytes (see InteractionProfile)
                    in.position(at + length);
                    profile.appendStored(bytes, at, length, in.getFloat(), in.getInt(), in.getLong(),
                            (in.get() & 1) != 0);
                } else {
                    in.position(at - 2);
                    profile.append(ModifiedUtf8.get(in), in.getFloat(), in.getInt(), in.getLong(),
                            (in.get() & 1) != 0);
                }
            }
            if (format == FORMAT_WITHOUT_VECTOR) {
                return profile;
            }
            int rank = in.getShort() & 0xFFFF;
            if (rank == 0) {
                return profile;
            }
            String version = ModifiedUtf8.get(in);
            float[] vector = new float[rank];
            for (int f = 0; f < rank; f++) {
                vector[f] = in.getFloat();
            }
            profile.restoreVector(version, vector);
            return profile;
        } catch (java.nio.BufferUnderflowException e) {
            throw new IllegalStateException("interaction profile of " + bytes.length + " bytes is cut short", e);
        }
    }
}
