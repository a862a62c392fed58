package org.congener.trainer.evaluation;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Invented test scenario: a three-level taxonomy (4 families × 4 groups × 8 leaf items) and researchers
 * who each work in one or two groups, drawing 85% of their interactions from those groups and the rest
 * at random. Written as an edge list and an interaction TSV; items are taxonomy leaves (no catalogue).
 */
final class TaxonomyScenario {
    static final int FAMILIES = 4;
    static final int GROUPS = 4;
    static final int LEAVES = 8;

    private TaxonomyScenario() {
    }

    static String item(int family, int group, int leaf) {
        return "item-" + family + "-" + group + "-" + leaf;
    }

    static void writeEdges(Path file) throws IOException {
        List<String> lines = new ArrayList<>();
        lines.add("# child<TAB>parent");
        for (int f = 0; f < FAMILIES; f++) {
            lines.add("family-" + f + "\troot");
            for (int g = 0; g < GROUPS; g++) {
                lines.add("group-" + f + "-" + g + "\tfamily-" + f);
                for (int l = 0; l < LEAVES; l++) {
                    lines.add(item(f, g, l) + "\tgroup-" + f + "-" + g);
                }
            }
        }
        Files.write(file, lines);
    }

    static void writeInteractions(Path file, int researchers, int perResearcher, long seed) throws IOException {
        SplittableRandom random = new SplittableRandom(seed);
        List<String> lines = new ArrayList<>();
        for (int r = 0; r < researchers; r++) {
            int groupsOwn = 1 + random.nextInt(2);
            int[][] own = new int[groupsOwn][];
            for (int g = 0; g < groupsOwn; g++) {
                own[g] = new int[] {random.nextInt(FAMILIES), random.nextInt(GROUPS)};
            }
            for (int n = 0; n < perResearcher; n++) {
                String id;
                if (random.nextDouble() < 0.85) {
                    int[] g = own[random.nextInt(groupsOwn)];
                    // within a group, low leaf numbers are more popular
                    int leaf = Math.min(LEAVES - 1, (int) (-Math.log(1 - random.nextDouble()) * 2.5));
                    id = item(g[0], g[1], leaf);
                } else {
                    id = item(random.nextInt(FAMILIES), random.nextInt(GROUPS), random.nextInt(LEAVES));
                }
                double strength = 1 + random.nextInt(3);
                lines.add("researcher-" + r + "\t" + id + "\t" + strength + "\t" + (1_700_000_000_000L + n * 3_600_000L));
            }
        }
        Files.write(file, lines);
    }
}
