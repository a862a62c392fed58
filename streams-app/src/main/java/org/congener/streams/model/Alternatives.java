package org.congener.streams.model;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;

import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.fusion.OneResearcherScoring;

/**
 * Compounds to consider instead of one that is out of stock, under one live version: by ontology (the
 * compound's neighbour list, most similar first) and by co-use (cosine of item factors, as items
 * that the same researchers use end up with near factor vectors under ALS; Hu, Koren &amp; Volinsky 2008,
 * section 5, explain recommendations through item–item similarity in the same way).
 */
public final class Alternatives {

    /**
     * One alternative with the similarity that placed it and, once {@link #withFacts} was applied, the
     * catalogue facts a person needs to act on it (name, stock, hazard statement codes).
     */
    public record Alternative(String compoundId, String name, double similarity, Boolean inStock,
                              List<String> hazardCodes) {

        public Alternative(String compoundId, double similarity) {
            this(compoundId, null, similarity, null, List.of());
        }

        public Alternative withFacts(String name, boolean inStock, List<String> hazardCodes) {
            return new Alternative(compoundId, name, similarity, inStock, List.copyOf(hazardCodes));
        }
    }

    /** Both lists of one request. */
    public record Lists(String compoundId, String modelVersion, List<Alternative> byOntology,
                        List<Alternative> byCoUse) {

        /** The same lists with each alternative passed through {@code describe}. */
        public Lists map(java.util.function.UnaryOperator<Alternative> describe) {
            return new Lists(compoundId, modelVersion, byOntology.stream().map(describe).toList(),
                    byCoUse.stream().map(describe).toList());
        }
    }

    private Alternatives() {
    }

    /**
     * @param eligible which compounds may be offered (active, in stock when asked for); the compound
     *                 itself never is
     */
    public static Lists of(LiveModel model, String compoundId, int n, Predicate<String> eligible) {
        int item = model.indexOf(compoundId);
        List<Alternative> byOntology = new ArrayList<>();
        List<Alternative> byCoUse = new ArrayList<>();
        if (item >= 0) {
            int[] ids = model.neighbours().neighbours(item);
            double[] sims = model.neighbours().similarities(item);
            for (int t = 0; t < ids.length && byOntology.size() < n; t++) {
                String id = model.compoundId(ids[t]);
                if (ids[t] != item && eligible.test(id)) {
                    byOntology.add(new Alternative(id, sims[t]));
                }
            }
            FactorMatrix y = model.itemFactors();
            double[] self = y.row(item);
            double selfNorm = norm(self);
            if (selfNorm > 0) {
                double[] cosine = new double[y.rows()];
                OneResearcherScoring.cfScores(self, y, cosine);
                for (int i = 0; i < cosine.length; i++) {
                    double other = norm(y.row(i));
                    cosine[i] = i == item || other == 0 ? Double.NEGATIVE_INFINITY : cosine[i] / (selfNorm * other);
                }
                for (int i : OneResearcherScoring.topN(cosine, n, i -> eligible.test(model.compoundId(i)))) {
                    byCoUse.add(new Alternative(model.compoundId(i), cosine[i]));
                }
            }
        }
        return new Lists(compoundId, model.version(), byOntology, byCoUse);
    }

    private static double norm(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x * x;
        }
        return Math.sqrt(s);
    }
}
