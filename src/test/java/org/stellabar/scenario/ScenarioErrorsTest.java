package org.stellabar.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.scenario.ScenarioTestSupport.assertError;
import static org.stellabar.scenario.ScenarioTestSupport.assertOneOf;
import static org.stellabar.scenario.ScenarioTestSupport.errorsOf;
import static org.stellabar.scenario.ScenarioTestSupport.onlyError;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.physics.BadInputException;
import org.stellabar.scenario.ScenarioError.Kind;

/**
 * Every kind of mistake in a scenario file is reported with its kind and the line and column of
 * the offending value or key. Wording is not asserted, except that a suggestion names the key it
 * suggests.
 */
class ScenarioErrorsTest {

    private static String star(String body) {
        return "name = \"t\"\n\n[[star]]\nname = \"A\"\n" + body + "\n";
    }

    @Nested
    class Quantities {

        @Test
        void unknownMassUnitPointsAtTheValue() {
            String toml = star("mass = \"45 Msol\"\nradius = \"10 Rsun\"");
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.BAD_UNIT, toml, "\"45 Msol\"");
            assertEquals("star[1].mass", e.key());
            assertEquals("\"45 Msol\"", e.value());
        }

        @Test
        void unitOfAnotherDimension() {
            String toml = star("mass = \"40 Msun\"\nradius = \"3e7 K\"");
            assertError(onlyError(toml), Kind.BAD_UNIT, toml, "\"3e7 K\"");
        }

        @Test
        void notANumber() {
            String toml = star("mass = \"forty Msun\"\nradius = \"10 Rsun\"");
            assertError(onlyError(toml), Kind.BAD_UNIT, toml, "\"forty Msun\"");
        }

        @ParameterizedTest
        @ValueSource(strings = {"0", "-3", "\"-3 Msun\"", "\"0 g\"", "nan", "inf", "-0.0"})
        void massMustBePositiveAndFinite(String mass) {
            String toml = star("mass = " + mass + "\nradius = \"10 Rsun\"");
            assertError(onlyError(toml), Kind.OUT_OF_RANGE, toml, mass);
        }

        @Test
        void radiusMustBePositive() {
            String toml = star("mass = \"40 Msun\"\nradius = -1e11");
            assertError(onlyError(toml), Kind.OUT_OF_RANGE, toml, "-1e11");
        }

        @Test
        void entropyMustBePositive() {
            String toml = star("kind = \"isentropic\"\nmass = \"40 Msun\"\nentropy_per_baryon = 0");
            assertError(onlyError(toml), Kind.OUT_OF_RANGE, toml, "0\n");
        }
    }

    @Nested
    class MissingAndConflicting {

        @Test
        void missingMassPointsAtTheStarHeader() {
            String toml = star("radius = \"10 Rsun\"");
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.MISSING, toml, "[[star]]");
            assertEquals("star[1].mass", e.key());
        }

        @Test
        void missingNameOfTheSecondStar() {
            String toml = star("mass = 1e34\nradius = 1e11") + "\n[[star]]\nmass = 1e34\nradius = 1e11\n";
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.MISSING, toml, "[[star]]", 2);
            assertEquals("star[2].name", e.key());
        }

        @ParameterizedTest
        @ValueSource(strings = {"kind = \"standard\"", "kind = \"polytrope\"\nindex = 1.5", "index = 2\nkind = \"polytrope\""})
        void radiusMissingForAKindThatNeedsIt(String kindLines) {
            String toml = star(kindLines + "\nmass = \"40 Msun\"");
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.MISSING, toml, "[[star]]");
            assertEquals("star[1].radius", e.key());
        }

        @Test
        void isentropicStarWithNothingToFixItsScale() {
            String toml = star("kind = \"isentropic\"\nmass = \"40 Msun\"");
            assertError(onlyError(toml), Kind.MISSING, toml, "[[star]]");
        }

        @Test
        void bothRadiusAndCentralTemperatureOnAnIsentropicStar() {
            String toml = star("kind = \"isentropic\"\nmass = \"40 Msun\"\nradius = \"10 Rsun\"\n"
                    + "central_temperature = \"3e7 K\"");
            assertError(onlyError(toml), Kind.CONFLICT, toml, "central_temperature");
        }

        @Test
        void allThreeAnchorsGiveTwoConflicts() {
            String toml = star("kind = \"isentropic\"\nmass = \"40 Msun\"\nentropy_per_baryon = 25\n"
                    + "radius = \"10 Rsun\"\ncentral_temperature = \"3e7 K\"");
            List<ScenarioError> errors = errorsOf(toml);
            assertEquals(2, errors.size(), ScenarioTestSupport.join(errors));
            // entropy_per_baryon comes first in the file and counts; the later two conflict with it
            assertError(errors.get(0), Kind.CONFLICT, toml, "radius");
            assertError(errors.get(1), Kind.CONFLICT, toml, "central_temperature");
        }

        @Test
        void bothRadiusAndCentralTemperatureOnAStandardStar() {
            String toml = star("mass = \"40 Msun\"\nradius = \"10 Rsun\"\ncentral_temperature = \"3e7 K\"");
            assertError(onlyError(toml), Kind.CONFLICT, toml, "central_temperature");
        }

        @Test
        void centralTemperatureInsteadOfRadiusOnAPolytrope() {
            String toml = star("kind = \"polytrope\"\nindex = 3\nmass = \"40 Msun\"\nentropy_per_baryon = 20");
            List<ScenarioError> errors = errorsOf(toml);
            assertEquals(2, errors.size(), ScenarioTestSupport.join(errors));
            assertOneOf(errors, Kind.MISSING, toml, "[[star]]");
            assertOneOf(errors, Kind.NOT_APPLICABLE, toml, "entropy_per_baryon");
        }
    }

    /**
     * The star rules (one place, {@code StarDraft}/{@code StarRequestRules}) reported with the
     * position of the key they are about, every one of them at once.
     */
    @Nested
    class StarRules {

        @Test
        void radiusInsideTheBuchdahlBoundPointsAtTheRadius() {
            // Buchdahl 1959: R > (9/4) GM/c^2 = 3.32 km per solar mass; 10 km for 40 Msun is inside it
            String toml = star("mass = \"40 Msun\"\nradius = \"10 km\"");
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.OUT_OF_RANGE, toml, "\"10 km\"");
            assertEquals("star[1].radius", e.key());
            assertTrue(e.problem().contains("Buchdahl"), e::toString);
        }

        @ParameterizedTest
        @ValueSource(strings = {"\"1e-3 K\"", "\"1e15 K\""})
        void centralTemperatureOutsideTheEosRangePointsAtTheValue(String temperature) {
            String toml = star("kind = \"isentropic\"\nmass = \"40 Msun\"\ncentral_temperature = " + temperature);
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.OUT_OF_RANGE, toml, temperature);
            assertEquals("star[1].central_temperature", e.key());
        }

        @Test
        void everyStarRuleOfAScenarioIsReportedAtOnceWithItsPosition() {
            String toml = "name = \"t\"\n\n"
                    + "[[star]]\nname = \"A\"\nmass = \"40 Msun\"\nradius = \"10 km\"\npoints = 2\n\n"
                    + "[[star]]\nname = \"B\"\nkind = \"isentropic\"\nmass = \"40 Msun\"\n"
                    + "central_temperature = \"1e15 K\"\n";
            List<ScenarioError> errors = errorsOf(toml);
            assertEquals(3, errors.size(), ScenarioTestSupport.join(errors));
            assertError(errors.get(0), Kind.OUT_OF_RANGE, toml, "\"10 km\"");
            assertError(errors.get(1), Kind.OUT_OF_RANGE, toml, "2\n");
            assertError(errors.get(2), Kind.OUT_OF_RANGE, toml, "\"1e15 K\"");
        }

        @Test
        void pointsTwoInTheDefaultsPointsAtTheDefaults() {
            String toml = "name = \"t\"\n\n[defaults]\npoints = 2\n\n[[star]]\nname = \"A\"\n"
                    + "mass = \"40 Msun\"\nradius = \"10 Rsun\"\n";
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.OUT_OF_RANGE, toml, "2\n");
            assertEquals("defaults.points", e.key());
        }
    }

    @Nested
    class PolytropicIndex {

        @ParameterizedTest
        @ValueSource(strings = {"5", "5.0", "7.5", "-1", "-0.01"})
        void indexOutsideZeroToFive(String index) {
            String toml = star("kind = \"polytrope\"\nmass = \"40 Msun\"\nradius = \"10 Rsun\"\nindex = " + index);
            assertError(onlyError(toml), Kind.OUT_OF_RANGE, toml, index + "\n");
        }

        @ParameterizedTest
        @ValueSource(strings = {"0", "4.999", "1.5", "3"})
        void indexInsideZeroToFiveIsAccepted(String index) {
            String toml = star("kind = \"polytrope\"\nmass = \"40 Msun\"\nradius = \"10 Rsun\"\nindex = " + index);
            ScenarioStar s = ScenarioReader.read("ok.toml", toml).stars().get(0);
            assertEquals(Double.parseDouble(index), ScenarioTestSupport.index(s).getAsDouble(), 0.0);
        }

        @ParameterizedTest
        @ValueSource(strings = {"standard", "isentropic"})
        void indexOnANonPolytropePointsAtTheKey(String kind) {
            String toml = star("kind = \"" + kind + "\"\nmass = \"40 Msun\"\nradius = \"10 Rsun\"\nindex = 3");
            assertError(onlyError(toml), Kind.NOT_APPLICABLE, toml, "index");
        }

        @Test
        void polytropeWithoutIndex() {
            String toml = star("kind = \"polytrope\"\nmass = \"40 Msun\"\nradius = \"10 Rsun\"");
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.MISSING, toml, "[[star]]");
            assertEquals("star[1].index", e.key());
        }
    }

    @Nested
    class Composition {

        private String withComposition(String composition) {
            return star("mass = \"40 Msun\"\nradius = \"10 Rsun\"\ncomposition = " + composition);
        }

        @Test
        void fractionsNotAddingUpToOnePointAtTheTable() {
            String toml = withComposition("{ X = 0.7, Y = 0.3, Z = 0.02 }");
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.COMPOSITION_SUM, toml, "{ X");
            assertEquals("star[1].composition", e.key());
        }

        @Test
        void sumToleranceIsOneInABillion() {
            // 0.70 + 0.28 + 0.0200000005 is 1 + 5e-10 (inside 1e-9); + 0.020000002 is 1 + 2e-9 (outside)
            ScenarioReader.read("ok.toml", withComposition("{ X = 0.70, Y = 0.28, Z = 0.0200000005 }"));
            String toml = withComposition("{ X = 0.70, Y = 0.28, Z = 0.020000002 }");
            assertError(onlyError(toml), Kind.COMPOSITION_SUM, toml, "{ X");
        }

        @Test
        void twoFractionsExceedingOne() {
            String toml = withComposition("{ X = 0.8, Y = 0.3 }");
            assertError(onlyError(toml), Kind.COMPOSITION_SUM, toml, "{ X");
        }

        @ParameterizedTest
        @CsvSource({"X, 1.2", "Y, -0.1", "Z, 2"})
        void fractionOutsideZeroToOne(String fraction, String value) {
            String other = fraction.equals("X") ? "Z = 0.02" : "X = 0.7";
            String toml = withComposition("{ " + other + ", " + fraction + " = " + value + " }");
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.OUT_OF_RANGE, toml, value + " }");
            assertEquals("star[1].composition." + fraction, e.key());
        }

        @Test
        void onlyOneFraction() {
            String toml = withComposition("{ X = 0.7 }");
            assertError(onlyError(toml), Kind.MISSING, toml, "{ X");
        }

        @Test
        void muTogetherWithFractions() {
            String toml = withComposition("{ X = 0.7, Z = 0.02, mu = 0.6 }");
            assertError(onlyError(toml), Kind.CONFLICT, toml, "mu");
        }

        @ParameterizedTest
        @ValueSource(strings = {"0.4", "2.5", "0"})
        void muOutsideTheFullyIonizedRange(String mu) {
            String toml = withComposition("{ mu = " + mu + " }");
            assertError(onlyError(toml), Kind.OUT_OF_RANGE, toml, mu + " }");
        }

        @Test
        void metalMassNumberBelowTwo() {
            String toml = withComposition("{ X = 0.7, Z = 0.02, metal_mass_number = 1 }");
            assertError(onlyError(toml), Kind.OUT_OF_RANGE, toml, "1 }");
        }

        @Test
        void metalsOnlyHaveNoIonsWhenMetalIonsAreNeglected() {
            String toml = withComposition("{ X = 0, Y = 0 }");
            assertError(onlyError(toml), Kind.COMPOSITION_SUM, toml, "{ X");
        }

        @Test
        void misspelledFractionSuggestsTheSymbol() {
            String toml = withComposition("{ X = 0.7, z = 0.02 }");
            List<ScenarioError> errors = errorsOf(toml);
            ScenarioError unknown = assertOneOf(errors, Kind.UNKNOWN_KEY, toml, "z =");
            assertTrue(unknown.problem().contains("'Z'"), unknown::toString);
        }

        @Test
        void compositionInTheDefaults() {
            String toml = "[defaults]\ncomposition = { X = 0.9, Y = 0.2 }\n\n[[star]]\nname = \"A\"\n"
                    + "mass = 1e34\nradius = 1e11\n";
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.COMPOSITION_SUM, toml, "{ X");
            assertEquals("defaults.composition", e.key());
        }
    }

    @Nested
    class Types {

        @ParameterizedTest
        @CsvSource(delimiter = '|', value = {
            "mass = true|true",
            "mass = [1, 2]|[1, 2]",
            "points = \"400\"|\"400\"",
            "points = 400.0|400.0",
            "index = \"3\"|\"3\"",
            "entropy_per_baryon = \"20\"|\"20\"",
            "composition = \"solar\"|\"solar\"",
            "outputs = \"csv\"|\"csv\"",
            "name = 7|7",
            "kind = 3|3",
            "note = 1.5|1.5"})
        void wrongTypePointsAtTheValue(String line, String value) {
            // the star is complete apart from the line under test, which replaces a key or adds one
            String key = line.substring(0, line.indexOf(' '));
            StringBuilder body = new StringBuilder();
            for (String base : List.of("mass = \"40 Msun\"", "radius = \"10 Rsun\"")) {
                if (!base.startsWith(key + " ")) {
                    body.append(base).append('\n');
                }
            }
            String kindLine = key.equals("index") ? "kind = \"polytrope\"\n"
                    : key.equals("entropy_per_baryon") ? "kind = \"isentropic\"\n" : "";
            String text = kindLine + body + line;
            if (key.equals("entropy_per_baryon")) {
                text = text.replace("radius = \"10 Rsun\"\n", "");
            }
            String toml = key.equals("name") ? "[[star]]\n" + text + "\n" : star(text);
            List<ScenarioError> errors = errorsOf(toml);
            ScenarioError e = errors.stream().filter(x -> x.kind() == Kind.WRONG_TYPE).findFirst().orElseThrow(
                    () -> new AssertionError(ScenarioTestSupport.join(errors)));
            assertEquals(1, errors.size(), ScenarioTestSupport.join(errors));
            ScenarioTestSupport.assertErrorWithin(e, Kind.WRONG_TYPE, toml, key + " = " + value, value);
            assertEquals(value, e.value());
        }

        @Test
        void wrongElementInAList() {
            String toml = star("mass = \"40 Msun\"\nradius = \"10 Rsun\"\noutputs = [\"csv\", 3]");
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.WRONG_TYPE, toml, "3]");
            assertEquals("star[1].outputs[2]", e.key());
        }

        @Test
        void starAsASingleTable() {
            String toml = "[star]\nname = \"A\"\nmass = 1e34\n";
            assertError(onlyError(toml), Kind.WRONG_TYPE, toml, "[star]");
        }
    }

    @Nested
    class PointsAndChoices {

        @ParameterizedTest
        @ValueSource(strings = {"2", "1", "0", "-5", "100001", "10000000000"})
        void pointsOutsideTheBound(String points) {
            String toml = star("mass = \"40 Msun\"\nradius = \"10 Rsun\"\npoints = " + points);
            assertError(onlyError(toml), Kind.OUT_OF_RANGE, toml, points + "\n");
        }

        @ParameterizedTest
        @ValueSource(ints = {3, 100000})
        void pointsAtTheBoundAreAccepted(int points) {
            String toml = star("mass = \"40 Msun\"\nradius = \"10 Rsun\"\npoints = " + points);
            assertEquals(points, ScenarioReader.read("ok.toml", toml).stars().get(0).request().points());
        }

        @Test
        void misspelledKindSuggestsTheWord() {
            String toml = star("kind = \"polytrop\"\nindex = 3\nmass = \"40 Msun\"\nradius = \"10 Rsun\"");
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.UNKNOWN_CHOICE, toml, "\"polytrop\"");
            assertTrue(e.problem().contains("'polytrope'"), e::toString);
        }

        @Test
        void unknownAndRepeatedOutputs() {
            String toml = star("mass = \"40 Msun\"\nradius = \"10 Rsun\"\noutputs = [\"csv\", \"fitz\", \"csv\"]");
            List<ScenarioError> errors = errorsOf(toml);
            assertEquals(2, errors.size(), ScenarioTestSupport.join(errors));
            assertError(errors.get(0), Kind.UNKNOWN_CHOICE, toml, "\"fitz\"");
            assertTrue(errors.get(0).problem().contains("'fits'"), errors.get(0)::toString);
            assertError(errors.get(1), Kind.BAD_VALUE, toml, "\"csv\"", 2);
        }

        @Test
        void unknownChartGroupAndChartFormat() {
            String toml = "chart_formats = [\"png\", \"jpeg\"]\n" + star("mass = \"40 Msun\"\nradius = \"10 Rsun\"\n"
                    + "charts = [\"structure\", \"opacity\"]");
            List<ScenarioError> errors = errorsOf(toml);
            assertEquals(2, errors.size(), ScenarioTestSupport.join(errors));
            assertError(errors.get(0), Kind.UNKNOWN_CHOICE, toml, "\"jpeg\"");
            assertError(errors.get(1), Kind.UNKNOWN_CHOICE, toml, "\"opacity\"");
        }
    }

    @Nested
    class NamesAndKeys {

        @Test
        void duplicateStarNameIgnoringCase() {
            String toml = star("mass = 1e34\nradius = 1e11") + "\n[[star]]\nname = \"a\"\nmass = 1e34\nradius = 1e11\n";
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.DUPLICATE_NAME, toml, "\"a\"");
            assertEquals("star[2].name", e.key());
        }

        @ParameterizedTest
        @ValueSource(strings = {"a/b", " lead", "trail ", "", "tab\\there", ".hidden"})
        void namesThatCannotBeFileNames(String name) {
            String toml = "[[star]]\nname = \"" + name + "\"\nmass = 1e34\nradius = 1e11\n";
            assertError(onlyError(toml), Kind.BAD_VALUE, toml, "\"" + name + "\"");
        }

        @Test
        void unknownStarKeyWithSuggestion() {
            String toml = star("mass = \"40 Msun\"\nradius = \"10 Rsun\"\nradus = \"10 Rsun\"");
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.UNKNOWN_KEY, toml, "radus");
            assertEquals("star[1].radus", e.key());
            assertTrue(e.problem().contains("did you mean 'radius'?"), e::toString);
        }

        @Test
        void unknownTopLevelKeyWithSuggestion() {
            String toml = "[[stars]]\nname = \"A\"\nmass = 1e34\nradius = 1e11\n";
            List<ScenarioError> errors = errorsOf(toml);
            // a table header is positioned at its opening bracket
            ScenarioError unknown = assertOneOf(errors, Kind.UNKNOWN_KEY, toml, "[[stars]]");
            assertTrue(unknown.problem().contains("'star'"), unknown::toString);
            // and, as the only [[star]] table is misspelled, the file has no stars
            assertEquals(Kind.NO_STARS, errors.stream().filter(x -> x != unknown).findFirst().orElseThrow().kind());
        }

        @Test
        void unknownKeyFarFromAnyHasNoSuggestion() {
            String toml = star("mass = \"40 Msun\"\nradius = \"10 Rsun\"\nluminosity = \"1e5 Lsun\"");
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.UNKNOWN_KEY, toml, "luminosity");
            assertFalse(e.problem().contains("did you mean"), e::toString);
        }

        @Test
        void unknownKeyInTheDefaults() {
            String toml = "name = \"t\"\n[defaults]\npoint = 300\n[[star]]\nname = \"A\"\nmass = 1e34\nradius = 1e11\n";
            ScenarioError e = onlyError(toml);
            assertError(e, Kind.UNKNOWN_KEY, toml, "point");
            assertTrue(e.problem().contains("'points'"), e::toString);
        }
    }

    @Nested
    class FileLevel {

        @ParameterizedTest
        @ValueSource(strings = {"", "\n\n", "# only a comment\n"})
        void emptyFile(String text) {
            assertEquals(Kind.NO_STARS, onlyError(text).kind());
            assertEquals(1, onlyError(text).line());
        }

        @Test
        void noStarTable() {
            assertEquals(Kind.NO_STARS, onlyError("name = \"lonely\"\n").kind());
        }

        @Test
        void emptyStarArray() {
            String toml = "star = []\n";
            assertError(onlyError(toml), Kind.NO_STARS, toml, "[]");
        }

        @Test
        void syntaxErrorsWithTheirPositions() {
            String toml = "name = \"t\n[[star]]\nmass = = 3\n";
            List<ScenarioError> errors = errorsOf(toml);
            assertEquals(2, errors.size(), ScenarioTestSupport.join(errors));
            assertEquals(Kind.SYNTAX, errors.get(0).kind());
            assertEquals(1, errors.get(0).line());
            // the parser reports the second '=' on line 3, column 8
            assertError(errors.get(1), Kind.SYNTAX, toml, "= 3");
        }

        @Test
        void keyDefinedTwiceIsASyntaxError() {
            String toml = star("mass = 1e34\nradius = 1e11\nmass = 2e34");
            assertError(onlyError(toml), Kind.SYNTAX, toml, "mass = 2e34");
        }

        @Test
        void missingFile(@TempDir Path dir) {
            Path path = dir.resolve("absent.toml");
            ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.read(path));
            assertEquals(1, e.errors().size());
            assertEquals(Kind.UNREADABLE, e.errors().get(0).kind());
            assertEquals(0, e.errors().get(0).line());
            assertTrue(e.getMessage().startsWith(path + ": "), e::getMessage);
        }

        @Test
        void directoryInsteadOfFile(@TempDir Path dir) {
            ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.read(dir));
            assertEquals(Kind.UNREADABLE, e.errors().get(0).kind());
        }

        @Test
        void notUtf8(@TempDir Path dir) throws IOException {
            Path path = dir.resolve("latin1.toml");
            Files.write(path, new byte[] {'n', 'a', 'm', 'e', ' ', '=', ' ', '"', (byte) 0xE9, '"', '\n'});
            ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.read(path));
            assertEquals(Kind.UNREADABLE, e.errors().get(0).kind());
        }

        @Test
        void errorsInAFileNameTheFileAsGiven(@TempDir Path dir) throws IOException {
            Path path = dir.resolve("one.toml");
            String toml = star("mass = \"45 Msol\"\nradius = \"10 Rsun\"");
            Files.writeString(path, toml);
            ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.read(path));
            assertTrue(e.getMessage().startsWith(path + ":5:8: star[1].mass = \"45 Msol\": "), e::getMessage);
        }
    }

    @Nested
    class AllAtOnce {

        @Test
        void threeMistakesGiveThreeLines() {
            String toml = """
                    name = "three"

                    [[star]]
                    name = "A"
                    mass = "45 Msol"
                    radius = "10 Rsun"

                    [[star]]
                    name = "B"
                    kind = "polytrope"
                    index = 6
                    mass = "20 Msun"
                    radius = "7 Rsun"
                    colour = "blue"
                    """;
            ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.read("three.toml", toml));
            assertInstanceOf(BadInputException.class, e);
            String[] lines = e.getMessage().split("\n");
            assertEquals(3, lines.length, e::getMessage);
            assertEquals(3, e.errors().size());
            for (int i = 0; i < 3; i++) {
                assertEquals(e.errors().get(i).toString(), lines[i]);
                assertTrue(lines[i].matches("three\\.toml:\\d+:\\d+: star\\[[12]]\\.\\S+.*"), lines[i]);
            }
            assertEquals(List.of(Kind.BAD_UNIT, Kind.OUT_OF_RANGE, Kind.UNKNOWN_KEY),
                    e.errors().stream().map(ScenarioError::kind).toList());
            assertEquals(List.of(5, 11, 14), e.errors().stream().map(ScenarioError::line).toList());
        }

        @Test
        void errorsAreInFileOrderAcrossSections() {
            String toml = "notebook = \"yes\"\n[[star]]\nname = \"A\"\nmass = 0\nradius = 1e11\n"
                    + "[defaults]\npoints = 1\n";
            List<ScenarioError> errors = errorsOf(toml);
            assertEquals(List.of(1, 4, 7), errors.stream().map(ScenarioError::line).toList(),
                    ScenarioTestSupport.join(errors));
        }

        @Test
        void aSubjectDoesNotHideTheList() {
            ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.read("x.toml", ""));
            assertEquals(e, e.about("--scenario"));
        }
    }
}
