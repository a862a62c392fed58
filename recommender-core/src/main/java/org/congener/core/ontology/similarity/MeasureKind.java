package org.congener.core.ontology.similarity;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.InformationContent;

/** The measures by the names that flags, manifests and {@code ItemNeighbours.measure} use. */
public enum MeasureKind {
    LIN(LinSimilarity.NAME),
    RESNIK(ResnikSimilarity.NAME),
    JIANG_CONRATH(JiangConrathSimilarity.NAME);

    private final String label;

    MeasureKind(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    public SimilarityMeasure create(Ontology ontology, InformationContent ic) {
        return switch (this) {
            case LIN -> new LinSimilarity(ontology, ic);
            case RESNIK -> new ResnikSimilarity(ontology, ic);
            case JIANG_CONRATH -> new JiangConrathSimilarity(ontology, ic);
        };
    }

    /** @throws IllegalArgumentException naming the accepted labels */
    public static MeasureKind fromLabel(String label) {
        String wanted = label.toLowerCase(Locale.ROOT);
        for (MeasureKind kind : values()) {
            if (kind.label.equals(wanted)) {
                return kind;
            }
        }
        throw new IllegalArgumentException("unknown measure '" + label + "', expected one of "
                + Arrays.stream(values()).map(MeasureKind::label).collect(Collectors.joining(", ")));
    }
}
