package org.stellabar.pipeline;

import java.util.Arrays;
import java.util.Optional;
import java.util.stream.Collectors;
import org.stellabar.physics.Dimension;
import org.stellabar.physics.Unit;

/**
 * The quantities {@code stellabar observed} reads from a catalogue, each under the key used in
 * {@code --columns}, {@code --units} and {@code --log} (also the column name looked for when
 * none is mapped), with its dimension and the unit assumed when neither {@code --units} nor the
 * file states one: a catalogue's customary unit (solar for L, M, R; K for T_eff), not CGS.
 * An error column ({@code L_err} ...) is in its quantity's unit, or in dex when the quantity is
 * a log column.
 */
public enum CatalogueQuantity {
    /** Luminosity. */
    L("L", "luminosity", Dimension.LUMINOSITY, Unit.LSUN, true),
    /** Effective temperature. */
    TEFF("Teff", "effective temperature", Dimension.TEMPERATURE, Unit.KELVIN, true),
    /** Radius. */
    R("R", "radius", Dimension.LENGTH, Unit.RSUN, true),
    /** Mass. */
    M("M", "mass", Dimension.MASS, Unit.MSUN, true),
    /** log10 of the surface gravity in cm/s², always a log. */
    LOG_G("log_g", "log10 of the surface gravity in cm/s2", null, null, true),
    /** Error of L. */
    L_ERR("L_err", "1-sigma error of L", null, null, false),
    /** Error of T_eff. */
    TEFF_ERR("Teff_err", "1-sigma error of Teff", null, null, false),
    /** Error of R. */
    R_ERR("R_err", "1-sigma error of R", null, null, false),
    /** Error of M. */
    M_ERR("M_err", "1-sigma error of M", null, null, false),
    /** Error of log g, in dex. */
    LOG_G_ERR("log_g_err", "1-sigma error of log_g in dex", null, null, false),
    /** Hydrogen mass fraction. */
    X("X", "hydrogen mass fraction", null, null, false),
    /** Metal mass fraction. */
    Z("Z", "metal mass fraction", null, null, false),
    /** The star's identifier (text). */
    NAME("name", "star identifier", null, null, false);

    private final String key;
    private final String label;
    private final Dimension dimension;
    private final Unit customaryUnit;
    private final boolean measured;

    CatalogueQuantity(String key, String label, Dimension dimension, Unit customaryUnit, boolean measured) {
        this.key = key;
        this.label = label;
        this.dimension = dimension;
        this.customaryUnit = customaryUnit;
        this.measured = measured;
    }

    /** @return the key in the options, also the column name looked for by default */
    public String key() {
        return key;
    }

    /** @return what it is, for messages */
    public String label() {
        return label;
    }

    /** @return its dimension; empty for a dimensionless, log or text column */
    public Optional<Dimension> dimension() {
        return Optional.ofNullable(dimension);
    }

    /** @return the unit assumed when none is stated */
    public Optional<Unit> customaryUnit() {
        return Optional.ofNullable(customaryUnit);
    }

    /** @return true for L, Teff, R, M and log_g, which carry an error column */
    public boolean measured() {
        return measured;
    }

    /** @return the error column's quantity of a measured quantity */
    public CatalogueQuantity error() {
        return switch (this) {
            case L -> L_ERR;
            case TEFF -> TEFF_ERR;
            case R -> R_ERR;
            case M -> M_ERR;
            case LOG_G -> LOG_G_ERR;
            default -> throw new IllegalStateException(key + " has no error column");
        };
    }

    /**
     * @param key as typed
     * @return the quantity, empty for an unknown key
     */
    public static Optional<CatalogueQuantity> ofKey(String key) {
        return Arrays.stream(values()).filter(q -> q.key.equals(key)).findFirst();
    }

    /** @return every key, for messages */
    public static String keys() {
        return Arrays.stream(values()).map(CatalogueQuantity::key).collect(Collectors.joining(", "));
    }
}
