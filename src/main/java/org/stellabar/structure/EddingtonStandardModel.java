package org.stellabar.structure;

import static org.stellabar.physics.Constants.ATOMIC_MASS_UNIT;
import static org.stellabar.physics.Constants.BOLTZMANN;
import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.RADIATION_DENSITY;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SPEED_OF_LIGHT;

import java.util.List;
import java.util.Objects;
import org.stellabar.eos.Composition;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.ConvergenceException;

/**
 * Eddington's standard model (Eddington 1926, <i>The Internal Constitution of the Stars</i>,
 * ch. VI; Chandrasekhar 1939, ch. VI; Kippenhahn, Weigert &amp; Weiss 2012, ch. 19): a star whose
 * gas-pressure fraction β = P_gas/P is the same everywhere. With an ideal gas and black-body
 * radiation, P = (1/β)(k/μm_u)ρT and P = aT⁴/(3(1 − β)) give P = Kρ^(4/3) with
 * K = [(3/a)(k/μm_u)⁴(1 − β)/β⁴]^(1/3), an n = 3 polytrope; its mass M = 4πω₃(K/πG)^(3/2) then
 * fixes β through Eddington's quartic
 *
 * <pre>
 *   1 − β = C μ⁴ β⁴ (M/M☉)²,   C = π a G³ M☉² m_u⁴ / (48 ω₃² k⁴) ≈ 0.00299,
 * </pre>
 *
 * with C computed here from the constants and the solver's own ω₃.
 *
 * <p><b>The quartic without cancellation.</b> With A = Cμ⁴(M/M☉)², for A ≤ 1 we solve
 * x = A(1 − x)⁴ for x = 1 − β (small at low mass, so it is never formed as 1 − β), and for A &gt; 1
 * we solve Aβ⁴ + β − 1 = 0 for β (small at high mass) and take 1 − β = Aβ⁴. Both are Newton
 * iterations on a monotone convex or concave function started on the side from which they
 * converge monotonically, stopped when a step changes the unknown by less than 2⁻⁵⁰ of itself.
 *
 * <p><b>Luminosity.</b> In radiative equilibrium dP_rad/dP = κL(r)/(4πcGm(r)); a constant 1 − β
 * therefore means κη constant, η = (L(r)/m(r))/(L/M). Taking electron scattering
 * κ_es = 0.2(1 + X) cm²/g and η = 1 gives L = (1 − β) L_Edd with L_Edd = 4πGMc/κ_es.
 *
 * <p>Immutable and thread-safe.
 */
public final class EddingtonStandardModel {

    /** Assumptions of the model, one line each, for table metadata. */
    public static final List<String> ASSUMPTIONS = List.of(
            "Eddington standard model: n = 3 polytrope with the same beta = P_gas/P everywhere",
            "fully ionized ideal gas + black-body radiation, uniform composition (constant mu)",
            "L/L_Edd = 1 - beta assumes radiative equilibrium throughout with kappa*eta constant: "
                    + "electron-scattering opacity kappa_es = 0.2(1+X) cm2/g and L(r)/m(r) = L/M",
            "stability: Gamma1 is uniform, so <Gamma1> = Gamma1(beta); relativistic criterion "
                    + "<Gamma1> - 4/3 > K3 2GM/(Rc^2) (Chandrasekhar 1964)");

    /** Bound on Newton iterations of the quartic. */
    public static final int MAX_ITERATIONS = 100;

    private final LaneEmdenSolution polytrope;
    private final double quarticCoefficient;
    private final double relativisticCoefficient;

    /**
     * @param polytrope the n = 3 Lane-Emden solution
     * @throws BadInputException if its index is not 3
     */
    public EddingtonStandardModel(LaneEmdenSolution polytrope) {
        this.polytrope = Objects.requireNonNull(polytrope, "polytrope");
        if (polytrope.n() != 3.0) {
            throw new BadInputException("the standard model needs the n = 3 polytrope, not n = " + polytrope.n());
        }
        double omega = polytrope.omega();
        double mu4 = Math.pow(ATOMIC_MASS_UNIT / BOLTZMANN, 4);
        this.quarticCoefficient = Math.PI * RADIATION_DENSITY * GRAVITATION * GRAVITATION * GRAVITATION
                * SOLAR_MASS * SOLAR_MASS * mu4 / (48.0 * omega * omega);
        this.relativisticCoefficient = polytrope.relativisticCoefficient();
    }

    /** @return the standard model built on a fresh n = 3 solution at the default tolerance */
    public static EddingtonStandardModel create() {
        return new EddingtonStandardModel(new LaneEmdenSolver().solve(3.0));
    }

    /** @return the n = 3 Lane-Emden solution */
    public LaneEmdenSolution polytrope() {
        return polytrope;
    }

    /** @return C of 1 − β = Cμ⁴β⁴(M/M☉)² */
    public double quarticCoefficient() {
        return quarticCoefficient;
    }

    /** @return K₃ of the post-Newtonian stability criterion */
    public double relativisticCoefficient() {
        return relativisticCoefficient;
    }

    /**
     * β and 1 − β of a standard model of mass M.
     *
     * @param mass M [g], positive and finite
     * @param mu mean molecular weight, positive and finite
     * @return β and 1 − β, each to about 10⁻¹⁵ relative
     * @throws BadInputException if mass or μ is not positive and finite
     */
    public BetaSolution beta(double mass, double mu) {
        if (!(mass > 0.0 && Double.isFinite(mass))) {
            throw new BadInputException("mass " + mass + " g must be positive and finite");
        }
        if (!(mu > 0.0 && Double.isFinite(mu))) {
            throw new BadInputException("mean molecular weight mu = " + mu + " must be positive and finite");
        }
        double m = mass / SOLAR_MASS;
        double mu2 = mu * mu;
        double a = quarticCoefficient * mu2 * mu2 * m * m;
        if (!Double.isFinite(a)) {
            throw new BadInputException("mass " + mass + " g is too large for the standard-model quartic");
        }
        return a <= 1.0 ? smallRadiationFraction(a) : smallGasFraction(a);
    }

    /** Solves x = A(1 − x)⁴ for x = 1 − β, A ≤ 1, by Newton from x = 0 (monotone from below). */
    private static BetaSolution smallRadiationFraction(double a) {
        double x = 0.0;
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            double b = 1.0 - x;
            double b3 = b * b * b;
            double g = x - a * b3 * b;
            double dg = 1.0 + 4.0 * a * b3;
            double step = g / dg;
            x -= step;
            if (Math.abs(step) <= 0x1p-50 * x) {
                return new BetaSolution(1.0 - x, x);
            }
        }
        throw new ConvergenceException("standard-model quartic (A = " + a + "): no convergence for 1 - beta after "
                + MAX_ITERATIONS + " Newton steps");
    }

    /** Solves Aβ⁴ + β − 1 = 0 for β, A &gt; 1, by Newton from β = A^(−1/4) (monotone from above). */
    private static BetaSolution smallGasFraction(double a) {
        double beta = Math.min(1.0, Math.pow(a, -0.25));
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            double b3 = beta * beta * beta;
            double h = a * b3 * beta + beta - 1.0;
            double dh = 4.0 * a * b3 + 1.0;
            double step = h / dh;
            beta -= step;
            if (Math.abs(step) <= 0x1p-50 * beta) {
                double b2 = beta * beta;
                return new BetaSolution(beta, a * b2 * b2);
            }
        }
        throw new ConvergenceException("standard-model quartic (A = " + a + "): no convergence for beta after "
                + MAX_ITERATIONS + " Newton steps");
    }

    /**
     * The standard model of mass M and radius R.
     *
     * @param mass M [g], positive and finite
     * @param radius R [cm], positive and finite
     * @param composition the mixture
     * @return the model's central values, luminosity and stability
     * @throws BadInputException if mass or radius is not positive and finite
     */
    public StandardModelState model(double mass, double radius, Composition composition) {
        if (!(radius > 0.0 && Double.isFinite(radius))) {
            throw new BadInputException("radius " + radius + " cm must be positive and finite");
        }
        BetaSolution b = beta(mass, composition.mu());
        double rhoC = centralDensity(mass, radius);
        double pC = centralPressure(mass, radius);
        // P_gas = β P_c = ρ_c k T_c/(μ m_u); β is accurate in both limits, so this form is too
        double tC = b.beta() * pC * composition.mu() * ATOMIC_MASS_UNIT / (rhoC * BOLTZMANN);
        double lEdd = eddingtonLuminosity(mass, composition);
        double gamma1 = gamma1(b);
        StabilityResult stability = StabilityAnalysis.assess(mass, radius, rhoC, gamma1, gamma1Excess(b),
                relativisticCoefficient);
        return new StandardModelState(mass, radius, composition, b.beta(), b.oneMinusBeta(), rhoC, pC, tC, lEdd,
                b.oneMinusBeta() * lEdd, gamma1, stability);
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @return ρ_c = (ρ_c/ρ̄)·3M/(4πR³) [g/cm3]
     */
    public double centralDensity(double mass, double radius) {
        return polytrope.centralToMeanDensity() * 3.0 * mass / (4.0 * Math.PI * radius * radius * radius);
    }

    /**
     * @param mass M [g]
     * @param radius R [cm]
     * @return P_c = W₃ GM²/R⁴ [dyn/cm2]
     */
    public double centralPressure(double mass, double radius) {
        double r2 = radius * radius;
        return polytrope.centralPressureCoefficient() * GRAVITATION * mass * mass / (r2 * r2);
    }

    /**
     * Γ1 of the gas + radiation mixture at this β (uniform in the standard model).
     *
     * @param b β and 1 − β
     * @return Γ1
     */
    public static double gamma1(BetaSolution b) {
        return GasRadiationEos.gamma1(b.beta(), b.oneMinusBeta(),
                GasRadiationEos.gamma3MinusOne(b.beta(), b.oneMinusBeta()));
    }

    /**
     * Radius at the onset of the relativistic instability, R_crit = K₃·2GM/(c²(Γ1 − 4/3)), with
     * Γ1 from the standard-model β of this mass (independent of the radius).
     *
     * @param mass M [g]
     * @param mu mean molecular weight
     * @return R_crit [cm]
     */
    public double criticalRadius(double mass, double mu) {
        BetaSolution b = beta(mass, mu);
        double excess = gamma1Excess(b);
        return 2.0 * GRAVITATION * mass * relativisticCoefficient / (SPEED_OF_LIGHT * SPEED_OF_LIGHT * excess);
    }

    /**
     * Γ1 − 4/3 of the mixture without cancellation, for β → 0 where Γ1 → 4/3 + β/6:
     * from Γ1 = (32 − 24β − 3β²)/(24 − 21β) (Chandrasekhar 1939, ch. II, for a monatomic gas),
     * Γ1 − 4/3 = β(4 − 3β)/(3(8 − 7β)), written with 4 − 3β = β + 4(1 − β) and
     * 8 − 7β = β + 8(1 − β).
     *
     * @param b β and 1 − β
     * @return Γ1 − 4/3
     */
    public static double gamma1Excess(BetaSolution b) {
        double beta = b.beta();
        double omb = b.oneMinusBeta();
        return beta * (beta + 4.0 * omb) / (3.0 * (beta + 8.0 * omb));
    }

    /**
     * L_Edd = 4πGMc/κ_es with the electron-scattering opacity κ_es = 0.2(1 + X) cm²/g.
     *
     * @param mass M [g]
     * @param composition gives X
     * @return L_Edd [erg/s]
     */
    public static double eddingtonLuminosity(double mass, Composition composition) {
        return 4.0 * Math.PI * GRAVITATION * mass * SPEED_OF_LIGHT / electronScatteringOpacity(composition);
    }

    /**
     * @param composition gives X
     * @return κ_es = 0.2(1 + X) [cm2/g] (Thomson scattering on free electrons, KWW 2012 §17.2)
     */
    public static double electronScatteringOpacity(Composition composition) {
        return 0.2 * (1.0 + composition.X());
    }
}
