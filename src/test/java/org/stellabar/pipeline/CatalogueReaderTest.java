package org.stellabar.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stellabar.physics.Constants.SOLAR_LUMINOSITY;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.stellabar.audit.CsvProfileSource;
import org.stellabar.eos.Composition;
import org.stellabar.observed.CatalogueEntry;
import org.stellabar.observed.Measurement;
import org.stellabar.observed.ObservedStar;
import org.stellabar.observed.ProblemKind;
import org.stellabar.output.CsvTableReader;
import org.stellabar.physics.BadInputException;

class CatalogueReaderTest {

    private static CatalogueReader.Catalogue read(CatalogueReader reader, String... lines) {
        return reader.read(new CsvProfileSource(new CsvTableReader().parse("t.csv", List.of(lines))), "t.csv");
    }

    // Units by identity: log10 columns in solar units and K, errors in dex; --units for a linear
    // column and its error; the file's heading unit; customary units where none is stated.
    @Test
    void unitsLogsAndErrors() {
        CatalogueReader reader = new CatalogueReader(Map.of("L", "logL", "Teff", "logT", "M", "mass", "M_err", "dm"),
                Map.of("M", "kg"), List.of("L", "Teff"), Composition.DEFAULT);
        CatalogueReader.Catalogue c = read(reader, "# comment", "logL,logT,mass,dm,R [km],L_err", "5,4.5,4e31,2e30,7e6,0.1");
        ObservedStar s = c.entries().get(0).star();
        assertEquals(1e5 * SOLAR_LUMINOSITY, s.luminosity().orElseThrow().value(), 1e-12 * 1e5 * SOLAR_LUMINOSITY);
        assertEquals(new Measurement(s.luminosity().orElseThrow().value(), 0.1, true), s.luminosity().orElseThrow());
        assertEquals(Math.pow(10, 4.5), s.temperature().orElseThrow().value(), 1e-9);
        assertEquals(4e34, s.mass().orElseThrow().value(), 1e-15 * 4e34, "kg to g");
        assertEquals(2e33, s.mass().orElseThrow().error(), 1e-15 * 2e33, "the error in the mass's unit");
        assertEquals(7e11, s.radius().orElseThrow().value(), 1e-3, "R in km from the heading");
        assertEquals("t.csv:3", c.locations().get(1));
        assertEquals("row-1", s.name());
        CatalogueReader.Catalogue solar = read(new CatalogueReader(Map.of(), Map.of(), List.of(), Composition.DEFAULT),
                "L,R,M,X", "2e5,10,30,0.5");
        ObservedStar t = solar.entries().get(0).star();
        assertEquals(2e5 * SOLAR_LUMINOSITY, t.luminosity().orElseThrow().value(), 1e-3 * SOLAR_LUMINOSITY);
        assertEquals(10 * SOLAR_RADIUS, t.radius().orElseThrow().value(), 1e-6 * SOLAR_RADIUS);
        assertEquals(30 * SOLAR_MASS, t.mass().orElseThrow().value(), 1e-9 * SOLAR_MASS);
        assertEquals(0.5, t.composition().X(), 0.0);
        assertEquals(Composition.DEFAULT.Z(), t.composition().Z(), 0.0);
    }

    @Test
    void rowProblemsStayWithTheirRow() {
        CatalogueReader reader = new CatalogueReader(Map.of(), Map.of(), List.of(), Composition.DEFAULT);
        CatalogueReader.Catalogue c = read(reader, "L,Teff,M,M_err,X", "1e5,3e4,30,-1,0.7", "1e5,3e4,30,1,1.5",
                "1e5,3e4,30,1,0.7");
        List<CatalogueEntry> e = c.entries();
        assertEquals(ProblemKind.impossible_combination, e.get(0).readingProblems().get(0).kind());
        assertEquals(1, e.get(0).readingProblems().get(0).row());
        assertEquals(ProblemKind.impossible_combination, e.get(1).readingProblems().get(0).kind());
        assertTrue(e.get(2).readingProblems().isEmpty());
    }

    @Test
    void badOptionsAreBadInput() {
        assertThrows(BadInputException.class, () -> new CatalogueReader(Map.of("Lum", "x"), Map.of(), List.of(), Composition.DEFAULT));
        assertThrows(BadInputException.class, () -> new CatalogueReader(Map.of(), Map.of("X", "Msun"), List.of(), Composition.DEFAULT));
        assertThrows(BadInputException.class, () -> new CatalogueReader(Map.of(), Map.of(), List.of("log_g"), Composition.DEFAULT));
        CatalogueReader wrongUnit = new CatalogueReader(Map.of(), Map.of("M", "cm"), List.of(), Composition.DEFAULT);
        assertThrows(BadInputException.class, () -> read(wrongUnit, "L,Teff,M", "1e5,3e4,30"));
        CatalogueReader fine = new CatalogueReader(Map.of(), Map.of(), List.of(), Composition.DEFAULT);
        assertThrows(BadInputException.class, () -> read(fine, "L,M", "1e5,30"), "two of L, Teff, R needed");
    }
}
