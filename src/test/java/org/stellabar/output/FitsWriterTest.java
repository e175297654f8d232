package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stellabar.physics.BadInputException;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;
import org.stellabar.table.TextColumn;

/** Java write → Java read round trips and the header layout (no Python needed). */
class FitsWriterTest {

    @TempDir
    Path dir;

    @Test
    void roundTripKeepsEveryDoubleBitForBitAndMapsUnitsBack() throws IOException {
        Table table = FitsSamples.table("profile", 42);
        Path file = dir.resolve("profile.fits");
        new FitsWriter().write(table, file);

        FitsTable read = FitsTableReader.read(file);
        assertEquals("profile", read.extensionName());
        assertEquals(1, read.hduIndex());
        assertEquals(FitsSamples.ROWS, read.rowCount());
        assertEquals(FitsSamples.NAMES, read.columns().stream().map(FitsColumn::name).toList());
        for (FitsColumn c : read.columns()) {
            NumberColumn written = table.numbers(c.name());
            // FITS 'D' columns are IEEE-754 doubles: the bits must survive unchanged (-0.0 too).
            double[] expected = written.values();
            double[] actual = c.values();
            for (int i = 0; i < expected.length; i++) {
                assertEquals(Double.doubleToRawLongBits(expected[i]), Double.doubleToRawLongBits(actual[i]),
                        c.name() + " row " + i);
            }
            assertEquals(written.unit(), c.unit(), "unit of " + c.name());
            assertEquals(FitsUnits.toFits(written.unit()), c.fitsUnit(), "TUNIT of " + c.name());
            assertTrue(c.unitKnown());
            assertEquals(FitsText.ascii(written.description()), c.description());
        }
        // Text: ASCII spelling, trailing blanks removed (FITS 4.0 section 7.3.3.1)
        assertEquals(List.of("Alpha, the first", "beta-star", "Olund", "", "plain", "x", "last"),
                read.textColumns().get("star"));
        assertTrue(read.skipped().isEmpty());
    }

    @Test
    void headerCarriesMetadataWithNumbersAsNumbers() throws IOException {
        Path file = dir.resolve("t.fits");
        new FitsWriter().write(FitsSamples.table("profile", 1), file);
        Map<String, String> k = FitsTableReader.read(file).keywords();
        assertEquals("profile", k.get("EXTNAME"));
        assertEquals("stellabar " + FitsSamples.metadata().toolVersion(), k.get("CREATOR"));
        assertEquals(org.stellabar.physics.Constants.RELEASE, k.get("STELLABAR CONSTANTS"));
        assertEquals("Test table: every unit, beta and Gamma1 in the title", k.get("STELLABAR TITLE"));
        assertEquals("40.0", k.get("STELLABAR INPUT MASS"));
        assertEquals("12.5", k.get("STELLABAR INPUT RADIUS"));
        assertEquals("0.7", k.get("STELLABAR INPUT X"));
        assertEquals("3", k.get("STELLABAR INPUT INDEX"));
        assertEquals("standard", k.get("STELLABAR INPUT KIND"));
        assertEquals("15 MK", k.get("STELLABAR INPUT CENTRAL_T"), "a text input stays text");
        assertEquals("7.953639482792202E34", k.get("STELLABAR INPUT M"));
        assertEquals("200", k.get("STELLABAR INPUT POINTS"));
        assertFalse(k.containsKey("DATE"), "no DATE unless asked for");

        String header = headerText(file);
        assertTrue(header.contains("/ [solMass] input mass"), header);
        assertTrue(header.contains("/ [solRad] input radius"), header);
        assertTrue(header.contains("INPUT M = 7.953639482792202E34 / [g] input M: total mass"), header);
        assertTrue(header.contains("TUNIT2  = 'erg/cm3 '"), header);
        assertTrue(header.matches("(?s).*\\nCOMMENT +note: made-up numbers for a transport test, not a star\\n.*"),
                header);
        assertFalse(header.matches("(?s).*TUNIT\\d+ *= *'[^']*dyn.*"), "astropy rejects dyn in FITS units");
    }

    @Test
    void sameContentGivesTheSameBytesAndDateOnlyWhenAsked() throws IOException {
        Table table = FitsSamples.table("profile", 7);
        Path a = dir.resolve("a.fits");
        Path b = dir.resolve("b.fits");
        new FitsWriter().write(table, a);
        new FitsWriter().write(table, b);
        assertArrayEquals(Files.readAllBytes(a), Files.readAllBytes(b));
        assertEquals(0, Files.size(a) % 2880, "FITS files come in 2880-byte blocks");

        Path dated = dir.resolve("dated.fits");
        new FitsWriter().withDate(Instant.parse("2024-03-01T12:34:56.789Z")).write(table, dated);
        assertEquals("2024-03-01T12:34:56", FitsTableReader.read(dated).keywords().get("DATE"));
    }

    @Test
    void severalTablesBecomeSeveralExtensionsReadableByName() throws IOException {
        Path file = dir.resolve("two.fits");
        Table first = FitsSamples.table("alpha", 1);
        Table second = FitsSamples.table("beta", 2);
        new FitsWriter().write(List.of(first, second), file);
        FitsTable b = FitsTableReader.read(file, "BETA");
        assertEquals(2, b.hduIndex());
        assertArrayEquals(second.numbers("rho").values(), b.values("rho"));
        assertArrayEquals(first.numbers("T").values(), FitsTableReader.read(file).values("T"));
        BadInputException missing = assertThrows(BadInputException.class,
                () -> FitsTableReader.read(file, "gamma"));
        assertTrue(missing.getMessage().contains("alpha, beta"), missing.getMessage());
    }

    @Test
    void sameNamedTablesGetExtensionVersions() throws IOException {
        Path file = dir.resolve("same.fits");
        new FitsWriter().write(List.of(FitsSamples.table("star", 1), FitsSamples.table("star", 2)), file);
        String header = headerText(file);
        assertTrue(header.contains("EXTVER  =                    1"), header);
        assertTrue(header.contains("EXTVER  =                    2"), header);
    }

    @Test
    void summaryGoesToThePrimaryHeaderAndItsTableToAnExtension() throws IOException {
        Path file = dir.resolve("summary.fits");
        new FitsWriter().write(FitsSamples.summary(), file);
        String header = headerText(file);
        String primary = header.substring(0, header.indexOf("XTENSION"));
        assertTrue(primary.contains("HIERARCH STELLABAR MASS = 40.0 / [solMass] total mass"), primary);
        assertTrue(primary.contains("HIERARCH STELLABAR P_C = 1.234567890123E17 / [erg/cm3] central pressure"),
                primary);
        assertTrue(primary.matches("(?s).*HIERARCH STELLABAR SHELLS = +7 / number of shells\\n.*"), primary);
        assertTrue(primary.matches("(?s).*HIERARCH STELLABAR STABLE = +T / whether the star is stable\\n.*"), primary);
        assertTrue(primary.contains("HIERARCH STELLABAR COMPOSITION MU = 0.6153846153846154"), primary);
        assertTrue(primary.contains("HIERARCH STELLABAR WARNINGS 1 = 'radiation_dominated: radiation pressure"),
                primary);
        FitsTable profile = FitsTableReader.read(file);
        assertEquals("profile", profile.extensionName());
        assertArrayEquals(FitsSamples.table("profile", 11).numbers("M").values(), profile.values("M"));
    }

    @Test
    void unknownUnitIsAnErrorAndLeavesNoFile() throws IOException {
        Table odd = new Table("odd", Metadata.of("odd", Inputs.none(), List.of()),
                List.of(new NumberColumn("x", "furlong", "a unit nobody maps", new double[] {1})));
        Path file = dir.resolve("odd.fits");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new FitsWriter().write(odd, file));
        assertTrue(e.getMessage().contains("furlong"), e.getMessage());
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(), files.toList(), "nothing written, not even a temporary file");
        }
    }

    @Test
    void inputKeysThatCollideAreRefused() {
        Table t = new Table("t", Metadata.of("t", Inputs.builder().integer("x", 1, "").integer("X", 2, "").build(), List.of()),
                List.of(new NumberColumn("a", "", "a", new double[] {1})));
        assertThrows(IllegalArgumentException.class,
                () -> new FitsWriter().write(List.of(t), new ByteArrayOutputStream()));
    }

    @Test
    void emptyTextColumnAndZeroRowsStillWrite() throws IOException {
        Table t = new Table("empty", FitsSamples.metadata(), List.of(
                new NumberColumn("a", "K", "a", new double[] {1, 2}),
                new TextColumn("s", "blank names", List.of("", ""))));
        Path file = dir.resolve("blank.fits");
        new FitsWriter().write(t, file);
        assertEquals(List.of("", ""), FitsTableReader.read(file).textColumns().get("s"));

        Table none = new Table("none", FitsSamples.metadata(),
                List.of(new NumberColumn("a", "K", "a", new double[0])));
        Path zero = dir.resolve("zero.fits");
        new FitsWriter().write(none, zero);
        FitsTable read = FitsTableReader.read(zero);
        assertEquals(0, read.rowCount());
        assertEquals(0, read.values("a").length);
    }

    @Test
    void readerRefusesFilesThatAreNotFitsOrHaveNoTable() throws IOException {
        Path text = dir.resolve("not.fits");
        Files.writeString(text, "rho,T\n1,2\n");
        assertThrows(BadInputException.class, () -> FitsTableReader.read(text));
        assertThrows(BadInputException.class, () -> FitsTableReader.read(dir.resolve("missing.fits")));
    }

    @ParameterizedTest(name = "{0} -> {1}")
    @CsvSource({
        "'g cm-3', g/cm3", "'g/cm3', g/cm3", "'g.cm**-3', g/cm3", "'cm^-3 g', g/cm3",
        "'erg cm-3', dyn/cm2", "'dyn cm-2', dyn/cm2", "'dyn/cm2', dyn/cm2",
        "'erg g-1 K-1', erg/g/K", "'erg/(g K)', erg/g/K", "'K', K", "'cm-3', 1/cm3", "'1/cm3', 1/cm3",
        "'solMass', Msun", "'Msun', Msun", "'solRad', Rsun", "'solLum', Lsun", "'erg s-1', erg/s",
        "'cm s-1', cm/s", "'erg g-1', erg/g", "'erg', erg", "'g', g", "'cm', cm", "'', ''",
    })
    void unitsFromOtherProgramsMapToOurs(String fits, String ours) {
        assertEquals(ours, FitsUnits.fromFits(fits).orElseThrow());
    }

    @ParameterizedTest
    @CsvSource({"'kg m-3'", "Pa", "'m s-1'", "'erg/g/K/s'", "'10**3 K'", "'(g'"})
    void unknownUnitsAreKeptAsGiven(String fits) {
        assertTrue(FitsUnits.fromFits(fits).isEmpty());
        assertEquals(fits, FitsUnits.fromFitsOrAsGiven(" " + fits + " "));
    }

    @Test
    void everyTableUnitHasAFitsSpellingThatMapsBack() {
        for (String unit : FitsSamples.UNITS) {
            assertEquals(unit, FitsUnits.fromFits(FitsUnits.toFits(unit)).orElseThrow(), unit);
        }
    }

    /**
     * The header cards of every HDU, one per line, found by walking the file as FITS 4.0 section
     * 3.3 lays it out: 80-byte cards up to END, padded to 2880-byte blocks, then the data
     * (NAXIS1 x NAXIS2 + PCOUNT bytes, padded). Also checks that every header byte is printable
     * ASCII.
     */
    private static String headerText(Path file) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        StringBuilder cards = new StringBuilder();
        int offset = 0;
        while (offset < bytes.length) {
            long naxis1 = 0;
            long naxis2 = 0;
            long pcount = 0;
            boolean end = false;
            while (!end) {
                String card = new String(bytes, offset, 80, StandardCharsets.US_ASCII);
                for (int i = offset; i < offset + 80; i++) {
                    assertTrue(bytes[i] >= 0x20 && bytes[i] <= 0x7E, "non-printable byte in header card " + card);
                }
                offset += 80;
                String key = card.substring(0, 8).strip();
                end = key.equals("END");
                if (key.equals("NAXIS1")) {
                    naxis1 = Long.parseLong(card.substring(10, 30).strip());
                } else if (key.equals("NAXIS2")) {
                    naxis2 = Long.parseLong(card.substring(10, 30).strip());
                } else if (key.equals("PCOUNT")) {
                    pcount = Long.parseLong(card.substring(10, 30).strip());
                }
                cards.append(card.stripTrailing()).append('\n');
            }
            offset = (int) (Math.ceil(offset / 2880.0) * 2880);
            offset += (int) (Math.ceil((naxis1 * naxis2 + pcount) / 2880.0) * 2880);
        }
        assertEquals(bytes.length, offset, "HDUs fill the file exactly");
        return cards.toString();
    }
}
