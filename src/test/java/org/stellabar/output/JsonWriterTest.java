package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.stellabar.table.Version;

/** The JSON is parsed back with Jackson's tree model, a reader independent of the streaming writer. */
class JsonWriterTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    @Test
    void summaryRoundTrips() throws Exception {
        StringWriter out = new StringWriter();
        new JsonWriter().write(Fixtures.summary(), out);
        assertTrue(out.toString().endsWith("}\n"));
        JsonNode root = MAPPER.readTree(out.toString());
        assertEquals(1.3721620554405665E15, root.get("P").asDouble(), 0.0);
        assertEquals(0.9816208947519909, root.get("beta").asDouble(), 0.0);
        assertTrue(root.get("count").isIntegralNumber());
        assertEquals(42, root.get("count").asLong());
        assertEquals("a, b", root.get("name").asText());
        assertTrue(root.get("ok").asBoolean());
        assertEquals(0.6172839506172839, root.get("composition").get("mu").asDouble(), 0.0);
        assertEquals("pairs, \"many\"", root.get("warnings").get(1 - 1).get("message").asText());
        assertEquals(2, root.get("warnings").size());
        // nested table
        JsonNode profile = root.get("profile");
        assertEquals("sample", profile.get("name").asText());
        assertEquals(Fixtures.AWKWARD.length, profile.get("rows").asInt());
        // units only for dimensional fields
        assertEquals("erg/cm3", root.get("units").get("P").asText());
        assertFalse(root.get("units").has("beta"));
        JsonNode metadata = root.get("metadata");
        assertEquals(Fixtures.META.title(), metadata.get("title").asText());
        assertEquals(Version.current(), metadata.get("stellabar_version").asText());
        assertTrue(metadata.get("constants").asText().contains("IAU 2015"));
        assertEquals("say \"hi\"", metadata.get("inputs").get("label").asText());
        // number inputs are JSON numbers, their units beside them as "units" does for fields
        assertTrue(metadata.get("inputs").get("M").isDouble());
        assertEquals(40.0, metadata.get("inputs").get("M").asDouble(), 0.0);
        assertEquals("solMass", metadata.get("input_units").get("M").asText());
        assertTrue(metadata.get("inputs").get("points").isIntegralNumber());
        assertEquals(1e-10, metadata.get("inputs").get("tolerance").asDouble(), 0.0);
        assertFalse(metadata.get("input_units").has("tolerance"));
        assertEquals(List.of("first note", "second note"),
                List.of(metadata.get("notes").get(0).asText(), metadata.get("notes").get(1).asText()));
    }

    @Test
    void tableRoundTripsExactly() throws Exception {
        StringWriter out = new StringWriter();
        new JsonWriter().write(Fixtures.table(), out);
        JsonNode root = MAPPER.readTree(out.toString());
        JsonNode columns = root.get("columns");
        assertEquals(3, columns.size());
        JsonNode rho = columns.get(0);
        assertEquals("rho", rho.get("name").asText());
        assertEquals("g/cm3", rho.get("unit").asText());
        assertEquals("density", rho.get("description").asText());
        for (int i = 0; i < Fixtures.AWKWARD.length; i++) {
            assertEquals(Fixtures.AWKWARD[i], rho.get("values").get(i).asDouble(), 0.0);
            assertEquals(Fixtures.AWKWARD_TEXT.get(i % Fixtures.AWKWARD_TEXT.size()),
                    columns.get(2).get("values").get(i).asText());
        }
        assertTrue(root.has("metadata"));
    }
}
