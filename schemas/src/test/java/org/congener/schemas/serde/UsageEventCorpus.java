package org.congener.schemas.serde;

import java.math.BigDecimal;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.time.Month;
import java.time.Year;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.function.BiFunction;
import org.congener.schemas.SchemaIds;

/**
 * A seeded corpus of usage-event payloads: valid events of every shape the schema allows, most of them
 * then given one or two mistakes (or harmless changes) of the kinds a producer could make. The
 * same seed gives the same payloads, so a failing case can be replayed.
 */
final class UsageEventCorpus {
    /** One payload and how it was made. */
    record Payload(String how, byte[] bytes) {
        /** The bytes as UTF-8 text with every character outside printable ASCII escaped, for a failure message. */
        String shown() {
            StringBuilder out = new StringBuilder();
            for (char c : new String(bytes, StandardCharsets.UTF_8).toCharArray()) {
                out.append(c >= 0x20 && c < 0x7F ? String.valueOf(c) : String.format("<U+%04X>", (int) c));
            }
            return how + " | " + bytes.length + " bytes | " + out;
        }
    }

    static final List<String> FIELDS = List.of("schema", "eventId", "researcherId", "compoundId", "kind", "quantity",
            "unit", "occurredAt");
    private static final String ID_CHARS = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789._:@-";
    private static final BigDecimal MAX_DOUBLE = new BigDecimal(Double.MAX_VALUE);
    private static final String MAX_DOUBLE_AS_INTEGER = MAX_DOUBLE.toBigInteger().toString();
    /** Half an ulp above the largest double: the first integer a double cannot hold short of infinity. */
    private static final String ROUNDS_TO_INFINITY = MAX_DOUBLE
            .add(new BigDecimal(Math.ulp(Double.MAX_VALUE)).divide(BigDecimal.valueOf(2))).toBigInteger().toString();

    private final Random random;

    private UsageEventCorpus(long seed) {
        this.random = new Random(seed);
    }

    static List<Payload> generate(long seed, int count) {
        UsageEventCorpus corpus = new UsageEventCorpus(seed);
        List<Payload> payloads = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            payloads.add(corpus.next(i));
        }
        return payloads;
    }

    private Payload next(int index) {
        PayloadDraft event = validEvent();
        StringBuilder how = new StringBuilder("#" + index);
        int roll = random.nextInt(10);
        int mistakes = roll < 2 ? 0 : roll < 8 ? 1 : 2;
        for (int i = 0; i < mistakes; i++) {
            how.append(' ').append(RandomPicks.pick(random, MUTATIONS).apply(this, event));
        }
        String text = event.render(random);
        return new Payload(how.toString(), event.encode(text));
    }

    // ---- valid values ----

    private PayloadDraft validEvent() {
        PayloadDraft event = new PayloadDraft();
        // JSON may escape the slashes; the value is the same
        event.put("schema", random.nextInt(8) == 0 ? "\"congener\\/usage-event\\/v1\"" : string(SchemaIds.USAGE_EVENT));
        for (String idField : List.of("eventId", "researcherId", "compoundId")) {
            event.put(idField, string(validId()));
        }
        event.put("kind", string(RandomPicks.pick(random, "ORDER", "WITHDRAWAL", "USAGE_LOG", "VIEW")));
        event.put("quantity", validQuantity());
        event.put("unit", string(RandomPicks.pick(random, "g", "mg", "kg", "mL", "L", "uL", "µL", "μL", "mol", "mmol", "ea", "mg/mL",
                "g.L", "µmol", "aaaaaaaaaaaaaaaa")));
        event.put("occurredAt", string(validInstant()));
        if (random.nextInt(4) == 0) {
            event.shuffle(random);
        }
        return event;
    }

    private String validId() {
        int length = switch (random.nextInt(10)) {
            case 0 -> 128;
            case 1 -> 1;
            default -> 1 + random.nextInt(24);
        };
        StringBuilder id = new StringBuilder().append(ID_CHARS.charAt(random.nextInt(62)));
        while (id.length() < length) {
            id.append(ID_CHARS.charAt(random.nextInt(ID_CHARS.length())));
        }
        return id.toString();
    }

    private String validQuantity() {
        return switch (random.nextInt(6)) {
            case 0 -> Integer.toString(random.nextInt(10_000));
            case 1 -> random.nextInt(1000) + "." + random.nextInt(1000);
            case 2 -> (1 + random.nextInt(9)) + "." + random.nextInt(100) + RandomPicks.pick(random, "e", "E") + RandomPicks.pick(random, "", "+", "-")
                    + random.nextInt(300);
            case 3 -> Double.toString(random.nextDouble() * Math.pow(10, random.nextInt(20) - 10));
            case 4 -> RandomPicks.pick(random, "0", "0.0", "-0", "0e0", "25.0", "1E2", "4.9e-324", "9223372036854775807");
            default -> Long.toString(random.nextLong() & Long.MAX_VALUE);
        };
    }

    private String validInstant() {
        int year = random.nextInt(10) == 0 ? RandomPicks.pick(random, 0, 4, 1600, 1900, 2000, 2100, 2400, 9999) : 1970 + random.nextInt(80);
        int month = 1 + random.nextInt(12);
        int day = random.nextInt(3) == 0 ? Month.of(month).length(Year.isLeap(year)) : 1 + random.nextInt(28);
        String fraction = random.nextBoolean() ? "" : "." + RandomPicks.digits(random, 1 + random.nextInt(9));
        String offset = random.nextBoolean() ? "Z" : validOffset();
        return String.format("%04d-%02d-%02dT%02d:%02d:%02d%s%s", year, month, day, random.nextInt(24),
                random.nextInt(60), random.nextInt(60), fraction, offset);
    }

    private String validOffset() {
        int minutes = random.nextInt(18 * 60 + 1);
        String sign = minutes == 0 ? "+" : RandomPicks.pick(random, "+", "-");
        return String.format("%s%02d:%02d", sign, minutes / 60, minutes % 60);
    }

    // ---- mistakes and harmless changes; each returns what it did ----

    private static final List<BiFunction<UsageEventCorpus, PayloadDraft, String>> MUTATIONS = List.of(
            UsageEventCorpus::dropField, UsageEventCorpus::extraField, UsageEventCorpus::wrongType,
            UsageEventCorpus::oddId, UsageEventCorpus::oddQuantity, UsageEventCorpus::oddInstant,
            UsageEventCorpus::oddInstant, UsageEventCorpus::oddInstant, UsageEventCorpus::repeatedName,
            UsageEventCorpus::oddUnit, UsageEventCorpus::oddKind, UsageEventCorpus::oddSchema, UsageEventCorpus::layout,
            UsageEventCorpus::trailing, UsageEventCorpus::notAnEvent, UsageEventCorpus::truncated,
            UsageEventCorpus::encoding, UsageEventCorpus::brokenBytes, UsageEventCorpus::deepValue);

    private String dropField(PayloadDraft event) {
        String field = RandomPicks.pick(random, FIELDS);
        event.remove(field);
        return "drop:" + field;
    }

    private String extraField(PayloadDraft event) {
        String name = RandomPicks.pick(random, "price", "Schema", "eventid", "", "schema ", "quantity2", "é", "occurred_at", "$ref");
        event.put(name, RandomPicks.pick(random, "12.5", "null", "\"x\"", "{}", "[1,2]", "true"));
        return "extra:" + name;
    }

    private String wrongType(PayloadDraft event) {
        String field = RandomPicks.pick(random, FIELDS);
        event.put(field, RandomPicks.pick(random, "null", "true", "false", "0", "-1", "1.5", "\"text\"", "\"\"", "[]", "{}",
                "[1,\"a\",{\"b\":null}]", "{\"a\":{\"b\":[]}}", "\"25\""));
        return "type:" + field;
    }

    private String oddId(PayloadDraft event) {
        String field = RandomPicks.pick(random, "eventId", "researcherId", "compoundId");
        String value = RandomPicks.pick(random, "", "a".repeat(129), "a".repeat(128), "-a", ".a", "_a", "@a", ":a", "a b", "a\n",
                "a\r\n", "a\u2028", "é", "a/b", "a#", "a\u0000", "ａ", "a\uD83D\uDE00", "A:b@c.d_e-f", "0", "a\t",
                " a", "\u0661", "Z" + "9".repeat(127), "a\u00B5");
        event.put(field, string(value));
        return "id:" + field;
    }

    private String oddQuantity(PayloadDraft event) {
        String value = RandomPicks.pick(random, "-1", "-0", "-0.0", "0", "0.0", "-1e-400", "1e400", "-1e400", "1E+2", "1e-2",
                "1.7976931348623157e308", "1.7976931348623159e308", "4.9e-324", "-4.9e-324", MAX_DOUBLE_AS_INTEGER,
                ROUNDS_TO_INFINITY, "-" + MAX_DOUBLE_AS_INTEGER, "1" + "0".repeat(400), "-1" + "0".repeat(400),
                "01", ".5", "1.", "+1", "NaN", "Infinity", "-Infinity", "0x10", "1e", "1.5e+", "-", "--1", "1_000",
                "00", "0.0000000000000000000000000001", "123456789012345678901234567890", "9223372036854775808",
                "-9223372036854775809", "2147483648", "1" + "0".repeat(1200), "0." + "1".repeat(1200), "1e-2147483649");
        event.put("quantity", value);
        return "quantity:" + value.substring(0, Math.min(24, value.length()));
    }

    private String oddInstant(PayloadDraft event) {
        String value = switch (random.nextInt(3)) {
            case 0 -> misspelt(validInstant());
            case 1 -> nearlyValidInstant();
            default -> RandomPicks.pick(random, "2026-03-14t09:26:53Z", "2026-03-14 09:26:53Z", "2026-03-14T09:26:53Z\n",
                    " 2026-03-14T09:26:53Z", "20260314T092653Z", "2026-03-14", "\u0662026-03-14T09:26:53Z",
                    "+2026-03-14T09:26:53Z", "2026-03-14T09:26:53+05", "2026-03-14T09:26:53UTC", "");
        };
        event.put("occurredAt", random.nextInt(20) == 0 ? "1773480413000" : string(value));
        return "instant:" + value.replace("\n", "\\n");
    }

    private String misspelt(String text) {
        StringBuilder out = new StringBuilder(text);
        int at = random.nextInt(out.length());
        switch (random.nextInt(4)) {
            case 0 -> out.setCharAt(at, RandomPicks.pick(random, "0123456789-:TZtz+. \n/\u0661".split("")).charAt(0));
            case 1 -> out.deleteCharAt(at);
            case 2 -> out.insert(at, RandomPicks.pick(random, "0123456789-:TZ+.".split("")));
            default -> out.setLength(at);
        }
        return out.toString();
    }

    /** Well formed, each part usually valid and near an edge of the calendar, the clock or the offset range. */
    private String nearlyValidInstant() {
        int year = RandomPicks.pick(random, 0, 4, 100, 1600, 1900, 2000, 2023, 2024, 2100, 2400, 9999, 1900, 2100, 2200);
        int month = random.nextInt(5) == 0 ? RandomPicks.pick(random, 0, 13) : random.nextBoolean() ? 2 : 1 + random.nextInt(12);
        int day = random.nextInt(5) == 0 ? RandomPicks.pick(random, 0, 32) : random.nextBoolean() ? 29 : RandomPicks.pick(random, 28, 30, 31);
        String time = random.nextInt(5) == 0 ? RandomPicks.pick(random, "24:00:00", "23:60:00", "23:59:60", "9:00:00")
                : RandomPicks.pick(random, "00:00:00", "23:59:59", "12:30:45");
        String fraction = random.nextInt(5) == 0 ? RandomPicks.pick(random, ".", ".1234567890") : RandomPicks.pick(random, "", ".5", ".123456789");
        String offset = random.nextInt(3) == 0
                ? RandomPicks.pick(random, "-00:00", "-00:00", "+18:01", "-18:01", "+23:59", "+24:00", "+05:60", "+5:00", "+0500", "z", "")
                : RandomPicks.pick(random, "Z", "+18:00", "-18:00", "-00:01", "+00:00", "+14:00", "-17:59");
        return String.format("%04d-%02d-%02dT%s%s%s", year, month, day, time, fraction, offset);
    }

    private String repeatedName(PayloadDraft event) {
        String field = RandomPicks.pick(random, FIELDS);
        String value = RandomPicks.pick(random, "\"BUY\"", "\"ORDER\"", "\"VIEW\"", "1", "-1", "null", "{}", "[[1]]",
                "\"congener/usage-event/v1\"", "\"2026-03-14T09:26:53Z\"", "\"2026-02-30T09:26:53Z\"", "\"g\"",
                "\"e-2\"", "\"\"", "{\"kind\":\"ORDER\"}");
        boolean before = random.nextBoolean();
        event.repeat(field, value, before);
        return "repeat:" + field + (before ? "-before" : "-after");
    }

    private String oddUnit(PayloadDraft event) {
        event.put("unit", string(RandomPicks.pick(random, "µL", "μL", "Μ", "µ", "g/µL", "ℓ", "g²", "m³", "uL", "1g", "g ", "",
                "a".repeat(17), "a".repeat(16), "/g", ".g", "g\n", "G", "µ".repeat(16), "µ".repeat(17), "g-1")));
        return "unit";
    }

    private String oddKind(PayloadDraft event) {
        event.put("kind", string(RandomPicks.pick(random, "order", "BUY", "ORDER ", " ORDER", "", "USAGE-LOG", "Order", "VIEW\u0000",
                "ORDER", "USAGE_LOG"), true));
        return "kind";
    }

    private String oddSchema(PayloadDraft event) {
        event.put("schema", string(RandomPicks.pick(random, "congener/usage-event/v2", "congener/usage-event/v1 ",
                "Congener/usage-event/v1", "congener/usage-event/", "congener/inventory-event/v1",
                "congener/usage-event/v1"), true));
        return "schema";
    }

    private String layout(PayloadDraft event) {
        event.spacing = RandomPicks.pick(random, " ", "\t", "\n", "\r\n", "  \n\t ");
        if (random.nextBoolean()) {
            event.shuffle(random);
        }
        return "layout";
    }

    private String trailing(PayloadDraft event) {
        event.suffix = RandomPicks.pick(random, " ", "\n", " x", "}", "{}", "null", "[", ",", "\u0000", "//c", "/* c */", "#", "\r\n\t");
        return "trailing";
    }

    private String notAnEvent(PayloadDraft event) {
        event.whole = RandomPicks.pick(random, "[]", "null", "1", "\"s\"", "true", "", " ", "{", "}", "{}", "{\"schema\"}", "[%s]",
                "{\"event\":%s}", "%s%s", "\uFEFF%s", "\"%s\"");
        return "whole:" + event.whole;
    }

    private String truncated(PayloadDraft event) {
        event.cut = random.nextDouble();
        return "cut";
    }

    private String encoding(PayloadDraft event) {
        event.charset = RandomPicks.pick(random, StandardCharsets.UTF_16BE, StandardCharsets.UTF_16LE, StandardCharsets.UTF_16,
                Charset.forName("UTF-32BE"), StandardCharsets.ISO_8859_1);
        return "charset:" + event.charset;
    }

    private String brokenBytes(PayloadDraft event) {
        String field = RandomPicks.pick(random, FIELDS);
        switch (random.nextInt(3)) {
            case 0 -> event.put(field, "\"a" + PayloadDraft.BROKEN + "\"");
            case 1 -> event.repeat(field, "[\"" + PayloadDraft.BROKEN + "\"]", true);
            default -> event.put("x" + PayloadDraft.BROKEN, "1");
        }
        event.brokenBytes = RandomPicks.pick(random, new byte[] {(byte) 0xC3, 0x28}, new byte[] {(byte) 0xFF}, new byte[] {(byte) 0x80},
                new byte[] {(byte) 0xE2, (byte) 0x82}, new byte[] {(byte) 0xC0, (byte) 0xAF},
                new byte[] {(byte) 0xED, (byte) 0xA0, (byte) 0x80});
        return "broken:" + field;
    }

    private String deepValue(PayloadDraft event) {
        int depth = RandomPicks.pick(random, 10, 400, 999, 1000, 1001, 1500);
        String field = RandomPicks.pick(random, FIELDS);
        event.repeat(field, "[".repeat(depth) + "]".repeat(depth), true);
        return "deep:" + field + ":" + depth;
    }

    // ---- helpers ----

    private String string(String value) {
        return string(value, false);
    }

    /** A JSON string literal, with some characters written as {@code \\u} escapes now and then. */
    private String string(String value, boolean alwaysEscapeSome) {
        boolean escapeSome = alwaysEscapeSome || random.nextInt(10) == 0;
        StringBuilder out = new StringBuilder("\"");
        for (char c : value.toCharArray()) {
            if (c == '"' || c == '\\') {
                out.append('\\').append(c);
            } else if (c < 0x20 || escapeSome && random.nextInt(4) == 0) {
                out.append(String.format("\\u%04x", (int) c));
            } else {
                out.append(c);
            }
        }
        return out.append('"').toString();
    }

}
