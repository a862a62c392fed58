package org.congener.core.fusion;

/**
 * A hand-made taxonomy for tests: items are leaves of a small tree, similarity is Wu &amp; Palmer's
 * 2·depth(lca)/(depth(a) + depth(b)) (Wu &amp; Palmer 1994, ACL), root at depth 1.
 * <pre>
 *   0 root ─┬─ 1 acids ─┬─ 3 carboxylic ─┬─ leaf item 0
 *           │           │                └─ leaf item 1
 *           │           └─ leaf item 2
 *           └─ 2 bases ─┬─ leaf item 3
 *                       └─ leaf item 4
 * </pre>
 */
final class TinyTaxonomySimilarity implements ItemSimilarity {
    // parents of nodes 0..8: inner nodes 0..3, leaves 4..8 are items 0..4
    private static final int[] PARENT = {-1, 0, 0, 1, 3, 3, 1, 2, 2};

    static final int ITEMS = 5;

    private static int depth(int node) {
        int d = 1;
        while (PARENT[node] >= 0) {
            node = PARENT[node];
            d++;
        }
        return d;
    }

    private static int lca(int a, int b) {
        java.util.Set<Integer> up = new java.util.HashSet<>();
        for (int n = a; n >= 0; n = PARENT[n]) {
            up.add(n);
        }
        int n = b;
        while (!up.contains(n)) {
            n = PARENT[n];
        }
        return n;
    }

    @Override
    public double similarity(int itemA, int itemB) {
        int a = itemA + 4;
        int b = itemB + 4;
        return 2.0 * depth(lca(a, b)) / (depth(a) + depth(b));
    }
}
