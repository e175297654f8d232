package org.stellabar.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.jar.JarFile;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.eos.Composition;

/**
 * Runs in the {@code install} phase, after the library is in the local Maven repository: the
 * installed jar is the plain library (no dependency inside, a module name), its POM names the
 * dependencies, and the README's Java example compiles with {@code javac} and runs in a JVM of
 * its own against the installed jar and the dependencies' jars only, printing the same numbers
 * as the library under test (the same code: equal to the last bit).
 */
class InstalledLibraryIT {

    private static Path property(String name) {
        String value = System.getProperty(name);
        assertTrue(value != null && !value.isBlank(), "system property " + name + " is set by the POM's failsafe"
                + " execution 'installed-library'; run this test through `mvn install`");
        return Path.of(value);
    }

    @Test
    void theInstalledJarIsThePlainLibraryWithItsDependenciesInThePom() throws Exception {
        Path jar = property("stellabar.installedJar");
        assertTrue(Files.isRegularFile(jar), jar + " is installed");
        try (JarFile file = new JarFile(jar.toFile())) {
            assertEquals("org.stellabar", file.getManifest().getMainAttributes().getValue("Automatic-Module-Name"));
            assertTrue(file.getEntry("org/stellabar/api/Stellabar.class") != null);
            List<String> foreign = file.stream().map(e -> e.getName())
                    .filter(n -> n.endsWith(".class") && !n.startsWith("org/stellabar/")).limit(5).toList();
            assertEquals(List.of(), foreign, "the library jar holds our classes only");
        }
        String pom = Files.readString(property("stellabar.installedPom"));
        for (String dependency : List.of("hipparchus-core", "hipparchus-ode", "picocli", "jackson-databind",
                "nom-tam-fits")) {
            assertTrue(pom.contains("<artifactId>" + dependency + "</artifactId>"), "the installed POM names " + dependency);
        }
        Path javadoc = jar.resolveSibling(jar.getFileName().toString().replace(".jar", "-javadoc.jar"));
        assertTrue(Files.isRegularFile(javadoc), javadoc + " is installed beside the jar");
    }

    @Test
    void theReadmeExampleRunsAgainstTheInstalledJar(@TempDir Path dir) throws Exception {
        String readme = Files.readString(Path.of("README.md"));
        int section = readme.indexOf("## Use it from Java");
        assertTrue(section >= 0, "README has the section");
        int start = readme.indexOf("```java\n", section) + "```java\n".length();
        Path source = dir.resolve("RadiationSupport.java");
        Files.writeString(source, readme.substring(start, readme.indexOf("```", start)));

        List<String> classPath = new ArrayList<>();
        classPath.add(property("stellabar.installedJar").toString());
        String dependencies = Files.readString(property("stellabar.libraryClasspath")).strip();
        assertFalse(dependencies.contains("target" + File.separator + "classes"), dependencies);
        classPath.addAll(List.of(dependencies.split(File.pathSeparator)));
        String cp = String.join(File.pathSeparator, classPath);

        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        assertEquals(0, javac.run(null, null, null, "-d", dir.toString(), "-cp", cp, source.toString()),
                "the example compiles against the installed jar");

        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        Process run = new ProcessBuilder(java.toString(), "-Djava.awt.headless=true", "-cp",
                dir + File.pathSeparator + cp, "RadiationSupport").redirectErrorStream(true).start();
        run.getOutputStream().close();
        String printed = new String(run.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(run.waitFor(120, TimeUnit.SECONDS), "the example finishes");
        assertEquals(0, run.exitValue(), printed);

        List<String> lines = printed.lines().toList();
        assertEquals(5, lines.size(), printed);
        Composition mix = Stellabar.composition(0.70, 0.28, 0.02);
        assertEquals("Gamma1 = " + Stellabar.state(1.0, 1e7, mix).Gamma1(), lines.get(0));
        assertEquals("beta = " + Stellabar.standardModelBeta(40, mix).beta(), lines.get(1));
        assertEquals("beta(1000 Msun) = " + Stellabar.standardModelSequence(10, 1000, 5, mix).get(4).beta(),
                lines.get(3));
    }
}
