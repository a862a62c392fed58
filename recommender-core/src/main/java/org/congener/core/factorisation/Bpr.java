package org.congener.core.factorisation;

import java.util.SplittableRandom;
import org.congener.core.interactions.InteractionMatrix;
import org.congener.core.interactions.SparseRows;

/**
 * LearnBPR (Rendle et al. 2009, Figure 4): stochastic gradient ascent on
 * BPR-Opt = Σ ln σ(x̂_uij) − λ‖Θ‖² with x̂_uij = x̂_ui − x̂_uj, triples (u, i, j) drawn with i an item
 * of u and j drawn uniformly from the items u has not touched. For each draw, with
 * g = 1 − σ(x̂_uij) = e^{−x̂}/(1 + e^{−x̂}):
 * <pre>
 *   x_u += α (g (y_i − y_j) − λ_Θ x_u)
 *   y_i += α (g x_u − λ_{H+} y_i),   y_j += α (−g x_u − λ_{H−} y_j)
 *   b_i += α (g − λ_b b_i),          b_j += α (−g − λ_b b_j)
 * </pre>
 * With T threads, users and items are cut into T blocks (index mod T) and an epoch runs T sub-epochs;
 * in sub-epoch s thread t draws only users of block t and items (positive and negative) of block
 * (t + s) mod T, so no two threads touch the same row (the stratification of Gemulla et al. 2011,
 * "Large-scale matrix factorization with distributed stochastic gradient descent", KDD). Negatives are
 * then uniform within the item block; over an epoch every block is visited. With one thread this is
 * plain LearnBPR. Each (epoch, sub-epoch, thread) draws from its own seeded stream: the result is fixed
 * by the seed and the thread count.
 */
public final class Bpr {
    private final BprConfig config;

    public Bpr(BprConfig config) {
        this.config = config;
    }

    public BprModel fit(InteractionMatrix matrix) {
        return fit(matrix, TrainingListener.NONE);
    }

    public BprModel fit(InteractionMatrix matrix, TrainingListener listener) {
        int k = config.rank();
        int t = config.threads();
        SparseRows byUser = matrix.byUser();
        FactorMatrix x = scaledRandom(matrix.userCount(), k, config.seed());
        FactorMatrix y = scaledRandom(matrix.itemCount(), k, config.seed() + 1);
        double[] bias = new double[matrix.itemCount()];
        int[][] strata = strata(byUser, t);
        int[][] blockItems = blockItems(matrix.itemCount(), t);
        int[] users = userOfPosition(byUser);
        try (ParallelRows parallel = new ParallelRows(t)) {
            for (int epoch = 0; epoch < config.epochs(); epoch++) {
                for (int s = 0; s < t; s++) {
                    final int sub = s;
                    final int ep = epoch;
                    parallel.forEachBlock(t, block -> {
                        int itemBlock = (block + sub) % t;
                        int[] stratum = strata[block * t + itemBlock];
                        SplittableRandom random = new SplittableRandom(
                                mix(config.seed(), ep, sub, block));
                        runStratum(byUser, users, stratum, blockItems[itemBlock], x, y, bias, random);
                    });
                }
                listener.iterationDone(epoch + 1, config.epochs(), Double.NaN);
            }
        }
        return new BprModel(x, y, bias, config);
    }

    /**
     * Fold-in of one researcher with item factors and biases fixed: {@code steps} LearnBPR draws that
     * update x_u only, from a start seeded by {@code seed}. Returns the new x_u.
     */
    public static double[] foldInUser(BprModel model, int[] items, int steps, long seed) {
        BprConfig cfg = model.config();
        int k = cfg.rank();
        int itemCount = model.itemFactors().rows();
        int[] sorted = items.clone();
        java.util.Arrays.sort(sorted);
        SplittableRandom random = new SplittableRandom(seed);
        double[] xu = new double[k];
        for (int f = 0; f < k; f++) {
            xu[f] = FactorMatrix.gaussian(random) * cfg.initStd();
        }
        if (sorted.length == 0 || sorted.length == itemCount) {
            return xu;
        }
        double[] y = model.itemFactors().data();
        double[] b = model.itemBias();
        DenseKernels kernels = DenseKernels.best();
        for (int step = 0; step < steps; step++) {
            int i = sorted[random.nextInt(sorted.length)];
            int j;
            do {
                j = random.nextInt(itemCount);
            } while (java.util.Arrays.binarySearch(sorted, j) >= 0);
            double xuij = kernels.dot(xu, 0, y, i * k, k) - kernels.dot(xu, 0, y, j * k, k) + b[i] - b[j];
            double g = sigmoid(-xuij);
            for (int f = 0; f < k; f++) {
                xu[f] += cfg.learningRate() * (g * (y[i * k + f] - y[j * k + f]) - cfg.regUser() * xu[f]);
            }
        }
        return xu;
    }

    private void runStratum(SparseRows byUser, int[] users, int[] stratum, int[] negatives, FactorMatrix xm, FactorMatrix ym,
                            double[] bias, SplittableRandom random) {
        if (stratum.length == 0 || negatives.length == 0) {
            return;
        }
        int k = config.rank();
        double[] x = xm.data();
        double[] y = ym.data();
        double lr = config.learningRate();
        for (int draw = 0; draw < stratum.length; draw++) {
            int p = stratum[random.nextInt(stratum.length)];
            int u = users[p];
            int i = byUser.column(p);
            int j = -1;
            for (int attempt = 0; attempt < 32; attempt++) {
                int candidate = negatives[random.nextInt(negatives.length)];
                if (!byUser.contains(u, candidate)) {
                    j = candidate;
                    break;
                }
            }
            if (j < 0) {
                continue;
            }
            int uo = u * k;
            int io = i * k;
            int jo = j * k;
            double xuij = bias[i] - bias[j];
            for (int f = 0; f < k; f++) {
                xuij += x[uo + f] * (y[io + f] - y[jo + f]);
            }
            double g = sigmoid(-xuij);
            for (int f = 0; f < k; f++) {
                double xf = x[uo + f];
                double yi = y[io + f];
                double yj = y[jo + f];
                x[uo + f] += lr * (g * (yi - yj) - config.regUser() * xf);
                y[io + f] += lr * (g * xf - config.regPositive() * yi);
                y[jo + f] += lr * (-g * xf - config.regNegative() * yj);
            }
            bias[i] += lr * (g - config.regBias() * bias[i]);
            bias[j] += lr * (-g - config.regBias() * bias[j]);
        }
    }

    /** The user of each CSR position. */
    private static int[] userOfPosition(SparseRows byUser) {
        int[] users = new int[byUser.nonZeroCount()];
        for (int u = 0; u < byUser.rowCount(); u++) {
            for (int p = byUser.rowStart(u); p < byUser.rowEnd(u); p++) {
                users[p] = u;
            }
        }
        return users;
    }

    /** CSR positions of each (user block, item block) stratum, index userBlock·T + itemBlock. */
    private static int[][] strata(SparseRows byUser, int t) {
        int[] counts = new int[t * t];
        for (int u = 0; u < byUser.rowCount(); u++) {
            for (int p = byUser.rowStart(u); p < byUser.rowEnd(u); p++) {
                counts[(u % t) * t + byUser.column(p) % t]++;
            }
        }
        int[][] out = new int[t * t][];
        for (int s = 0; s < out.length; s++) {
            out[s] = new int[counts[s]];
        }
        int[] fill = new int[t * t];
        for (int u = 0; u < byUser.rowCount(); u++) {
            for (int p = byUser.rowStart(u); p < byUser.rowEnd(u); p++) {
                int s = (u % t) * t + byUser.column(p) % t;
                out[s][fill[s]++] = p;
            }
        }
        return out;
    }

    private static int[][] blockItems(int items, int t) {
        int[][] out = new int[t][];
        for (int b = 0; b < t; b++) {
            int n = (items - b + t - 1) / t;
            out[b] = new int[Math.max(0, n)];
            for (int m = 0; m < out[b].length; m++) {
                out[b][m] = b + m * t;
            }
        }
        return out;
    }

    private FactorMatrix scaledRandom(int rows, int k, long seed) {
        FactorMatrix m = new FactorMatrix(rows, k);
        double[] d = m.data();
        for (int r = 0; r < rows; r++) {
            SplittableRandom random = new SplittableRandom(seed * 0x9E3779B97F4A7C15L + r);
            for (int f = 0; f < k; f++) {
                d[r * k + f] = FactorMatrix.gaussian(random) * config.initStd();
            }
        }
        return m;
    }

    private static long mix(long seed, int epoch, int sub, int block) {
        long h = seed;
        h = h * 0x9E3779B97F4A7C15L + epoch;
        h = h * 0x9E3779B97F4A7C15L + sub;
        h = h * 0x9E3779B97F4A7C15L + block;
        return h;
    }

    static double sigmoid(double v) {
        return 1.0 / (1.0 + Math.exp(-v));
    }
}
