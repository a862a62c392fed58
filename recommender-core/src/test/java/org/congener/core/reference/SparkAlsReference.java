package org.congener.core.reference;

import java.util.ArrayList;
import java.util.List;
import org.apache.spark.ml.recommendation.ALS;
import org.apache.spark.ml.recommendation.ALSModel;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructType;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.interactions.InteractionMatrix;
import org.congener.core.interactions.SparseRows;

/**
 * Spark MLlib's implicit-feedback ALS (spark-mllib 4.1.0, test scope) run on the same matrix with the
 * same rank, λ (regParam), α and iteration count. Settings from ../shared/SPARK-NOTES.md: local[2],
 * no UI, driver on 127.0.0.1, two blocks per side.
 */
public final class SparkAlsReference implements AutoCloseable {
    private final SparkSession spark;

    public SparkAlsReference() {
        spark = SparkSession.builder()
                .master("local[2]")
                .appName("congener-als-reference")
                .config("spark.ui.enabled", "false")
                .config("spark.driver.host", "127.0.0.1")
                .config("spark.driver.bindAddress", "127.0.0.1")
                .config("spark.sql.shuffle.partitions", "4")
                .getOrCreate();
        spark.sparkContext().setLogLevel("WARN");
    }

    /** Fitted user and item factors, rows in our indexes; rows Spark never saw stay 0. */
    public record Factors(FactorMatrix users, FactorMatrix items) {
    }

    public Factors fit(InteractionMatrix matrix, AlsConfig config, long seed) {
        StructType schema = new StructType()
                .add("user", DataTypes.IntegerType)
                .add("item", DataTypes.IntegerType)
                .add("rating", DataTypes.FloatType);
        List<Row> rows = new ArrayList<>(matrix.nonZeroCount());
        SparseRows byUser = matrix.byUser();
        for (int u = 0; u < byUser.rowCount(); u++) {
            for (int p = byUser.rowStart(u); p < byUser.rowEnd(u); p++) {
                rows.add(RowFactory.create(u, byUser.column(p), (float) byUser.value(p)));
            }
        }
        Dataset<Row> frame = spark.createDataFrame(rows, schema);
        ALS als = new ALS()
                .setImplicitPrefs(true)
                .setRank(config.rank())
                .setMaxIter(config.iterations())
                .setRegParam(config.lambda())
                .setAlpha(config.alpha())
                .setNumUserBlocks(2)
                .setNumItemBlocks(2)
                .setSeed(seed)
                .setUserCol("user")
                .setItemCol("item")
                .setRatingCol("rating");
        ALSModel model = als.fit(frame);
        return new Factors(collect(model.userFactors(), matrix.userCount(), config.rank()),
                collect(model.itemFactors(), matrix.itemCount(), config.rank()));
    }

    private static FactorMatrix collect(Dataset<Row> factors, int rows, int rank) {
        FactorMatrix out = new FactorMatrix(rows, rank);
        for (Row row : factors.collectAsList()) {
            int id = row.getInt(0);
            List<Object> values = row.getList(1);
            double[] v = new double[rank];
            for (int f = 0; f < rank; f++) {
                v[f] = ((Number) values.get(f)).doubleValue();
            }
            out.setRow(id, v);
        }
        return out;
    }

    @Override
    public void close() {
        spark.stop();
    }
}
