package org.stellabar.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.eos.Composition;

/** The README's "Use it from Java" example, compiled and run as a reader would, and the facade's values. */
class ReadmeExampleTest {

    @Test
    void theReadmeExampleCompilesAndRuns(@TempDir Path dir) throws Exception {
        String readme = Files.readString(Path.of("README.md"));
        int section = readme.indexOf("## Use it from Java");
        assertTrue(section >= 0, "README has the section");
        int start = readme.indexOf("```java\n", section) + "```java\n".length();
        String source = readme.substring(start, readme.indexOf("```", start));
        Path file = dir.resolve("RadiationSupport.java");
        Files.writeString(file, source);

        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        int status = javac.run(null, null, null, "-d", dir.toString(), "-cp", System.getProperty("java.class.path"),
                file.toString());
        assertEquals(0, status, "the example compiles");

        ByteArrayOutputStream printed = new ByteArrayOutputStream();
        PrintStream saved = System.out;
        try (URLClassLoader loader = new URLClassLoader(new URL[] {dir.toUri().toURL()}, getClass().getClassLoader())) {
            System.setOut(new PrintStream(printed, true, StandardCharsets.UTF_8));
            loader.loadClass("RadiationSupport").getMethod("main", String[].class).invoke(null, (Object) new String[0]);
        } finally {
            System.setOut(saved);
        }
        List<String> lines = printed.toString(StandardCharsets.UTF_8).lines().toList();
        assertEquals(5, lines.size(), lines.toString());
        assertTrue(lines.get(0).startsWith("Gamma1 = ") && lines.get(1).startsWith("beta = "), lines.toString());
        assertTrue(lines.get(2).contains(" K, verdict "), lines.toString());
        assertTrue(lines.get(3).startsWith("beta(1000 Msun) = ") && lines.get(4).startsWith("<Gamma1> = "),
                lines.toString());
    }

    /** The facade's values are the library's own (identities, no second calculation). */
    @Test
    void facadeValuesAreTheLibrarysOwn() {
        Composition mix = Stellabar.composition(0.70, 0.28, 0.02);
        var state = Stellabar.state(1.0, 1e7, mix);
        // P(rho, T) -> (P, T) -> rho: the inversion returns the density to rounding
        assertEquals(1.0, Stellabar.stateAtPressure(state.P(), 1e7, mix).rho(), 1e-12);
        // the standard model's beta is the same whether asked for directly or through the star
        double beta = Stellabar.standardModelBeta(40, mix).beta();
        assertEquals(beta, Stellabar.standardModel(40, 12, mix).headline().centre().beta(), 1e-12);
        // n = 1: xi1 = pi (closed form)
        assertEquals(Math.PI, Stellabar.polytrope(1.0).xi1(), 1e-12);
    }
}
