package org.congener.core.ontology;

import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Objects;

import org.congener.core.ontology.io.OboReader;

/**
 * The eight-term DAG of {@code ontology/small-dag.obo}, named by letter:
 * R ← A, R ← B, A ← C, A ← D, B ← D, C ← E, C ← F, D ← G (D has two parents).
 */
public final class SmallDag {
    public static final String RESOURCE = "/ontology/small-dag.obo";

    public final Ontology ontology;

    private SmallDag(Ontology ontology) {
        this.ontology = ontology;
    }

    public static SmallDag load() {
        try (Reader reader = new InputStreamReader(
                Objects.requireNonNull(SmallDag.class.getResourceAsStream(RESOURCE)), StandardCharsets.UTF_8)) {
            return new SmallDag(new OboReader().read(reader));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Dense id of the term named by a letter R, A .. G. */
    public int term(String letter) {
        for (int t = 0; t < ontology.termCount(); t++) {
            if (ontology.name(t).equals(letter)) {
                return t;
            }
        }
        throw new IllegalArgumentException("no term named " + letter);
    }
}
