package org.stellabar.charts;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.stellabar.physics.Unit;

/**
 * Turns the project's compact unit strings (the units of table columns: "g/cm3", "dyn/cm2",
 * "erg/g/K", "1/cm3", "Msun") into typeset chart markup for {@link ScriptedText}: "g cm^{-3}",
 * "dyn cm^{-2}", "erg g^{-1} K^{-1}", "cm^{-3}", "M_☉". A string outside that grammar (already
 * typeset, or any other text) is returned unchanged. A unit of the project's unit table
 * ({@link Unit}) takes its chart label from there; other compact strings are typeset factor by
 * factor with the same rule.
 */
public final class UnitText {

    private static final Pattern FACTOR = Pattern.compile("([A-Za-z]+)(\\d*)");
    private static final Pattern COMPACT = Pattern.compile("(1|[A-Za-z]+\\d*)(/[A-Za-z]+\\d*)*");

    private UnitText() {
    }

    /**
     * @param unit a unit string, "" for dimensionless
     * @return chart markup for it ("" stays "")
     */
    public static String typeset(String unit) {
        Optional<Unit> known = Unit.of(unit.strip());
        if (known.isPresent()) {
            return known.get().chartLabel();
        }
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
            // a symbol the unit table knows takes its label there ("Msun" → "M_☉")
            String symbol = Unit.of(m.group(1)).map(Unit::chartLabel).orElse(m.group(1));
            int power = m.group(2).isEmpty() ? 1 : Integer.parseInt(m.group(2));
            int signed = i == 0 ? power : -power;
            factors.add(signed == 1 ? symbol : symbol + "^{" + signed + "}");
        }
        return String.join(" ", factors);
    }
}
