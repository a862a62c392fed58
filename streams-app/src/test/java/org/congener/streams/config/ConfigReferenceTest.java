package org.congener.streams.config;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;

class ConfigReferenceTest {

    /** Run with {@code -Dcongener.updateDocs=true} to rewrite the table after changing a setting. */
    @Test
    void shouldMatchDocumentedTableWhenSettingsChange() throws Exception {
        Path doc = Path.of("..", "docs", "runtime.md");
        String text = Files.readString(doc);
        String expected = ConfigReference.updated(text);
        if (Boolean.getBoolean("congener.updateDocs")) {
            Files.writeString(doc, expected);
            text = expected;
        }
        assertEquals(expected, text, "docs/runtime.md is out of date; rerun this test with -Dcongener.updateDocs=true");
    }

    /** Rewritten, like the table, with {@code -Dcongener.updateDocs=true}. */
    @Test
    void shouldShipAPropertiesFileWithEverySettingAtItsDefault() throws Exception {
        Path file = Path.of("..", "config", "streams.properties");
        String expected = ConfigReference.propertiesFile();
        if (Boolean.getBoolean("congener.updateDocs")) {
            Files.createDirectories(file.getParent());
            Files.writeString(file, expected);
        }
        assertEquals(expected, Files.readString(file),
                "config/streams.properties is out of date; rerun this test with -Dcongener.updateDocs=true");
        for (String key : AppConfig.DEFINITION.names()) {
            assertTrue(expected.contains("\n#" + key + "="), key);
        }
        // every line uncommented is a valid configuration equal to the defaults
        Path uncommented = Files.createTempFile("streams", ".properties");
        try {
            StringBuilder active = new StringBuilder();
            for (String line : expected.split("\n")) {
                boolean setting = line.startsWith("#") && line.contains("=") && !line.startsWith("# ");
                active.append(setting ? line.substring(1) : line).append('\n');
            }
            Files.writeString(uncommented, active);
            AppConfig loaded = ConfigLoader.load(uncommented, java.util.Map.of(), java.util.Map.of());
            assertEquals(AppConfig.defaults().streamsProperties(), loaded.streamsProperties());
            assertEquals(AppConfig.defaults().topN(), loaded.topN());
            assertEquals(AppConfig.defaults().ontologyFile(), loaded.ontologyFile());
        } finally {
            Files.deleteIfExists(uncommented);
        }
    }

    @Test
    void shouldListEverySettingWithItsEnvironmentVariable() {
        String table = ConfigReference.markdown();
        for (String key : AppConfig.DEFINITION.names()) {
            assertTrue(table.contains("| `" + key + "` | `" + ConfigLoader.envName(key) + "` |"), key);
        }
        assertTrue(table.contains("`exactly_once_v2`"));
    }
}
