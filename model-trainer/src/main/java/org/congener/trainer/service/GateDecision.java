package org.congener.trainer.service;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/**
 * Whether a candidate may replace the live version: it may when there is no live version, or when
 * candidate ≥ live − margin on the gate metric, both measured on the same held-out split.
 *
 * @param liveVersion null when nothing is live
 * @param liveFigure  NaN when nothing is live
 */
public record GateDecision(boolean publish, String metric, double candidateFigure, String liveVersion,
                           double liveFigure, double margin) {

    public static GateDecision decide(String metric, double candidate, String liveVersion, double live, double margin) {
        boolean ok = liveVersion == null || candidate >= live - margin;
        return new GateDecision(ok, metric, candidate, liveVersion, live, margin);
    }

    /** One line for the log and the summary, naming both figures. */
    public String reason() {
        if (liveVersion == null) {
            return String.format(Locale.ROOT, "publish: no live version; candidate %s %.4f", metric, candidateFigure);
        }
        return String.format(Locale.ROOT, "%s: candidate %s %.4f %s live %s %.4f − margin %.4f = %.4f",
                publish ? "publish" : "refused", metric, candidateFigure, publish ? "≥" : "<", liveVersion,
                liveFigure, margin, liveFigure - margin);
    }

    public Map<String, Object> toReport() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("gateDecision", publish ? "publish" : "refused");
        m.put("gateMetric", metric);
        m.put("gateCandidate", candidateFigure);
        m.put("gateLiveVersion", liveVersion == null ? "none" : liveVersion);
        m.put("gateLive", Double.isFinite(liveFigure) ? liveFigure : "none");
        m.put("gateMargin", margin);
        m.put("gateReason", reason());
        return m;
    }
}
