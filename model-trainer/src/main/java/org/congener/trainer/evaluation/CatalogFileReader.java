package org.congener.trainer.evaluation;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Reads {@code --catalog}: JSON lines of catalogue entries; keeps compound id → ontology term ids. */
public final class CatalogFileReader {
    private static final ObjectMapper JSON = new ObjectMapper();

    private CatalogFileReader() {
    }

    public static Map<String, List<String>> termsByCompound(Path file) {
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new InputFileException(file, 0, "cannot read: " + e.getMessage());
        }
        Map<String, List<String>> out = new LinkedHashMap<>();
        for (int n = 0; n < lines.size(); n++) {
            String line = lines.get(n).strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            JsonNode node;
            try {
                node = JSON.readTree(line);
            } catch (IOException e) {
                throw new InputFileException(file, n + 1, "not valid JSON: " + e.getMessage());
            }
            JsonNode id = node.get("compoundId");
            JsonNode terms = node.get("termIds");
            if (id == null || !id.isTextual() || id.asText().isBlank()) {
                throw new InputFileException(file, n + 1, "missing compoundId");
            }
            if (terms == null || !terms.isArray() || terms.isEmpty()) {
                throw new InputFileException(file, n + 1, "compound " + id.asText() + " has no termIds");
            }
            List<String> list = new ArrayList<>();
            terms.forEach(t -> list.add(t.asText()));
            out.put(id.asText(), list);
        }
        return out;
    }
}
