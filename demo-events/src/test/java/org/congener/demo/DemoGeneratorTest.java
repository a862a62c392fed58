package org.congener.demo;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class DemoGeneratorTest {

    @TempDir
    static Path first;
    @TempDir
    static Path second;

    @BeforeAll
    static void generateTwice() throws Exception {
        DemoGenerator.generate(DemoGenerator.DEFAULT_SEED, first);
        DemoGenerator.generate(DemoGenerator.DEFAULT_SEED, second);
    }

    @Test
    void shouldWriteByteIdenticalFilesWhenRunTwiceWithTheSameSeed() throws Exception {
        assertNotEquals(first, second);
        for (String file : DemoGenerator.FILES) {
            assertArrayEquals(Files.readAllBytes(first.resolve(file)), Files.readAllBytes(second.resolve(file)), file);
        }
    }

    @Test
    void shouldMatchTheShippedResourcesWhenGeneratedWithTheDefaultSeed() throws Exception {
        for (String file : DemoGenerator.FILES) {
            assertArrayEquals(DemoResources.bytes(file), Files.readAllBytes(first.resolve(file)),
                    file + " is stale: regenerate the shipped demo files (see docs/demo-scenario.md)");
        }
    }

    @Test
    void shouldProduceDifferentEventsButTheSameCatalogueWhenTheSeedDiffers() throws Exception {
        Map<String, byte[]> other = DemoGenerator.render(DemoScenario.build(DemoGenerator.DEFAULT_SEED + 1,
                DemoGenerator.TARGET_USAGE_EVENTS));
        assertFalse(Arrays.equals(Files.readAllBytes(first.resolve(DemoGenerator.USAGE_EVENTS_FILE)),
                other.get(DemoGenerator.USAGE_EVENTS_FILE)));
        assertFalse(Arrays.equals(Files.readAllBytes(first.resolve(DemoGenerator.INVENTORY_EVENTS_FILE)),
                other.get(DemoGenerator.INVENTORY_EVENTS_FILE)));
        assertArrayEquals(Files.readAllBytes(first.resolve(DemoGenerator.CATALOG_FILE)), other.get(DemoGenerator.CATALOG_FILE));
        assertArrayEquals(Files.readAllBytes(first.resolve(DemoGenerator.ONTOLOGY_FILE)), other.get(DemoGenerator.ONTOLOGY_FILE));
    }

    @Test
    void shouldEndEveryLineWithNewlineAndLeaveNoTrailingSpacesWhenWritingFiles() throws Exception {
        for (String file : DemoGenerator.FILES) {
            String text = Files.readString(first.resolve(file), StandardCharsets.UTF_8);
            assertTrue(text.endsWith("\n"), file);
            assertFalse(text.contains("\r"), file);
            for (String line : text.split("\n")) {
                assertFalse(line.endsWith(" ") || line.endsWith("\t"), file + ": trailing space in '" + line + "'");
            }
        }
    }

    @Test
    void shouldExitWithUsageErrorWhenOutIsMissing() {
        Run run = run("--seed", "7");
        assertEquals(2, run.code);
        assertTrue(run.err.contains("--out DIR is required"), run.err);
    }

    @Test
    void shouldExitWithUsageErrorNamingTheValueWhenSeedIsNotANumber() {
        Run run = run("--seed", "seven", "--out", first.toString());
        assertEquals(2, run.code);
        assertTrue(run.err.contains("'seven'"), run.err);
    }

    @Test
    void shouldExitWithUsageErrorWhenAnArgumentIsUnknown() {
        Run run = run("--colour", "blue");
        assertEquals(2, run.code);
        assertTrue(run.err.contains("unknown argument '--colour'"), run.err);
    }

    private static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = DemoGenerator.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, err.toString(StandardCharsets.UTF_8));
    }

    private record Run(int code, String err) {
    }
}
