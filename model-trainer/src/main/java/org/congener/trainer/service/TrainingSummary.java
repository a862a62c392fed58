package org.congener.trainer.service;

import java.util.Locale;
import java.util.Map;

/** The one-screen summary printed after a training run. */
public final class TrainingSummary {
    private TrainingSummary() {
    }

    public static String render(TrainingOutcome o) {
        StringBuilder s = new StringBuilder();
        String rule = "─".repeat(64);
        s.append(rule).append('\n');
        s.append(String.format(Locale.ROOT, "training run      %s in %.1f s%n",
                o.published() ? "published " + o.version() : "published nothing", o.millis() / 1000.0));
        s.append(String.format(Locale.ROOT, "history           %d events, %d researchers, %d compounds, %d unreadable skipped%n",
                o.events(), o.researchers(), o.compounds(), o.skippedRecords()));
        ChosenModel c = o.candidate();
        s.append(String.format(Locale.ROOT, "candidate         %s (rank %d, λ %s, α %s, fusion %s)%n", c.name(),
                c.als().rank(), c.als().lambda(), c.als().alpha(), c.fusion().rule()));
        for (Map.Entry<String, Double> m : c.metrics().entrySet()) {
            if (m.getKey().startsWith("ndcg@") || m.getKey().equals("mrr") || m.getKey().startsWith("recall@")
                    || m.getKey().equals("auc")) {
                s.append(String.format(Locale.ROOT, "  %-16s %.4f%n", m.getKey(), m.getValue()));
            }
        }
        s.append("gate              ").append(o.gate().reason()).append('\n');
        if (!o.removed().isEmpty()) {
            s.append("retention         dropped ").append(String.join(", ", o.removed())).append('\n');
        }
        if (o.report() != null) {
            s.append("report            ").append(o.report().resolve("report.html")).append('\n');
        }
        s.append(rule).append('\n');
        return s.toString();
    }
}
