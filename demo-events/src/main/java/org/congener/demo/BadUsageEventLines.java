package org.congener.demo;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.congener.schemas.UsageEvent;

import java.math.BigDecimal;
import java.util.List;

/**
 * Deliberately broken usage-event lines for the dead-letter path of the demo, one defect each, in
 * this order: broken JSON, unknown kind, negative quantity, missing field, unknown compound id,
 * wrong schema id. Each is built from a valid event so that it has exactly one defect.
 */
final class BadUsageEventLines {

    static final String UNKNOWN_COMPOUND_ID = "C99999";
    static final String UNKNOWN_KIND = "BORROW";
    static final String WRONG_SCHEMA = "congener/usage-event/v9";

    private BadUsageEventLines() {
    }

    static List<String> from(UsageEvent template) {
        String valid = DemoJson.line(withId(template, "U900001"));
        String brokenJson = valid.substring(0, valid.indexOf(",\"kind\"")) + ",\"kind\":\"ORD";

        ObjectNode unknownKind = tree(template, "U900002");
        unknownKind.put("kind", UNKNOWN_KIND);

        ObjectNode negative = tree(template, "U900003");
        negative.put("kind", "WITHDRAWAL");
        negative.put("quantity", new BigDecimal("-25.0"));

        ObjectNode missing = tree(template, "U900004");
        missing.remove("researcherId");

        ObjectNode unknownCompound = tree(template, "U900005");
        unknownCompound.put("compoundId", UNKNOWN_COMPOUND_ID);

        ObjectNode wrongSchema = tree(template, "U900006");
        wrongSchema.put("schema", WRONG_SCHEMA);

        return List.of(brokenJson, DemoJson.line(unknownKind), DemoJson.line(negative), DemoJson.line(missing),
                DemoJson.line(unknownCompound), DemoJson.line(wrongSchema));
    }

    private static UsageEvent withId(UsageEvent e, String eventId) {
        return new UsageEvent(e.schema(), eventId, e.researcherId(), e.compoundId(), e.kind(), e.quantity(),
                e.unit(), e.occurredAt());
    }

    private static ObjectNode tree(UsageEvent template, String eventId) {
        ObjectNode tree = DemoJson.mapper().valueToTree(withId(template, eventId));
        // A tree writes doubles with Double.toString; keep the files' plain, JDK-independent form.
        tree.put("quantity", new BigDecimal(DemoJson.plain(template.quantity())));
        return tree;
    }
}
