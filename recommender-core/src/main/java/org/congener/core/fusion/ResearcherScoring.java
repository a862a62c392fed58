package org.congener.core.fusion;

import org.congener.core.factorisation.DenseKernels;
import org.congener.core.factorisation.FactorColumns;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FoldIn;

/**
 * The scores of every item for one researcher under one model version, into a per-thread
 * {@link ScoringWorkspace}: fold-in of x_u ({@link FoldIn}), CF scores Y·x_u, the mean semantic score
 * over the neighbour lists ({@link SemanticScorer}) and the fusion rule ({@link ScoreFusion}). The
 * stream (per event, with the researcher's previous vector as a warm start) and the batch path
 * ({@link OneResearcherScoring}, without one) both run this code.
 *
 * <p>Without a warm start the fold-in is exact (Cholesky): it is the solution itself, so the batch
 * lists depend on no tolerance and are bit for bit what they were before the workspace, and at k = 64
 * it costs about as much as CG run to convergence from zero (n_u·k²/2 + k³/6 multiply-adds against
 * 12 to 25 steps of k² + 2·n_u·k). It happens once per researcher and version; every later event has
 * the kept vector. With a warm start CG runs to ‖r‖ ≤ {@link FoldIn#CONVERGED_RELATIVE_RESIDUAL}·‖b‖,
 * within about 1e-10 of the exact vector, so the stream's top-N is the batch top-N.
 *
 * <p>The CF product reads a second copy of Y laid out factor by factor in panels of items
 * ({@link FactorColumns}: within a panel, each factor's values of its items side by side, as floats
 * when Y's entries all are floats), while
 * the fold-in goes on reading Y row by row. In that layout a vector of lanes holds one score per
 * item, each summed in its own lane by fused multiply-adds over the factors in order
 * ({@link DenseKernels#multiplyFactorMajor}), so no score needs a horizontal sum across lanes, and
 * in a batch ({@link #multiplyBatch}) each widened block of factors serves a group of vectors at
 * once. A researcher scored alone ({@link #score}) and in a batch gets the same sums in the same
 * order, hence the same bits, which is what lets the stream's top-N equal the batch top-N of
 * {@link OneResearcherScoring}.
 *
 * <p>Immutable and thread-safe; each thread passes its own workspace.
 */
public final class ResearcherScoring {
    private static final DenseKernels KERNELS = DenseKernels.best();

    private final FoldIn foldIn;
    private final NeighbourLists neighbours;
    private final FusionSettings fusion;
    private final FactorColumns columns;

    public ResearcherScoring(FoldIn foldIn, FactorMatrix itemFactors, NeighbourLists neighbours,
                             FusionSettings fusion) {
        if (neighbours.itemCount() != itemFactors.rows()) {
            throw new IllegalArgumentException("neighbour lists cover " + neighbours.itemCount() + " items, factors "
                    + itemFactors.rows());
        }
        if (foldIn.rank() != itemFactors.rank()) {
            throw new IllegalArgumentException("fold-in has rank " + foldIn.rank() + ", factors " + itemFactors.rank());
        }
        this.foldIn = foldIn;
        this.neighbours = neighbours;
        this.fusion = fusion;
        this.columns = FactorColumns.of(itemFactors);
    }

    /**
     * Whether the CF product reads the factors as floats: when every entry is a float value, which
     * halves the bytes read and changes no bit of the scores.
     */
    public boolean readsFloatFactors() {
        return columns.floats();
    }

    public int itemCount() {
        return columns.items();
    }

    public int rank() {
        return columns.rank();
    }

    public FusionSettings fusion() {
        return fusion;
    }

    /** A workspace of this model's size; one per thread, kept across calls. */
    public ScoringWorkspace newWorkspace() {
        return new ScoringWorkspace(itemCount(), rank());
    }

    /**
     * {@code previous} when it fits this model's size, else a new workspace: for a thread that keeps
     * its workspace across model versions.
     */
    public ScoringWorkspace workspaceFor(ScoringWorkspace previous) {
        return previous != null && previous.fits(itemCount(), rank()) ? previous : newWorkspace();
    }

    /**
     * Scores one researcher into {@code ws} and returns it.
     *
     * @param items     indices of the compounds the researcher interacted with (distinct)
     * @param strengths r_ui of each
     * @param warmStart the researcher's x_u from an earlier call under this same model version (k
     *                  entries, not modified), or null: with it the fold-in is CG run to convergence
     *                  from it, without it exact
     * @param ws        this thread's workspace; overwritten
     */
    public ScoringWorkspace score(int[] items, double[] strengths, double[] warmStart, ScoringWorkspace ws) {
        check(items, strengths, ws);
        ws.sortItems(items, strengths);
        foldInto(items, strengths, warmStart, ws);
        columns.multiply(KERNELS, ws.vector, ws.cf);
        semanticAndFusion(items.length, ws);
        return ws;
    }

    /**
     * The fold-in alone, for a caller that scores later with other researchers in a {@link ScoringBatch}:
     * x_u as {@link #score} computes it, left in {@code ws} (read it with {@link
     * ScoringWorkspace#copyVector}). The arguments are those of {@link #score}.
     */
    public ScoringWorkspace foldIn(int[] items, double[] strengths, double[] warmStart, ScoringWorkspace ws) {
        check(items, strengths, ws);
        ws.sortItems(items, strengths);
        foldInto(items, strengths, warmStart, ws);
        return ws;
    }

    /** An empty batch for up to {@code capacity} researchers under this model. */
    public ScoringBatch newBatch(int capacity) {
        return new ScoringBatch(capacity, itemCount(), rank());
    }

    /**
     * The CF scores of every column of {@code batch}, Y·[x_1 … x_B], in one pass over the item factors:
     * each column's scores equal the single product of {@link #score} bit for bit
     * ({@link DenseKernels#multiplyFactorMajorMany}). {@code ws} must fit this model (the product needs
     * no scratch of it).
     */
    public void multiplyBatch(ScoringBatch batch, ScoringWorkspace ws) {
        if (!batch.fits(itemCount(), rank()) || !ws.fits(itemCount(), rank())) {
            throw new IllegalArgumentException("batch or workspace made for another model size");
        }
        columns.multiplyMany(KERNELS, batch.vectors, batch.size, batch.cf);
        batch.multiplied = true;
    }

    /**
     * Scores column {@code column} of a multiplied batch into {@code ws} and returns it: the same scores
     * as {@link #score} with that column's vector, bit for bit. {@code items} and {@code strengths} are
     * the researcher's history the vector was folded in from. The column's CF scores move into the
     * workspace (its arrays are exchanged, nothing is copied), so each column is scored once per batch.
     */
    public ScoringWorkspace scoreColumn(ScoringBatch batch, int column, int[] items, double[] strengths,
                                        ScoringWorkspace ws) {
        check(items, strengths, ws);
        if (!batch.fits(itemCount(), rank()) || !batch.multiplied || column < 0 || column >= batch.size) {
            throw new IllegalArgumentException("column " + column + " of a batch of " + batch.size
                    + (batch.multiplied ? "" : " not multiplied yet") + " for this model");
        }
        double[] scores = batch.cf[column];
        batch.cf[column] = ws.cf;
        ws.cf = scores;
        System.arraycopy(batch.vectors[column], 0, ws.vector, 0, rank());
        ws.sortItems(items, strengths);
        semanticAndFusion(items.length, ws);
        return ws;
    }

    private void check(int[] items, double[] strengths, ScoringWorkspace ws) {
        if (!ws.fits(itemCount(), rank())) {
            throw new IllegalArgumentException("workspace for " + ws.itemCount() + " items at rank " + ws.rank()
                    + ", model has " + itemCount() + " at rank " + rank());
        }
        if (items.length != strengths.length) {
            throw new IllegalArgumentException(items.length + " items but " + strengths.length + " strengths");
        }
    }

    private void semanticAndFusion(int researcherItems, ScoringWorkspace ws) {
        SemanticScorer.scoreInto(ws.sortedItems, ws.sortedStrengths, 0, researcherItems, neighbours,
                SemanticAggregation.MEAN, ws.semantic);
        ws.fusion.fuse(fusion, ws.cf, ws.semantic, ws.sortedItems, 0, researcherItems, ws.fused);
    }

    private void foldInto(int[] items, double[] strengths, double[] warmStart, ScoringWorkspace ws) {
        if (items.length == 0) {
            // no interactions: x_u = 0 (the minimiser of λ‖x‖² + Σ_i (x·y_i)²)
            java.util.Arrays.fill(ws.vector, 0.0);
            ws.foldInSteps = 0;
        } else if (warmStart == null) {
            foldIn.foldInExact(items, strengths, ws.vector, ws.foldIn);
            ws.foldInSteps = 0;
        } else {
            ws.foldInSteps = foldIn.foldInConverged(items, strengths, warmStart, ws.vector, ws.foldIn);
        }
    }
}
