package org.congener.core.ontology.similarity;

/** Similarity of two compounds, each mapped to a set of terms, by a term measure and an {@link Aggregation}. */
public final class CompoundSimilarity {
    private final SimilarityMeasure measure;
    private final Aggregation aggregation;

    public CompoundSimilarity(SimilarityMeasure measure, Aggregation aggregation) {
        this.measure = measure;
        this.aggregation = aggregation;
    }

    public SimilarityMeasure measure() {
        return measure;
    }

    public Aggregation aggregation() {
        return aggregation;
    }

    /**
     * @param termsA dense term ids of one compound (not modified)
     * @param termsB dense term ids of the other
     * @return similarity in [0, 1]; 0 when either compound has no terms
     */
    public double similarity(int[] termsA, int[] termsB) {
        if (termsA.length == 0 || termsB.length == 0) {
            return 0.0;
        }
        return aggregation == Aggregation.MAX ? max(termsA, termsB) : bestMatchAverage(termsA, termsB);
    }

    private double max(int[] termsA, int[] termsB) {
        double best = 0.0;
        for (int a : termsA) {
            for (int b : termsB) {
                best = Math.max(best, measure.similarity(a, b));
                if (best >= 1.0) {
                    return best;
                }
            }
        }
        return best;
    }

    private double bestMatchAverage(int[] termsA, int[] termsB) {
        double[] matrix = new double[termsA.length * termsB.length];
        for (int i = 0; i < termsA.length; i++) {
            for (int j = 0; j < termsB.length; j++) {
                matrix[i * termsB.length + j] = measure.similarity(termsA[i], termsB[j]);
            }
        }
        return bestMatchAverage(matrix, termsA.length, termsB.length);
    }

    /**
     * Best-match average of a row-major matrix of term similarities (rows: A's terms, columns: B's terms), not
     * modified. Public so that searches which fill the matrix their own way get bit-identical results.
     */
    public static double bestMatchAverage(double[] matrix, int rows, int columns) {
        double sumRows = 0.0;
        for (int i = 0; i < rows; i++) {
            double best = 0.0;
            for (int j = 0; j < columns; j++) {
                best = Math.max(best, matrix[i * columns + j]);
            }
            sumRows += best;
        }
        double sumColumns = 0.0;
        for (int j = 0; j < columns; j++) {
            double best = 0.0;
            for (int i = 0; i < rows; i++) {
                best = Math.max(best, matrix[i * columns + j]);
            }
            sumColumns += best;
        }
        return 0.5 * (sumRows / rows + sumColumns / columns);
    }
}
