package org.stellabar.output;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.stellabar.physics.Unit;

/**
 * Translates between this project's unit strings and the unit strings files carry: the written
 * spelling of the project's unit table, {@link Unit#written()}, which every format writes (CSV
 * headers, ECSV, FITS TUNITn and the {@code [unit]} at the start of a header comment, VOTable,
 * JSON, the terminal), and which astropy parses as the same unit in its generic, FITS and CDS
 * formats ("g/cm3", "solMass", a pressure as "erg/cm3"; see there).
 *
 * <p>Reading is more forgiving: a unit string from another program is parsed into symbols with
 * integer powers ("g cm-3", "g/cm3", "g cm**-3", "g.cm^-3" are all one unit) and compared with
 * ours; dyn and erg/cm are the same. Anything not recognised is kept as written.
 */
public final class FitsUnits {

    /** Our unit string → its FITS spelling, from the unit table; "" has none (no TUNITn card is written). */
    private static final Map<String, String> TO_FITS = new LinkedHashMap<>();

    static {
        for (Unit u : Unit.values()) {
            u.written().ifPresent(written -> TO_FITS.put(u.spelling(), written));
        }
    }

    /** Symbols other programs write, mapped to one base symbol each. */
    private static final Map<String, String> SYMBOLS = Map.ofEntries(
            Map.entry("g", "g"), Map.entry("cm", "cm"), Map.entry("s", "s"), Map.entry("K", "K"),
            Map.entry("erg", "erg"), Map.entry("dyn", "dyn"), Map.entry("dyne", "dyn"),
            Map.entry("solMass", "solMass"), Map.entry("Msun", "solMass"), Map.entry("Msol", "solMass"),
            Map.entry("solRad", "solRad"), Map.entry("Rsun", "solRad"), Map.entry("Rsol", "solRad"),
            Map.entry("solLum", "solLum"), Map.entry("Lsun", "solLum"), Map.entry("Lsol", "solLum"));

    private static final Pattern FACTOR =
            Pattern.compile("([A-Za-z]+)(?:\\*\\*|\\^)?\\(?([-+]?\\d+)?\\)?");

    /** Our unit string keyed by its symbols and powers, e.g. {cm=-3, g=1} → "g/cm3". */
    private static final Map<Map<String, Integer>, String> BY_POWERS = new LinkedHashMap<>();

    static {
        for (Map.Entry<String, String> e : TO_FITS.entrySet()) {
            if (!e.getKey().isEmpty()) {
                BY_POWERS.put(powers(e.getValue()).orElseThrow(), e.getKey());
            }
        }
    }

    private FitsUnits() {
    }

    /**
     * The written spelling of one of our unit strings: what every writer puts in a file or on the
     * terminal.
     *
     * @param unit a unit string used in tables ("g/cm3", "dyn/cm2", "Msun", "" ...)
     * @return its written spelling ("g/cm3", "erg/cm3", "solMass", "" ...)
     * @throws IllegalArgumentException for a unit the unit table cannot write: a table with such a
     *     unit is a programming error (or a foreign column that its caller must describe instead)
     */
    public static String written(String unit) {
        return toFits(unit);
    }

    /**
     * The FITS spelling of one of our unit strings (the written spelling: one spelling for every
     * format).
     *
     * @param unit a unit string used in tables ("g/cm3", "dyn/cm2", "Msun", "" ...)
     * @return its FITS spelling, "" for a dimensionless quantity
     * @throws IllegalArgumentException for a unit this class does not know: a table with such a
     *     unit is a programming error, and the unit must be added here rather than dropped
     */
    public static String toFits(String unit) {
        String fits = TO_FITS.get(unit);
        if (fits == null) {
            throw new IllegalArgumentException("no FITS spelling for unit '" + unit + "'; known units: "
                    + String.join(", ", TO_FITS.keySet().stream().filter(u -> !u.isEmpty()).toList()));
        }
        return fits;
    }

    /**
     * The FITS spelling of one of our unit strings, if FITS has one.
     *
     * @param unit a unit string used in tables
     * @return its FITS spelling ("" for a dimensionless quantity), or empty for a unit FITS
     *     cannot spell (k_B)
     */
    public static Optional<String> spelling(String unit) {
        return Optional.ofNullable(TO_FITS.get(unit));
    }

    /**
     * Our unit string for a FITS unit written by any program, when it is one we know.
     *
     * @param fitsUnit a TUNITn value, e.g. "g cm-3", "g/cm3", "dyn cm-2", "solMass"
     * @return our unit string ("g/cm3", "dyn/cm2", "Msun" ...), or empty if not recognised
     */
    public static Optional<String> fromFits(String fitsUnit) {
        if (fitsUnit == null || fitsUnit.isBlank()) {
            return Optional.of("");
        }
        return powers(fitsUnit).map(BY_POWERS::get);
    }

    /**
     * Our unit string for a FITS unit if known, otherwise the unit as written (trimmed).
     *
     * @param fitsUnit a TUNITn value
     * @return the unit to report
     */
    public static String fromFitsOrAsGiven(String fitsUnit) {
        return fromFits(fitsUnit).orElse(fitsUnit.strip());
    }

    /**
     * Splits a unit string into base symbols with integer powers: factors separated by spaces,
     * '.' or a single '*', at most one '/' after which every power is negated (parentheses allowed around
     * the divisor), "1" factors ignored, dyn reduced to erg/cm.
     */
    private static Optional<Map<String, Integer>> powers(String unit) {
        String text = unit.strip();
        String numerator = text;
        String denominator = "";
        int slash = text.indexOf('/');
        if (slash >= 0) {
            numerator = text.substring(0, slash);
            denominator = text.substring(slash + 1).strip();
            if (denominator.startsWith("(") && denominator.endsWith(")")) {
                denominator = denominator.substring(1, denominator.length() - 1);
            }
            if (denominator.indexOf('/') >= 0 || denominator.isBlank()) {
                return Optional.empty();
            }
        }
        Map<String, Integer> result = new TreeMap<>();
        if (!addFactors(numerator, 1, result) || !addFactors(denominator, -1, result)) {
            return Optional.empty();
        }
        Integer dyn = result.remove("dyn");
        if (dyn != null) {
            result.merge("erg", dyn, Integer::sum);
            result.merge("cm", -dyn, Integer::sum);
        }
        result.values().removeIf(p -> p == 0);
        return Optional.of(result);
    }

    private static boolean addFactors(String part, int sign, Map<String, Integer> into) {
        for (String token : part.strip().split("\\s+|\\.|(?<!\\*)\\*(?!\\*)")) {
            if (token.isEmpty() || token.equals("1")) {
                continue;
            }
            Matcher m = FACTOR.matcher(token);
            if (!m.matches()) {
                return false;
            }
            String symbol = SYMBOLS.get(m.group(1));
            if (symbol == null) {
                return false;
            }
            int power = m.group(2) == null ? 1 : Integer.parseInt(m.group(2));
            into.merge(symbol, sign * power, Integer::sum);
        }
        return true;
    }
}
