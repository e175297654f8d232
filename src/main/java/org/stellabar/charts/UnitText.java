package org.stellabar.charts;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Turns the project's compact unit strings (the units of table columns: "g/cm3", "dyn/cm2",
 * "erg/g/K", "1/cm3", "Msun") into typeset chart markup for {@link ScriptedText}: "g cm^{-3}",
 * "dyn cm^{-2}", "erg g^{-1} K^{-1}", "cm^{-3}", "M_☉". A string outside that grammar (already
 * typeset, or any other text) is returned unchanged.
 */
public final class UnitText {

    private static final Pattern FACTOR = Pattern.compile("([A-Za-z]+)(\\d*)");
    private static final Pattern COMPACT = Pattern.compile("(1|[A-Za-z]+\\d*)(/[A-Za-z]+\\d*)*");
    // IAU 2015 Resolution B3 writes the nominal solar values with the solar symbol as a subscript.
    private static final Map<String, String> SOLAR = Map.of("Msun", "M_☉", "Rsun", "R_☉", "Lsun", "L_☉");

    private UnitText() {
    }

    /**
     * @param unit a unit string, "" for dimensionless
     * @return chart markup for it ("" stays "")
     */
    public static String typeset(String unit) {
        String u = unit.strip();
        if (u.isEmpty() || !COMPACT.matcher(u).matches()) {
            return u;
        }
        String[] parts = u.split("/");
        List<String> factors = new ArrayList<>();
        for (int i = 0; i < parts.length; i++) {
            if (i == 0 && parts[i].equals("1")) {
                continue;
            }
            Matcher m = FACTOR.matcher(parts[i]);
            if (!m.matches()) {
                return u;
            }
            String symbol = SOLAR.getOrDefault(m.group(1), m.group(1));
            int power = m.group(2).isEmpty() ? 1 : Integer.parseInt(m.group(2));
            int signed = i == 0 ? power : -power;
            factors.add(signed == 1 ? symbol : symbol + "^{" + signed + "}");
        }
        return String.join(" ", factors);
    }
}
