package org.congener.schemas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import com.fasterxml.jackson.core.JsonProcessingException;
import java.time.Instant;
import java.util.Map;
import org.junit.jupiter.api.Test;

class JsonTest {

    @Test
    void shouldWriteInstantsAsIsoStrings() throws Exception {
        String json = Json.mapper().writeValueAsString(Map.of("at", Instant.parse("2026-03-14T09:26:53.125Z")));
        assertEquals("{\"at\":\"2026-03-14T09:26:53.125Z\"}", json);
    }

    @Test
    void shouldReadAbsentOptionalFieldsAsNullAndIgnoreUnknownOnes() throws Exception {
        String json = "{\"compoundId\":\"cmp-1\",\"weight\":0.5,\"extra\":true}";
        assertEquals(new Contribution("cmp-1", 0.5), Json.mapper().readValue(json, Contribution.class));
        Suggestion partial = Json.mapper().readValue("{\"rank\":1,\"compoundId\":\"cmp-1\"}", Suggestion.class);
        assertEquals(null, partial.sharedTermId());
    }

    @Test
    void shouldFailWhenContentFollowsTheValue() {
        assertThrows(JsonProcessingException.class,
                () -> Json.mapper().readValue("{\"compoundId\":\"a\",\"weight\":1} {}", Contribution.class));
    }

    @Test
    void shouldRoundTripFloatFactorsExactly() throws Exception {
        float[] factors = {0.1f, -2.5e-12f, Float.MAX_VALUE, Float.MIN_VALUE, 1f / 3f};
        ItemFactors written = new ItemFactors(SchemaIds.ITEM_FACTORS, "m-1", "cmp-1", factors);
        ItemFactors read = Json.mapper().readValue(Json.mapper().writeValueAsBytes(written), ItemFactors.class);
        for (int i = 0; i < factors.length; i++) {
            assertEquals(Float.floatToIntBits(factors[i]), Float.floatToIntBits(read.factors()[i]), "factor " + i);
        }
    }
}
