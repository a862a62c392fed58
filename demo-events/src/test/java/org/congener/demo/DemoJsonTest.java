package org.congener.demo;

import org.congener.schemas.SchemaIds;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.junit.jupiter.api.Test;

import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.List;
import java.util.stream.Collectors;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class DemoJsonTest {

    @Test
    void shouldWriteDoublesInPlainNotationWithAtMostThreeDecimals() {
        assertEquals("0.0", DemoJson.plain(0));
        assertEquals("250.0", DemoJson.plain(250));
        assertEquals("0.125", DemoJson.plain(0.125));
        assertEquals("0.123", DemoJson.plain(0.1234));
        assertEquals("-25.0", DemoJson.plain(-25));
        assertEquals("12000000.0", DemoJson.plain(1.2e7));
        assertEquals("0.001", DemoJson.plain(0.001));
    }

    @Test
    void shouldRefuseNonFiniteNumbers() {
        assertThrows(IllegalArgumentException.class, () -> DemoJson.plain(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> DemoJson.plain(Double.POSITIVE_INFINITY));
    }

    @Test
    void shouldWriteFieldsInRecordComponentOrder() throws Exception {
        UsageEvent event = new UsageEvent(SchemaIds.USAGE_EVENT, "U000001", "R0001", "C00001", UsageKind.ORDER,
                2.5, "mL", "2026-01-01T09:00:00Z");
        List<String> written = iteratorToList(DemoJson.mapper().readTree(DemoJson.line(event)).fieldNames());
        List<String> declared = Arrays.stream(UsageEvent.class.getRecordComponents())
                .map(RecordComponent::getName).collect(Collectors.toList());
        assertEquals(declared, written);
        assertEquals("{\"schema\":\"congener/usage-event/v1\",\"eventId\":\"U000001\",\"researcherId\":\"R0001\","
                + "\"compoundId\":\"C00001\",\"kind\":\"ORDER\",\"quantity\":2.5,\"unit\":\"mL\","
                + "\"occurredAt\":\"2026-01-01T09:00:00Z\"}", DemoJson.line(event));
    }

    @Test
    void shouldReadBackWhatItWrites() {
        UsageEvent event = new UsageEvent(SchemaIds.USAGE_EVENT, "U000002", "R0002", "C00002", UsageKind.VIEW,
                0.0, "g", "2026-02-01T10:00:00Z");
        assertEquals(event, DemoJson.readLine(DemoJson.line(event), UsageEvent.class, "test", 1));
    }

    @Test
    void shouldNameSourceAndLineWhenALineDoesNotParse() {
        Exception e = assertThrows(RuntimeException.class,
                () -> DemoJson.readLine("{\"schema\":", UsageEvent.class, "usage-events.jsonl", 42));
        assertTrue(e.getMessage().startsWith("usage-events.jsonl line 42:"), e.getMessage());
    }

    private static List<String> iteratorToList(Iterator<String> it) {
        List<String> list = new ArrayList<>();
        it.forEachRemaining(list::add);
        return list;
    }
}
