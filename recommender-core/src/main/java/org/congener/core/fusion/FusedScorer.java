package org.congener.core.fusion;

import org.congener.core.interactions.SparseRows;
import org.congener.core.metrics.ScoreFunction;

/**
 * Fuses a CF score function and a semantic one per researcher by the rules of {@link ScoreFusion},
 * for batch evaluation over many researchers; training items get −∞. Each thread keeps its own two
 * score arrays and fusion scratch, made on its first call.
 */
public final class FusedScorer implements ScoreFunction {
    private final ScoreFunction cf;
    private final ScoreFunction semantic;
    private final SparseRows training;
    private final FusionSettings settings;
    private final ThreadLocal<Scratch> scratch;

    public FusedScorer(ScoreFunction cf, ScoreFunction semantic, SparseRows trainingByUser, FusionSettings settings) {
        this.cf = cf;
        this.semantic = semantic;
        this.training = trainingByUser;
        this.settings = settings;
        int items = trainingByUser.columnCount();
        this.scratch = ThreadLocal.withInitial(() -> new Scratch(items));
    }

    public FusionSettings settings() {
        return settings;
    }

    @Override
    public void scoreAll(int user, double[] out) {
        Scratch s = scratch.get();
        cf.scoreAll(user, s.cf);
        semantic.scoreAll(user, s.semantic);
        s.fusion.fuse(settings, s.cf, s.semantic, training.columnArray(), training.rowStart(user),
                training.rowEnd(user), out);
    }

    private static final class Scratch {
        final double[] cf;
        final double[] semantic;
        final ScoreFusion fusion;

        Scratch(int items) {
            cf = new double[items];
            semantic = new double[items];
            fusion = new ScoreFusion(items);
        }
    }
}
