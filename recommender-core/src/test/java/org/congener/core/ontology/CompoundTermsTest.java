package org.congener.core.ontology;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

class CompoundTermsTest {
    private final SmallDag dag = SmallDag.load();

    @Test
    void shouldResolveAltAndObsoleteIdsAndReportUnknownOnes() {
        Map<String, List<String>> catalogue = new LinkedHashMap<>();
        catalogue.put("cmp-1", List.of("CGT:0000106", "CGT:0000006", "CGT:0000009")); // alt id of E, E, obsolete -> F
        catalogue.put("cmp-2", List.of("CGT:9999999"));
        List<String> unknown = new ArrayList<>();
        Map<String, int[]> resolved = CompoundTerms.resolve(dag.ontology, catalogue,
                (compound, term) -> unknown.add(compound + " " + term));
        int e = dag.term("E");
        int f = dag.term("F");
        assertArrayEquals(new int[] {Math.min(e, f), Math.max(e, f)}, resolved.get("cmp-1"));
        assertArrayEquals(new int[0], resolved.get("cmp-2"));
        assertEquals(List.of("cmp-2 CGT:9999999"), unknown);
        assertEquals(List.of("cmp-1", "cmp-2"), new ArrayList<>(resolved.keySet()));
    }
}
