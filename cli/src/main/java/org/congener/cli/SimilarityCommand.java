package org.congener.cli;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.InformationContent;
import org.congener.core.ontology.ic.ResnikCorpusIc;
import org.congener.core.ontology.ic.SanchezIntrinsicIc;
import org.congener.core.ontology.ic.SecoIntrinsicIc;
import org.congener.core.ontology.similarity.MeasureKind;
import org.congener.core.ontology.similarity.SimilarityMeasure;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code congener similarity}: the similarity of term pairs read from a file, one result line per pair. */
@Command(name = "similarity", mixinStandardHelpOptions = true,
        description = {"Prints a<TAB>b<TAB>similarity for every a<TAB>b line of the pairs file.",
                "Unknown ids and broken lines are reported on stderr with their line number; the run goes on "
                        + "and ends with exit code 1."},
        exitCodeListHeading = "Exit codes:%n",
        exitCodeList = {"0:every pair was scored", "1:a bad file, or some lines skipped (see stderr)",
                "2:bad flags"})
public final class SimilarityCommand implements Callable<Integer> {
    private static final String NAME = "congener similarity";

    /** IC methods by flag value. */
    enum IcFlag { intrinsic, sanchez, corpus }

    @Mixin
    private OntologyFileOptions ontologyFile;

    @Option(names = "--measure", paramLabel = "lin|resnik|jc", defaultValue = "lin",
            description = "Lin 1998, Resnik 1995 or Jiang-Conrath 1997 (default: ${DEFAULT-VALUE}).")
    private String measure;

    @Option(names = "--ic", paramLabel = "intrinsic|sanchez|corpus", defaultValue = "intrinsic",
            description = "Information content: intrinsic (Seco et al. 2004), sanchez (Sanchez et al. 2011) or "
                    + "corpus (Resnik 1995, needs --counts) (default: ${DEFAULT-VALUE}).")
    private IcFlag ic;

    @Option(names = "--counts", paramLabel = "FILE",
            description = "Usage counts for --ic corpus: term<TAB>count per line.")
    private Path counts;

    @Option(names = "--pairs", required = true, paramLabel = "FILE",
            description = "Term pairs: a<TAB>b per line; blank lines and lines starting with # are skipped.")
    private Path pairs;

    @Spec
    private CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        MeasureKind kind;
        try {
            kind = MeasureKind.fromLabel(measure);
        } catch (IllegalArgumentException e) {
            err.println(NAME + ": --measure: " + e.getMessage());
            return 2;
        }
        if (ic == IcFlag.corpus && counts == null) {
            err.println(NAME + ": --ic corpus needs --counts FILE");
            return 2;
        }
        Ontology ontology = ontologyFile.load(err, NAME);
        if (ontology == null) {
            return 1;
        }
        LineProblems problems = new LineProblems(err, NAME);
        InformationContent content = switch (ic) {
            case intrinsic -> SecoIntrinsicIc.compute(ontology);
            case sanchez -> SanchezIntrinsicIc.compute(ontology);
            case corpus -> {
                double[] usage = UsageCountsFile.read(counts, ontology, problems);
                yield usage == null ? null : ResnikCorpusIc.compute(ontology, usage, ResnikCorpusIc.DEFAULT_SMOOTHING);
            }
        };
        if (content == null) {
            return 1;
        }
        SimilarityMeasure similarity = kind.create(ontology, content);
        try (BufferedReader reader = Files.newBufferedReader(pairs, StandardCharsets.UTF_8)) {
            String line;
            int number = 0;
            while ((line = reader.readLine()) != null) {
                number++;
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] fields = line.split("\t", -1);
                if (fields.length != 2 || fields[0].isBlank() || fields[1].isBlank()) {
                    problems.report(pairs, number, "expected 'a<TAB>b', found '" + line + "'");
                    continue;
                }
                String a = fields[0].strip();
                String b = fields[1].strip();
                int ia = ontology.termIndex(a);
                int ib = ontology.termIndex(b);
                if (ia < 0 || ib < 0) {
                    problems.report(pairs, number, "unknown term '" + (ia < 0 ? a : b) + "'");
                    continue;
                }
                out.append(a).append('\t').append(b).append('\t')
                        .append(Double.toString(similarity.similarity(ia, ib))).append('\n');
            }
        } catch (NoSuchFileException e) {
            err.println(NAME + ": " + pairs + ": no such file");
            return 1;
        }
        out.flush();
        return problems.count() == 0 ? 0 : 1;
    }
}
