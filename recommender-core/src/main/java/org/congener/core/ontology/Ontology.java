package org.congener.core.ontology;

import java.util.Arrays;
import java.util.Collections;
import java.util.Map;
import java.util.OptionalInt;

/**
 * An immutable is-a graph (a DAG) whose terms carry dense int ids {@code 0 .. size()-1}.
 *
 * <p>Real terms have ids {@code 0 .. termCount()-1} in the order the source defined them. When the source has
 * several roots, one virtual root with id {@code termCount()} sits above them, so every pair of terms has a
 * common ancestor; {@link #top()} is that virtual root, or the single real root. Parents, children and
 * ancestor sets are stored as compact int arrays; each ancestor set is sorted by id and contains the term
 * itself, so two sets intersect by one merge pass.
 *
 * <p>Build one with an {@link OntologyBuilder} or a reader in {@code org.congener.core.ontology.io}.
 */
public final class Ontology {
    /** Id of the virtual root that joins several roots; no reader accepts it as a term id. */
    public static final String VIRTUAL_ROOT_ID = "<virtual-root>";

    private final String[] ids;
    private final String[] names;
    private final IdIndex indexById;
    private final int termCount;
    private final int edgeCount;
    private final int[] roots;
    private final int top;
    private final int[] parentOffsets;
    private final int[] parentData;
    private final int[] childOffsets;
    private final int[] childData;
    private final int[] ancestorStart;
    private final int[] ancestorEnd;
    private final int[] ancestorData;
    private final int[] depth;
    private final int obsoleteTermsLeftOut;
    private final int aliasCount;

    Ontology(String[] ids, String[] names, IdIndex indexById, int termCount, int edgeCount,
             int[] roots, int top, int[] parentOffsets, int[] parentData, int[] childOffsets, int[] childData,
             int[] ancestorStart, int[] ancestorEnd, int[] ancestorData, int[] depth, int obsoleteTermsLeftOut,
             int aliasCount) {
        this.ids = ids;
        this.names = names;
        this.indexById = indexById;
        this.termCount = termCount;
        this.edgeCount = edgeCount;
        this.roots = roots;
        this.top = top;
        this.parentOffsets = parentOffsets;
        this.parentData = parentData;
        this.childOffsets = childOffsets;
        this.childData = childData;
        this.ancestorStart = ancestorStart;
        this.ancestorEnd = ancestorEnd;
        this.ancestorData = ancestorData;
        this.depth = depth;
        this.obsoleteTermsLeftOut = obsoleteTermsLeftOut;
        this.aliasCount = aliasCount;
    }

    /** Number of nodes: the real terms plus the virtual root when there is one. */
    public int size() {
        return ids.length;
    }

    /** Number of real terms (obsolete terms are not among them). */
    public int termCount() {
        return termCount;
    }

    /** Number of distinct is-a edges between real terms. */
    public int edgeCount() {
        return edgeCount;
    }

    /** The real terms without parents, ascending. */
    public int[] roots() {
        return roots.clone();
    }

    /** The single node above all others: the virtual root, or the only real root. */
    public int top() {
        return top;
    }

    public boolean hasVirtualRoot() {
        return ids.length > termCount;
    }

    public boolean isVirtualRoot(int term) {
        return term == termCount && hasVirtualRoot();
    }

    /**
     * Dense id of a term id, of one of its alternative ids, or of an obsolete id through its replacement;
     * -1 when the id is unknown.
     */
    public int termIndex(String id) {
        return indexById.get(id);
    }

    /** {@link #termIndex(String)} as an optional. */
    public OptionalInt findTerm(String id) {
        int index = termIndex(id);
        return index < 0 ? OptionalInt.empty() : OptionalInt.of(index);
    }

    /** The primary id of a term ({@link #VIRTUAL_ROOT_ID} for the virtual root). */
    public String termId(int term) {
        return ids[term];
    }

    /** The term's name, or its id when the source gave none. */
    public String name(int term) {
        return names[term];
    }

    public int parentCount(int term) {
        return parentOffsets[term + 1] - parentOffsets[term];
    }

    /** The k-th parent of a term, {@code 0 <= k < parentCount(term)}; parents are sorted by id. */
    public int parent(int term, int k) {
        return parentData[parentOffsets[term] + k];
    }

    /** A copy of the term's parents, sorted; a real root's only parent is the virtual root if there is one. */
    public int[] parents(int term) {
        return Arrays.copyOfRange(parentData, parentOffsets[term], parentOffsets[term + 1]);
    }

    public int childCount(int term) {
        return childOffsets[term + 1] - childOffsets[term];
    }

    public int child(int term, int k) {
        return childData[childOffsets[term] + k];
    }

    /** A copy of the term's children, sorted. */
    public int[] children(int term) {
        return Arrays.copyOfRange(childData, childOffsets[term], childOffsets[term + 1]);
    }

    /** A copy of the ancestor set, sorted ascending, including the term itself and the virtual root. */
    public int[] ancestors(int term) {
        return Arrays.copyOfRange(ancestorData, ancestorStart[term], ancestorEnd[term]);
    }

    /** Size of the ancestor set (the term itself included). */
    public int ancestorCount(int term) {
        return ancestorEnd[term] - ancestorStart[term];
    }

    /**
     * Start of the term's ancestor set in the shared array read by {@link #ancestorAt(int)}; with
     * {@link #ancestorsTo(int)} this lets hot loops walk the set without a copy.
     */
    public int ancestorsFrom(int term) {
        return ancestorStart[term];
    }

    /** End (exclusive) of the term's ancestor set in the shared array. */
    public int ancestorsTo(int term) {
        return ancestorEnd[term];
    }

    /** One entry of the shared ancestor array, at a position between ancestorsFrom and ancestorsTo. */
    public int ancestorAt(int position) {
        return ancestorData[position];
    }

    /** True when {@code ancestor} is {@code term} itself or lies above it. */
    public boolean isAncestorOrSelf(int ancestor, int term) {
        return Arrays.binarySearch(ancestorData, ancestorStart[term], ancestorEnd[term], ancestor) >= 0;
    }

    /** Length of the longest is-a path from a real root down to the term; roots are 0, the virtual root -1. */
    public int depth(int term) {
        return depth[term];
    }

    public int maxDepth() {
        int max = 0;
        for (int term = 0; term < termCount; term++) {
            max = Math.max(max, depth[term]);
        }
        return max;
    }

    /** How many obsolete terms the reader left out. */
    public int obsoleteTermsLeftOut() {
        return obsoleteTermsLeftOut;
    }

    /** How many alternative or obsolete ids {@link #termIndex(String)} resolves to a primary term. */
    public int aliasCount() {
        return aliasCount;
    }

    /** Every id that {@link #termIndex(String)} resolves, mapped to its dense id (a new map each call). */
    public Map<String, Integer> indexById() {
        return Collections.unmodifiableMap(indexById.toMap());
    }
}
