package org.stellabar.observed;

import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.SOLAR_LUMINOSITY;
import static org.stellabar.physics.Constants.SOLAR_MASS;

import java.util.ArrayList;
import java.util.Locale;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.structure.StandardModelState;

/**
 * The estimate for one observed star (see the package documentation for the formulae):
 *
 * <ol>
 * <li>L, T_eff and R from any two of them (Stefan–Boltzmann). When all three are given they
 *     must agree within {@link #CONSISTENCY} in L (catalogues round their values; a larger
 *     disagreement is an impossible combination); the given R is then kept.</li>
 * <li>M from the catalogue; else M = gR²/G from log g; else the standard model's mass for L.</li>
 * <li>L_Edd and Γ_e = L/L_Edd; Γ_e ≥ 1 is a problem (no star in hydrostatic equilibrium).</li>
 * <li>The standard model of that M and μ scaled to R ({@link EddingtonStandardModel#model}):
 *     β, 1 − β, ρ_c, T_c, P_c, ⟨Γ1⟩ and the Newtonian and post-Newtonian margins.</li>
 * </ol>
 *
 * <p>Problems of a row are returned, never thrown. Immutable and thread-safe.
 */
public final class ObservedStarAnalysis {

    /** Largest relative disagreement in L allowed when L, T_eff and R are all given. */
    public static final double CONSISTENCY = 0.05;

    private final EddingtonStandardModel model;
    private final MassFromLuminosity massFromLuminosity;

    /** @param model the standard model */
    public ObservedStarAnalysis(EddingtonStandardModel model) {
        this.model = Objects.requireNonNull(model, "model");
        this.massFromLuminosity = new MassFromLuminosity(model);
    }

    /** @return the standard model this analysis uses */
    public EddingtonStandardModel model() {
        return model;
    }

    /**
     * @param star a catalogue row
     * @return the estimate at the catalogue's values, or the row's problems
     */
    public StarOutcome analyze(ObservedStar star) {
        List<StarProblem> problems = new ArrayList<>();
        Optional<ObservedEstimate> estimate = estimate(star.row(), value(star.luminosity()),
                value(star.temperature()), value(star.radius()), value(star.mass()), value(star.gravity()),
                star.composition(), problems);
        return new StarOutcome(star, estimate, problems, Optional.empty());
    }

    /**
     * The estimate at given values (each NaN when absent), collecting problems instead of throwing.
     * {@link UncertaintyPropagation} calls this with drawn values.
     */
    Optional<ObservedEstimate> estimate(int row, double luminosity, double temperature, double radius, double mass,
            double gravity, Composition composition, List<StarProblem> problems) {
        positiveIfGiven(row, "L", luminosity, "erg/s", problems);
        positiveIfGiven(row, "Teff", temperature, "K", problems);
        positiveIfGiven(row, "R", radius, "cm", problems);
        positiveIfGiven(row, "M", mass, "g", problems);
        positiveIfGiven(row, "g", gravity, "cm/s2", problems);
        if (!problems.isEmpty()) {
            return Optional.empty();
        }
        int given = (isGiven(luminosity) ? 1 : 0) + (isGiven(temperature) ? 1 : 0) + (isGiven(radius) ? 1 : 0);
        if (given < 2) {
            problems.add(new StarProblem(row, ProblemKind.missing_value,
                    "two of L, Teff and R are needed (Stefan-Boltzmann); the row gives " + given));
            return Optional.empty();
        }
        double l = luminosity;
        double t = temperature;
        double r = radius;
        if (!isGiven(r)) {
            r = StefanBoltzmann.radius(l, t);
        } else if (!isGiven(t)) {
            t = StefanBoltzmann.temperature(l, r);
        } else if (!isGiven(l)) {
            l = StefanBoltzmann.luminosity(r, t);
        } else {
            double implied = StefanBoltzmann.luminosity(r, t);
            if (Math.abs(implied / l - 1.0) > CONSISTENCY) {
                problems.add(new StarProblem(row, ProblemKind.impossible_combination, String.format(Locale.US,
                        "L = %.6g Lsun but 4 pi R^2 sigma Teff^4 = %.6g Lsun: they must agree within %.0f %%",
                        l / SOLAR_LUMINOSITY, implied / SOLAR_LUMINOSITY, 100 * CONSISTENCY)));
                return Optional.empty();
            }
        }
        if (!(Double.isFinite(r) && r > 0.0 && Double.isFinite(t) && Double.isFinite(l))) {
            problems.add(new StarProblem(row, ProblemKind.out_of_range,
                    "L, Teff and R overflow the numbers this tool can represent"));
            return Optional.empty();
        }
        double mFromL;
        try {
            mFromL = massFromLuminosity.mass(l, composition);
        } catch (BadInputException e) {
            problems.add(new StarProblem(row, ProblemKind.out_of_range, e.getMessage()));
            return Optional.empty();
        }
        double m;
        MassSource source;
        if (isGiven(mass)) {
            m = mass;
            source = MassSource.catalogue;
        } else if (isGiven(gravity)) {
            m = gravity * r * r / GRAVITATION;
            source = MassSource.log_g;
        } else {
            m = mFromL;
            source = MassSource.standard_model_L;
        }
        double lEdd = EddingtonStandardModel.eddingtonLuminosity(m, composition);
        double gammaE = l / lEdd;
        if (!(gammaE < 1.0)) {
            problems.add(new StarProblem(row, ProblemKind.above_eddington, String.format(Locale.US,
                    "L = %.6g Lsun is at or above L_Edd = %.6g Lsun for M = %.6g Msun (Gamma_e = %.6g); "
                            + "it must be below", l / SOLAR_LUMINOSITY, lEdd / SOLAR_LUMINOSITY, m / SOLAR_MASS, gammaE)));
            return Optional.empty();
        }
        StandardModelState standard;
        try {
            standard = model.model(m, r, composition);
        } catch (BadInputException e) {
            problems.add(new StarProblem(row, ProblemKind.out_of_range, e.getMessage()));
            return Optional.empty();
        }
        return Optional.of(new ObservedEstimate(l, t, r, m, source, mFromL, lEdd, gammaE, standard));
    }

    private static void positiveIfGiven(int row, String what, double value, String unit, List<StarProblem> problems) {
        if (isGiven(value) && !(value > 0.0 && Double.isFinite(value))) {
            problems.add(new StarProblem(row, ProblemKind.impossible_combination,
                    what + " = " + value + " " + unit + ": it must be positive and finite"));
        }
    }

    private static boolean isGiven(double value) {
        return !Double.isNaN(value);
    }

    private static double value(Optional<Measurement> m) {
        return m.map(Measurement::value).orElse(Double.NaN);
    }
}
