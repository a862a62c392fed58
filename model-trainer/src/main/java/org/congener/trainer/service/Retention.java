package org.congener.trainer.service;

import java.util.ArrayList;
import java.util.List;
import org.congener.trainer.publish.ModelPublisher;
import org.congener.trainer.registry.PublishedModels;

/** Keeps the newest N versions (and always the live one); the rest get tombstones in one transaction. */
public final class Retention {
    private Retention() {
    }

    public static List<String> dropped(PublishedModels models, int keep) {
        List<String> newestFirst = new ArrayList<>(models.versions().descendingKeySet());
        List<String> out = new ArrayList<>();
        for (int i = keep; i < newestFirst.size(); i++) {
            String v = newestFirst.get(i);
            if (!v.equals(models.liveVersion())) {
                out.add(v);
            }
        }
        // record keys of versions whose manifest is already gone (e.g. an earlier run stopped half-way)
        for (String v : models.factorKeys().keySet()) {
            if (!models.versions().containsKey(v) && !out.contains(v) && !v.equals(models.liveVersion())
                    && isOlderThanKept(v, newestFirst, keep)) {
                out.add(v);
            }
        }
        return out;
    }

    private static boolean isOlderThanKept(String v, List<String> newestFirst, int keep) {
        if (newestFirst.size() < keep) {
            return false;
        }
        return v.compareTo(newestFirst.get(keep - 1)) < 0;
    }

    public static List<String> apply(PublishedModels models, int keep, ModelPublisher publisher) {
        List<String> drop = dropped(models, keep);
        List<String> factorKeys = new ArrayList<>();
        List<String> neighbourKeys = new ArrayList<>();
        for (String v : drop) {
            factorKeys.addAll(models.factorKeys().getOrDefault(v, List.of()));
            neighbourKeys.addAll(models.neighbourKeys().getOrDefault(v, List.of()));
        }
        publisher.delete(drop.stream().filter(models.versions()::containsKey).toList(), factorKeys, neighbourKeys);
        return drop;
    }
}
