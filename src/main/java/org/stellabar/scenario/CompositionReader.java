package org.stellabar.scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Optional;
import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;

/**
 * Reads a composition table: two or three of the mass fractions {@code X}, {@code Y}, {@code Z}
 * (the third derived), or the mean molecular weight {@code mu}; optionally
 * {@code metal_mass_number} to count metal ions. Every rule of {@link Composition} is checked
 * here first, so that each problem is reported at its own key.
 */
final class CompositionReader {

    static final String X = "X";
    static final String Y = "Y";
    static final String Z = "Z";
    static final String MU = "mu";
    static final String METAL_MASS_NUMBER = "metal_mass_number";
    static final List<String> KEYS = List.of(X, Y, Z, MU, METAL_MASS_NUMBER);

    private static final String FRACTION = "a mass fraction: a number in [0, 1]";

    private CompositionReader() {
    }

    /**
     * @param section the composition table
     * @return the composition, or empty if anything is wrong (every problem reported)
     */
    static Optional<Composition> read(TomlSection section) {
        section.rejectUnknownKeys(KEYS, "a composition");
        return readKeys(section);
    }

    /**
     * Reads the composition keys of a table that has other keys too (a survey's own table).
     *
     * @param section the table
     * @return the composition, or empty if anything is wrong (every problem reported)
     */
    static Optional<Composition> readKeys(TomlSection section) {
        boolean valid = true;
        List<String> given = new ArrayList<>();
        double[] fractions = {Double.NaN, Double.NaN, Double.NaN};
        String[] names = {X, Y, Z};
        for (int i = 0; i < 3; i++) {
            if (!section.has(names[i])) {
                continue;
            }
            given.add(names[i]);
            OptionalDouble f = section.number(names[i], FRACTION);
            if (f.isEmpty()) {
                valid = false;
            } else if (f.getAsDouble() < 0.0 || f.getAsDouble() > 1.0) {
                section.error(names[i], ScenarioError.Kind.OUT_OF_RANGE,
                        "a mass fraction lies in [0, 1]");
                valid = false;
            } else {
                fractions[i] = f.getAsDouble();
            }
        }
        OptionalDouble mu = section.number(MU, "a mean molecular weight: a number in [0.5, 2]");
        if (section.has(MU) && mu.isEmpty()) {
            valid = false;
        }
        if (mu.isPresent() && !(mu.getAsDouble() >= Composition.MU_MIN && mu.getAsDouble() <= Composition.MU_MAX)) {
            section.error(MU, ScenarioError.Kind.OUT_OF_RANGE, "mu lies in [" + Composition.MU_MIN + ", "
                    + Composition.MU_MAX + "] for a fully ionized mixture (pure hydrogen to pure metals)");
            valid = false;
        }
        OptionalDouble metals = section.number(METAL_MASS_NUMBER,
                "a mass number: a number >= 2, or 0 to neglect metal ions");
        if (section.has(METAL_MASS_NUMBER) && metals.isEmpty()) {
            valid = false;
        }
        if (metals.isPresent() && !(metals.getAsDouble() == 0.0 || metals.getAsDouble() >= 2.0)) {
            section.error(METAL_MASS_NUMBER, ScenarioError.Kind.OUT_OF_RANGE,
                    "give a mass number >= 2 (e.g. 16 for oxygen), or 0 to neglect metal ions");
            valid = false;
        }
        if (section.has(MU) && !given.isEmpty()) {
            section.errorAtKey(MU, ScenarioError.Kind.CONFLICT,
                    "give either mu or the mass fractions, not both (" + String.join(", ", given) + " also given)");
            return Optional.empty();
        }
        if (section.has(MU) && section.has(METAL_MASS_NUMBER)) {
            section.errorAtKey(METAL_MASS_NUMBER, ScenarioError.Kind.CONFLICT,
                    "applies to mass fractions only; mu already counts every particle, give X, Y, Z instead of mu"
                            + " to count metal ions");
            return Optional.empty();
        }
        if (!section.has(MU) && given.size() < 2) {
            section.errorAtTable(ScenarioError.Kind.MISSING, given.isEmpty()
                    ? "no composition given; give two of X, Y, Z (the third is derived), or mu"
                    : "only " + given.get(0) + " is given; give a second of X, Y, Z (the third is derived), or mu");
            return Optional.empty();
        }
        if (!valid) {
            return Optional.empty();
        }
        if (mu.isPresent()) {
            return Optional.of(Composition.ofMu(mu.getAsDouble()));
        }
        if (!checkSum(section, given, fractions)) {
            return Optional.empty();
        }
        try {
            // the metal mass number in the same step: a mixture of metals only (a stellar core) has
            // ions only once metal ions are counted
            return Optional.of(metals.isPresent()
                    ? Composition.fromAnyTwo(fractions[0], fractions[1], fractions[2], metals.getAsDouble())
                    : Composition.fromAnyTwo(fractions[0], fractions[1], fractions[2]));
        } catch (BadInputException e) {
            // e.g. a mixture of metals only, which has no ions once metal ions are neglected
            section.errorAtTable(ScenarioError.Kind.COMPOSITION_SUM, e.getMessage());
            return Optional.empty();
        }
    }

    /**
     * Checks X + Y + Z = 1 when three are given, or that two given leave a non-negative third.
     *
     * @return true if the fractions are consistent (otherwise the problem is reported)
     */
    private static boolean checkSum(TomlSection section, List<String> given, double[] f) {
        double sum = 0.0;
        for (double v : f) {
            if (!Double.isNaN(v)) {
                sum += v;
            }
        }
        if (given.size() == 3 && Math.abs(sum - 1.0) > Composition.SUM_TOLERANCE) {
            section.errorAtTable(ScenarioError.Kind.COMPOSITION_SUM, "X + Y + Z = " + compact(sum)
                    + "; the mass fractions must add up to 1 (within 1e-9)");
            return false;
        }
        if (given.size() == 2 && sum > 1.0 + Composition.SUM_TOLERANCE) {
            section.errorAtTable(ScenarioError.Kind.COMPOSITION_SUM, given.get(0) + " + " + given.get(1) + " = "
                    + compact(sum) + " exceeds 1, so " + otherThan(given.get(0), given.get(1))
                    + " would be negative; the mass fractions must add up to 1");
            return false;
        }
        return true;
    }

    /** @return a sum shown to 10 significant digits, trailing zeros dropped ("1.02", "1.000000002") */
    static String compact(double value) {
        String text = String.format(Locale.US, "%.10g", value);
        if (text.contains("e")) {
            return text;
        }
        return text.contains(".") ? text.replaceAll("0+$", "").replaceAll("\\.$", "") : text;
    }

    /** @return the first of X, Y, Z that is not among {@code names} */
    private static String otherThan(String... names) {
        for (String candidate : List.of(X, Y, Z)) {
            if (!List.of(names).contains(candidate)) {
                return candidate;
            }
        }
        return X;
    }
}
