package org.congener.trainer.publish;

import java.util.Collection;
import java.util.regex.Pattern;

/** Version names {@code v} + 4 digits, increasing; record keys {@code <version>/<compoundId>}. */
public final class VersionNames {
    public static final String CURRENT = "current";
    private static final Pattern NAME = Pattern.compile("v\\d{4}");

    private VersionNames() {
    }

    public static boolean isVersion(String s) {
        return s != null && NAME.matcher(s).matches();
    }

    /** Max published + 1; {@code v0001} when none is. */
    public static String next(Collection<String> published) {
        int max = published.stream().filter(VersionNames::isVersion).mapToInt(v -> Integer.parseInt(v.substring(1)))
                .max().orElse(0);
        if (max >= 9999) {
            throw new IllegalStateException("version names are exhausted at v9999");
        }
        return String.format("v%04d", max + 1);
    }

    public static String recordKey(String version, String compoundId) {
        return version + "/" + compoundId;
    }

    /** The version part of a record key, or null when the key has none. */
    public static String versionOf(String recordKey) {
        int slash = recordKey == null ? -1 : recordKey.indexOf('/');
        return slash < 0 ? null : recordKey.substring(0, slash);
    }
}
