package org.stellabar.observed;

import static org.stellabar.physics.Constants.SOLAR_MASS;

import java.util.Objects;
import org.stellabar.eos.Composition;
import org.stellabar.numerics.BracketedNewton;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.BetaSolution;
import org.stellabar.structure.EddingtonStandardModel;

/**
 * The mass of the standard model that shines with a given luminosity: the root of
 * L_model(M) = (1 − β(M)) L_Edd(M) = L, with β from Eddington's quartic and
 * L_Edd = 4πGMc/κ_es (both from {@link EddingtonStandardModel}). A model-dependent estimate: it
 * holds only under the standard model's assumptions (n = 3, constant β, electron scattering).
 *
 * <p>L_model rises monotonically with M (L_model ∝ M³ at low mass, ∝ M at high mass), so the
 * root is unique. We solve ln L_model(M) − ln L = 0 in x = ln M by Newton kept inside the bracket
 * [{@link #LOWEST_MASS}, {@link #HIGHEST_MASS}] ({@link BracketedNewton}, bounded count). The
 * derivative is exact: with x₁ = 1 − β = Aβ⁴, A ∝ M², d ln x₁/d ln M = 2β/(β + 4(1 − β)), so
 * d ln L_model/d ln M = 1 + 2β/(β + 4(1 − β)).
 */
public final class MassFromLuminosity {

    /** Lower end of the bracket [g]: the standard model's range starts at 10⁻² M☉. */
    public static final double LOWEST_MASS = 1e-2 * SOLAR_MASS;

    /** Upper end of the bracket [g]: 10⁸ M☉. */
    public static final double HIGHEST_MASS = 1e8 * SOLAR_MASS;

    /** Convergence of the Newton steps in ln M, relative to max(1, |ln M|). */
    static final double TOLERANCE = 1e-15;

    private final EddingtonStandardModel model;

    /**
     * The luminosities at the ends of the bracket for the composition asked last: a catalogue
     * star's thousands of Monte Carlo draws share one composition, and these two quartics were a
     * fifth of each solve. Replaced whole, so threads sharing this object see a consistent pair.
     */
    private volatile Range lastRange;

    /** The bracket's luminosities for one composition. */
    private record Range(Composition composition, double lowest, double highest) {
    }

    private Range range(Composition composition) {
        Range r = lastRange;
        // the same object, as a star's draws pass it, is the common case: a record's equals
        // goes through a bootstrap method on its first call
        if (r == null || r.composition() != composition && !r.composition().equals(composition)) {
            r = new Range(composition, luminosity(LOWEST_MASS, composition), luminosity(HIGHEST_MASS, composition));
            lastRange = r;
        }
        return r;
    }

    /** @param model the standard model */
    public MassFromLuminosity(EddingtonStandardModel model) {
        this.model = Objects.requireNonNull(model, "model");
    }

    /**
     * @param mass M [g]
     * @param composition μ for β, X for κ_es
     * @return the standard model's luminosity (1 − β) L_Edd [erg/s]
     */
    public double luminosity(double mass, Composition composition) {
        return model.beta(mass, composition.mu()).oneMinusBeta()
                * EddingtonStandardModel.eddingtonLuminosity(mass, composition);
    }

    /**
     * @param luminosity L [erg/s], positive and finite
     * @param composition μ for β, X for κ_es
     * @return M [g] with L_model(M) = L
     * @throws BadInputException if L is outside the luminosities of 10⁻² to 10⁸ M☉ models
     */
    public double mass(double luminosity, Composition composition) {
        if (!(luminosity > 0.0 && Double.isFinite(luminosity))) {
            throw BadInputException.mustBePositive("luminosity", luminosity, "erg/s");
        }
        Range range = range(composition);
        double lowest = range.lowest();
        double highest = range.highest();
        if (!(luminosity >= lowest && luminosity <= highest)) {
            throw BadInputException.notAllowed("luminosity for the standard-model mass", luminosity, "erg/s",
                    "between " + lowest + " and " + highest + " erg/s, the standard models of 1e-2 to 1e8 Msun");
        }
        double logL = Math.log(luminosity);
        BracketedNewton.Function f = new BracketedNewton.Function() {
            // the solver asks for the derivative where it has just asked for the value: one
            // quartic serves both (this solve runs thousands of times per catalogue star)
            private double lastLnMass = Double.NaN;
            private BetaSolution last;

            private BetaSolution beta(double lnMass) {
                if (Double.doubleToLongBits(lnMass) != Double.doubleToLongBits(lastLnMass)) {
                    last = model.beta(Math.exp(lnMass), composition.mu());
                    lastLnMass = lnMass;
                }
                return last;
            }

            @Override
            public double value(double lnMass) {
                double mass = Math.exp(lnMass);
                return Math.log(beta(lnMass).oneMinusBeta() * EddingtonStandardModel.eddingtonLuminosity(mass,
                        composition)) - logL;
            }

            @Override
            public double derivative(double lnMass) {
                BetaSolution b = beta(lnMass);
                return 1.0 + 2.0 * b.beta() / (b.beta() + 4.0 * b.oneMinusBeta());
            }
        };
        return Math.exp(BracketedNewton.solve(() -> "standard-model mass from L = " + luminosity + " erg/s", f,
                Math.log(LOWEST_MASS), Math.log(HIGHEST_MASS), TOLERANCE));
    }
}
