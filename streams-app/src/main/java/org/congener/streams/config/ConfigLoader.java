package org.congener.streams.config;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Properties;
import java.util.regex.Pattern;

import org.apache.kafka.common.config.ConfigDef;
import org.apache.kafka.common.config.ConfigException;

/**
 * Builds an {@link AppConfig} from three layers, each overriding the one before: a properties file,
 * environment variables ({@code CONGENER_} plus the key in upper case with {@code _} for {@code .},
 * e.g. {@code CONGENER_HTTP_PORT}), then command-line flags. Every value is checked where it comes
 * from, so an error names the file and line, the variable or the flag.
 */
public final class ConfigLoader {

    public static final String ENV_PREFIX = "CONGENER_";

    private ConfigLoader() {
    }

    /** The environment variable that sets {@code key}. */
    public static String envName(String key) {
        return ENV_PREFIX + key.toUpperCase(Locale.ROOT).replace('.', '_');
    }

    /**
     * @param file  properties file, or null for none
     * @param env   environment variables (usually {@code System.getenv()}); unrelated ones are ignored
     * @param flags settings given on the command line, by key
     */
    public static AppConfig load(Path file, Map<String, String> env, Map<String, String> flags) {
        Map<String, String> values = new LinkedHashMap<>();
        if (file != null) {
            values.putAll(readFile(file));
        }
        values.putAll(readEnv(env));
        for (Map.Entry<String, String> flag : flags.entrySet()) {
            check(flag.getKey(), flag.getValue(), "setting " + flag.getKey() + " given on the command line");
            values.put(flag.getKey(), flag.getValue());
        }
        return new AppConfig(values);
    }

    static Map<String, String> readFile(Path file) {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new ConfigLoadException("config file " + file + " does not exist");
        } catch (IOException e) {
            throw new ConfigLoadException("cannot read config file " + file + ": " + e.getMessage());
        }
        Properties properties = new Properties();
        try (Reader reader = new java.io.StringReader(text)) {
            properties.load(reader);
        } catch (IOException | IllegalArgumentException e) {
            throw new ConfigLoadException("config file " + file + " is not a properties file: " + e.getMessage());
        }
        List<String> lines = text.lines().toList();
        Map<String, String> values = new LinkedHashMap<>();
        for (String key : properties.stringPropertyNames()) {
            String value = properties.getProperty(key).trim();
            String where = file + " line " + lineOf(lines, key);
            if (!AppConfig.DEFINITION.configKeys().containsKey(key)) {
                throw new ConfigLoadException(where + ": unknown setting '" + key + "' (known: "
                        + String.join(", ", AppConfig.DEFINITION.names()) + ")");
            }
            check(key, value, where);
            values.put(key, value);
        }
        return values;
    }

    static Map<String, String> readEnv(Map<String, String> env) {
        Map<String, String> values = new LinkedHashMap<>();
        for (String key : AppConfig.DEFINITION.names()) {
            String name = envName(key);
            String value = env.get(name);
            if (value != null) {
                check(key, value.trim(), "environment variable " + name);
                values.put(key, value.trim());
            }
        }
        return values;
    }

    private static void check(String key, String value, String where) {
        ConfigDef.ConfigKey definition = AppConfig.DEFINITION.configKeys().get(key);
        if (definition == null) {
            throw new ConfigLoadException(where + ": unknown setting '" + key + "'");
        }
        try {
            Object parsed = ConfigDef.parseType(key, value, definition.type);
            if (definition.validator != null) {
                definition.validator.ensureValid(key, parsed);
            }
        } catch (ConfigException e) {
            throw new ConfigLoadException(where + ": bad value '" + value + "' for " + key + ": " + reason(e, definition));
        }
    }

    private static String reason(ConfigException e, ConfigDef.ConfigKey definition) {
        String message = e.getMessage();
        int colon = message.indexOf(": ");
        String detail = colon >= 0 ? message.substring(colon + 2) : message;
        return definition.validator == null ? detail : detail + " (allowed: " + definition.validator + ")";
    }

    /** 1-based line where {@code key} is set; the first such line (later ones win in Properties, rare). */
    private static int lineOf(List<String> lines, String key) {
        Pattern keyAtStart = Pattern.compile("^\\s*" + Pattern.quote(key) + "\\s*([=:\\s]|$).*");
        int found = 0;
        for (int i = 0; i < lines.size(); i++) {
            if (keyAtStart.matcher(lines.get(i)).matches()) {
                found = i + 1;
            }
        }
        return found;
    }
}
