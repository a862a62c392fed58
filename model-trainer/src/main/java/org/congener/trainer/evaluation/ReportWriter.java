package org.congener.trainer.evaluation;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.congener.core.metrics.ConfidenceInterval;

/** Writes an {@link ExperimentReport} as report.json, report.html (SVG plots) and a console table. */
public final class ReportWriter {
    public static final String SCHEMA = "congener/evaluation-report/v1";
    private static final String[] COLOURS = {"#1b6ca8", "#d1495b", "#66a182", "#edae49", "#8e5572", "#00798c",
        "#30638e", "#a0a0a0"};

    private ReportWriter() {
    }

    /** The documented JSON structure (docs/evaluate.md). */
    public static Map<String, Object> toJson(ExperimentReport report, String createdAt) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("schema", SCHEMA);
        root.put("createdAt", createdAt);
        root.put("data", report.data());
        root.put("split", report.split());
        root.put("ks", report.ks());
        Map<String, Object> selection = new LinkedHashMap<>();
        selection.put("metric", report.selectMetric());
        selection.put("grid", report.selection());
        root.put("selection", selection);
        List<Map<String, Object>> models = new ArrayList<>();
        for (ModelResult m : report.models()) {
            Map<String, Object> model = new LinkedHashMap<>();
            model.put("name", m.name());
            model.put("configuration", m.configuration());
            List<Map<String, Object>> metrics = new ArrayList<>();
            for (Map.Entry<String, ConfidenceInterval> e : m.metrics().entrySet()) {
                Map<String, Object> metric = new LinkedHashMap<>();
                String[] parts = e.getKey().split("@", 2);
                metric.put("metric", parts[0]);
                metric.put("k", parts.length == 2 ? Integer.valueOf(parts[1]) : null);
                putInterval(metric, e.getValue());
                metrics.add(metric);
            }
            model.put("metrics", metrics);
            models.add(model);
        }
        root.put("models", models);
        List<Map<String, Object>> comparisons = new ArrayList<>();
        report.comparisons().forEach((name, ci) -> {
            Map<String, Object> c = new LinkedHashMap<>();
            c.put("name", name);
            putInterval(c, ci);
            comparisons.add(c);
        });
        root.put("comparisons", comparisons);
        root.put("alsObjective", report.alsObjective());
        return root;
    }

    private static void putInterval(Map<String, Object> target, ConfidenceInterval ci) {
        target.put("value", finiteOrNull(ci.mean()));
        target.put("lower", finiteOrNull(ci.lower()));
        target.put("upper", finiteOrNull(ci.upper()));
        target.put("level", ci.level());
    }

    private static Double finiteOrNull(double v) {
        return Double.isFinite(v) ? v : null;
    }

    public static void writeAll(ExperimentReport report, Path dir) throws IOException {
        Files.createDirectories(dir);
        String createdAt = Instant.now().toString();
        ObjectMapper json = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        Files.writeString(dir.resolve("report.json"), json.writeValueAsString(toJson(report, createdAt)),
                StandardCharsets.UTF_8);
        Files.writeString(dir.resolve("report.html"), html(report, createdAt), StandardCharsets.UTF_8);
    }

    /** The console table: one row per model, the @k metrics at the selection k, then MRR and AUCs. */
    public static void printTable(ExperimentReport report, PrintStream out) {
        List<String> columns = new ArrayList<>();
        String atK = report.selectMetric().contains("@") ? report.selectMetric().split("@")[1] : "10";
        for (String m : List.of("precision", "recall", "f1", "ndcg")) {
            columns.add(m + "@" + atK);
        }
        columns.add("mrr");
        columns.add("auc");
        report.models().get(0).metrics().keySet().stream().filter(n -> n.startsWith("auc@")).forEach(columns::add);
        StringBuilder header = new StringBuilder(String.format(Locale.ROOT, "%-15s", "model"));
        columns.forEach(c -> header.append(String.format(Locale.ROOT, " %22s", c)));
        out.println(header);
        for (ModelResult m : report.models()) {
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "%-15s", m.name()));
            for (String c : columns) {
                ConfidenceInterval ci = m.metrics().get(c);
                row.append(String.format(Locale.ROOT, " %22s", ci == null ? "-" : String.format(Locale.ROOT,
                        "%.4f [%.4f,%.4f]", ci.mean(), ci.lower(), ci.upper())));
            }
            out.println(row);
        }
        report.comparisons().forEach((name, ci) -> out.printf(Locale.ROOT, "%s: %+.4f [%+.4f, %+.4f] (%d%% interval)%n",
                name, ci.mean(), ci.lower(), ci.upper(), Math.round(ci.level() * 100)));
    }

    static String html(ExperimentReport report, String createdAt) {
        StringBuilder h = new StringBuilder();
        h.append("<!DOCTYPE html><html lang=\"en\"><head><meta charset=\"utf-8\"><title>Congener evaluation</title>")
                .append("<style>body{font-family:sans-serif;margin:2em;max-width:1100px}table{border-collapse:collapse}")
                .append("td,th{border:1px solid #ccc;padding:3px 8px;text-align:right}th{background:#f3f3f3}")
                .append(".plots{display:flex;flex-wrap:wrap;gap:1em}</style></head><body>")
                .append("<h1>Congener offline evaluation</h1><p>Created ").append(esc(createdAt)).append(", split ")
                .append(esc(report.split())).append(", configurations chosen on ").append(esc(report.selectMetric()))
                .append(" of a validation split of the training part.</p>")
                .append("<p><em>Suggestions are no safety review: read the safety data sheet before using any ")
                .append("compound, follow your chemical hygiene plan; local regulations and licensed practice govern.</em></p>");
        h.append("<h2>Data</h2><table>");
        report.data().forEach((k, v) -> h.append("<tr><th>").append(esc(k)).append("</th><td>").append(esc(String.valueOf(v)))
                .append("</td></tr>"));
        h.append("</table><h2>Metrics against k</h2><div class=\"plots\">");
        for (String metric : List.of("precision", "recall", "f1", "ndcg")) {
            h.append(plot(report, metric));
        }
        h.append("</div><h2>Other metrics</h2><table><tr><th>model</th>");
        List<String> others = new ArrayList<>();
        report.models().get(0).metrics().keySet().stream().filter(n -> !n.matches("(precision|recall|f1|ndcg)@.*"))
                .forEach(others::add);
        others.forEach(o -> h.append("<th>").append(esc(o)).append("</th>"));
        h.append("</tr>");
        for (ModelResult m : report.models()) {
            h.append("<tr><th>").append(esc(m.name())).append("</th>");
            for (String o : others) {
                ConfidenceInterval ci = m.metrics().get(o);
                h.append("<td>").append(String.format(Locale.ROOT, "%.4f [%.4f, %.4f]", ci.mean(), ci.lower(), ci.upper()))
                        .append("</td>");
            }
            h.append("</tr>");
        }
        h.append("</table>");
        if (!report.comparisons().isEmpty()) {
            h.append("<h2>Paired comparisons</h2><ul>");
            report.comparisons().forEach((name, ci) -> h.append("<li>").append(esc(name)).append(": ")
                    .append(String.format(Locale.ROOT, "%+.4f [%+.4f, %+.4f]", ci.mean(), ci.lower(), ci.upper()))
                    .append("</li>"));
            h.append("</ul>");
        }
        h.append("<h2>Chosen configurations</h2><table><tr><th>model</th><th>configuration</th></tr>");
        for (ModelResult m : report.models()) {
            h.append("<tr><th>").append(esc(m.name())).append("</th><td style=\"text-align:left\">")
                    .append(esc(String.valueOf(m.configuration()))).append("</td></tr>");
        }
        h.append("</table><h2>ALS objective per iteration</h2><p>")
                .append(esc(report.alsObjective().toString())).append("</p></body></html>\n");
        return h.toString();
    }

    private static String plot(ExperimentReport report, String metric) {
        int w = 500;
        int hgt = 300;
        int left = 50;
        int bottom = 30;
        int[] ks = report.ks();
        double max = 1e-9;
        for (ModelResult m : report.models()) {
            for (int k : ks) {
                ConfidenceInterval ci = m.metrics().get(metric + "@" + k);
                if (ci != null && Double.isFinite(ci.upper())) {
                    max = Math.max(max, ci.upper());
                }
            }
        }
        StringBuilder s = new StringBuilder();
        s.append("<svg width=\"").append(w + 160).append("\" height=\"").append(hgt + 20)
                .append("\" role=\"img\" aria-label=\"").append(metric).append(" against k\">")
                .append("<text x=\"").append(left).append("\" y=\"14\" font-weight=\"bold\">").append(metric)
                .append("@k</text>");
        int plotW = w - left - 10;
        int plotH = hgt - bottom - 20;
        s.append(line(left, 20 + plotH, left + plotW, 20 + plotH, "#333")).append(line(left, 20, left, 20 + plotH, "#333"));
        for (int t = 0; t <= 4; t++) {
            double v = max * t / 4;
            int y = 20 + plotH - (int) (plotH * t / 4.0);
            s.append("<text x=\"4\" y=\"").append(y + 4).append("\" font-size=\"10\">")
                    .append(String.format(Locale.ROOT, "%.3f", v)).append("</text>");
        }
        for (int n = 0; n < ks.length; n++) {
            int x = left + (ks.length == 1 ? plotW / 2 : plotW * n / (ks.length - 1));
            s.append("<text x=\"").append(x - 4).append("\" y=\"").append(hgt - 8).append("\" font-size=\"10\">k=")
                    .append(ks[n]).append("</text>");
        }
        int c = 0;
        for (ModelResult m : report.models()) {
            String colour = COLOURS[c % COLOURS.length];
            StringBuilder points = new StringBuilder();
            for (int n = 0; n < ks.length; n++) {
                ConfidenceInterval ci = m.metrics().get(metric + "@" + ks[n]);
                int x = left + (ks.length == 1 ? plotW / 2 : plotW * n / (ks.length - 1));
                int y = 20 + plotH - (int) (plotH * ci.mean() / max);
                int lo = 20 + plotH - (int) (plotH * ci.lower() / max);
                int hi = 20 + plotH - (int) (plotH * ci.upper() / max);
                points.append(x).append(',').append(y).append(' ');
                s.append(line(x, lo, x, hi, colour));
            }
            s.append("<polyline fill=\"none\" stroke=\"").append(colour).append("\" stroke-width=\"2\" points=\"")
                    .append(points.toString().strip()).append("\"/>");
            s.append("<text x=\"").append(w + 4).append("\" y=\"").append(30 + 16 * c).append("\" font-size=\"11\" fill=\"")
                    .append(colour).append("\">").append(esc(m.name())).append("</text>");
            c++;
        }
        return s.append("</svg>").toString();
    }

    private static String line(int x1, int y1, int x2, int y2, String colour) {
        return "<line x1=\"" + x1 + "\" y1=\"" + y1 + "\" x2=\"" + x2 + "\" y2=\"" + y2 + "\" stroke=\"" + colour + "\"/>";
    }

    private static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
