package org.congener.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.congener.schemas.ModelManifest;
import org.congener.trainer.registry.PublishedModels;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code congener models}: the published model versions, their held-out metrics and which is live. */
@Command(name = "models", mixinStandardHelpOptions = true,
        description = "Lists the model versions on the broker with their offline metrics; * marks the live one.")
public final class ModelsCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    TrainerConnection connection;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        PublishedModels models = connection.registry(line -> err.println("models: " + line)).read();
        print(models, spec.commandLine().getOut());
        return 0;
    }

    static void print(PublishedModels models, PrintWriter out) {
        if (models.versions().isEmpty()) {
            out.println("no model version is published");
            return;
        }
        out.printf(Locale.ROOT, "  %-7s %-24s %4s %-12s %7s %7s %-9s %8s %8s %8s%n", "version", "created", "rank",
                "fusion", "factors", "neighb.", "records", "ndcg@10", "mrr", "auc");
        for (ModelManifest m : models.versions().values()) {
            boolean live = m.version().equals(models.liveVersion());
            out.printf(Locale.ROOT, "%s %-7s %-24s %4d %-12s %7d %7d %-9s %8s %8s %8s%n", live ? "*" : " ", m.version(),
                    m.createdAt(), m.rank(), m.fusionRule(), m.itemCount(), m.neighbourCount(),
                    models.complete(m.version()) ? "complete" : "partial", metric(m, "ndcg@10"), metric(m, "mrr"),
                    metric(m, "auc"));
        }
        if (models.liveVersion() == null) {
            out.println("no version is live");
        }
        out.flush();
    }

    private static String metric(ModelManifest m, String name) {
        Double v = m.offlineMetrics() == null ? null : m.offlineMetrics().get(name);
        return v == null ? "-" : String.format(Locale.ROOT, "%.4f", v);
    }
}
