package org.congener.demo;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Writes the demo scenario's files for a seed. The same seed gives byte-identical files; the files
 * shipped in this module's resources are those of {@link #DEFAULT_SEED}.
 *
 * <pre>DemoGenerator [--seed N] --out DIR</pre>
 */
public final class DemoGenerator {

    /** The seed of the shipped demo files. */
    public static final long DEFAULT_SEED = 20_260_101L;
    /** About this many usage events in the simulated year. */
    public static final int TARGET_USAGE_EVENTS = 20_000;

    public static final String ONTOLOGY_FILE = "ontology.obo";
    public static final String CATALOG_FILE = "catalog.jsonl";
    public static final String RESEARCHERS_FILE = "researchers.jsonl";
    public static final String USAGE_EVENTS_FILE = "usage-events.jsonl";
    public static final String INVENTORY_EVENTS_FILE = "inventory-events.jsonl";
    public static final String GROUPS_FILE = "groups.json";
    public static final String BAD_USAGE_EVENTS_FILE = "bad-usage-events.txt";
    /** Every file {@link #generate(long, Path)} writes. */
    public static final List<String> FILES = List.of(ONTOLOGY_FILE, CATALOG_FILE, RESEARCHERS_FILE, USAGE_EVENTS_FILE,
            INVENTORY_EVENTS_FILE, GROUPS_FILE, BAD_USAGE_EVENTS_FILE);

    private static final String USAGE = "usage: DemoGenerator [--seed N] --out DIR";

    private DemoGenerator() {
    }

    public static void main(String[] args) {
        System.exit(run(args, System.out, System.err));
    }

    /** Runs the command line; returns the exit code (0 ok, 2 bad arguments, 1 failed to write). */
    static int run(String[] args, PrintStream out, PrintStream err) {
        long seed = DEFAULT_SEED;
        Path outDir = null;
        for (int i = 0; i < args.length; i++) {
            String arg = args[i];
            switch (arg) {
                case "--seed", "--out" -> {
                    if (i + 1 >= args.length) {
                        err.println("error: " + arg + " needs a value\n" + USAGE);
                        return 2;
                    }
                    String value = args[++i];
                    if (arg.equals("--out")) {
                        outDir = Path.of(value);
                    } else {
                        try {
                            seed = Long.parseLong(value);
                        } catch (NumberFormatException e) {
                            err.println("error: --seed needs a whole number, got '" + value + "'\n" + USAGE);
                            return 2;
                        }
                    }
                }
                case "--help", "-h" -> {
                    out.println(USAGE);
                    return 0;
                }
                default -> {
                    err.println("error: unknown argument '" + arg + "'\n" + USAGE);
                    return 2;
                }
            }
        }
        if (outDir == null) {
            err.println("error: --out DIR is required\n" + USAGE);
            return 2;
        }
        try {
            generate(seed, outDir);
        } catch (IOException | RuntimeException e) {
            err.println("error: cannot write the demo files to " + outDir + ": " + e.getMessage());
            return 1;
        }
        out.println("wrote " + FILES.size() + " demo files for seed " + seed + " to " + outDir);
        return 0;
    }

    /** Generates the scenario for {@code seed} and writes every file of {@link #FILES} into {@code outDir}. */
    public static void generate(long seed, Path outDir) throws IOException {
        Files.createDirectories(outDir);
        for (Map.Entry<String, byte[]> file : render(DemoScenario.build(seed, TARGET_USAGE_EVENTS)).entrySet()) {
            Files.write(outDir.resolve(file.getKey()), file.getValue());
        }
    }

    /** File name to exact file content, in {@link #FILES} order. */
    static Map<String, byte[]> render(DemoScenario scenario) {
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put(ONTOLOGY_FILE, scenario.ontologyObo().getBytes(StandardCharsets.UTF_8));
        files.put(CATALOG_FILE, DemoJson.jsonLines(scenario.catalog()));
        files.put(RESEARCHERS_FILE, DemoJson.jsonLines(scenario.researchers()));
        files.put(USAGE_EVENTS_FILE, DemoJson.jsonLines(scenario.usageEvents()));
        files.put(INVENTORY_EVENTS_FILE, DemoJson.jsonLines(scenario.inventoryEvents()));
        files.put(GROUPS_FILE, DemoJson.jsonArray(scenario.groups()));
        files.put(BAD_USAGE_EVENTS_FILE, (String.join("\n", scenario.badUsageEventLines()) + "\n")
                .getBytes(StandardCharsets.UTF_8));
        return files;
    }
}
