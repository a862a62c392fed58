package org.congener.cli;

import java.io.IOException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.LinkedHashSet;
import java.util.List;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.OntologyFormatException;
import org.congener.core.ontology.io.EdgeListReader;
import org.congener.core.ontology.io.OboReader;
import picocli.CommandLine.Option;

/** The flags that name an ontology file and say how to read it; shared by the ontology subcommands. */
final class OntologyFileOptions {

    /** File formats the ontology subcommands read. */
    enum Format { obo, edges }

    @Option(names = "--ontology", required = true, paramLabel = "FILE",
            description = "Ontology file: OBO 1.4, or an edge list (child<TAB>parent per line).")
    Path file;

    @Option(names = "--format", paramLabel = "obo|edges", defaultValue = "obo",
            description = "Format of the ontology file (default: ${DEFAULT-VALUE}).")
    Format format;

    @Option(names = "--relation", paramLabel = "NAME",
            description = "An OBO relationship type whose targets also count as parents (repeatable; "
                    + "default: is_a alone).")
    List<String> relations = List.of();

    /** Reads the ontology, or explains on stderr why it cannot and returns null. */
    Ontology load(java.io.PrintWriter err, String command) {
        try {
            return format == Format.obo ? new OboReader(new LinkedHashSet<>(relations)).read(file)
                    : new EdgeListReader().read(file);
        } catch (NoSuchFileException e) {
            err.println(command + ": " + file + ": no such file");
        } catch (OntologyFormatException e) {
            err.println(command + ": " + file + ": " + e.getMessage());
        } catch (IOException e) {
            err.println(command + ": " + file + ": cannot read: " + e.getMessage());
        }
        return null;
    }
}
