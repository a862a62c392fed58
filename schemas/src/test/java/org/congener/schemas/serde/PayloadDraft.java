package org.congener.schemas.serde;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Random;

/**
 * A payload being made for {@link UsageEventCorpus}: fields as name and raw JSON value in writing
 * order (a name may repeat), and how the whole is laid out, framed, encoded and cut.
 */
final class PayloadDraft {
    /** Stands for bytes that are no UTF-8 at all; replaced after encoding. */
    static final char BROKEN = '\uE000';
    private static final byte[] BROKEN_UTF8 = "\uE000".getBytes(StandardCharsets.UTF_8);

    final List<String[]> fields = new ArrayList<>();
    String spacing = "";
    String suffix = "";
    String whole = "%s";
    Charset charset = StandardCharsets.UTF_8;
    byte[] brokenBytes;
    double cut = 1.0;

    void put(String name, String rawValue) {
        for (String[] field : fields) {
            if (field[0].equals(name)) {
                field[1] = rawValue;
                return;
            }
        }
        fields.add(new String[] {name, rawValue});
    }

    void remove(String name) {
        fields.removeIf(field -> field[0].equals(name));
    }

    void repeat(String name, String rawValue, boolean before) {
        int at = 0;
        while (at < fields.size() && !fields.get(at)[0].equals(name)) {
            at++;
        }
        fields.add(before ? at : Math.min(at + 1, fields.size()), new String[] {name, rawValue});
    }

    void shuffle(Random random) {
        Collections.shuffle(fields, random);
    }

    String render(Random random) {
        StringBuilder out = new StringBuilder("{").append(spacing);
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                out.append(spacing).append(',').append(spacing);
            }
            String name = fields.get(i)[0].replace("\\", "\\\\").replace("\"", "\\\"");
            out.append('"').append(name).append('"').append(spacing).append(':').append(spacing)
                    .append(fields.get(i)[1]);
        }
        String object = out.append(spacing).append('}').toString();
        return whole.replace("%s", object) + suffix;
    }

    byte[] encode(String text) {
        byte[] bytes = text.getBytes(charset);
        if (brokenBytes != null && charset == StandardCharsets.UTF_8) {
            bytes = replace(bytes, BROKEN_UTF8, brokenBytes);
        }
        return Arrays.copyOf(bytes, (int) Math.round(bytes.length * cut));
    }

    private static byte[] replace(byte[] bytes, byte[] what, byte[] with) {
        List<Byte> out = new ArrayList<>();
        for (int i = 0; i < bytes.length; i++) {
            if (i + what.length <= bytes.length && Arrays.equals(bytes, i, i + what.length, what, 0, what.length)) {
                for (byte b : with) {
                    out.add(b);
                }
                i += what.length - 1;
            } else {
                out.add(bytes[i]);
            }
        }
        byte[] result = new byte[out.size()];
        for (int i = 0; i < result.length; i++) {
            result[i] = out.get(i);
        }
        return result;
    }
}
