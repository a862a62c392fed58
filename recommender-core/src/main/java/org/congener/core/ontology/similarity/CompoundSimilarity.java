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
        double[] bestForB = new double[termsB.length];
        double sumA = 0.0;
        for (int a : termsA) {
            double bestForA = 0.0;
            for (int j = 0; j < termsB.length; j++) {
                double s = measure.similarity(a, termsB[j]);
                bestForA = Math.max(bestForA, s);
                bestForB[j] = Math.max(bestForB[j], s);
            }
            sumA += bestForA;
        }
        double sumB = 0.0;
        for (double s : bestForB) {
            sumB += s;
        }
        return 0.5 * (sumA / termsA.length + sumB / termsB.length);
    }
}
