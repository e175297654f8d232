package org.stellabar.eos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.stellabar.output.JsonWriter;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Summary;

/** The state as the command line shows it: the field names of DESIGN §4 and README, units, values. */
class EosStateSummaryTest {

    /** DESIGN §4 JSON names, plus the extras README lists. */
    private static final List<String> TOP_LEVEL = List.of("rho", "T", "P", "P_gas", "P_rad", "beta", "one_minus_beta",
            "u", "s", "s_per_baryon", "f", "g", "chi_rho", "chi_T", "delta", "c_V", "c_P", "Gamma1", "Gamma2", "Gamma3",
            "nabla_ad", "sound_speed", "n_photon", "mean_photon_energy", "photons_per_baryon", "composition",
            "warnings");

    private static JsonNode json(EosState state) throws Exception {
        StringWriter out = new StringWriter();
        new JsonWriter().write(EosStateSummary.of(state, Inputs.builder().number(EosQuantities.RHO, 1.0).build()), out);
        return new ObjectMapper().readTree(out.toString());
    }

    @Test
    void jsonHoldsTheContractFieldsWithTheirValues() throws Exception {
        EosState s = new GasRadiationEos(Composition.of(0.7, 0.28, 0.02)).state(1.0, 1e7);
        JsonNode root = json(s);
        for (String name : TOP_LEVEL) {
            assertTrue(root.has(name), "field " + name);
        }
        // full double precision survives the text
        assertEquals(s.P(), root.get("P").asDouble(), 0.0);
        assertEquals(s.oneMinusBeta(), root.get("one_minus_beta").asDouble(), 0.0);
        assertEquals(s.Gamma1(), root.get("Gamma1").asDouble(), 0.0);
        assertEquals(s.nablaAd(), root.get("nabla_ad").asDouble(), 0.0);
        JsonNode c = root.get("composition");
        for (String name : List.of("X", "Y", "Z", "mu", "mu_e", "mu_i")) {
            assertTrue(c.has(name), "composition." + name);
        }
        assertEquals(1.0 / 1.62, c.get("mu").asDouble(), 1e-15);
        assertTrue(root.get("warnings").isArray());
        assertEquals("g/cm3", root.get("units").get("rho").asText());
        assertEquals("erg/cm3", root.get("units").get("P").asText());
        assertEquals("erg/(g.K)", root.get("units").get("c_P").asText());
        assertTrue(root.get("metadata").get("constants").asText().contains("CODATA 2018"));
    }

    @Test
    void warningsAreCodeAndMessage() throws Exception {
        EosState s = new GasRadiationEos(Composition.of(0.7, 0.28, 0.02)).state(1e6, 2e9);
        JsonNode warnings = json(s).get("warnings");
        assertEquals(s.warnings().size(), warnings.size());
        for (int i = 0; i < warnings.size(); i++) {
            assertEquals(s.warnings().get(i).code().code(), warnings.get(i).get("code").asText());
            assertEquals(s.warnings().get(i).message(), warnings.get(i).get("message").asText());
        }
        assertTrue(s.has(ValidityWarning.Regime.PAIR_CREATION));
    }

    @Test
    void metalMassNumberAppearsOnlyWhenCounted() {
        Metadata metadata = Metadata.of("t", Inputs.none(), List.of());
        Summary without = EosStateSummary.composition(Composition.of(0.7, 0.28, 0.02), metadata);
        assertTrue(without.field("A_Z").isEmpty());
        Summary with = EosStateSummary.composition(Composition.of(0.7, 0.28, 0.02, 16), metadata);
        assertEquals(16.0, with.number("A_Z"));
    }
}
