package org.congener.trainer.publish;

import java.util.List;
import org.congener.schemas.ItemFactors;
import org.congener.schemas.ItemNeighbours;
import org.congener.schemas.ModelManifest;

/** Everything one published model version consists of; the manifest's counts match the lists. */
public record ModelVersion(ModelManifest manifest, List<ItemFactors> factors, List<ItemNeighbours> neighbours) {
    public ModelVersion {
        factors = List.copyOf(factors);
        neighbours = List.copyOf(neighbours);
        if (manifest.itemCount() != factors.size() || manifest.neighbourCount() != neighbours.size()) {
            throw new InvalidModelException("manifest of " + manifest.version() + " counts " + manifest.itemCount()
                    + " factors and " + manifest.neighbourCount() + " neighbour lists, but " + factors.size()
                    + " and " + neighbours.size() + " are given");
        }
    }

    public String version() {
        return manifest.version();
    }
}
