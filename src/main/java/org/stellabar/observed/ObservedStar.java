package org.stellabar.observed;

import java.util.Objects;
import java.util.Optional;
import org.stellabar.eos.Composition;

/**
 * One star as a catalogue gives it, in CGS. Any two of L, T_eff, R are needed; the mass comes
 * from M, else from the surface gravity with R, else from the standard model's luminosity.
 *
 * @param name the star's identifier, carried into every output row
 * @param row the catalogue's data row, counted from 1
 * @param luminosity L [erg/s]
 * @param temperature T_eff [K]
 * @param radius R [cm]
 * @param mass M [g]
 * @param gravity surface gravity g [cm/s²] (catalogues give log g; an error of log g is in dex)
 * @param composition the star's mixture (X sets κ_es, μ sets β)
 */
public record ObservedStar(String name, int row, Optional<Measurement> luminosity, Optional<Measurement> temperature,
        Optional<Measurement> radius, Optional<Measurement> mass, Optional<Measurement> gravity,
        Composition composition) {

    /**
     * Canonical constructor: no component may be null.
     *
     * @param name the star's identifier, carried into every output row
     * @param row the catalogue's data row, counted from 1
     * @param luminosity L [erg/s]
     * @param temperature T_eff [K]
     * @param radius R [cm]
     * @param mass M [g]
     * @param gravity surface gravity g [cm/s²] (catalogues give log g; an error of log g is in dex)
     * @param composition the star's mixture (X sets κ_es, μ sets β)
     */
    public ObservedStar {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(luminosity, "luminosity");
        Objects.requireNonNull(temperature, "temperature");
        Objects.requireNonNull(radius, "radius");
        Objects.requireNonNull(mass, "mass");
        Objects.requireNonNull(gravity, "gravity");
        Objects.requireNonNull(composition, "composition");
    }

    /** @return true if any value carries an error */
    public boolean hasErrors() {
        return java.util.stream.Stream.of(luminosity, temperature, radius, mass, gravity)
                .anyMatch(m -> m.map(Measurement::hasError).orElse(false));
    }
}
