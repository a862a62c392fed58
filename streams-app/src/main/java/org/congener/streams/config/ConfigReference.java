package org.congener.streams.config;

import java.util.Map;

import org.apache.kafka.common.config.ConfigDef;

/** Writes the configuration reference, a Markdown table, from {@link AppConfig#DEFINITION}. */
public final class ConfigReference {

    public static final String BEGIN_MARKER = "<!-- config-reference:begin (generated from AppConfig; do not edit) -->";
    public static final String END_MARKER = "<!-- config-reference:end -->";

    private ConfigReference() {
    }

    public static String markdown() {
        StringBuilder out = new StringBuilder();
        out.append("| key | environment variable | type | default | allowed | description |\n");
        out.append("| --- | --- | --- | --- | --- | --- |\n");
        for (Map.Entry<String, ConfigDef.ConfigKey> entry : AppConfig.DEFINITION.configKeys().entrySet()) {
            ConfigDef.ConfigKey key = entry.getValue();
            String defaultValue = key.hasDefault() ? ConfigDef.convertToString(key.defaultValue, key.type) : "(required)";
            out.append("| `").append(key.name).append("` | `").append(ConfigLoader.envName(key.name)).append("` | ")
                    .append(key.type.toString().toLowerCase(java.util.Locale.ROOT)).append(" | ")
                    .append(defaultValue == null || defaultValue.isEmpty() ? "(empty)" : "`" + defaultValue + "`").append(" | ")
                    .append(key.validator == null ? "" : escape(key.validator.toString())).append(" | ")
                    .append(escape(key.documentation)).append(" |\n");
        }
        return out.toString();
    }

    /** {@code document} with the text between the markers replaced by the current table. */
    public static String updated(String document) {
        int begin = document.indexOf(BEGIN_MARKER);
        int end = document.indexOf(END_MARKER);
        if (begin < 0 || end < begin) {
            throw new IllegalArgumentException("the document has no configuration reference markers");
        }
        return document.substring(0, begin + BEGIN_MARKER.length()) + "\n" + markdown()
                + document.substring(end);
    }

    private static String escape(String text) {
        return text.replace("|", "\\|");
    }
}
