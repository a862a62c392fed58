package org.congener.trainer.publish;

import org.congener.schemas.ModelManifest;
import org.congener.trainer.registry.PublishedModels;

/**
 * Makes an older version live again: its manifest, read from key {@code <version>}, written again under
 * {@code current} in one transaction, after checking all its factor and neighbour records are still there.
 */
public final class Rollback {
    private Rollback() {
    }

    /** @return the manifest now live */
    public static ModelManifest to(String version, PublishedModels models, ModelPublisher publisher) {
        ModelManifest manifest = models.versions().get(version);
        if (manifest == null) {
            throw new IllegalArgumentException("no version " + version + " is published; there are "
                    + models.versions().keySet());
        }
        if (!models.complete(version)) {
            throw new IllegalStateException("version " + version + " is incomplete on the broker: "
                    + models.factorCount(version) + " of " + manifest.itemCount() + " factor records and "
                    + models.neighbourCount(version) + " of " + manifest.neighbourCount() + " neighbour lists");
        }
        publisher.makeCurrent(manifest);
        return manifest;
    }
}
