package org.congener.trainer.evaluation;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A minimal is-a taxonomy read from an edge list, one {@code child<TAB>parent} pair a line ({@code #}
 * comments), with Lin similarity on intrinsic information content. TO BE REPLACED by the ontology
 * module's reader and similarity ({@code org.congener.core.ontology}) once it is on main; it exists
 * so that {@code evaluate} runs before then, and keeps the same definitions:
 * <ul>
 *   <li>IC(c) = 1 − ln(hypo(c) + 1) / ln(N), hypo = number of descendants, N = number of terms
 *       (Seco, Veale &amp; Hayes 2004, ECAI, eq. 3)</li>
 *   <li>Lin(a, b) = 2·IC(mica) / (IC(a) + IC(b)), mica the common ancestor of highest IC (Lin 1998,
 *       ICML); 1 when a = b</li>
 * </ul>
 */
public final class EdgeListTaxonomy implements TermSimilarity {
    private final Map<String, Integer> index = new HashMap<>();
    private final List<String> terms = new ArrayList<>();
    private final List<List<Integer>> parents = new ArrayList<>();
    private BitSet[] ancestors;
    private double[] informationContent;
    private int[][] ancestorsByIc;

    private EdgeListTaxonomy() {
    }

    public static EdgeListTaxonomy read(Path file) {
        EdgeListTaxonomy t = new EdgeListTaxonomy();
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new InputFileException(file, 0, "cannot read: " + e.getMessage());
        }
        for (int n = 0; n < lines.size(); n++) {
            String line = lines.get(n).strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            String[] f = line.split("\\s+");
            if (f.length != 2) {
                throw new InputFileException(file, n + 1, "expected child<TAB>parent, got " + f.length + " fields");
            }
            if (f[0].equals(f[1])) {
                throw new InputFileException(file, n + 1, "term " + f[0] + " is its own parent");
            }
            int child = t.term(f[0]);
            int parent = t.term(f[1]);
            t.parents.get(child).add(parent);
        }
        if (t.terms.isEmpty()) {
            throw new InputFileException(file, 0, "no edges in the file");
        }
        t.computeAncestors(file);
        return t;
    }

    private int term(String id) {
        Integer existing = index.get(id);
        if (existing != null) {
            return existing;
        }
        index.put(id, terms.size());
        terms.add(id);
        parents.add(new ArrayList<>());
        return terms.size() - 1;
    }

    private void computeAncestors(Path file) {
        int n = terms.size();
        ancestors = new BitSet[n];
        int[] state = new int[n];
        for (int t = 0; t < n; t++) {
            ancestorsOf(t, state, file);
        }
        int[] descendants = new int[n];
        for (int t = 0; t < n; t++) {
            for (int a = ancestors[t].nextSetBit(0); a >= 0; a = ancestors[t].nextSetBit(a + 1)) {
                if (a != t) {
                    descendants[a]++;
                }
            }
        }
        informationContent = new double[n];
        for (int t = 0; t < n; t++) {
            informationContent[t] = n <= 1 ? 1.0 : 1.0 - Math.log(descendants[t] + 1.0) / Math.log(n);
        }
        ancestorsByIc = new int[n][];
        for (int t = 0; t < n; t++) {
            ancestorsByIc[t] = ancestors[t].stream().boxed()
                    .sorted((a, b) -> Double.compare(informationContent[b], informationContent[a]))
                    .mapToInt(Integer::intValue).toArray();
        }
    }

    /** Ancestors including the term itself; iterative depth-first with cycle detection. */
    private void ancestorsOf(int start, int[] state, Path file) {
        if (state[start] == 2) {
            return;
        }
        Deque<int[]> stack = new ArrayDeque<>();
        stack.push(new int[] {start, 0});
        state[start] = 1;
        while (!stack.isEmpty()) {
            int[] top = stack.peek();
            int t = top[0];
            List<Integer> ps = parents.get(t);
            if (top[1] < ps.size()) {
                int p = ps.get(top[1]++);
                if (state[p] == 1) {
                    throw new InputFileException(file, 0, "is-a cycle through " + terms.get(p));
                }
                if (state[p] == 0) {
                    state[p] = 1;
                    stack.push(new int[] {p, 0});
                }
            } else {
                BitSet set = new BitSet();
                set.set(t);
                for (int p : ps) {
                    set.or(ancestors[p]);
                }
                ancestors[t] = set;
                state[t] = 2;
                stack.pop();
            }
        }
    }

    @Override
    public double similarity(int termA, int termB) {
        return lin(termA, termB);
    }

    @Override
    public int termCount() {
        return terms.size();
    }

    /** Index of a term id, or −1 when the taxonomy does not have it. */
    @Override
    public int indexOf(String termId) {
        Integer i = index.get(termId);
        return i == null ? -1 : i;
    }

    public double informationContent(int term) {
        return informationContent[term];
    }

    /** Lin similarity of two terms (class comment). */
    public double lin(int a, int b) {
        if (a == b) {
            return 1.0;
        }
        double mica = 0.0;
        for (int c : ancestorsByIc[a]) {
            if (ancestors[b].get(c)) {
                mica = informationContent[c];
                break;
            }
        }
        double denominator = informationContent[a] + informationContent[b];
        return denominator == 0 ? 0.0 : 2 * mica / denominator;
    }
}
