package org.stellabar.physics;

import static org.stellabar.physics.Dimension.DENSITY;
import static org.stellabar.physics.Dimension.ENERGY;
import static org.stellabar.physics.Dimension.LENGTH;
import static org.stellabar.physics.Dimension.LUMINOSITY;
import static org.stellabar.physics.Dimension.MASS;
import static org.stellabar.physics.Dimension.PRESSURE;
import static org.stellabar.physics.Dimension.SPECIFIC_ENERGY;
import static org.stellabar.physics.Dimension.SPECIFIC_ENTROPY;
import static org.stellabar.physics.Dimension.TEMPERATURE;
import static org.stellabar.physics.Dimension.TIME;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The one table of unit strings: each unit as tables spell it internally (the key a
 * {@code table.Quantity} holds), the dimension a user may give it for, its factor to CGS, its
 * written spelling and its chart label. User input ({@link Units}, {@link Dimension#factors()}),
 * every file and terminal writer ({@code output.FitsUnits}) and chart axis labels
 * ({@code charts.UnitText}) all read it, so a unit is added in one place.
 *
 * <p>The written spelling is the one string every output format carries for the unit: CSV
 * headers, ECSV, FITS TUNITn and header cards, VOTable, JSON and the terminal. It must mean the
 * same unit to astropy's generic parser ({@code astropy.units.Unit}, used for ECSV), to its FITS
 * parser (FITS Standard 4.0, 2018, section 4.3: "/" for one division, "." or a space between
 * factors, integer powers written after the symbol) and to its CDS parser (used for VOTable 1.3),
 * all three without a warning. Hence: "g/cm3"; a pressure as the energy density "erg/cm3"
 * (1 dyn/cm2 = 1 erg/cm3: FITS has no dyne); "erg/(g.K)" (the generic parser refuses a second
 * "/"); "cm-3" (FITS refuses "1/cm3"); the solar units "solMass", "solRad", "solLum". Each is
 * checked by {@code cli.UnitSpellingAstropyTest}. A unit without a written spelling (the SI input
 * units, "k_B") is accepted on input and never written; entropy per baryon is a dimensionless
 * number (s m_u/k_B). Chart labels are in the charts' small markup ("g cm^{-3}", "M_☉": IAU 2015
 * Resolution B3 writes the nominal solar values with the solar symbol as a subscript).
 */
public enum Unit {
    /** No unit: a dimensionless number. */
    NONE("", null, 1.0, "", ""),
    /** {@code K}: a temperature; times 1.0 gives CGS. */
    KELVIN("K", TEMPERATURE, 1.0, "K", "K"),
    /** {@code MK}: a temperature; times 1e6 gives CGS. */
    MEGAKELVIN("MK", TEMPERATURE, 1e6, null, "MK"),
    /** {@code g/cm3}: a density; times 1.0 gives CGS. */
    G_PER_CM3("g/cm3", DENSITY, 1.0, "g/cm3", "g cm^{-3}", "g/cm^3", "g cm-3"),
    /** {@code kg/m3}: a density; times 1e-3 gives CGS. */
    KG_PER_M3("kg/m3", DENSITY, 1e-3, null, "kg m^{-3}", "kg/m^3", "kg m-3"),
    /** {@code dyn/cm2}: a pressure; times 1.0 gives CGS. */
    DYN_PER_CM2("dyn/cm2", PRESSURE, 1.0, "erg/cm3", "dyn cm^{-2}", "dyn/cm^2", "dyn cm-2", "erg cm-3", "Ba"),
    /** {@code Pa}: a pressure; times 10.0 gives CGS. */
    PASCAL("Pa", PRESSURE, 10.0, null, "Pa", "N m-2", "J m-3"),
    /** {@code bar}: a pressure; times 1e6 gives CGS. */
    BAR("bar", PRESSURE, 1e6, null, "bar"),
    /** {@code cm}: a length; times 1.0 gives CGS. */
    CM("cm", LENGTH, 1.0, "cm", "cm"),
    /** {@code m}: a length; times 100.0 gives CGS. */
    M("m", LENGTH, 100.0, null, "m"),
    /** {@code km}: a length; times 1e5 gives CGS. */
    KM("km", LENGTH, 1e5, null, "km"),
    /** {@code Rsun}: a length; times {@link Constants#SOLAR_RADIUS} gives CGS. */
    RSUN("Rsun", LENGTH, Constants.SOLAR_RADIUS, "solRad", "R_☉"),
    /** {@code au}: a length; times {@link Constants#ASTRONOMICAL_UNIT} gives CGS. */
    AU("au", LENGTH, Constants.ASTRONOMICAL_UNIT, null, "au", "AU"),
    /** {@code g}: a mass; times 1.0 gives CGS. */
    GRAM("g", MASS, 1.0, "g", "g"),
    /** {@code kg}: a mass; times 1000.0 gives CGS. */
    KG("kg", MASS, 1000.0, null, "kg"),
    /** {@code Msun}: a mass; times {@link Constants#SOLAR_MASS} gives CGS. */
    MSUN("Msun", MASS, Constants.SOLAR_MASS, "solMass", "M_☉"),
    /** {@code erg}: a energy; times 1.0 gives CGS. */
    ERG("erg", ENERGY, 1.0, "erg", "erg"),
    /** {@code J}: a energy; times 1e7 gives CGS. */
    JOULE("J", ENERGY, 1e7, null, "J"),
    /** {@code erg/g}: a specific energy; times 1.0 gives CGS. */
    ERG_PER_G("erg/g", SPECIFIC_ENERGY, 1.0, "erg/g", "erg g^{-1}"),
    /** {@code J/kg}: a specific energy; times 1e4 gives CGS. */
    J_PER_KG("J/kg", SPECIFIC_ENERGY, 1e4, null, "J kg^{-1}"),
    /** {@code erg/g/K}: a specific entropy; times 1.0 gives CGS. */
    ERG_PER_G_K("erg/g/K", SPECIFIC_ENTROPY, 1.0, "erg/(g.K)", "erg g^{-1} K^{-1}", "erg g-1 K-1"),
    /** {@code J/kg/K}: a specific entropy; times 1e4 gives CGS. */
    J_PER_KG_K("J/kg/K", SPECIFIC_ENTROPY, 1e4, null, "J kg^{-1} K^{-1}"),
    /** {@code s}: a time; times 1.0 gives CGS. */
    SECOND("s", TIME, 1.0, null, "s"),
    /** {@code yr}: a time; times {@link Constants#JULIAN_YEAR} gives CGS. */
    YEAR("yr", TIME, Constants.JULIAN_YEAR, null, "yr"),
    /** {@code erg/s}: a luminosity; times 1.0 gives CGS. */
    ERG_PER_S("erg/s", LUMINOSITY, 1.0, "erg/s", "erg s^{-1}", "erg s-1"),
    /** {@code W}: a luminosity; times 1e7 gives CGS. */
    WATT("W", LUMINOSITY, 1e7, null, "W"),
    /** {@code Lsun}: a luminosity; times {@link Constants#SOLAR_LUMINOSITY} gives CGS. */
    LSUN("Lsun", LUMINOSITY, Constants.SOLAR_LUMINOSITY, "solLum", "L_☉"),
    /** {@code cm/s}: CGS, written on output only. */
    CM_PER_S("cm/s", null, 1.0, "cm/s", "cm s^{-1}", "cm s-1"),
    /** {@code 1/cm3}: CGS, written on output only. */
    PER_CM3("1/cm3", null, 1.0, "cm-3", "cm^{-3}"),
    /** Entropy per baryon in units of Boltzmann's constant: an input unit only (astropy has no such unit). */
    K_B("k_B", null, 1.0, null, "k_B");

    private final String spelling;
    private final Dimension dimension;
    private final double cgsFactor;
    private final String written;
    private final String chartLabel;
    private final List<String> inputAliases;

    Unit(String spelling, Dimension dimension, double cgsFactor, String written, String chartLabel, String... aliases) {
        this.spelling = spelling;
        this.dimension = dimension;
        this.cgsFactor = cgsFactor;
        this.written = written;
        this.chartLabel = chartLabel;
        this.inputAliases = List.of(aliases);
    }

    /**
     * @param spelling a unit string as tables write it ("g/cm3", "Msun", "" ...)
     * @return the unit, if the table has it
     */
    public static Optional<Unit> of(String spelling) {
        return Arrays.stream(values()).filter(u -> u.spelling.equals(spelling)).findFirst();
    }

    /**
     * A unit as another program may write it in a file's header: our spelling, an input spelling
     * or the FITS spelling, also in the FITS notations that join factors with '.' and write powers
     * with '**' ("g.cm**-3" is "g cm-3").
     *
     * @param text a unit string
     * @return the unit, if the table has it
     */
    public static Optional<Unit> read(String text) {
        String folded = text.strip().replaceAll("(?<=[A-Za-z0-9])\\.(?=[A-Za-z])", " ").replace("**", "");
        return Arrays.stream(values()).filter(u -> u.inputSpellings().contains(folded)
                || u.written().filter(w -> w.equals(folded) || w.equals(text.strip())).isPresent()).findFirst();
    }

    /** @return the unit string tables use, e.g. "g/cm3"; "" for a dimensionless quantity */
    public String spelling() {
        return spelling;
    }

    /** @return the dimension a user may give this unit for, if input accepts it */
    public Optional<Dimension> dimension() {
        return Optional.ofNullable(dimension);
    }

    /** @return the factor from this unit to CGS (1 Msun = 1.988...e33 g) */
    public double cgsFactor() {
        return cgsFactor;
    }

    /**
     * @return the spelling every output format writes ("g/cm3", "erg/cm3", "solMass"; "" when
     *     dimensionless), if the unit is ever written
     */
    public Optional<String> written() {
        return Optional.ofNullable(written);
    }

    /** @return the axis-label markup of the charts, e.g. "g cm^{-3}" */
    public String chartLabel() {
        return chartLabel;
    }

    /**
     * @return the spellings user input accepts for this unit: its own first, then aliases, then
     *     the written spelling (so that a unit copied from any of our files is accepted)
     */
    public List<String> inputSpellings() {
        return java.util.stream.Stream.of(java.util.stream.Stream.of(spelling), inputAliases.stream(),
                java.util.stream.Stream.ofNullable(written)).flatMap(s -> s).distinct().toList();
    }
}
