package org.congener.schemas.serde;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.LinkedList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.function.Supplier;
import org.congener.schemas.Contribution;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.Suggestion;
import org.congener.schemas.SuggestionSource;
import org.congener.schemas.Suggestions;

/**
 * Seeded suggestion lists of two kinds: lists the {@code suggestions} schema accepts, of every shape
 * it allows, and lists of anything the record types can hold (nulls anywhere, non-finite numbers,
 * control characters and lone surrogates in strings, any rank). The same seed gives the same lists.
 */
final class SuggestionsCorpus {
    private static final String ID_CHARS = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789._:@-";
    /** Characters the schema's text allows, the ones JSON escapes and multi-byte UTF-8 among them. */
    private static final String[] TEXT_CHARS = {"a", "b", "Z", "7", " ", "-", "\"", "\\", "/", "'", "<", "&", "ü",
        "α", "ß", "é", "µ", "€", "中", "\u00A0", "\u0085", "\u2028", "\uFFFD", "\uD83E\uDDEA", "\uD835\uDC9C"};
    /** Everything a Java string can hold that a writer could get wrong. */
    private static final String[] ANY_CHARS = {"a", "Q", "0", " ", "\"", "\\", "/", "\u0000", "\u0001", "\b", "\t",
        "\n", "\f", "\r", "\u001B", "\u001F", "\u007F", "\u0080", "\u009F", "\u00FF", "ü", "α", "\u07FF", "\u0800",
        "\u2028", "\u2029", "\uFEFF", "\uFFFE", "\uFFFF", "\uD800", "\uDBFF", "\uDC00", "\uDFFF", "\uD83E\uDDEA"};
    private static final double[] EDGE_DOUBLES = {0.0, -0.0, 1.0, -1.0, Double.MIN_VALUE, -Double.MIN_VALUE,
        Double.MIN_NORMAL, Double.MAX_VALUE, -Double.MAX_VALUE, 1e-300, 1.0E22, 1.0E21, 1.0E23, 123456.789, 1e7,
        9999999.999999998, 1e-3, 9.999999999999998E-4, 0.1 + 0.2, 1.0 / 3.0, 4.35, 2.0E-7, 100.0, 1e16, 1e17,
        9007199254740993.0, (double) Float.MAX_VALUE, (double) 0.1f};
    private static final double[] NON_FINITE = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};

    private final Random random;

    private SuggestionsCorpus(long seed) {
        this.random = new Random(seed);
    }

    /** {@code count} lists that the {@code suggestions} schema and its cross-field rules accept. */
    static List<Suggestions> withinContract(long seed, int count) {
        SuggestionsCorpus corpus = new SuggestionsCorpus(seed);
        return generate(count, corpus::validList);
    }

    /** {@code count} lists of any values the records can hold, most of them far outside the schema. */
    static List<Suggestions> anything(long seed, int count) {
        SuggestionsCorpus corpus = new SuggestionsCorpus(seed);
        return generate(count, corpus::anyList);
    }

    private static List<Suggestions> generate(int count, Supplier<Suggestions> next) {
        List<Suggestions> lists = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            lists.add(next.get());
        }
        return lists;
    }

    // ---- within the schema ----

    private Suggestions validList() {
        int roll = random.nextInt(40);
        int size = roll < 4 ? 0 : roll < 24 ? 10 : roll == 24 ? 60 + random.nextInt(61) : 1 + random.nextInt(30);
        List<Suggestion> items = new ArrayList<>(size);
        for (int rank = 1; rank <= size; rank++) {
            items.add(validItem(rank));
        }
        return new Suggestions(SchemaIds.SUGGESTIONS, validId(), random.nextInt(3) == 0 ? null : validId(),
                RandomPicks.pick(random, SuggestionSource.values()), random.nextInt(4) == 0 ? null : validId(), validInstant(), items,
                validCaution());
    }

    private Suggestion validItem(int rank) {
        int contributors = random.nextInt(30) == 0 ? 50 : random.nextInt(6);
        List<Contribution> contributions = new ArrayList<>(contributors);
        for (int i = 0; i < contributors; i++) {
            contributions.add(new Contribution(validId(), finiteDouble()));
        }
        boolean sharesTerm = random.nextInt(3) != 0;
        return new Suggestion(rank, validId(), validText(), finiteDouble(), unitInterval(), finiteDouble(),
                contributions, sharesTerm ? validId() : null, sharesTerm && random.nextInt(5) != 0 ? validText() : null,
                validHazardCodes(), random.nextBoolean());
    }

    private String validId() {
        int length = random.nextInt(20) == 0 ? 128 : 1 + random.nextInt(24);
        StringBuilder id = new StringBuilder().append(ID_CHARS.charAt(random.nextInt(62)));
        while (id.length() < length) {
            id.append(ID_CHARS.charAt(random.nextInt(ID_CHARS.length())));
        }
        return id.toString();
    }

    /** Not blank, no control characters: a visible character first, then anything from {@link #TEXT_CHARS}. */
    private String validText() {
        StringBuilder text = new StringBuilder().append(RandomPicks.pick(random, "V", "ü", "α", "\"", "\\", "中"));
        int length = random.nextInt(40);
        for (int i = 0; i < length; i++) {
            text.append(RandomPicks.pick(random, TEXT_CHARS));
        }
        return text.toString();
    }

    /** Line breaks, tabs and other control characters are allowed in the caution, so they are here. */
    private String validCaution() {
        StringBuilder text = new StringBuilder("Suggestions are no safety review.");
        int extra = random.nextInt(4) == 0 ? 1 + random.nextInt(600) : 0;
        for (int i = 0; i < extra; i++) {
            text.append(random.nextInt(8) == 0 ? RandomPicks.pick(random, "\n", "\r\n", "\t", "\u0000", "\u001F", "\u007F", "\b")
                    : RandomPicks.pick(random, TEXT_CHARS));
        }
        return text.toString();
    }

    private List<String> validHazardCodes() {
        int count = random.nextInt(40) == 0 ? 64 : random.nextInt(4);
        Set<String> codes = new LinkedHashSet<>();
        while (codes.size() < count) {
            String code = hazardCode();
            codes.add(random.nextInt(10) == 0 ? code + "+" + hazardCode() : code);
        }
        return new ArrayList<>(codes);
    }

    private String hazardCode() {
        return "H" + (2 + random.nextInt(3)) + random.nextInt(10) + random.nextInt(10)
                + RandomPicks.pick(random, "", "", "", "F", "D", "fd", "FD", "Df");
    }

    private String validInstant() {
        String fraction = random.nextBoolean() ? "" : "." + RandomPicks.digits(random, 1 + random.nextInt(9));
        // an offset of at most 17:59 either way, the range that a date-time format check accepts
        String offset = random.nextBoolean() ? "Z"
                : String.format("%s%02d:%02d", RandomPicks.pick(random, "+", "-"), random.nextInt(18), random.nextInt(60));
        return String.format("%04d-%02d-%02dT%02d:%02d:%02d%s%s", 1970 + random.nextInt(130), 1 + random.nextInt(12),
                1 + random.nextInt(28), random.nextInt(24), random.nextInt(60), random.nextInt(60), fraction,
                "-00:00".equals(offset) ? "Z" : offset);
    }

    private double finiteDouble() {
        return switch (random.nextInt(6)) {
            case 0 -> pickDouble(EDGE_DOUBLES);
            case 1 -> random.nextGaussian() * Math.pow(10, random.nextInt(40) - 20);
            case 2 -> (float) random.nextGaussian();
            case 3 -> random.nextInt(2001) - 1000;
            case 4 -> {
                double bits = Double.longBitsToDouble(random.nextLong());
                yield Double.isFinite(bits) ? bits : 0.5;
            }
            default -> random.nextDouble() * 2 - 1;
        };
    }

    private double unitInterval() {
        return switch (random.nextInt(5)) {
            case 0 -> pickDouble(0.0, 1.0, Double.MIN_VALUE, Double.MIN_NORMAL, 1e-300, 0.5, Math.nextDown(1.0),
                    0.1 + 0.2);
            case 1 -> random.nextFloat();
            default -> random.nextDouble();
        };
    }

    // ---- anything the records hold ----

    private Suggestions anyList() {
        return new Suggestions(anyString(), anyString(), anyString(), random.nextInt(8) == 0 ? null
                : RandomPicks.pick(random, SuggestionSource.values()), anyString(), anyString(), anyList(this::anyItem), anyString());
    }

    private Suggestion anyItem() {
        return new Suggestion(anyRank(), anyString(), anyString(), anyDouble(), anyDouble(), anyDouble(),
                anyList(this::anyContribution), anyString(), anyString(), anyList(this::anyString),
                random.nextBoolean());
    }

    private Contribution anyContribution() {
        return new Contribution(anyString(), anyDouble());
    }

    /** Null now and then; else a list of some implementation, its elements null now and then. */
    private <V> List<V> anyList(Supplier<V> element) {
        if (random.nextInt(8) == 0) {
            return null;
        }
        int size = random.nextInt(4) == 0 ? 0 : random.nextInt(50) == 0 ? 200 : 1 + random.nextInt(6);
        List<V> elements = new ArrayList<>(size);
        for (int i = 0; i < size; i++) {
            elements.add(random.nextInt(10) == 0 ? null : element.get());
        }
        return switch (random.nextInt(4)) {
            case 0 -> new LinkedList<>(elements);
            case 1 -> Collections.unmodifiableList(elements);
            case 2 -> elements.stream().toList();
            default -> elements;
        };
    }

    private String anyString() {
        if (random.nextInt(8) == 0) {
            return null;
        }
        int length = switch (random.nextInt(200)) {
            case 0, 1, 2, 3, 4 -> 0;
            case 5 -> 2000 + random.nextInt(8000);
            default -> random.nextInt(30);
        };
        StringBuilder text = new StringBuilder(length);
        for (int i = 0; i < length; i++) {
            text.append(RandomPicks.pick(random, ANY_CHARS));
        }
        return text.toString();
    }

    private double anyDouble() {
        return switch (random.nextInt(8)) {
            case 0 -> pickDouble(NON_FINITE);
            case 1 -> Double.longBitsToDouble(random.nextLong());
            default -> finiteDouble();
        };
    }

    private int anyRank() {
        return switch (random.nextInt(4)) {
            case 0 -> RandomPicks.pick(random, 0, -1, 1000, 1001, 65_536, 1_000_000, Integer.MAX_VALUE, Integer.MIN_VALUE);
            case 1 -> random.nextInt();
            default -> 1 + random.nextInt(1000);
        };
    }

    // ---- helpers ----



    private double pickDouble(double... values) {
        return values[random.nextInt(values.length)];
    }
}
