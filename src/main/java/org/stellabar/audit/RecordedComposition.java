package org.stellabar.audit;

import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.stellabar.eos.Composition;

/**
 * The composition a stellabar profile records in its metadata, read back so that auditing our
 * own profile needs no composition options: "mu = 0.6" (given as μ, the hydrogen–helium mixture
 * of that μ) or "X = 0.7, Y = 0.28, Z = 0.02 (mu = 0.6172839506)". A recorded μ that differs from
 * the one X, Y, Z give without metal ions means metal ions of a mass number A were counted:
 * 1/μ = 2X + 3Y/4 + Z/2 + Z/A gives A back.
 */
public final class RecordedComposition {

    private static final String NUMBER = "([-+]?[0-9]*\\.?[0-9]+(?:[eE][-+]?[0-9]+)?)";
    /** "mu = 0.6", perhaps followed by what it was taken as, in parentheses. */
    private static final Pattern MU_ONLY = Pattern.compile("^mu\\s*=\\s*" + NUMBER + "(?:\\s*\\(.*\\))?$");
    private static final Pattern FRACTIONS = Pattern.compile("^X\\s*=\\s*" + NUMBER + ",\\s*Y\\s*=\\s*" + NUMBER
            + ",\\s*Z\\s*=\\s*" + NUMBER + "\\s*\\(mu\\s*=\\s*" + NUMBER + "\\)$");
    /** Relative difference of μ below which no metal ions were counted (10 digits are recorded). */
    private static final double SAME_MU = 1e-9;

    private RecordedComposition() {
    }

    /**
     * @param text the recorded text
     * @return the composition, or empty when the text is not one stellabar writes or describes
     *     no allowed composition
     */
    public static Optional<Composition> parse(String text) {
        try {
            Matcher mu = MU_ONLY.matcher(text.strip());
            if (mu.matches()) {
                return Optional.of(Composition.ofMu(Double.parseDouble(mu.group(1))));
            }
            Matcher f = FRACTIONS.matcher(text.strip());
            if (!f.matches()) {
                return Optional.empty();
            }
            double x = Double.parseDouble(f.group(1));
            double y = Double.parseDouble(f.group(2));
            double z = Double.parseDouble(f.group(3));
            double recordedMu = Double.parseDouble(f.group(4));
            // 1/μ without metal ions: electrons 1/μ_e = X + Y/2 + Z/2, ions X + Y/4
            double plainInverseMu = 2.0 * x + 0.75 * y + 0.5 * z;
            if (z == 0.0 || Math.abs(plainInverseMu * recordedMu - 1.0) < SAME_MU) {
                return Optional.of(Composition.of(x, y, z));
            }
            double metalTerm = 1.0 / recordedMu - plainInverseMu;
            if (!(metalTerm > 0.0)) {
                return Optional.empty();
            }
            double massNumber = z / metalTerm;
            // μ is recorded to ten digits: A comes back to about six; a whole number is what was given
            double whole = Math.rint(massNumber);
            return Optional.of(Composition.of(x, y, z, Math.abs(massNumber - whole) < 1e-4 ? whole : massNumber));
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
    }
}
