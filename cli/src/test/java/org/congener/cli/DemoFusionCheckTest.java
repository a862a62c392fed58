package org.congener.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The finding the project's issue cites — ontology similarity reorders the most relevant items to the
 * top — checked on the invented demo scenario: with the
 * default settings of {@code congener evaluate --demo}, ALS×semantic has a higher MRR than ALS, and the
 * 95% paired bootstrap interval of the difference lies above zero.
 */
class DemoFusionCheckTest {

    @Test
    void shouldRaiseMrrWhenFusingAlsWithSemanticsOnTheDemoScenario(@TempDir Path dir) throws Exception {
        PrintStream original = System.out;
        ByteArrayOutputStream captured = new ByteArrayOutputStream();
        int code;
        try {
            System.setOut(new PrintStream(captured, true, StandardCharsets.UTF_8));
            code = CongenerMain.run("evaluate", "--demo", "--threads", "2", "--out", dir.toString());
        } finally {
            System.setOut(original);
        }
        assertEquals(0, code, captured.toString(StandardCharsets.UTF_8));
        JsonNode report = new ObjectMapper().readTree(dir.resolve("report.json").toFile());
        JsonNode mrrGap = null;
        for (JsonNode c : report.get("comparisons")) {
            if (c.get("name").asText().equals("ALS×semantic − ALS mrr")) {
                mrrGap = c;
            }
        }
        assertNotNull(mrrGap, report.get("comparisons").toString());
        System.out.println("demo: ALS×semantic − ALS on MRR " + mrrGap);
        assertTrue(mrrGap.get("value").asDouble() > 0, mrrGap.toString());
        assertTrue(mrrGap.get("lower").asDouble() > 0, mrrGap.toString());
    }
}
