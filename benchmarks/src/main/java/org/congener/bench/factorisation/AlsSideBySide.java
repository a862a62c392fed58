package org.congener.bench.factorisation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.spark.ml.recommendation.ALS;
import org.apache.spark.ml.recommendation.ALSModel;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructType;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.AlsModel;
import org.congener.core.factorisation.Bpr;
import org.congener.core.factorisation.BprConfig;
import org.congener.core.factorisation.DenseKernels;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.ImplicitAls;
import org.congener.core.factorisation.Regularisation;
import org.congener.core.factorisation.SolverKind;
import org.congener.core.interactions.Interaction;
import org.congener.core.interactions.InteractionMatrix;
import org.congener.core.interactions.InteractionMatrixBuilder;
import org.congener.core.interactions.PlantedInteractions;
import org.congener.core.metrics.RankingEvaluation;
import org.congener.core.split.LeaveKOut;
import org.congener.core.split.Split;

/**
 * End-to-end harness: Congener's ALS (CG and Cholesky) and Spark MLlib's implicit ALS fit the same
 * planted data (default 20,000 × 5,000 × 500,000, true rank 16) at rank 64, 10 iterations, λ 0.01 with
 * Spark's λ·n weighting, α 1, two threads / local[2], interleaved rounds, minimum time kept; held-out
 * nDCG@10 on a leave-one-out split; the machine's multiply-add rate on 2 threads measured two ways;
 * BPR epochs per second. Arguments: [users items interactions rounds].
 */
public final class AlsSideBySide {
    private static final int RANK = 64;
    private static final int ITERATIONS = 10;
    private static final int THREADS = 2;

    private AlsSideBySide() {
    }

    public static void main(String[] args) throws Exception {
        int users = args.length > 0 ? Integer.parseInt(args[0]) : 20_000;
        int items = args.length > 1 ? Integer.parseInt(args[1]) : 5_000;
        int interactions = args.length > 2 ? Integer.parseInt(args[2]) : 500_000;
        int rounds = args.length > 3 ? Integer.parseInt(args[3]) : 3;

        System.out.printf(Locale.ROOT, "multiply-adds/s on %d threads: scalar %.2f G, vector %.2f G (%s)%n", THREADS,
                MultiplyAddRate.best(DenseKernels.scalar(), THREADS, 5) / 1e9,
                MultiplyAddRate.best(DenseKernels.best(), THREADS, 5) / 1e9, DenseKernels.best());

        InteractionMatrix all = PlantedInteractions.generate(users, items, interactions, 16, 2.0, 20L);
        Split split = new LeaveKOut(1, 1L).split(cells(all));
        InteractionMatrix train = matrix(split.train(), users, items);
        System.out.printf(Locale.ROOT, "data: %d × %d, %d distinct cells (%d training)%n", users, items,
                all.nonZeroCount(), train.nonZeroCount());

        AlsConfig base = AlsConfig.defaults().withRank(RANK).withIterations(ITERATIONS).withLambda(0.01).withAlpha(1.0)
                .withRegularisation(Regularisation.PER_INTERACTION).withThreads(THREADS);
        AlsConfig cg = base.withSolver(SolverKind.CONJUGATE_GRADIENT).withCgSteps(3);
        AlsConfig chol = base.withSolver(SolverKind.CHOLESKY);

        SparkSession spark = SparkSession.builder().master("local[2]").appName("congener-bench")
                .config("spark.ui.enabled", "false").config("spark.driver.host", "127.0.0.1")
                .config("spark.driver.bindAddress", "127.0.0.1").config("spark.sql.shuffle.partitions", "4")
                .getOrCreate();
        spark.sparkContext().setLogLevel("ERROR");
        Dataset<Row> frame = frame(spark, train).cache();
        frame.count();

        double[] tCg = new double[rounds];
        double[] tChol = new double[rounds];
        double[] tSpark = new double[rounds];
        AlsModel cgModel = null;
        AlsModel cholModel = null;
        ALSModel sparkModel = null;
        for (int r = 0; r < rounds; r++) {
            long t0 = System.nanoTime();
            cgModel = new ImplicitAls(cg).fit(train);
            tCg[r] = (System.nanoTime() - t0) / 1e9;
            t0 = System.nanoTime();
            sparkModel = sparkAls(base).fit(frame);
            sparkModel.userFactors().count();
            tSpark[r] = (System.nanoTime() - t0) / 1e9;
            t0 = System.nanoTime();
            cholModel = new ImplicitAls(chol).fit(train);
            tChol[r] = (System.nanoTime() - t0) / 1e9;
            System.out.printf(Locale.ROOT, "round %d: congener CG %.2f s, Spark %.2f s, congener Cholesky %.2f s%n",
                    r + 1, tCg[r], tSpark[r], tChol[r]);
        }
        FactorMatrix sparkUsers = collect(sparkModel.userFactors(), users);
        FactorMatrix sparkItems = collect(sparkModel.itemFactors(), items);
        spark.stop();

        RankingEvaluation evaluation = new RankingEvaluation(new int[] {10}, 100, THREADS);
        double[] perCg = perResearcher(evaluation, train, split, cgModel::scoreAll);
        double ndcgCg = Arrays.stream(perCg).average().orElse(Double.NaN);
        double ndcgChol = Arrays.stream(perResearcher(evaluation, train, split, cholModel::scoreAll)).average()
                .orElse(Double.NaN);
        double[] perSpark = perResearcher(evaluation, train, split, (u, out) -> {
            for (int i = 0; i < out.length; i++) {
                out[i] = FactorMatrix.dot(sparkUsers, u, sparkItems, i);
            }
        });
        double ndcgSpark = Arrays.stream(perSpark).average().orElse(Double.NaN);
        org.congener.core.metrics.ConfidenceInterval gap =
                org.congener.core.metrics.Bootstrap.meanDifferenceInterval(perCg, perSpark, 1000, 0.95, 5L);
        System.out.printf(Locale.ROOT, "nDCG@10 CG − Spark: %+.4f, 95%% paired bootstrap [%+.4f, %+.4f]%n",
                gap.mean(), gap.lower(), gap.upper());
        double minCg = min(tCg);
        double minChol = min(tChol);
        double minSpark = min(tSpark);
        System.out.printf(Locale.ROOT, "fit, min of %d: congener CG %.2f s (%.3f s/iteration), Cholesky %.2f s "
                        + "(%.3f s/iteration), Spark %.2f s; CG/Spark = %.3f%n", rounds, minCg, minCg / ITERATIONS,
                minChol, minChol / ITERATIONS, minSpark, minCg / minSpark);
        System.out.printf(Locale.ROOT, "nDCG@10: congener CG %.4f, Cholesky %.4f, Spark %.4f%n", ndcgCg, ndcgChol,
                ndcgSpark);
        long rows = users + (long) items;
        long nnz = train.nonZeroCount();
        int s = cg.cgSteps();
        // CG per row and half-step: (s + 1)·(k² Gram product + 2·n_u·k for the sparse part); Gram 2 × n·k²/2
        double cgOps = (s + 1) * (rows * (double) RANK * RANK + 2.0 * 2 * nnz * RANK) + rows * (double) RANK * RANK / 2;
        // Cholesky: n_u·k²/2 rank-one updates + k³/6 factorisation (k³/3 flops) + k² triangular solves
        // + n_u·k right-hand side, both half-steps, + Gram
        double cholOps = 2.0 * nnz * RANK * RANK / 2 + rows * Math.pow(RANK, 3) / 6 + rows * (double) RANK * RANK
                + 2.0 * nnz * RANK + rows * (double) RANK * RANK / 2;
        System.out.printf(Locale.ROOT, "multiply-adds per iteration: CG %.3g, Cholesky %.3g%n", cgOps, cholOps);

        BprConfig bprConfig = BprConfig.defaults().withRank(RANK).withEpochs(5).withThreads(THREADS);
        long t0 = System.nanoTime();
        new Bpr(bprConfig).fit(train);
        double bprSeconds = (System.nanoTime() - t0) / 1e9;
        System.out.printf(Locale.ROOT, "BPR rank %d, %d threads: %.2f epochs/s (%d triples per epoch)%n", RANK, THREADS,
                5 / bprSeconds, nnz);
    }

    private static ALS sparkAls(AlsConfig c) {
        return new ALS().setImplicitPrefs(true).setRank(c.rank()).setMaxIter(c.iterations()).setRegParam(c.lambda())
                .setAlpha(c.alpha()).setNumUserBlocks(2).setNumItemBlocks(2).setSeed(3L).setUserCol("user")
                .setItemCol("item").setRatingCol("rating");
    }

    private static Dataset<Row> frame(SparkSession spark, InteractionMatrix m) {
        StructType schema = new StructType().add("user", DataTypes.IntegerType).add("item", DataTypes.IntegerType)
                .add("rating", DataTypes.FloatType);
        List<Row> rows = new ArrayList<>(m.nonZeroCount());
        for (int u = 0; u < m.userCount(); u++) {
            for (int p = m.byUser().rowStart(u); p < m.byUser().rowEnd(u); p++) {
                rows.add(RowFactory.create(u, m.byUser().column(p), (float) m.byUser().value(p)));
            }
        }
        return spark.createDataFrame(rows, schema);
    }

    private static FactorMatrix collect(Dataset<Row> factors, int rows) {
        FactorMatrix out = new FactorMatrix(rows, RANK);
        for (Row row : factors.collectAsList()) {
            List<Object> values = row.getList(1);
            double[] v = new double[RANK];
            for (int f = 0; f < RANK; f++) {
                v[f] = ((Number) values.get(f)).doubleValue();
            }
            out.setRow(row.getInt(0), v);
        }
        return out;
    }

    private static double[] perResearcher(RankingEvaluation evaluation, InteractionMatrix train, Split split,
                                          org.congener.core.metrics.ScoreFunction scorer) {
        Map<String, double[]> values = evaluation.perResearcher(train.byUser(), split.test(), scorer);
        return values.get("ndcg@10");
    }

    private static double min(double[] v) {
        return Arrays.stream(v).min().orElse(Double.NaN);
    }

    private static List<Interaction> cells(InteractionMatrix m) {
        List<Interaction> out = new ArrayList<>();
        for (int u = 0; u < m.userCount(); u++) {
            for (int p = m.byUser().rowStart(u); p < m.byUser().rowEnd(u); p++) {
                out.add(new Interaction(u, m.byUser().column(p), m.byUser().value(p), 0L));
            }
        }
        return out;
    }

    private static InteractionMatrix matrix(List<Interaction> cells, int users, int items) {
        InteractionMatrixBuilder b = new InteractionMatrixBuilder(users, items);
        cells.forEach(i -> b.add(i.user(), i.item(), i.strength()));
        return b.build();
    }
}
