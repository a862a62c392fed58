package org.congener.streams.config;

import java.util.Map;

import org.apache.kafka.common.config.ConfigDef;

/**
 * Writes the configuration reference from {@link AppConfig#DEFINITION}: a Markdown table for
 * {@code docs/runtime.md} and a properties file with every setting, its documentation and its
 * default ({@code config/streams.properties}), so neither can drift from the declarations.
 */
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

    /**
     * A properties file for {@code --config}: every setting commented out at its default, each with its
     * documentation, type and allowed values; uncomment a line to change it.
     */
    public static String propertiesFile() {
        StringBuilder out = new StringBuilder();
        out.append("# Settings of the Congener streams app (congener streams --config FILE).\n")
                .append("# Generated from AppConfig; every setting is listed at its default, commented out.\n")
                .append("# Later layers win: this file, then CONGENER_* environment variables, then flags.\n")
                .append("#\n")
                .append("# Suggestions come from usage patterns and ontology similarity, not from any safety\n")
                .append("# review; see README.md, \"Safety\".\n");
        for (ConfigDef.ConfigKey key : AppConfig.DEFINITION.configKeys().values()) {
            out.append('\n');
            for (String line : wrap(key.documentation, 96)) {
                out.append("# ").append(line).append('\n');
            }
            out.append("# type ").append(key.type.toString().toLowerCase(java.util.Locale.ROOT));
            if (key.validator != null && !key.validator.toString().isBlank()) {
                out.append(", allowed ").append(key.validator);
            }
            out.append("; environment ").append(ConfigLoader.envName(key.name)).append('\n');
            String value = key.hasDefault() ? ConfigDef.convertToString(key.defaultValue, key.type) : "";
            out.append('#').append(key.name).append('=').append(value == null ? "" : value).append('\n');
        }
        return out.toString();
    }

    private static java.util.List<String> wrap(String text, int width) {
        java.util.List<String> lines = new java.util.ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            if (line.length() > 0 && line.length() + 1 + word.length() > width) {
                lines.add(line.toString());
                line.setLength(0);
            }
            if (line.length() > 0) {
                line.append(' ');
            }
            line.append(word);
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
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
