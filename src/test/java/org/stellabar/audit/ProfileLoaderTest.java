package org.stellabar.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.stellabar.eos.Composition;
import org.stellabar.output.CsvTableReader;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Constants;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.TextColumn;

class ProfileLoaderTest {

    private static final Composition SUN_LIKE = Composition.of(0.7, 0.28, 0.02);

    private static LoadedProfile load(List<String> lines) {
        return load(lines, ColumnMapping.ourNames(), false);
    }

    private static LoadedProfile load(List<String> lines, ColumnMapping mapping, boolean skip) {
        return new ProfileLoader(mapping, CompositionPolicy.wholeStar(SUN_LIKE), skip)
                .load(new CsvProfileSource(new CsvTableReader().parse("star.csv", lines)));
    }

    private static BadInputException bad(List<String> lines) {
        return assertThrows(BadInputException.class, () -> load(lines));
    }

    /** A small centre-first profile with invented but plausible numbers. */
    private static List<String> rows(String header, String... data) {
        List<String> l = new ArrayList<>();
        l.add(header);
        l.addAll(List.of(data));
        return l;
    }

    private static final String[] GOOD = {"0,0,10,2e7", "1e10,4e31,8,1.8e7", "2e10,2.5e32,5,1.5e7", "3e10,6e32,2,1e7"};

    @Test
    void ourOwnColumnNamesNeedNoMapping() {
        LoadedProfile p = load(rows("r [cm],m [g],rho [g/cm3],T [K]", GOOD));
        assertEquals(4, p.profile().size());
        assertTrue(p.profile().hasRadius() && p.profile().hasMass());
        assertEquals("from the file", p.column(ProfileQuantity.DENSITY).unitOrigin());
    }

    @Test
    void headerUnitsAreApplied() {
        LoadedProfile p = load(rows("r [Rsun],m [Msun],rho [kg/m3],T [MK]", "0,0,1e4,20", "0.1,0.5,8e3,18",
                "0.2,1,5e3,15"));
        assertEquals(0.1 * Constants.SOLAR_RADIUS, p.profile().r()[1], 0.0);
        assertEquals(Constants.SOLAR_MASS, p.profile().m()[2], 0.0);
        assertEquals(10.0, p.profile().rho()[0], 1e-15);
        assertEquals(2e7, p.profile().T()[0], 0.0);
    }

    @Test
    void unitsOptionOverridesTheHeaderAndTakesColumnNames() {
        ColumnMapping mapping = ColumnMapping.of(Map.of("r", "radius", "rho", "density", "T", "temp"))
                .withUnits(Map.of("radius", "km", "rho", "kg/m3"));
        LoadedProfile p = load(rows("radius [cm],density,temp", "0,1e4,2e7", "1,8e3,1.8e7", "2,5e3,1.5e7"), mapping,
                false);
        assertEquals(1e5, p.profile().r()[1], 0.0);
        assertEquals(10.0, p.profile().rho()[0], 1e-15);
        assertEquals("from --units", p.column(ProfileQuantity.RADIUS).unitOrigin());
    }

    @Test
    void fitsSpellingsOfUnitsAreUnderstood() {
        LoadedProfile p = load(rows("r [solRad],m [solMass],rho [g cm-3],T [K],P [Ba]", "0,0,10,2e7,1e17",
                "0.1,0.5,8,1.8e7,8e16", "0.2,1,5,1.5e7,5e16"));
        assertEquals(Constants.SOLAR_MASS, p.profile().m()[2], 0.0);
        assertEquals(1e17, p.profile().P()[0], 0.0);
    }

    @Test
    void otherNotationsOfUnitsAreReadIntoOurSpelling() {
        LoadedProfile p = load(rows("r [AU],m [solMass],rho [g.cm**-3],T [K],P [N m-2]", "0,0,10,2e7,1e16",
                "0.1,0.5,8,1.8e7,8e15", "0.2,1,5,1.5e7,5e15"));
        assertEquals(10.0, p.profile().P()[0] / 1e16, 1e-15);
        assertEquals(List.of("au", "Msun", "g/cm3", "K", "Pa"), p.mapped().stream().map(MappedColumn::unit).toList());
    }

    @Test
    void missingDensityColumnIsNamed() {
        BadInputException e = bad(rows("r,m,dens,T", GOOD));
        assertTrue(e.getMessage().contains("density") && e.getMessage().contains("--columns rho="), e.getMessage());
    }

    @Test
    void mappedColumnMissingFromTheFileIsNamed() {
        BadInputException e = assertThrows(BadInputException.class, () -> load(rows("r,m,rho,T", GOOD),
                ColumnMapping.of(Map.of("P", "pressure")), false));
        assertTrue(e.getMessage().startsWith("--columns P=pressure"), e.getMessage());
    }

    @Test
    void unknownQuantityKeyInColumnsIsBadInput() {
        assertThrows(BadInputException.class, () -> ColumnMapping.of(Map.of("density", "rho")));
        Map<String, String> twice = new LinkedHashMap<>();
        twice.put("rho", "x");
        twice.put("T", "x");
        assertThrows(BadInputException.class, () -> ColumnMapping.of(twice));
    }

    @Test
    void unknownUnitNamesTheColumn() {
        BadInputException e = bad(rows("r [furlong],m,rho,T", GOOD));
        assertTrue(e.getMessage().contains("column 'r'") && e.getMessage().contains("furlong"), e.getMessage());
        BadInputException option = assertThrows(BadInputException.class, () -> load(rows("r,m,rho,T", GOOD),
                ColumnMapping.ourNames().withUnits(Map.of("rho", "g/cc")), false));
        assertTrue(option.getMessage().startsWith("--units rho") && option.getMessage().contains("g/cc"),
                option.getMessage());
        BadInputException wrongDimension = assertThrows(BadInputException.class, () -> load(rows("r,m,rho,T", GOOD),
                ColumnMapping.ourNames().withUnits(Map.of("T", "cm")), false));
        assertTrue(wrongDimension.getMessage().contains("length"), wrongDimension.getMessage());
        assertThrows(BadInputException.class, () -> load(rows("r,m,rho,T,X [g]", "0,0,10,2e7,0.7",
                "1e10,4e31,8,1.8e7,0.7", "2e10,2.5e32,5,1.5e7,0.7"), ColumnMapping.ourNames(), false));
        assertThrows(BadInputException.class, () -> load(rows("r,m,rho,T", GOOD),
                ColumnMapping.ourNames().withUnits(Map.of("nosuch", "cm")), false));
    }

    @Test
    void nonNumericCellNamesRowLineAndColumn() {
        BadInputException e = bad(rows("r,m,rho,T", "0,0,10,2e7", "1e10,4e31,8,hot", "2e10,2.5e32,5,1.5e7",
                "3e10,6e32,2,1e7"));
        // data row 2 is on line 3 of the file (after the header)
        assertTrue(e.getMessage().contains("row 2 (line 3)") && e.getMessage().contains("'hot'")
                && e.getMessage().contains("(T)"), e.getMessage());
    }

    @Test
    void emptyCellAndRaggedRowAreBadRows() {
        BadInputException e = bad(rows("r,m,rho,T", "0,0,10,2e7", "1e10,4e31,,1.8e7", "2e10,2.5e32,5",
                "3e10,6e32,2,1e7"));
        assertTrue(e.getMessage().contains("2 bad rows") && e.getMessage().contains("empty")
                && e.getMessage().contains("has 3 cells where the header has 4"), e.getMessage());
    }

    @Test
    void emptyFileAndHeaderOnlyAreBadInput() {
        assertThrows(BadInputException.class, () -> load(List.of()));
        BadInputException e = bad(rows("r,m,rho,T"));
        assertTrue(e.getMessage().contains("no data rows"), e.getMessage());
    }

    @Test
    void singleRowIsBadInput() {
        BadInputException e = bad(rows("rho,T", "1,1e7"));
        assertTrue(e.getMessage().contains("1 usable data row"), e.getMessage());
    }

    @Test
    void nonMonotonicRadiusNamesTheRow() {
        BadInputException e = bad(rows("r,m,rho,T", "0,0,10,2e7", "2e10,4e31,8,1.8e7", "1e10,2.5e32,5,1.5e7",
                "3e10,6e32,2,1e7"));
        assertTrue(e.getMessage().contains("row 3 (line 4)") && e.getMessage().contains("radius"), e.getMessage());
    }

    @Test
    void decreasingMassNamesTheRow() {
        BadInputException e = bad(rows("r,m,rho,T", "0,0,10,2e7", "1e10,4e31,8,1.8e7", "2e10,3e31,5,1.5e7",
                "3e10,6e32,2,1e7"));
        assertTrue(e.getMessage().contains("row 3") && e.getMessage().contains("mass"), e.getMessage());
    }

    @Test
    void skipBadRowsReportsWhatWasSkipped() {
        LoadedProfile p = load(rows("r,m,rho,T", "0,0,10,2e7", "1e10,4e31,8,hot", "2e10,2.5e32,-5,1.5e7",
                "2.5e10,4e32,3,1.2e7", "2.4e10,4.1e32,3,1.2e7", "3e10,6e32,2,1e7"), ColumnMapping.ourNames(), true);
        assertEquals(3, p.profile().size());
        assertEquals(List.of(2, 3, 5), p.skipped().stream().map(BadRow::row).toList());
        assertTrue(p.skipped().get(1).reason().contains("not positive"));
        assertTrue(p.skipped().get(2).reason().contains("radius"));
        // each skipped row says what kind of problem it has, and where
        assertEquals(List.of(RowProblem.Kind.NOT_A_NUMBER, RowProblem.Kind.NOT_POSITIVE, RowProblem.Kind.OUT_OF_ORDER),
                p.skipped().stream().map(b -> b.problem().kind()).toList());
        assertEquals("column 'T' (T)", p.skipped().get(0).problem().column());
        assertEquals("hot", p.skipped().get(0).problem().value());
        // too few rows left is still an error
        assertThrows(BadInputException.class, () -> load(rows("rho,T", "1,1e7", "x,1e7", "1,y"),
                ColumnMapping.ourNames(), true));
    }

    @Test
    void massAtZeroRadiusIsABadRow() {
        BadInputException e = bad(rows("r,m,rho,T", "0,1e30,10,2e7", "1e10,4e31,8,1.8e7", "2e10,2.5e32,5,1.5e7"));
        assertTrue(e.getMessage().contains("row 1"), e.getMessage());
    }

    @Test
    void surfaceFirstIsTurnedAroundKeepingRowNumbers() {
        List<String> down = new ArrayList<>(List.of(GOOD));
        java.util.Collections.reverse(down);
        LoadedProfile p = load(rows("r,m,rho,T", down.toArray(String[]::new)));
        assertTrue(p.profile().surfaceFirst());
        assertEquals(0.0, p.profile().r()[0]);
        assertEquals(4, p.profile().rows()[0]);
        assertTrue(p.orderedBy().contains("surface first"), p.orderedBy());
    }

    @Test
    void vacuumSurfaceRowClosesTheStarWithoutBeingAShell() {
        LoadedProfile p = load(rows("r,m,rho,T,P", "0,0,10,2e7,1e17", "1e10,4e31,8,1.8e7,8e16",
                "2e10,2.5e32,5,1.5e7,5e16", "3e10,3e32,0,0,0"));
        assertEquals(3, p.profile().size());
        assertTrue(p.profile().hasSurface());
        assertEquals(4, p.profile().surface().row());
        assertEquals(3e32, p.profile().surface().m(), 0.0);
        // the same row first in a surface-first file
        LoadedProfile down = load(rows("r,m,rho,T,P", "3e10,3e32,0,0,0", "2e10,2.5e32,5,1.5e7,5e16",
                "1e10,4e31,8,1.8e7,8e16", "0,0,10,2e7,1e17"));
        assertTrue(down.profile().surfaceFirst());
        assertEquals(1, down.profile().surface().row());
    }

    @Test
    void zeroDensityInsideTheStarIsABadRow() {
        BadInputException e = bad(rows("r,m,rho,T,P", "0,0,10,2e7,1e17", "1e10,4e31,0,0,0",
                "2e10,2.5e32,5,1.5e7,5e16", "3e10,3e32,2,1e7,1e16"));
        assertTrue(e.getMessage().contains("row 2") && e.getMessage().contains("is 0"), e.getMessage());
        // a zero temperature with a pressure left is no vacuum surface either
        BadInputException p = bad(rows("r,m,rho,T,P", "0,0,10,2e7,1e17", "1e10,4e31,8,1.8e7,8e16",
                "2e10,2.5e32,5,1.5e7,5e16", "3e10,3e32,1,0,1e10"));
        assertTrue(p.getMessage().contains("row 4"), p.getMessage());
    }

    @Test
    void allInputColumnsAreKeptAsWritten() {
        LoadedProfile p = load(rows("zone,r [Rsun],m,rho,T,note", "1,0,0,10,2e7,core", "2,0.1,4e31,8,1.8e7,",
                "3,0.2,2.5e32,5,1.5e7,env"));
        assertEquals(List.of("zone", "r", "m", "rho", "T", "note"),
                p.inputColumns().stream().map(c -> c.name()).toList());
        NumberColumn r = (NumberColumn) p.inputColumns().get(1);
        assertEquals("Rsun", r.unit());
        assertEquals(0.1, r.get(1), 0.0);
        assertTrue(p.inputColumns().get(5) instanceof TextColumn);
    }

    @Test
    void compositionColumnsThatDoNotAddUpAreBadRows() {
        LoadedProfile ok = new ProfileLoader(ColumnMapping.ourNames(), CompositionPolicy.columnsFirst(SUN_LIKE), false)
                .load(new CsvProfileSource(new CsvTableReader().parse("c.csv", rows("rho,T,X,Y,Z",
                        "10,2e7,0.5,0.48,0.02", "8,1.8e7,0.6,0.38,0.02", "5,1.5e7,0.7,0.28,0.02"))));
        assertEquals(0.5, ok.profile().compositions().get(0).X(), 1e-15);
        BadInputException e = assertThrows(BadInputException.class,
                () -> new ProfileLoader(ColumnMapping.ourNames(), CompositionPolicy.columnsFirst(SUN_LIKE), false)
                        .load(new CsvProfileSource(new CsvTableReader().parse("c.csv", rows("rho,T,X,Y,Z",
                                "10,2e7,0.5,0.48,0.02", "8,1.8e7,0.6,0.48,0.02", "5,1.5e7,0.7,0.28,0.02")))));
        assertTrue(e.getMessage().contains("row 2") && e.getMessage().contains("X + Y + Z"), e.getMessage());
    }
}
