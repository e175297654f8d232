package org.stellabar.structure;

import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.SPEED_OF_LIGHT;

import java.util.OptionalDouble;
import org.stellabar.numerics.TabulatedQuadrature;
import org.stellabar.physics.BadInputException;

/**
 * Dynamical stability of a spherical star against radial collapse, for any structure.
 *
 * <p><b>Newtonian.</b> With a homologous trial displacement, the fundamental radial mode is
 * stable when the pressure-weighted mean ⟨Γ1⟩ = ∫Γ1 P dV / ∫P dV exceeds 4/3 (Ledoux 1945, ApJ
 * 102, 143; Cox 1980, <i>Theory of Stellar Pulsation</i>, §8.7).
 *
 * <p><b>General relativity.</b> To first post-Newtonian order the star is stable only when
 * ⟨Γ1⟩ − 4/3 &gt; K·2GM/(Rc²) (Chandrasekhar 1964, ApJ 140, 417). We evaluate the right-hand side
 * from the profile itself as
 *
 * <pre>
 *   K·2GM/(Rc²) = [ (4/9) ∫ (Gm/r) P dV + (1/3) ∫ (Gm/r)² ρ dV ] / ( c² ∫ P dV ),
 * </pre>
 *
 * the post-Newtonian energy of a homologous compression over its Newtonian part. This form was
 * written down for this tool from the energy argument (we did not have the paper at hand); it
 * reproduces Chandrasekhar's tabulated K₃ = 1.1245 and K₁.₅ = 0.6451 (Chandrasekhar 1965, ApJ 142,
 * 1519) to four digits for Lane-Emden structures (see the tests), and for an n = 3 polytrope it
 * agrees with the energy coefficients k₂, k₄ of Shapiro &amp; Teukolsky 1983, §6.9 (K = k₄ (ρ_c
 * R³/M)^(1/3) / (3 k₂)).
 *
 * <p><b>Onset.</b> Contracting homologously at fixed M, ⟨Γ1⟩ and K, instability sets in at
 * R_crit = K·2GM/(c²(⟨Γ1⟩ − 4/3)), with central density ρ_c (R/R_crit)³. ⟨Γ1⟩ is fixed under
 * such a contraction for the standard model (β depends on M alone), and approximately so
 * otherwise.
 *
 * <p><b>Verdict.</b> R/R_crit = (⟨Γ1⟩ − 4/3)/(K·2GM/(Rc²)). Stable when it exceeds 1 + b,
 * unstable below 1 − b, marginal in between, with b = {@link #MARGINAL_BAND} = 5 %: the
 * homologous trial function and the first-order expansion make the threshold itself uncertain
 * at the level of a few per cent, so a star that close to it cannot be called either way. A star
 * with ⟨Γ1⟩ ≤ 4/3 is unstable whatever its compactness.
 *
 * <p>Integrals use {@link TabulatedQuadrature} over the profile's shells, from its innermost shell
 * (the centre, for a complete profile) to its outermost. Stateless and thread-safe.
 */
public final class StabilityAnalysis {

    /** Relative band of R/R_crit around 1 reported as marginal. */
    public static final double MARGINAL_BAND = 0.05;

    private StabilityAnalysis() {
    }

    /**
     * Estimates the stability of a tabulated star.
     *
     * @param profile the star's radial structure
     * @return the estimate
     */
    public static StabilityResult analyze(RadialProfile profile) {
        double[] r = profile.r();
        double[] m = profile.m();
        double[] rho = profile.rho();
        double[] p = profile.P();
        double[] g1 = profile.gamma1();
        int k = r.length;
        double[] pdv = new double[k];
        double[] g1pdv = new double[k];
        double[] potentialP = new double[k];
        double[] potentialSquaredRho = new double[k];
        for (int i = 0; i < k; i++) {
            double shell = 4.0 * Math.PI * r[i] * r[i];
            double phi = r[i] > 0.0 ? GRAVITATION * m[i] / r[i] : 0.0;
            pdv[i] = p[i] * shell;
            g1pdv[i] = g1[i] * p[i] * shell;
            potentialP[i] = phi * p[i] * shell;
            potentialSquaredRho[i] = phi * phi * rho[i] * shell;
        }
        double pressureVolume = TabulatedQuadrature.integral(r, pdv);
        if (!(pressureVolume > 0.0)) {
            throw new BadInputException("radial profile: the pressure integral over the volume is " + pressureVolume
                    + " erg; the pressure must be positive over some volume");
        }
        double meanGamma1 = TabulatedQuadrature.integral(r, g1pdv) / pressureVolume;
        double threshold = (4.0 / 9.0 * TabulatedQuadrature.integral(r, potentialP)
                + 1.0 / 3.0 * TabulatedQuadrature.integral(r, potentialSquaredRho))
                / (SPEED_OF_LIGHT * SPEED_OF_LIGHT * pressureVolume);
        double mass = profile.mass();
        double radius = profile.radius();
        double compactness = compactness(mass, radius);
        return assess(mass, radius, profile.centralDensity(), meanGamma1, threshold / compactness);
    }

    /**
     * The estimate from its ingredients, when ⟨Γ1⟩ and K are known in closed form (e.g. the
     * standard model, where Γ1 is the same everywhere and K = K₃).
     *
     * @param mass M [g], positive
     * @param radius R [cm], positive
     * @param centralDensity ρ_c [g/cm3], positive
     * @param meanGamma1 ⟨Γ1⟩, positive
     * @param relativisticCoefficient K, ≥ 0
     * @return the estimate
     * @throws BadInputException if an ingredient is out of range
     */
    public static StabilityResult assess(double mass, double radius, double centralDensity, double meanGamma1,
            double relativisticCoefficient) {
        return assess(mass, radius, centralDensity, meanGamma1, meanGamma1 - 4.0 / 3.0, relativisticCoefficient);
    }

    /**
     * As {@link #assess(double, double, double, double, double)}, with ⟨Γ1⟩ − 4/3 given
     * separately so that a caller who knows it without cancellation (Γ1 → 4/3 + β/6 as β → 0)
     * keeps its digits.
     *
     * @param mass M [g], positive
     * @param radius R [cm], positive
     * @param centralDensity ρ_c [g/cm3], positive
     * @param meanGamma1 ⟨Γ1⟩, positive
     * @param newtonianMargin ⟨Γ1⟩ − 4/3, finite
     * @param relativisticCoefficient K, ≥ 0
     * @return the estimate
     * @throws BadInputException if an ingredient is out of range
     */
    public static StabilityResult assess(double mass, double radius, double centralDensity, double meanGamma1,
            double newtonianMargin, double relativisticCoefficient) {
        positive("mass", mass, "g");
        positive("radius", radius, "cm");
        positive("central density", centralDensity, "g/cm3");
        positive("mean Gamma1", meanGamma1, "");
        if (!(relativisticCoefficient >= 0.0 && Double.isFinite(relativisticCoefficient))) {
            throw new BadInputException("relativistic coefficient K = " + relativisticCoefficient
                    + " must be finite and >= 0");
        }
        double compactness = compactness(mass, radius);
        double threshold = relativisticCoefficient * compactness;
        if (!Double.isFinite(newtonianMargin)) {
            throw new BadInputException("Gamma1 - 4/3 = " + newtonianMargin + " must be finite");
        }
        double newtonian = newtonianMargin;
        OptionalDouble criticalRadius = OptionalDouble.empty();
        OptionalDouble criticalDensity = OptionalDouble.empty();
        StabilityVerdict verdict;
        if (newtonian > 0.0 && threshold > 0.0) {
            double rCrit = 2.0 * GRAVITATION * mass * relativisticCoefficient
                    / (SPEED_OF_LIGHT * SPEED_OF_LIGHT * newtonian);
            criticalRadius = OptionalDouble.of(rCrit);
            double ratio = radius / rCrit;
            criticalDensity = OptionalDouble.of(centralDensity * ratio * ratio * ratio);
            verdict = ratio > 1.0 + MARGINAL_BAND ? StabilityVerdict.STABLE
                    : ratio < 1.0 - MARGINAL_BAND ? StabilityVerdict.UNSTABLE : StabilityVerdict.MARGINAL;
        } else if (newtonian > 0.0) {
            verdict = StabilityVerdict.STABLE;
        } else {
            verdict = StabilityVerdict.UNSTABLE;
        }
        return new StabilityResult(mass, radius, meanGamma1, newtonian, relativisticCoefficient, compactness,
                threshold, newtonian - threshold, criticalRadius, criticalDensity, MARGINAL_BAND, verdict);
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @return 2GM/(Rc²)
     */
    public static double compactness(double mass, double radius) {
        return 2.0 * GRAVITATION * mass / (radius * SPEED_OF_LIGHT * SPEED_OF_LIGHT);
    }

    private static void positive(String what, double value, String unit) {
        if (!(value > 0.0 && Double.isFinite(value))) {
            throw new BadInputException(what + " " + value + (unit.isEmpty() ? "" : " " + unit)
                    + " must be positive and finite");
        }
    }
}
