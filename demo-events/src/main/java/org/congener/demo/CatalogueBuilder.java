package org.congener.demo;

import org.congener.schemas.CatalogEntry;
import org.congener.schemas.SchemaIds;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Reads the hand-written compound table and turns it into catalogue entries with ids
 * {@code C00001}, {@code C00002}, … in table order. The table, not the seed, fixes the catalogue, so
 * every seed shares one catalogue and one ontology.
 */
final class CatalogueBuilder {

    static final Set<String> RESTRICTION_TAGS = Set.of("toxic", "flammable-bulk", "controlled-precursor",
            "pyrophoric", "carcinogen-cmr", "explosive-precursor", "radioactive");

    private static final Pattern HAZARD_CODE = Pattern.compile("H[2-4][0-9]{2}[A-Za-z]{0,2}");

    private CatalogueBuilder() {
    }

    /** Parses the table; a malformed line gets a message naming its number. */
    static List<SourceCompound> parse(String table, DemoOntology ontology) {
        List<SourceCompound> compounds = new ArrayList<>();
        String[] lines = table.split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            String where = "compounds.txt line " + (i + 1);
            String[] fields = line.split("\\|", -1);
            if (fields.length != 6) {
                throw new IllegalArgumentException(where + ": expected 6 fields separated by '|', got " + fields.length);
            }
            List<String> termIds = new ArrayList<>();
            for (String number : list(fields[2])) {
                if (!number.matches("\\d{1,7}")) {
                    throw new IllegalArgumentException(where + ": term number '" + number + "' is not 1 to 7 digits");
                }
                String id = String.format(Locale.ROOT, "CGNR:%07d", Integer.parseInt(number));
                if (!ontology.isActiveTerm(id)) {
                    throw new IllegalArgumentException(where + ": " + id + " is not an active ontology term");
                }
                termIds.add(id);
            }
            if (termIds.isEmpty() || termIds.size() > 3) {
                throw new IllegalArgumentException(where + ": a compound needs 1 to 3 ontology terms");
            }
            List<String> tags = list(fields[3]);
            for (String tag : tags) {
                if (!RESTRICTION_TAGS.contains(tag)) {
                    throw new IllegalArgumentException(where + ": unknown restriction tag '" + tag + "'");
                }
            }
            List<String> hazards = list(fields[4]);
            for (String code : hazards) {
                if (!HAZARD_CODE.matcher(code).matches()) {
                    throw new IllegalArgumentException(where + ": '" + code + "' is not a GHS hazard statement code");
                }
            }
            boolean active = switch (fields[5]) {
                case "" -> true;
                case "x" -> false;
                default -> throw new IllegalArgumentException(where + ": status must be empty or x");
            };
            PhysicalForm form;
            try {
                form = PhysicalForm.ofCode(fields[1]);
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException(where + ": " + e.getMessage(), e);
            }
            compounds.add(new SourceCompound(fields[0], form, List.copyOf(termIds),
                    tags, hazards, active));
        }
        return List.copyOf(compounds);
    }

    static String compoundId(int index) {
        return String.format(Locale.ROOT, "C%05d", index + 1);
    }

    static List<CatalogEntry> entries(List<SourceCompound> compounds) {
        List<CatalogEntry> entries = new ArrayList<>(compounds.size());
        for (int i = 0; i < compounds.size(); i++) {
            SourceCompound c = compounds.get(i);
            entries.add(new CatalogEntry(SchemaIds.CATALOG_ENTRY, compoundId(i), c.name(), c.termIds(),
                    c.restrictionTags(), c.hazardCodes(), c.active()));
        }
        return List.copyOf(entries);
    }

    private static List<String> list(String field) {
        return field.isEmpty() ? List.of() : List.copyOf(Arrays.asList(field.split(",")));
    }
}
