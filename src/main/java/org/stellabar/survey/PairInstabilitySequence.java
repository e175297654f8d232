package org.stellabar.survey;

import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.OptionalDouble;
import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosQuantities;
import org.stellabar.eos.Electrons;
import org.stellabar.eos.fermi.FermiEosSummary;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.ConvergenceException;
import org.stellabar.structure.DirectIsentropicStarFinder;
import org.stellabar.structure.IsentropicStar;
import org.stellabar.structure.IsentropicStarBuilder;
import org.stellabar.structure.StabilityResult;
import org.stellabar.structure.StarSchema;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;

/**
 * The pair instability of a stellar core: for each core mass, a sequence of isentropic models on
 * the Fermi–Dirac equation of state (electrons of any degeneracy with e± pairs) over central
 * temperature, each with its pressure-weighted ⟨Γ1⟩ − 4/3 and its post-Newtonian margin
 * ⟨Γ1⟩ − 4/3 − K·2GM/(Rc²) (Chandrasekhar 1964, ApJ 140, 417), and the central temperature where
 * the core first turns unstable: the first sign change of the post-Newtonian margin along the
 * sequence, refined by Brent's bracketed method (Hipparchus) in ln T_c to a relative
 * {@value #ONSET_TOLERANCE}, at most {@value #MAX_ONSET_MODELS} models. The idea of following a
 * core along its adiabats to where pair creation pulls ⟨Γ1⟩ below the critical value is that of
 * Fowler &amp; Hoyle (1964, ApJS 9, 201) and Rakavy &amp; Shaviv (1967, ApJ 148, 803).
 *
 * <p>Models along one sequence start each shooting from the previous centre scaled by ρ ∝ T³
 * (the classical homology), so a sequence costs a few integrations per model. Masses are
 * independent and computed in parallel; the table is the same for any number of threads.
 */
public final class PairInstabilitySequence {

    /** Relative accuracy of the onset temperature. */
    public static final double ONSET_TOLERANCE = 1e-4;
    /** Bound on the models of one onset search. */
    public static final int MAX_ONSET_MODELS = 40;
    /** Most temperatures along one sequence. */
    public static final int MAX_TEMPERATURES = 200;
    /** Most core masses in one run. */
    public static final int MAX_MASSES = 20;

    /** Onset temperature, per core mass. */
    public static final Quantity T_ONSET = new Quantity("T_onset", "K",
            "central temperature where the core first turns unstable (post-Newtonian margin = 0); 0 if it does not"
                    + " within the sequence");

    /**
     * One model of a sequence.
     *
     * @param mass M as asked [g]
     * @param centralTemperature T_c [K]
     * @param centralDensity ρ_c [g/cm3]
     * @param entropyPerBaryon s m_u/k_B
     * @param radius R [cm]
     * @param stability ⟨Γ1⟩ and the margins
     */
    public record Model(double mass, double centralTemperature, double centralDensity, double entropyPerBaryon,
            double radius, StabilityResult stability) {
    }

    /**
     * Where one core turns unstable.
     *
     * @param mass M [g]
     * @param temperature the onset T_c [K], empty if the post-Newtonian margin keeps one sign along the sequence
     * @param stableBelow true if the sequence starts stable
     */
    public record Onset(double mass, OptionalDouble temperature, boolean stableBelow) {
    }

    /**
     * @param models every model, masses in the order asked, temperatures increasing
     * @param onsets one per mass
     * @param table the models as a table
     * @param onsetTable the onsets as a table
     */
    public record Result(List<Model> models, List<Onset> onsets, Table table, Table onsetTable) {
        /**
         * Canonical constructor: copies the lists in.
         *
         * @param models every model, core by core
         * @param onsets one onset per core
         * @param table the models as a table
         * @param onsetTable the onsets as a table
         */
        public Result {
            models = List.copyOf(models);
            onsets = List.copyOf(onsets);
        }
    }

    private final Composition composition;
    private final DirectIsentropicStarFinder finder;

    /** @param composition the core's mixture */
    public PairInstabilitySequence(Composition composition) {
        this.composition = Objects.requireNonNull(composition, "composition");
        this.finder = new DirectIsentropicStarFinder(Electrons.fermi.inversions(composition));
    }

    /**
     * @param masses core masses [g], positive, at most {@link #MAX_MASSES}
     * @param tMin lowest central temperature [K]
     * @param tMax highest central temperature [K]
     * @param temperatures log-spaced central temperatures, 2 to {@link #MAX_TEMPERATURES}
     * @return the sequences and onsets
     */
    public Result run(List<Double> masses, double tMin, double tMax, int temperatures) {
        if (masses.isEmpty() || masses.size() > MAX_MASSES) {
            throw new BadInputException("core masses: " + masses.size() + " given; give 1 to " + MAX_MASSES);
        }
        for (double m : masses) {
            if (!(m > 0.0) || !Double.isFinite(m)) {
                throw BadInputException.mustBePositive("core mass", m, "g");
            }
        }
        if (!(tMin > 0.0 && tMax > tMin && Double.isFinite(tMax))) {
            throw new BadInputException(String.format(Locale.US, "central temperature range %.6g:%.6g K is not"
                    + " allowed; both ends positive, the low end below the high end", tMin, tMax));
        }
        if (temperatures < 2 || temperatures > MAX_TEMPERATURES) {
            throw new BadInputException("temperatures = " + temperatures + " is not allowed; give 2 to "
                    + MAX_TEMPERATURES);
        }
        double[] t = EosGrid.logSpaced(tMin, tMax, temperatures);
        List<List<Model>> perMass = masses.parallelStream().map(m -> sequence(m, t)).toList();
        List<Model> models = new ArrayList<>();
        List<Onset> onsets = new ArrayList<>();
        for (int i = 0; i < masses.size(); i++) {
            models.addAll(perMass.get(i));
        }
        onsets.addAll(java.util.stream.IntStream.range(0, masses.size()).parallel()
                .mapToObj(i -> onset(masses.get(i), perMass.get(i))).toList());
        return new Result(models, onsets, table(models, tMin, tMax, temperatures), onsetTable(onsets));
    }

    private List<Model> sequence(double mass, double[] temperatures) {
        List<Model> out = new ArrayList<>();
        double guess = Double.NaN;
        double previousT = Double.NaN;
        for (double t : temperatures) {
            IsentropicStar star = Double.isNaN(guess) ? finder.withCentralTemperature(mass, t)
                    : finder.withCentralTemperature(mass, t, guess * Math.pow(t / previousT, 3.0));
            out.add(model(mass, star));
            guess = star.centre().rho();
            previousT = t;
        }
        return out;
    }

    /** The model, labelled with the mass asked for (the star matches it to {@link DirectIsentropicStarFinder#MATCH_TOLERANCE}). */
    private static Model model(double mass, IsentropicStar star) {
        return new Model(mass, star.centre().T(), star.centre().rho(), star.centre().sPerBaryon(),
                star.radius(), IsentropicStarBuilder.stabilityOf(star));
    }

    private Onset onset(double mass, List<Model> sequence) {
        boolean stableBelow = sequence.get(0).stability().relativisticMargin() > 0.0;
        for (int i = 1; i < sequence.size(); i++) {
            Model lo = sequence.get(i - 1);
            Model hi = sequence.get(i);
            if (lo.stability().relativisticMargin() > 0.0 && hi.stability().relativisticMargin() <= 0.0) {
                return new Onset(mass, OptionalDouble.of(root(mass, lo, hi)), stableBelow);
            }
        }
        return new Onset(mass, OptionalDouble.empty(), stableBelow);
    }

    /** The T_c in (lo, hi) where the post-Newtonian margin vanishes, by Brent in ln T_c. */
    private double root(double mass, Model lo, Model hi) {
        double rhoLo = lo.centralDensity();
        double tLo = lo.centralTemperature();
        UnivariateFunction margin = lnT -> {
            double t = Math.exp(lnT);
            IsentropicStar star = finder.withCentralTemperature(mass, t, rhoLo * Math.pow(t / tLo, 3.0));
            return IsentropicStarBuilder.stabilityOf(star).relativisticMargin();
        };
        BracketingNthOrderBrentSolver brent = new BracketingNthOrderBrentSolver(1e-12, ONSET_TOLERANCE, 0.0, 5);
        try {
            return Math.exp(brent.solve(MAX_ONSET_MODELS, margin, Math.log(tLo), Math.log(hi.centralTemperature()),
                    AllowedSolution.ANY_SIDE));
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            throw new ConvergenceException(String.format(Locale.US,
                    "pair-instability onset of a %.6g Msun core: no root in %d models (%s)", mass / SOLAR_MASS,
                    MAX_ONSET_MODELS, e.getMessage()));
        }
    }

    private Table table(List<Model> models, double tMin, double tMax, int temperatures) {
        int n = models.size();
        double[][] c = new double[9][n];
        for (int i = 0; i < n; i++) {
            Model m = models.get(i);
            c[0][i] = m.mass() / SOLAR_MASS;
            c[1][i] = m.centralTemperature();
            c[2][i] = m.centralDensity();
            c[3][i] = m.entropyPerBaryon();
            c[4][i] = m.radius() / SOLAR_RADIUS;
            c[5][i] = m.stability().meanGamma1();
            c[6][i] = m.stability().newtonianMargin();
            c[7][i] = m.stability().relativisticThreshold();
            c[8][i] = m.stability().relativisticMargin();
        }
        Inputs inputs = Inputs.builder()
                .text("composition", String.format(Locale.US, "X = %s, Y = %s, Z = %s, mu = %.10g%s", composition.X(),
                        composition.Y(), composition.Z(), composition.mu(), composition.metalMassNumber() > 0
                                ? ", metal ions of A = " + composition.metalMassNumber() : ""))
                .number("T_c_min", tMin, "K", "lowest central temperature")
                .number("T_c_max", tMax, "K", "highest central temperature")
                .integer("temperatures", temperatures, "log-spaced central temperatures per core")
                .text("electrons", Electrons.fermi.name()).build();
        Metadata metadata = Metadata.of("pair instability of isentropic cores over central temperature", inputs,
                List.of("isentropic cores on one adiabat each of the fermi EOS (classical ions, electrons of any"
                                + " degeneracy and relativity with e+e- pairs, black-body radiation)",
                        "energy convention: " + FermiEosSummary.ENERGY_CONVENTION,
                        "stability: pressure-weighted <Gamma1> against 4/3 (Newtonian) and 4/3 + K 2GM/(Rc^2)"
                                + " (post-Newtonian, Chandrasekhar 1964)",
                        "rows: core masses in the order given, central temperatures increasing"));
        return new Table.Builder("pair_instability", metadata)
                .number(StarSchema.M, c[0])
                .number(StarSchema.T_C, c[1])
                .number(StarSchema.RHO_C, c[2])
                .number(StarSchema.S_PER_BARYON_C.withDescription("entropy per baryon in units of k_B"), c[3])
                .number(StarSchema.R, c[4])
                .number(StarSchema.GAMMA1_MEAN, c[5])
                .number(StarSchema.NEWTONIAN_MARGIN, c[6])
                .number(StarSchema.GR_THRESHOLD, c[7])
                .number(StarSchema.GR_MARGIN, c[8])
                .build();
    }

    private Table onsetTable(List<Onset> onsets) {
        double[] m = onsets.stream().mapToDouble(o -> o.mass() / SOLAR_MASS).toArray();
        double[] t = onsets.stream().mapToDouble(o -> o.temperature().orElse(0.0)).toArray();
        List<String> verdict = onsets.stream().map(o -> o.temperature().isPresent() ? "turns unstable"
                : o.stableBelow() ? "stable throughout" : "unstable throughout").toList();
        Inputs inputs = Inputs.builder().number(EosQuantities.MU, composition.mu()).build();
        return new Table.Builder("pair_instability_onset", Metadata.of("central temperature where each core first"
                + " turns unstable (post-Newtonian margin crosses 0)", inputs, List.of(String.format(Locale.US,
                        "Brent's method in ln T_c between the sequence's neighbours, relative %.0e, at most %d models",
                        ONSET_TOLERANCE, MAX_ONSET_MODELS))))
                .number(StarSchema.M, m)
                .number(T_ONSET, t)
                .text("sequence", "stable throughout, turns unstable, or unstable throughout", verdict)
                .build();
    }
}
