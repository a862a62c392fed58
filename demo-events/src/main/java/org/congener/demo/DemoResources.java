package org.congener.demo;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** Reads the demo's files from the classpath (package {@code org/congener/demo}). */
final class DemoResources {

    static final String BASE = "/org/congener/demo/";

    private DemoResources() {
    }

    static InputStream open(String name) {
        InputStream in = DemoResources.class.getResourceAsStream(BASE + name);
        if (in == null) {
            throw new IllegalStateException("demo resource " + BASE + name + " is missing from the classpath");
        }
        return in;
    }

    static byte[] bytes(String name) {
        try (InputStream in = open(name)) {
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read demo resource " + name, e);
        }
    }

    static String text(String name) {
        return new String(bytes(name), StandardCharsets.UTF_8);
    }

    /** Non-empty lines of a text resource, without line ends. */
    static List<String> lines(String name) {
        List<String> lines = new ArrayList<>();
        for (String line : text(name).split("\n")) {
            if (!line.isEmpty()) {
                lines.add(line);
            }
        }
        return lines;
    }

    /** A word list: non-empty lines that are not comments. */
    static List<String> words(String name) {
        return lines(name).stream().filter(l -> !l.startsWith("#")).map(String::trim).toList();
    }
}
