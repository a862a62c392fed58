package org.congener.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.congener.core.ontology.Ontology;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code congener ontology-stats}: what an ontology file holds, as {@code key<TAB>value} lines. */
@Command(name = "ontology-stats", mixinStandardHelpOptions = true,
        description = "Reads an ontology and prints key<TAB>value lines: terms, edges, roots, virtual_root, "
                + "max_depth, obsolete_left_out, alias_ids, load_ms.",
        exitCodeListHeading = "Exit codes:%n",
        exitCodeList = {"0:the file is a valid ontology", "1:a bad file (the problem and line on stderr)",
                "2:bad flags"})
public final class OntologyStatsCommand implements Callable<Integer> {
    private static final String NAME = "congener ontology-stats";

    @Mixin
    private OntologyFileOptions ontologyFile;

    @Spec
    private CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        long start = System.nanoTime();
        Ontology ontology = ontologyFile.load(spec.commandLine().getErr(), NAME);
        long elapsed = System.nanoTime() - start;
        if (ontology == null) {
            return 1;
        }
        out.println("terms\t" + ontology.termCount());
        out.println("edges\t" + ontology.edgeCount());
        out.println("roots\t" + ontology.roots().length);
        out.println("virtual_root\t" + (ontology.hasVirtualRoot() ? "yes" : "no"));
        out.println("max_depth\t" + ontology.maxDepth());
        out.println("obsolete_left_out\t" + ontology.obsoleteTermsLeftOut());
        out.println("alias_ids\t" + ontology.aliasCount());
        // load time inside the running JVM: JVM start and class loading before this command are not included
        out.println("load_ms\t" + String.format(Locale.ROOT, "%.1f", elapsed / 1e6));
        out.flush();
        return 0;
    }
}
