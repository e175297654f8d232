package org.stellabar.output;

import java.util.Map;
import java.util.Optional;
import org.stellabar.table.Column;
import org.stellabar.table.NumberColumn;

/**
 * IVOA Unified Content Descriptors (UCD1+ controlled vocabulary, IVOA Recommendation 2018 / its
 * 2021 list) for the columns where a standard word fits. In our tables the unit alone says what
 * a column is for densities, pressures, temperatures, masses, radii, luminosities and speeds
 * (every length column is a radius, every speed a sound speed); an effective temperature, a
 * surface gravity, a star's name and a row number are told by the column's name. Anything else
 * (exponents, fractions, residuals) gets no UCD rather than a loose one. Each word is checked
 * against astropy's copy of the vocabulary ({@code astropy.io.votable.ucd.check_ucd}) by
 * {@code cli.VotableAstropyTest}.
 */
final class Ucds {

    /** By the internal unit spelling of the column. */
    private static final Map<String, String> BY_UNIT = Map.ofEntries(
            Map.entry("g/cm3", "phys.density"),
            Map.entry("dyn/cm2", "phys.pressure"),
            Map.entry("K", "phys.temperature"),
            Map.entry("g", "phys.mass"),
            Map.entry("Msun", "phys.mass"),
            Map.entry("cm", "phys.size.radius"),
            Map.entry("Rsun", "phys.size.radius"),
            Map.entry("erg/s", "phys.luminosity"),
            Map.entry("Lsun", "phys.luminosity"),
            Map.entry("cm/s", "phys.veloc"));

    /** By column name, before the unit: names whose meaning the unit does not carry. */
    private static final Map<String, String> BY_NAME = Map.of(
            "Teff", "phys.temperature.effective",
            "log_g", "phys.gravity",
            "name", "meta.id;meta.main",
            "row", "meta.record");

    private Ucds() {
    }

    /**
     * @param column a column
     * @return its UCD, if a standard one fits
     */
    static Optional<String> of(Column column) {
        String byName = BY_NAME.get(column.name());
        if (byName != null) {
            return Optional.of(byName);
        }
        return column instanceof NumberColumn ? Optional.ofNullable(BY_UNIT.get(column.unit())) : Optional.empty();
    }
}
