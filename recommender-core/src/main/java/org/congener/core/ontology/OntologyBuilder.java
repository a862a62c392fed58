package org.congener.core.ontology;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.StringJoiner;

/**
 * Collects terms and is-a edges, then checks and freezes them into an {@link Ontology}. Readers resolve ids
 * themselves (they know about alternative and obsolete ids) and hand over dense indices with the source line
 * of each edge, so that a cycle can be reported where it is written. A builder builds once: the ontology takes
 * over its id table.
 */
public final class OntologyBuilder {
    private final List<String> ids = new ArrayList<>();
    private final List<String> names = new ArrayList<>();
    private final IdIndex indexById;
    private final GrowableIntArray edgeChild = new GrowableIntArray(1024);
    private final GrowableIntArray edgeParent = new GrowableIntArray(1024);
    private final GrowableIntArray edgeLine = new GrowableIntArray(1024);
    private int aliasCount;
    private int obsoleteTermsLeftOut;
    private boolean built;

    public OntologyBuilder() {
        this(1024);
    }

    /** @param expectedTerms how many terms to make room for (a hint; more are accepted) */
    public OntologyBuilder(int expectedTerms) {
        indexById = new IdIndex(expectedTerms);
    }

    /**
     * Adds a term and returns its dense id.
     *
     * @param line source line of the definition, for the duplicate-id message (0 when unknown)
     * @throws OntologyFormatException when the id is already a term or an alias
     */
    public int addTerm(String id, String name, int line) {
        checkNotBuilt();
        if (id.equals(Ontology.VIRTUAL_ROOT_ID)) {
            throw new OntologyFormatException(line, id, "this id is reserved for the virtual root");
        }
        int index = ids.size();
        int previous = indexById.putIfAbsent(id, index);
        if (previous >= 0) {
            throw new OntologyFormatException(line, id, "duplicate id (already defined)");
        }
        ids.add(id);
        names.add(name == null || name.isEmpty() ? id : name);
        return index;
    }

    /** Dense id of a term added before, or -1. */
    public int indexOf(String id) {
        return indexById.get(id);
    }

    public int termCount() {
        return ids.size();
    }

    /** Adds an is-a edge; duplicates are merged when the graph is built. */
    public void addEdge(int child, int parent, int line) {
        checkNotBuilt();
        checkTerm(child);
        checkTerm(parent);
        if (child == parent) {
            throw new OntologyFormatException(line, ids.get(child), "cycle: the term is its own parent");
        }
        edgeChild.add(child);
        edgeParent.add(parent);
        edgeLine.add(line);
    }

    /** Lets {@link Ontology#termIndex(String)} resolve another id (an alt_id, an obsolete id) to a term. */
    public void addAlias(String alias, int term, int line) {
        checkNotBuilt();
        checkTerm(term);
        int previous = indexById.putIfAbsent(alias, term);
        if (previous >= 0 && previous != term) {
            throw new OntologyFormatException(line, alias, "duplicate id: already names term " + ids.get(previous));
        }
        if (previous < 0) {
            aliasCount++;
        }
    }

    /** Records how many obsolete terms the reader left out, for statistics. */
    public void setObsoleteTermsLeftOut(int count) {
        obsoleteTermsLeftOut = count;
    }

    private void checkNotBuilt() {
        if (built) {
            throw new IllegalStateException("this builder has built its ontology already");
        }
    }

    private void checkTerm(int term) {
        if (term < 0 || term >= ids.size()) {
            throw new IllegalArgumentException("no term with index " + term);
        }
    }

    /**
     * Checks the graph is acyclic, joins several roots under a virtual root and computes ancestor sets.
     *
     * @throws OntologyFormatException naming the members of a cycle and the line of one of its edges
     */
    public Ontology build() {
        checkNotBuilt();
        built = true;
        int termCount = ids.size();
        long[] edges = distinctEdges();
        int[] parentCountReal = new int[termCount];
        for (long edge : edges) {
            parentCountReal[(int) (edge >>> 32)]++;
        }
        int[] roots = Arrays.stream(rangeOf(termCount)).filter(t -> parentCountReal[t] == 0).toArray();
        boolean virtualRoot = roots.length > 1;
        int size = termCount + (virtualRoot ? 1 : 0);

        int[] parentOffsets = new int[size + 1];
        for (int t = 0; t < termCount; t++) {
            parentOffsets[t + 1] = parentOffsets[t] + (parentCountReal[t] == 0 && virtualRoot ? 1 : parentCountReal[t]);
        }
        if (virtualRoot) {
            parentOffsets[size] = parentOffsets[termCount];
        }
        int[] parentData = new int[parentOffsets[size]];
        int[] fill = Arrays.copyOf(parentOffsets, size);
        for (long edge : edges) {
            int child = (int) (edge >>> 32);
            parentData[fill[child]++] = (int) edge;
        }
        if (virtualRoot) {
            for (int root : roots) {
                parentData[fill[root]++] = termCount;
            }
        }

        int[] childOffsets = new int[size + 1];
        for (int p : parentData) {
            childOffsets[p + 1]++;
        }
        for (int t = 0; t < size; t++) {
            childOffsets[t + 1] += childOffsets[t];
        }
        int[] childData = new int[parentData.length];
        int[] childFill = Arrays.copyOf(childOffsets, size);
        for (int child = 0; child < size; child++) {
            for (int k = parentOffsets[child]; k < parentOffsets[child + 1]; k++) {
                childData[childFill[parentData[k]]++] = child;
            }
        }

        int[] order = topologicalOrder(size, parentOffsets, childOffsets, childData, parentData);
        int[] depth = new int[size];
        int[] ancestorStart = new int[size];
        int[] ancestorEnd = new int[size];
        int[] ancestorData = new int[Math.max(16, size * 8)];
        int ancestorSize = 0;
        int[] scratch = new int[16];
        for (int term : order) {
            int from = parentOffsets[term];
            int to = parentOffsets[term + 1];
            int d = term == termCount ? -1 : 0;
            int total = 1;
            for (int k = from; k < to; k++) {
                int p = parentData[k];
                if (p != termCount || !virtualRoot) {
                    d = Math.max(d, depth[p] + 1);
                }
                total += ancestorEnd[p] - ancestorStart[p];
            }
            depth[term] = d;
            if (scratch.length < total) {
                scratch = new int[Math.max(total, scratch.length * 2)];
            }
            int n = 0;
            scratch[n++] = term;
            for (int k = from; k < to; k++) {
                int p = parentData[k];
                int count = ancestorEnd[p] - ancestorStart[p];
                System.arraycopy(ancestorData, ancestorStart[p], scratch, n, count);
                n += count;
            }
            Arrays.sort(scratch, 0, n);
            if (ancestorData.length - ancestorSize < n) {
                ancestorData = Arrays.copyOf(ancestorData,
                        Math.max(ancestorData.length + (ancestorData.length >> 1), ancestorSize + n));
            }
            ancestorStart[term] = ancestorSize;
            int last = -1;
            for (int i = 0; i < n; i++) {
                if (scratch[i] != last) {
                    ancestorData[ancestorSize++] = scratch[i];
                    last = scratch[i];
                }
            }
            ancestorEnd[term] = ancestorSize;
        }

        String[] idArray = ids.toArray(new String[size]);
        String[] nameArray = names.toArray(new String[size]);
        if (virtualRoot) {
            idArray[termCount] = Ontology.VIRTUAL_ROOT_ID;
            nameArray[termCount] = "virtual root";
        }
        int top = virtualRoot ? termCount : (roots.length == 1 ? roots[0] : -1);
        return new Ontology(idArray, nameArray, indexById, termCount, edges.length, roots, top,
                parentOffsets, parentData, childOffsets, childData, ancestorStart, ancestorEnd,
                Arrays.copyOf(ancestorData, ancestorSize), depth, obsoleteTermsLeftOut, aliasCount);
    }

    private long[] distinctEdges() {
        long[] keys = new long[edgeChild.size()];
        for (int i = 0; i < keys.length; i++) {
            keys[i] = ((long) edgeChild.get(i) << 32) | edgeParent.get(i);
        }
        Arrays.sort(keys);
        int n = 0;
        for (int i = 0; i < keys.length; i++) {
            if (n == 0 || keys[n - 1] != keys[i]) {
                keys[n++] = keys[i];
            }
        }
        return Arrays.copyOf(keys, n);
    }

    private static int[] rangeOf(int n) {
        int[] range = new int[n];
        Arrays.setAll(range, i -> i);
        return range;
    }

    /** Kahn's algorithm from the roots down; what it cannot reach lies in or below a cycle. */
    private int[] topologicalOrder(int size, int[] parentOffsets, int[] childOffsets, int[] childData,
                                   int[] parentData) {
        int[] pending = new int[size];
        // order doubles as the queue: entries before head are done, entries from head to n are ready
        int[] order = new int[size];
        int n = 0;
        for (int t = 0; t < size; t++) {
            pending[t] = parentOffsets[t + 1] - parentOffsets[t];
            if (pending[t] == 0) {
                order[n++] = t;
            }
        }
        for (int head = 0; head < n; head++) {
            int t = order[head];
            for (int k = childOffsets[t]; k < childOffsets[t + 1]; k++) {
                if (--pending[childData[k]] == 0) {
                    order[n++] = childData[k];
                }
            }
        }
        if (n < size) {
            throw cycleError(pending, parentOffsets, parentData);
        }
        return order;
    }

    /** Every unordered term keeps an unordered parent, so walking such parents must come back on itself. */
    private OntologyFormatException cycleError(int[] pending, int[] parentOffsets, int[] parentData) {
        int start = 0;
        while (pending[start] == 0) {
            start++;
        }
        int[] seenAt = new int[pending.length];
        Arrays.fill(seenAt, -1);
        List<Integer> walk = new ArrayList<>();
        int t = start;
        while (seenAt[t] < 0) {
            seenAt[t] = walk.size();
            walk.add(t);
            int next = -1;
            for (int k = parentOffsets[t]; k < parentOffsets[t + 1]; k++) {
                if (pending[parentData[k]] > 0) {
                    next = parentData[k];
                    break;
                }
            }
            t = next;
        }
        List<Integer> cycle = walk.subList(seenAt[t], walk.size());
        StringJoiner members = new StringJoiner(" is_a ");
        for (int member : cycle) {
            members.add(ids.get(member));
        }
        members.add(ids.get(cycle.get(0)));
        int first = cycle.get(0);
        int second = cycle.size() > 1 ? cycle.get(1) : first;
        return new OntologyFormatException(lineOf(first, second), ids.get(first),
                "cycle of " + cycle.size() + " terms: " + members);
    }

    private int lineOf(int child, int parent) {
        for (int i = 0; i < edgeChild.size(); i++) {
            if (edgeChild.get(i) == child && edgeParent.get(i) == parent) {
                return edgeLine.get(i);
            }
        }
        return 0;
    }
}
