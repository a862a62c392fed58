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

    @Test
    void shouldListEverySettingWithItsEnvironmentVariable() {
        String table = ConfigReference.markdown();
        for (String key : AppConfig.DEFINITION.names()) {
            assertTrue(table.contains("| `" + key + "` | `" + ConfigLoader.envName(key) + "` |"), key);
        }
        assertTrue(table.contains("`exactly_once_v2`"));
    }
}
