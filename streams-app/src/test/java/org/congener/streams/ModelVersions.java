package org.congener.streams;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.AlsModel;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FixedFactors;
import org.congener.core.factorisation.ImplicitAls;
import org.congener.core.fusion.FusionSettings;
import org.congener.core.fusion.ManifestSettings;
import org.congener.core.interactions.InteractionMatrixBuilder;
import org.congener.core.interactions.InteractionWeights;
import org.congener.schemas.ItemFactors;
import org.congener.schemas.ModelChecksum;
import org.congener.schemas.ItemNeighbours;
import org.congener.schemas.ModelManifest;
import org.congener.schemas.Neighbour;
import org.congener.schemas.SchemaIds;

/**
 * Publishes model versions the way the trainer does (the model-version contract): ALS trained with
 * {@link ImplicitAls} on a few interactions, records keyed {@code <version>/<compoundId>}, the manifest
 * with YᵀY of the published (float) factors and the settings of {@link ManifestSettings}.
 */
public final class ModelVersions {

    /** The records of one version, in publishing order. */
    public record Version(String name, List<ItemFactors> factors, List<ItemNeighbours> neighbours,
                          ModelManifest manifest) {
        public static String key(String version, String compoundId) {
            return version + "/" + compoundId;
        }
    }

    /** One training interaction. */
    public record Use(String researcherId, String compoundId, double strength) {
    }

    private ModelVersions() {
    }

    /**
     * @param compounds  compounds the version has factors for
     * @param uses       the training interactions
     * @param neighbours top-K ontology neighbours per compound, most similar first
     */
    public static Version train(String version, List<String> compounds, List<Use> uses,
                                Map<String, List<Neighbour>> neighbours, FusionSettings fusion, int rank, long seed) {
        List<String> users = uses.stream().map(Use::researcherId).distinct().sorted().toList();
        InteractionMatrixBuilder matrix = new InteractionMatrixBuilder(users.size(), compounds.size());
        for (Use u : uses) {
            matrix.add(users.indexOf(u.researcherId()), compounds.indexOf(u.compoundId()), u.strength());
        }
        AlsConfig als = AlsConfig.defaults().withRank(rank).withIterations(8).withSeed(seed).withThreads(1);
        AlsModel model = new ImplicitAls(als).fit(matrix.build());
        FactorMatrix trained = model.itemFactors();

        TreeMap<String, float[]> byId = new TreeMap<>();
        FactorMatrix published = new FactorMatrix(compounds.size(), rank);
        for (int i = 0; i < compounds.size(); i++) {
            float[] f = new float[rank];
            for (int k = 0; k < rank; k++) {
                f[k] = (float) trained.get(i, k);
                published.data()[published.offset(i) + k] = f[k];
            }
            byId.put(compounds.get(i), f);
        }
        List<ItemFactors> factors = new ArrayList<>();
        byId.forEach((id, f) -> factors.add(new ItemFactors(SchemaIds.ITEM_FACTORS, version, id, f)));
        List<ItemNeighbours> lists = new ArrayList<>();
        new TreeMap<>(neighbours).forEach((id, list) ->
                lists.add(new ItemNeighbours(SchemaIds.ITEM_NEIGHBOURS, version, id, "lin", list)));

        double[] gram = FixedFactors.of(published).gram();
        List<Double> gramList = new ArrayList<>(gram.length);
        for (double g : gram) {
            gramList.add(g);
        }
        ModelManifest manifest = new ModelManifest(SchemaIds.MODEL_MANIFEST, version, Fixtures.DAY0, rank,
                als.lambda(), als.alpha(), factors.size(), lists.size(), gramList, fusion.rule(),
                ManifestSettings.write(fusion, als, InteractionWeights.defaults()), Map.of("ndcg@10", 0.0),
                ModelChecksum.of(factors));
        return new Version(version, factors, lists, manifest);
    }

    /** Compact form of a neighbour list for fixtures: id, similarity, id, similarity, … */
    public static List<Neighbour> list(Object... idAndSimilarity) {
        List<Neighbour> out = new ArrayList<>();
        for (int i = 0; i < idAndSimilarity.length; i += 2) {
            out.add(new Neighbour((String) idAndSimilarity[i], ((Number) idAndSimilarity[i + 1]).doubleValue()));
        }
        return out;
    }
}
