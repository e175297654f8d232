package org.stellabar.structure;

import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.SPEED_OF_LIGHT;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.stellabar.eos.EosInversion;
import org.stellabar.eos.EosState;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.eos.Inversions;
import org.stellabar.physics.BadInputException;

/**
 * A Lane-Emden polytrope of index n scaled to a star of mass M and radius R, with the gas +
 * radiation equation of state evaluated along it.
 *
 * <p>Scaling (Chandrasekhar 1939, ch. IV): α = R/ξ₁, ρ_c = M/(4πα³ω_n), P_c = W_n GM²/R⁴, and at
 * ξ = r/α: ρ = ρ_c θⁿ, P = P_c θⁿ⁺¹, m = M(−ξ²θ')/ω_n. The temperature at every point is the
 * root of the mixed EOS at (ρ, P), {@link EosInversion#temperature}, and β, Γ1, ∇_ad, c_s follow
 * from the EOS at (ρ, T). For n = 3, P/ρ^{4/3} = K is the same everywhere and so is the root's
 * β: the inversion reproduces Eddington's standard model.
 *
 * <p>Surface. The last row is r = R exactly, where ρ = P = 0 (ρ = ρ_c for n = 0) and T = 0. The
 * ratios there are 0/0; the row holds their limits as θ → 0, found from the inversion's
 * asymptotics: T → Pμm_u/(ρk) ∝ θ on the gas branch, so P_rad/P ∝ θ^{3−n} and β → 1 for n &lt; 3;
 * β is constant for n = 3; and T → (3P/a)^{1/4}, P_gas/P ∝ θ^{(n−3)/4}, β → 0 for n &gt; 3. The
 * approach is slow near n = 3, so for such n the profile's last interval holds a visible step
 * to the limit. c_s = 0 there.
 *
 * <p>Immutable and thread-safe.
 */
public final class ScaledPolytropeStar {

    private final LaneEmdenSolution polytrope;
    private final Inversions inversion;
    /** The classical mixture's inversion, for points outside another EOS's search range; null if classical. */
    private final EosInversion outsideRange;

    /**
     * @param polytrope the Lane-Emden solution of the star's index
     * @param eos the equation of state
     */
    public ScaledPolytropeStar(LaneEmdenSolution polytrope, GasRadiationEos eos) {
        this(polytrope, new EosInversion(Objects.requireNonNull(eos, "eos")));
    }

    /**
     * A polytrope on any equation of state. For one other than the classical mixture, a point whose
     * (ρ, P) lies outside that equation of state's search range (the cool, thin layers next to the
     * surface of a hot core: T below 10⁴ K or ρ below 10⁻¹⁴ g/cm3 for
     * {@link org.stellabar.eos.fermi.FermiEosInversion}) takes the classical mixture's state, its
     * limit there: non-degenerate electrons and no pairs.
     *
     * @param polytrope the Lane-Emden solution of the star's index
     * @param inversion the equation of state's inversions
     */
    public ScaledPolytropeStar(LaneEmdenSolution polytrope, Inversions inversion) {
        this.polytrope = Objects.requireNonNull(polytrope, "polytrope");
        this.inversion = Objects.requireNonNull(inversion, "inversion");
        this.outsideRange = inversion instanceof EosInversion ? null
                : new EosInversion(new GasRadiationEos(inversion.eos().composition()));
    }

    /** @return the Lane-Emden solution */
    public LaneEmdenSolution polytrope() {
        return polytrope;
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @return ρ_c = (ρ_c/ρ̄) 3M/(4πR³) [g/cm3]
     */
    public double centralDensity(double mass, double radius) {
        return polytrope.centralToMeanDensity() * 3.0 * mass / (4.0 * Math.PI * radius * radius * radius);
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @return P_c = W_n GM²/R⁴ [dyn/cm2]
     */
    public double centralPressure(double mass, double radius) {
        double r2 = radius * radius;
        return polytrope.centralPressureCoefficient() * GRAVITATION * mass * mass / (r2 * r2);
    }

    /**
     * Stability of the star from the Lane-Emden solution itself, not from sampled rows: the
     * integrals of {@link StabilityAnalysis} (∫P dV, ∫Γ1 P dV, ∫(Gm/r) P dV, ∫(Gm/r)² ρ dV) by
     * Gauss–Legendre quadrature on every step of the solver's dense output
     * ({@link LaneEmdenCurve#integrate}), with Γ1 from the equation of state at each node. The
     * result does not depend on how many rows a table holds, which matters near n = 5, where the
     * mass sits in a core a tiny fraction of R across and evenly spaced rows miss it.
     *
     * @param mass M [g], positive
     * @param radius R [cm], positive
     * @return the estimate
     */
    public StabilityResult stability(double mass, double radius) {
        double n = polytrope.n();
        double omega = polytrope.omega();
        double alpha = radius / polytrope.xi1();
        double rhoC = centralDensity(mass, radius);
        double pC = centralPressure(mass, radius);
        // Gm/r = (GM/(α ω_n)) (−ξθ'), so with dV = 4πα³ξ²dξ every integral is 4πα³ × a
        // dimensionless one; the common factor cancels in both ratios below.
        double potentialScale = GRAVITATION * mass / (alpha * omega);
        double[] integrals = polytrope.curve().integrate(
                (x, th, dth) -> Math.pow(th, n + 1.0) * x * x,
                (x, th, dth) -> th > 0.0 ? gamma1(rhoC * Math.pow(th, n), pC * Math.pow(th, n + 1.0))
                        * Math.pow(th, n + 1.0) * x * x : 0.0,
                (x, th, dth) -> -x * dth * Math.pow(th, n + 1.0) * x * x,
                (x, th, dth) -> x * x * dth * dth * Math.pow(th, n) * x * x);
        double pressureVolume = pC * integrals[0];
        double meanGamma1 = integrals[1] / integrals[0];
        double threshold = (4.0 / 9.0 * potentialScale * pC * integrals[2]
                + 1.0 / 3.0 * potentialScale * potentialScale * rhoC * integrals[3])
                / (SPEED_OF_LIGHT * SPEED_OF_LIGHT * pressureVolume);
        return StabilityAnalysis.assess(mass, radius, rhoC, meanGamma1,
                threshold / StabilityAnalysis.compactness(mass, radius));
    }

    private double gamma1(double rho, double pressure) {
        return stateAt(rho, pressure).Gamma1();
    }

    private EosState stateAt(double rho, double pressure) {
        if (outsideRange == null) {
            return inversion.atDensityPressure(rho, pressure);
        }
        try {
            return inversion.atDensityPressure(rho, pressure);
        } catch (BadInputException e) {
            return outsideRange.atDensityPressure(rho, pressure);
        }
    }

    private double temperatureAt(double rho, double pressure) {
        if (outsideRange == null) {
            return inversion.temperature(rho, pressure);
        }
        try {
            return inversion.temperature(rho, pressure);
        } catch (BadInputException e) {
            return outsideRange.temperature(rho, pressure);
        }
    }

    /**
     * The star at {@code points} radii evenly spaced from the centre to the surface, both included.
     *
     * @param mass M [g], positive
     * @param radius R [cm], positive
     * @param points number of rows, at least 3
     * @return the structure
     */
    public StarStructure build(double mass, double radius, int points) {
        double n = polytrope.n();
        double rhoC = centralDensity(mass, radius);
        double pC = centralPressure(mass, radius);
        EosState centre = stateAt(rhoC, pC);
        LaneEmdenProfile le = polytrope.sample(points);
        double[] xi = le.xi();
        double[] theta = le.theta();
        double[] massFraction = le.massFraction();
        double alpha = radius / polytrope.xi1();
        double[] r = new double[points];
        double[] m = new double[points];
        double[] rho = new double[points];
        double[] p = new double[points];
        double[] t = new double[points];
        for (int i = 0; i < points; i++) {
            r[i] = i == points - 1 ? radius : alpha * xi[i];
            // clamped into [m(previous row), M]: near the surface of a high-index polytrope the true
            // increase per row can fall below the interpolation error (~1e-13)
            m[i] = i == 0 ? 0.0 : i == points - 1 ? mass : Math.min(mass, Math.max(m[i - 1], mass * massFraction[i]));
            double th = i == points - 1 ? 0.0 : theta[i];
            rho[i] = rhoC * Math.pow(th, n);
            p[i] = pC * Math.pow(th, n + 1.0);
            if (p[i] > 0.0) {
                t[i] = i == 0 ? centre.T() : temperatureAt(rho[i], p[i]);
            }
        }
        double surfaceBeta;
        double surfaceOneMinusBeta;
        if (n < 3.0) {
            surfaceBeta = 1.0;
            surfaceOneMinusBeta = 0.0;
        } else if (n == 3.0) {
            // near the surface T and rho fall together (rho ~ T^3) and every EOS tends to the classical
            // mixture, whose beta along P = K rho^(4/3) is the same everywhere: the centre's classical beta
            EosState classicalCentre = outsideRange == null ? centre : outsideRange.atDensityPressure(rhoC, pC);
            surfaceBeta = classicalCentre.beta();
            surfaceOneMinusBeta = classicalCentre.oneMinusBeta();
        } else {
            surfaceBeta = 0.0;
            surfaceOneMinusBeta = 1.0;
        }
        StarProfile profile = StarProfile.of(inversion.eos(), r, m, rho, p, t, surfaceBeta, surfaceOneMinusBeta);
        // 3∫P dV = 12πα³P_c ∫θⁿ⁺¹ξ² dξ against −Ω = (3/(5−n)) GM²/R, by quadrature on the dense solution
        double pressureIntegral = polytrope.curve().integrate((x, th, dth) -> Math.pow(th, n + 1.0) * x * x);
        double threePdV = 12.0 * Math.PI * alpha * alpha * alpha * pC * pressureIntegral;
        double minusOmega = polytrope.bindingEnergyCoefficient() * GRAVITATION * mass * mass / radius;
        return new StarStructure(mass, radius, centre, profile, true, threePdV / minusOmega - 1.0, List.of(
                String.format(Locale.US, "Lane-Emden polytrope n = %s scaled to M and R: rho = rho_c theta^n,"
                        + " P = P_c theta^(n+1); xi1 = %.12g, omega_n = %.12g", n, polytrope.xi1(),
                        polytrope.omega()),
                outsideRange == null
                        ? "T at every point from the gas + radiation EOS at (rho, P) (root of aT^4/3 + (k rho/mu m_u) T = P)"
                        : "T at every point from the fermi EOS at (rho, P) (bracketed Newton in ln T); points outside"
                                + " its range (T < 1e4 K or rho < 1e-14 g/cm3, next to the surface) take the classical"
                                + " mixture, its limit there",
                "rows evenly spaced in r from the centre to the surface r = R",
                "surface row: rho = P = T = 0 (rho = rho_c for n = 0) and c_s = 0 exactly; beta, Gamma1, nabla_ad"
                        + " hold their limits as theta -> 0 (beta -> 1 for n < 3, constant for n = 3, 0 for n > 3)"));
    }
}
