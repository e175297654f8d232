package org.stellabar.output;

import java.text.Normalizer;
import java.util.Map;

/**
 * FITS headers and character columns hold printable ASCII only (FITS Standard 4.0, sections 4.1
 * and 7.3.3.1). Titles, descriptions and star names may carry Greek letters or accents, so they
 * are spelled out in ASCII here: Greek letters by name ("β" → "beta"), accented letters without
 * the accent, super- and subscript digits as digits, other characters as '?'. CSV and JSON keep
 * the original text.
 */
final class FitsText {

    private static final Map<Character, String> NAMED = Map.ofEntries(
            Map.entry('α', "alpha"), Map.entry('β', "beta"), Map.entry('γ', "gamma"), Map.entry('δ', "delta"),
            Map.entry('ε', "epsilon"), Map.entry('ζ', "zeta"), Map.entry('η', "eta"), Map.entry('θ', "theta"),
            Map.entry('κ', "kappa"), Map.entry('λ', "lambda"), Map.entry('μ', "mu"), Map.entry('ν', "nu"),
            Map.entry('ξ', "xi"), Map.entry('π', "pi"), Map.entry('ρ', "rho"), Map.entry('σ', "sigma"),
            Map.entry('τ', "tau"), Map.entry('φ', "phi"), Map.entry('χ', "chi"), Map.entry('ψ', "psi"),
            Map.entry('ω', "omega"), Map.entry('Γ', "Gamma"), Map.entry('Δ', "Delta"), Map.entry('Θ', "Theta"),
            Map.entry('Λ', "Lambda"), Map.entry('Ξ', "Xi"), Map.entry('Π', "Pi"), Map.entry('Σ', "Sigma"),
            Map.entry('Φ', "Phi"), Map.entry('Ψ', "Psi"), Map.entry('Ω', "Omega"), Map.entry('∇', "nabla"),
            Map.entry('☉', "sun"), Map.entry('−', "-"), Map.entry('–', "-"), Map.entry('—', "-"),
            Map.entry('×', "x"), Map.entry('·', "."), Map.entry('≈', "~"), Map.entry('≤', "<="),
            Map.entry('≥', ">="), Map.entry('°', "deg"), Map.entry('‘', "'"), Map.entry('’', "'"),
            Map.entry('“', "\""), Map.entry('”', "\""));

    private FitsText() {
    }

    /**
     * @param text any text
     * @return the text in printable ASCII (0x20 to 0x7E), line breaks and tabs as spaces
     */
    static String ascii(String text) {
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c >= 0x20 && c <= 0x7E) {
                out.append(c);
            } else if (c == '\n' || c == '\r' || c == '\t') {
                out.append(' ');
            } else if (NAMED.containsKey(c)) {
                out.append(NAMED.get(c));
            } else {
                // Compatibility decomposition turns "é" into "e" + accent and "³" into "3".
                String decomposed = Normalizer.normalize(String.valueOf(c), Normalizer.Form.NFKD)
                        .replaceAll("\\p{M}", "");
                boolean plain = !decomposed.isEmpty()
                        && decomposed.chars().allMatch(ch -> ch >= 0x20 && ch <= 0x7E);
                out.append(plain ? decomposed : "?");
            }
        }
        return out.toString();
    }
}
