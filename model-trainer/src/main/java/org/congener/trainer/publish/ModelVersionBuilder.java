package org.congener.trainer.publish;

import java.time.Instant;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Map;
import org.congener.core.factorisation.AlsModel;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FixedFactors;
import org.congener.core.fusion.FusionSettings;
import org.congener.core.fusion.ManifestSettings;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.interactions.IdIndex;
import org.congener.core.interactions.Interaction;
import org.congener.core.interactions.InteractionLog;
import org.congener.core.interactions.InteractionWeights;
import org.congener.schemas.ItemFactors;
import org.congener.schemas.ItemNeighbours;
import org.congener.schemas.ModelManifest;
import org.congener.schemas.Neighbour;
import org.congener.schemas.SchemaIds;

/**
 * Turns a trained ALS model and the neighbour lists into the records of one version: factors of the
 * compounds with at least one interaction (the others have no factors worth the name), neighbour lists
 * of every compound that has neighbours, and the manifest with YᵀY over exactly the published rows.
 */
public final class ModelVersionBuilder {
    public static final String MEASURE = "lin";

    private ModelVersionBuilder() {
    }

    public static ModelVersion build(String version, InteractionLog log, AlsModel model, NeighbourLists neighbours,
                                     FusionSettings fusion, InteractionWeights weights,
                                     Map<String, Double> offlineMetrics) {
        IdIndex items = log.items();
        BitSet seen = new BitSet(items.size());
        for (Interaction i : log.interactions()) {
            seen.set(i.item());
        }
        FactorMatrix y = model.itemFactors();
        int rank = y.rank();
        List<ItemFactors> factors = new ArrayList<>();
        FactorMatrix published = new FactorMatrix(seen.cardinality(), rank);
        int row = 0;
        for (int i = seen.nextSetBit(0); i >= 0; i = seen.nextSetBit(i + 1)) {
            double[] v = y.row(i);
            float[] f = new float[rank];
            double[] asPublished = new double[rank];
            for (int c = 0; c < rank; c++) {
                f[c] = (float) v[c];
                asPublished[c] = f[c];
            }
            published.setRow(row++, asPublished);
            factors.add(new ItemFactors(SchemaIds.ITEM_FACTORS, version, items.id(i), f));
        }
        List<ItemNeighbours> lists = new ArrayList<>();
        if (neighbours != null) {
            for (int i = 0; i < items.size(); i++) {
                int[] ids = neighbours.neighbours(i);
                if (ids.length == 0) {
                    continue;
                }
                double[] sims = neighbours.similarities(i);
                List<Neighbour> out = new ArrayList<>(ids.length);
                for (int n = 0; n < ids.length; n++) {
                    out.add(new Neighbour(items.id(ids[n]), sims[n]));
                }
                lists.add(new ItemNeighbours(SchemaIds.ITEM_NEIGHBOURS, version, items.id(i), MEASURE, out));
            }
        }
        // YᵀY of the float values the streams app will read, so its fold-in matches the trainer's
        double[] gram = factors.isEmpty() ? new double[rank * rank] : FixedFactors.of(published).gram();
        List<Double> gramList = new ArrayList<>(gram.length);
        for (double g : gram) {
            if (!Double.isFinite(g)) {
                throw new InvalidModelException("YᵀY of " + version + " is not finite; the factors diverged");
            }
            gramList.add(g);
        }
        ModelManifest manifest = new ModelManifest(SchemaIds.MODEL_MANIFEST, version, Instant.now().toString(), rank,
                model.config().lambda(), model.config().alpha(), factors.size(), lists.size(), gramList, fusion.rule(),
                ManifestSettings.write(fusion, model.config(), weights), Map.copyOf(offlineMetrics),
                ModelPublisher.checksum(factors));
        return new ModelVersion(manifest, factors, lists);
    }
}
