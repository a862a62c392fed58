package org.congener.core.reference;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.List;
import org.congener.core.interactions.IdIndex;
import org.congener.core.interactions.Interaction;
import java.util.ArrayList;

/** Finds the project's read-only check data ({@code shared/data} beside the checkout or above it). */
public final class SharedData {
    private SharedData() {
    }

    public static Path directory() {
        for (Path p = Paths.get("").toAbsolutePath(); p != null; p = p.getParent()) {
            Path candidate = p.resolve("shared").resolve("data");
            if (Files.isDirectory(candidate)) {
                return candidate;
            }
        }
        throw new IllegalStateException("check data not found: no shared/data in " + Paths.get("").toAbsolutePath()
                + " or any parent");
    }

    /**
     * The training part of the UCI "Anonymous Microsoft Web Data" (Breese, Heckerman &amp; Kadie 1998):
     * {@code C} lines start a user, {@code V,area,1} lines are that user's visits (format in
     * anonymous-msweb.info). One interaction of strength 1 per visit; time = order in the file.
     */
    public static List<Interaction> msweb(IdIndex users, IdIndex items) {
        Path file = directory().resolve("msweb").resolve("anonymous-msweb.data");
        List<Interaction> out = new ArrayList<>();
        int user = -1;
        long line = 0;
        try {
            for (String text : Files.readAllLines(file, java.nio.charset.StandardCharsets.ISO_8859_1)) {
                line++;
                if (text.startsWith("C,")) {
                    String[] parts = text.split(",");
                    user = users.indexOrAdd(parts[2].trim());
                } else if (text.startsWith("V,")) {
                    if (user < 0) {
                        throw new IllegalStateException(file + ":" + line + ": visit before any user");
                    }
                    String[] parts = text.split(",");
                    out.add(new Interaction(user, items.indexOrAdd(parts[1].trim()), 1.0, line));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out;
    }
}
