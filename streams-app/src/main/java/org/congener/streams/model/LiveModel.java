package org.congener.streams.model;

import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.TreeSet;

import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FixedFactors;
import org.congener.core.factorisation.FoldIn;
import org.congener.core.fusion.ManifestSettings;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.fusion.ResearcherScoring;
import org.congener.schemas.ItemFactors;
import org.congener.schemas.ItemNeighbours;
import org.congener.schemas.ModelManifest;
import org.congener.schemas.Neighbour;
import org.congener.streams.state.InteractionProfile;

/**
 * One published model version, complete and immutable: every event is scored under one snapshot,
 * never a mix of two versions. Compounds are indexed in id order over those with factors and those
 * named in neighbour lists; a compound without factors (new in the catalogue) has a zero factor row,
 * so it is reached through semantics alone.
 */
public final class LiveModel {

    private final ModelManifest manifest;
    private final ManifestSettings settings;
    private final String[] compoundIds;
    private final CompoundIndex index;
    private final FactorMatrix itemFactors;
    private final NeighbourLists neighbours;
    private final FoldIn foldIn;
    private final ResearcherScoring scoring;

    private LiveModel(ModelManifest manifest, ManifestSettings settings, String[] compoundIds,
                      CompoundIndex index, FactorMatrix itemFactors, NeighbourLists neighbours) {
        this.manifest = manifest;
        this.settings = settings;
        this.compoundIds = compoundIds;
        this.index = index;
        this.itemFactors = itemFactors;
        this.neighbours = neighbours;
        AlsConfig als = settings.foldIn().toConfig(manifest.rank(), manifest.lambda(), manifest.alpha());
        double[] gram = new double[manifest.gram().size()];
        for (int i = 0; i < gram.length; i++) {
            gram[i] = manifest.gram().get(i);
        }
        this.foldIn = new FoldIn(new FixedFactors(itemFactors, gram), als);
        this.scoring = new ResearcherScoring(foldIn, itemFactors, neighbours, settings.fusion());
    }

    /**
     * The snapshot of a version from its manifest and all its records.
     *
     * @throws IllegalArgumentException when a record disagrees with the manifest (rank, version)
     */
    public static LiveModel assemble(ModelManifest manifest, Collection<ItemFactors> factors,
                                     Collection<ItemNeighbours> neighbourRecords) {
        ManifestSettings settings = ManifestSettings.of(manifest);
        int rank = manifest.rank();
        if (manifest.gram() == null || manifest.gram().size() != rank * rank) {
            throw new IllegalArgumentException("manifest " + manifest.version() + " gram is not rank²");
        }
        TreeSet<String> ids = new TreeSet<>();
        for (ItemFactors f : factors) {
            requireVersion(manifest, f.version(), f.compoundId());
            if (f.factors() == null || f.factors().length != rank) {
                throw new IllegalArgumentException("factors of " + f.compoundId() + " are not of rank " + rank);
            }
            ids.add(f.compoundId());
        }
        for (ItemNeighbours n : neighbourRecords) {
            requireVersion(manifest, n.version(), n.compoundId());
            ids.add(n.compoundId());
            for (Neighbour nb : n.neighbours()) {
                ids.add(nb.compoundId());
            }
        }
        String[] compoundIds = ids.toArray(String[]::new);
        CompoundIndex index = new CompoundIndex(compoundIds);
        FactorMatrix y = new FactorMatrix(compoundIds.length, rank);
        double[] data = y.data();
        for (ItemFactors f : factors) {
            int off = y.offset(index.indexOf(f.compoundId()));
            for (int k = 0; k < rank; k++) {
                data[off + k] = f.factors()[k];
            }
        }
        int[][] nIds = new int[compoundIds.length][];
        double[][] nSims = new double[compoundIds.length][];
        Arrays.fill(nIds, new int[0]);
        Arrays.fill(nSims, new double[0]);
        for (ItemNeighbours n : neighbourRecords) {
            List<Neighbour> list = n.neighbours();
            int row = index.indexOf(n.compoundId());
            nIds[row] = new int[list.size()];
            nSims[row] = new double[list.size()];
            for (int t = 0; t < list.size(); t++) {
                nIds[row][t] = index.indexOf(list.get(t).compoundId());
                nSims[row][t] = list.get(t).similarity();
            }
        }
        return new LiveModel(manifest, settings, compoundIds, index, y, new NeighbourLists(nIds, nSims));
    }

    private static void requireVersion(ModelManifest manifest, String version, String compoundId) {
        if (!manifest.version().equals(version)) {
            throw new IllegalArgumentException("record of " + compoundId + " names version " + version
                    + ", not " + manifest.version());
        }
    }

    public String version() {
        return manifest.version();
    }

    public ModelManifest manifest() {
        return manifest;
    }

    public ManifestSettings settings() {
        return settings;
    }

    public int itemCount() {
        return compoundIds.length;
    }

    /** The index of a compound, or −1 when this version does not know it. */
    public int indexOf(String compoundId) {
        return index.indexOf(compoundId);
    }

    /** The index of the compound of a profile's entry at {@code p}, or −1 when this version does not know it. */
    public int indexOf(InteractionProfile profile, int p) {
        return profile.indexIn(index, p);
    }

    public String compoundId(int index) {
        return compoundIds[index];
    }

    public FactorMatrix itemFactors() {
        return itemFactors;
    }

    public NeighbourLists neighbours() {
        return neighbours;
    }

    public FoldIn foldIn() {
        return foldIn;
    }

    /** Scoring of one researcher under this version, into a per-thread workspace. */
    public ResearcherScoring scoring() {
        return scoring;
    }
}
