package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import picocli.CommandLine;

/** {@code stellabar eos} run in-process, output captured through picocli's writers. */
class EosCommandTest {

    /** What one run printed and returned. */
    record Run(int exit, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = StellabarCommand.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        List<String> all = new ArrayList<>(List.of("eos"));
        all.addAll(List.of(args));
        int exit = cl.execute(all.toArray(String[]::new));
        return new Run(exit, out.toString(), err.toString());
    }

    // CODATA 2018 (Tiesinga et al. 2021), CGS; a = π²k⁴/(15ħ³c³)
    private static final double K = 1.380649e-16;
    private static final double M_U = 1.66053906660e-24;
    private static final double HBAR_C = 6.62607015e-27 / (2 * Math.PI) * 2.99792458e10;
    private static final double A = Math.PI * Math.PI * Math.pow(K, 4) / (15 * Math.pow(HBAR_C, 3));

    /** The README example, ρ = 1 g/cm3, T = 1e7 K, X = 0.7, Z = 0.02: 1/μ = 2X + 3Y/4 + Z/2 = 1.62. */
    private static final double P_GAS = 1.0 * K * 1e7 * 1.62 / M_U;
    private static final double P_RAD = A * 1e28 / 3;
    private static final double P = P_GAS + P_RAD;
    private static final String[] README_EXAMPLE = {"--rho", "1", "--temp", "1e7", "--X", "0.7", "--Z", "0.02"};

    private static String[] with(String... extra) {
        List<String> args = new ArrayList<>(List.of(README_EXAMPLE));
        args.addAll(List.of(extra));
        return args.toArray(String[]::new);
    }

    private static double textValue(String text, String name) {
        Matcher m = Pattern.compile("(?m)^" + Pattern.quote(name) + "\\s+(\\S+)").matcher(text);
        assertTrue(m.find(), "line for " + name + " in\n" + text);
        return Double.parseDouble(m.group(1));
    }

    @Nested
    class ReadmeExample {

        @Test
        void text() {
            Run r = run(README_EXAMPLE);
            assertEquals(0, r.exit(), r.err());
            assertEquals("", r.err());
            // seven significant digits: half a unit of the seventh, 5e-7, plus margin
            assertEquals(P, textValue(r.out(), "P"), 1e-6 * P);
            assertEquals(P_GAS / P, textValue(r.out(), "beta"), 1e-6);
            assertEquals(P_RAD / P, textValue(r.out(), "one_minus_beta"), 1e-6 * P_RAD / P);
            assertTrue(r.out().lines().anyMatch(l -> l.matches("P\\s+\\S+\\s+erg/cm3\\s+.*")), "unit beside P");
            assertTrue(r.out().contains("warnings: none"));
            assertTrue(r.out().contains("input rho = 1.0 g/cm3"));
        }

        @Test
        void json() throws Exception {
            Run r = run(with("--format", "json"));
            assertEquals(0, r.exit(), r.err());
            JsonNode root = new ObjectMapper().readTree(r.out());
            // double precision through the text: the independent formula to 1e-12
            assertEquals(P, root.get("P").asDouble(), 1e-12 * P);
            assertEquals(P_RAD / P, root.get("one_minus_beta").asDouble(), 1e-12 * P_RAD / P);
            assertEquals(1.0 / 1.62, root.get("composition").get("mu").asDouble(), 1e-15);
            for (String name : List.of("rho", "T", "P", "P_gas", "P_rad", "beta", "one_minus_beta", "u", "s", "c_V",
                    "c_P", "chi_T", "chi_rho", "delta", "Gamma1", "Gamma2", "Gamma3", "nabla_ad", "sound_speed",
                    "n_photon", "photons_per_baryon", "warnings")) {
                assertTrue(root.has(name), "DESIGN §4 field " + name);
            }
            assertEquals(0, root.get("warnings").size());
            assertEquals("erg/cm3", root.get("units").get("P").asText());
        }

        @Test
        void csv() {
            Run r = run(with("--format", "csv"));
            assertEquals(0, r.exit(), r.err());
            List<String> lines = r.out().lines().toList();
            assertEquals(2, lines.size());
            List<String> header = List.of(lines.get(0).split(","));
            List<String> row = List.of(lines.get(1).split(",", -1));
            assertEquals(header.size(), row.size());
            assertTrue(header.contains("rho [g/cm3]") && header.contains("T [K]") && header.contains("beta"));
            int p = header.indexOf("P [erg/cm3]");
            assertEquals(P, Double.parseDouble(row.get(p)), 1e-12 * P);
        }

        @Test
        void sameStateFromPressureAndInOtherUnits() throws Exception {
            Run fromPressure = run("--pressure", P + " dyn/cm2", "--temp", "10 MK", "--X", "0.7", "--Z", "0.02",
                    "--format", "json");
            assertEquals(0, fromPressure.exit(), fromPressure.err());
            assertEquals(1.0, new ObjectMapper().readTree(fromPressure.out()).get("rho").asDouble(), 1e-12);
            Run si = run("--rho", "1000 kg/m3", "--temp", "1e7 K", "--format", "json");
            Run cgs = run("--rho", "1", "--temp", "1e7", "--format", "json");
            assertEquals(new ObjectMapper().readTree(cgs.out()).get("P"), new ObjectMapper().readTree(si.out()).get("P"));
            // no composition given: X = 0.70, Z = 0.02, the README's default
            assertEquals(P, new ObjectMapper().readTree(cgs.out()).get("P").asDouble(), 1e-12 * P);
        }

        @Test
        void pureMetalsWithTheirIons() {
            Run r = run("--rho", "1e6", "--temp", "1e7", "--X", "0", "--Y", "0", "--Z", "1", "--metal-mass-number", "12");
            assertEquals(0, r.exit(), r.err());
            assertTrue(r.out().contains("electron_degeneracy"));
        }
    }

    static Stream<Arguments> badInputs() {
        return Stream.of(
                new String[] {},
                new String[] {"--temp", "1e7"},
                new String[] {"--rho", "1"},
                new String[] {"--rho", "1", "--rho", "2", "--temp", "1e7"},
                new String[] {"--pressure", "1e15", "--pressure", "2e15", "--temp", "1e7"},
                new String[] {"--rho", "1", "--pressure", "1e15", "--temp", "1e7"},
                new String[] {"--rho", "1", "--temp", "1e7", "--temp", "2e7"},
                new String[] {"--rho", "1", "--temp", "1e7", "--X", "0.7", "--Y", "0.2", "--Z", "0.2"},
                new String[] {"--rho", "1", "--temp", "1e7", "--X", "0.8", "--Y", "0.3"},
                new String[] {"--rho", "1", "--temp", "1e7", "--X", "1.2", "--Z", "0"},
                new String[] {"--rho", "1", "--temp", "1e7", "--X", "-0.1", "--Z", "0"},
                new String[] {"--rho", "1", "--temp", "1e7", "--X", "0.7"},
                new String[] {"--rho", "-1", "--temp", "1e7"},
                new String[] {"--rho=-1", "--temp", "1e7"},
                new String[] {"--rho", "0", "--temp", "1e7"},
                new String[] {"--rho", "1", "--temp", "0"},
                new String[] {"--rho", "1", "--temp=-5"},
                new String[] {"--rho", "1", "--temp", "-5"},
                new String[] {"--pressure", "0", "--temp", "1e7"},
                new String[] {"--rho", "NaN", "--temp", "1e7"},
                new String[] {"--rho", "1", "--temp", "NaN"},
                new String[] {"--rho", "Infinity", "--temp", "1e7"},
                new String[] {"--rho", "1", "--temp", "1e7", "--X", "NaN", "--Z", "0.02"},
                new String[] {"--rho", "1", "--temp", "1e7", "--mu", "NaN"},
                new String[] {"--rho", "3 K", "--temp", "1e7"},
                new String[] {"--rho", "1", "--temp", "1e7 furlong"},
                new String[] {"--rho", "1", "--temp", "1e7 g/cm3"},
                new String[] {"--pressure", "1 Msun", "--temp", "1e7"},
                new String[] {"--pressure", "1", "--temp", "1e7"},
                new String[] {"--pressure", "2.5e13", "--temp", "1e7"},
                new String[] {"--rho", "1", "--temp", "1e7", "--mu", "0.6", "--X", "0.7"},
                new String[] {"--rho", "1", "--temp", "1e7", "--mu", "0.6", "--Z", "0.02", "--Y", "0.3"},
                new String[] {"--rho", "1", "--temp", "1e7", "--mu", "2"},
                new String[] {"--rho", "1", "--temp", "1e7", "--mu", "0.4"},
                new String[] {"--rho", "1", "--temp", "1e7", "--mu", "1.5", "--metal-mass-number", "16"},
                new String[] {"--rho", "1", "--temp", "1e7", "--metal-mass-number", "1"},
                new String[] {"--rho", "1", "--temp", "1e7", "--X", "0", "--Y", "0", "--Z", "1"},
                new String[] {"--rho", "1e-300", "--temp", "1e10"},
                new String[] {"--rho", "1", "--temp", "1e80"},
                new String[] {"--rho", "1", "--temp", "1e7", "--format", "xml"},
                new String[] {"--rho", "1", "--temp", "1e7", "--frobnicate"},
                new String[] {"--rho", "1", "--temp", "1e7", "extra"}).map(args -> Arguments.of((Object) args));
    }

    @ParameterizedTest
    @MethodSource("badInputs")
    void badInputIsOneLineAndExitTwo(String[] args) {
        Run r = run(args);
        String shown = String.join(" ", args);
        assertEquals(StellabarCommand.EXIT_BAD_INPUT, r.exit(), shown + " -> " + r.err());
        assertEquals(1, r.err().lines().count(), "exactly one line for '" + shown + "':\n" + r.err());
        assertTrue(r.err().startsWith("stellabar eos: "), r.err());
        assertFalse(r.err().contains("at org.") || r.err().contains("Exception"), "no stack trace: " + r.err());
        assertFalse(r.err().contains("NaN") && !shown.contains("NaN"), r.err());
        assertEquals("", r.out(), "nothing printed on bad input");
    }

    @Test
    void messagesNameTheOptionAndTheValue() {
        Run sum = run("--rho", "1", "--temp", "1e7", "--X", "0.7", "--Y", "0.2", "--Z", "0.2");
        assertTrue(sum.err().contains("--X/--Y/--Z") && sum.err().contains("1.1"), sum.err());
        Run negative = run("--rho", "-1", "--temp", "1e7");
        assertTrue(negative.err().contains("--rho") && negative.err().contains("-1"), negative.err());
        Run unit = run("--rho", "3 K", "--temp", "1e7");
        assertTrue(unit.err().contains("--rho") && unit.err().contains("'K'") && unit.err().contains("g/cm3"),
                unit.err());
        Run radiation = run("--pressure", "1", "--temp", "1e7");
        assertTrue(radiation.err().contains("--pressure") && radiation.err().contains("radiation pressure"),
                radiation.err());
        Run mu = run("--rho", "1", "--temp", "1e7", "--mu", "0.6", "--X", "0.7");
        assertTrue(mu.err().contains("--mu"), mu.err());
    }

    @Test
    void helpExitsZero() {
        Run r = run("--help");
        assertEquals(0, r.exit());
        assertTrue(r.out().contains("--rho") && r.out().contains("--pressure") && r.out().contains("--temp"));
    }
}
