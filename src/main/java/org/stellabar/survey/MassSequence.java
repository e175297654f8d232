package org.stellabar.survey;

import static org.stellabar.physics.Constants.ATOMIC_MASS_UNIT;
import static org.stellabar.physics.Constants.BOLTZMANN;
import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.SOLAR_LUMINOSITY;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;
import static org.stellabar.physics.Constants.SPEED_OF_LIGHT;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.stream.IntStream;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosQuantities;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.eos.ValidityCheck;
import org.stellabar.numerics.LargeArrays;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.StarRequestRules;
import org.stellabar.structure.BetaSolution;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;

/**
 * Eddington standard models over a range of masses, log-spaced: β, 1 − β, L/L_Edd, Γ1 − 4/3 and
 * the onset of the relativistic instability for each (see {@link EddingtonStandardModel}).
 *
 * <p>Row i has mass M_low (M_high/M_low)^(i/(steps−1)), with both ends exact. Rows depend on
 * their index alone, so any sub-range of indices can be computed on its own ({@link #rows(int,
 * int)}, {@link #table(int, int)}) — one shard of a job array — and the shards concatenate to the
 * whole table. Within a call rows are computed in parallel on the common fork-join pool and
 * returned in mass order; the output is the same on every run.
 *
 * <p>Immutable and thread-safe.
 */
public final class MassSequence {

    // The sequence table's columns besides beta and 1 - beta (declared in EosQuantities).
    /** {@code M}: mass [Msun]. */
    public static final Quantity M = new Quantity("M", "Msun", "mass");
    /** {@code L_over_L_Edd}: luminosity over the Eddington luminosity (= 1 - beta in the model), dimensionless. */
    public static final Quantity L_OVER_L_EDD = Quantity.dimensionless("L_over_L_Edd",
            "luminosity over the Eddington luminosity (= 1 - beta in the model)");
    /** {@code L_Edd}: Eddington luminosity 4 pi G M c/kappa_es [Lsun]. */
    public static final Quantity L_EDD = new Quantity("L_Edd", "Lsun", "Eddington luminosity 4 pi G M c/kappa_es");
    /** {@code L}: luminosity (1 - beta) L_Edd [Lsun]. */
    public static final Quantity L = new Quantity("L", "Lsun", "luminosity (1 - beta) L_Edd");
    /** {@code Gamma1}: first adiabatic exponent (uniform in the model), dimensionless. */
    public static final Quantity GAMMA1 =
            Quantity.dimensionless("Gamma1", "first adiabatic exponent (uniform in the model)");
    /** {@code Gamma1_minus_4_3}: Newtonian stability margin Gamma1 - 4/3, dimensionless. */
    public static final Quantity GAMMA1_MINUS_4_3 =
            Quantity.dimensionless("Gamma1_minus_4_3", "Newtonian stability margin Gamma1 - 4/3");
    /** {@code R_crit}: radius at the onset of the relativistic instability [Rsun]. */
    public static final Quantity R_CRIT =
            new Quantity("R_crit", "Rsun", "radius at the onset of the relativistic instability");
    /** {@code R_crit_over_GM_c2}: R_crit in units of GM/c^2, dimensionless. */
    public static final Quantity R_CRIT_OVER_GM_C2 =
            Quantity.dimensionless("R_crit_over_GM_c2", "R_crit in units of GM/c^2");
    /** {@code rho_c_crit}: central density at the onset [g/cm3]. */
    public static final Quantity RHO_C_CRIT = new Quantity("rho_c_crit", "g/cm3", "central density at the onset");
    /** {@code T_c_crit}: central temperature at the onset [K]. */
    public static final Quantity T_C_CRIT = new Quantity("T_c_crit", "K", "central temperature at the onset");
    /**
     * The validity warnings of the equation of state at the onset centre (ρ_c_crit, T_c_crit),
     * the same bits as a profile's warning_mask: at low masses the onset lies where electrons are
     * degenerate and relativistic and pairs abound, far outside the model, and the row says so.
     */
    public static final Quantity CRITICAL_POINT_WARNINGS = Quantity.dimensionless("critical_point_warnings",
            "validity warnings at the onset centre (rho_c_crit, T_c_crit) as bits: " + ValidityCheck.maskLegend());

    /** Lowest mass a sequence may reach [Msun]: that of a star model. */
    public static final double MIN_MASS_MSUN = StarRequestRules.MIN_MASS_MSUN;
    /** Highest mass a sequence may reach [Msun]: that of a star model. */
    public static final double MAX_MASS_MSUN = StarRequestRules.MAX_MASS_MSUN;

    /** Largest number of masses in one sequence. */
    public static final int MAX_STEPS = 10_000_000;

    private final EddingtonStandardModel model;
    private final Composition composition;
    private final double low;
    private final double high;
    private final int steps;

    /**
     * @param model the standard model (carries ω₃ and K₃)
     * @param composition the mixture, the same for every mass
     * @param lowMass lowest mass [g], positive and finite
     * @param highMass highest mass [g], above lowMass and finite
     * @param steps number of masses, 2 to {@link #MAX_STEPS}
     * @throws BadInputException naming the mass range or the step count
     */
    public MassSequence(EddingtonStandardModel model, Composition composition, double lowMass, double highMass,
            int steps) {
        this.model = Objects.requireNonNull(model, "model");
        this.composition = Objects.requireNonNull(composition, "composition");
        if (!(lowMass > 0.0 && Double.isFinite(lowMass))) {
            throw new BadInputException("mass range", "lower mass " + lowMass / SOLAR_MASS
                    + " Msun must be positive and finite");
        }
        if (!(highMass > lowMass && Double.isFinite(highMass))) {
            throw new BadInputException("mass range", "upper mass " + highMass / SOLAR_MASS
                    + " Msun must be finite and above the lower mass " + lowMass / SOLAR_MASS + " Msun");
        }
        if (lowMass < MIN_MASS_MSUN * SOLAR_MASS || highMass > MAX_MASS_MSUN * SOLAR_MASS) {
            throw new BadInputException("mass range", String.format(Locale.US, "%s:%s Msun reaches outside the"
                    + " supported %.0e..%.0e Msun (a standard model is a star: from well below the hydrogen-burning"
                    + " limit to beyond supermassive stars; outside it the critical-point columns leave the double"
                    + " range)", number(lowMass / SOLAR_MASS), number(highMass / SOLAR_MASS), MIN_MASS_MSUN,
                    MAX_MASS_MSUN));
        }
        if (steps < 2 || steps > MAX_STEPS) {
            throw new BadInputException("steps " + steps + " is outside 2.." + MAX_STEPS);
        }
        this.low = lowMass;
        this.high = highMass;
        this.steps = steps;
    }

    private static String number(double value) {
        return String.format(Locale.US, "%.6g", value);
    }

    /** @return the number of masses */
    public int size() {
        return steps;
    }

    /** @return the composition */
    public Composition composition() {
        return composition;
    }

    /**
     * @param index 0 ≤ index &lt; size()
     * @return the mass of row index [g]
     */
    public double mass(int index) {
        Objects.checkIndex(index, steps);
        if (index == 0) {
            return low;
        }
        if (index == steps - 1) {
            return high;
        }
        return low * Math.exp(Math.log(high / low) * index / (steps - 1));
    }

    /**
     * @param index 0 ≤ index &lt; size()
     * @return the standard model of that mass
     */
    public SequenceRow row(int index) {
        double mass = mass(index);
        double mu = composition.mu();
        BetaSolution b = model.beta(mass, mu);
        double excess = EddingtonStandardModel.gamma1Excess(b);
        double lEdd = EddingtonStandardModel.eddingtonLuminosity(mass, composition);
        double rCrit = 2.0 * GRAVITATION * mass * model.relativisticCoefficient()
                / (SPEED_OF_LIGHT * SPEED_OF_LIGHT * excess);
        double rhoC = model.centralDensity(mass, rCrit);
        double pC = model.centralPressure(mass, rCrit);
        double tC = b.beta() * pC * mu * ATOMIC_MASS_UNIT / (rhoC * BOLTZMANN);
        return new SequenceRow(mass, b.beta(), b.oneMinusBeta(), 4.0 / 3.0 + excess, excess, lEdd,
                b.oneMinusBeta() * lEdd, rCrit, rhoC, tC);
    }

    /**
     * Rows from..to−1, computed in parallel, in index order.
     *
     * @param from first index, inclusive
     * @param to last index, exclusive
     * @return the rows
     */
    public List<SequenceRow> rows(int from, int to) {
        Objects.checkFromToIndex(from, to, steps);
        SequenceRow[] out = new SequenceRow[to - from];
        IntStream.range(from, to).parallel().forEach(i -> out[i - from] = row(i));
        return List.of(out);
    }

    /** @return the whole sequence as a table */
    public Table table() {
        return table(0, steps);
    }

    /**
     * Rows from..to−1 as a table named "sequence".
     *
     * @param from first index, inclusive
     * @param to last index, exclusive
     * @return the table
     */
    public Table table(int from, int to) {
        Objects.checkFromToIndex(from, to, steps);
        int k = to - from;
        // made on all cores when long, and handed to the table without a copy (numberTaking)
        double[][] c = LargeArrays.doubles(13, k);
        ValidityCheck validity = new GasRadiationEos(composition).validity();
        // each row straight into the columns, in parallel: a call per row, which the JIT compiles
        // after a few hundred rows, where one loop over all rows would run interpreted in a short
        // run (a loop is compiled on the stack only after ~60 000 iterations, Tier3BackEdgeThreshold)
        IntStream.range(0, k).parallel().forEach(i -> fill(c, i, row(from + i), validity));
        return new Table.Builder("sequence", metadata(from, to))
                .numberTaking(M, c[0])
                .numberTaking(EosQuantities.BETA, c[1])
                .numberTaking(EosQuantities.ONE_MINUS_BETA, c[2])
                .numberTaking(L_OVER_L_EDD, c[3])
                .numberTaking(L_EDD, c[4])
                .numberTaking(L, c[5])
                .numberTaking(GAMMA1, c[6])
                .numberTaking(GAMMA1_MINUS_4_3, c[7])
                .numberTaking(R_CRIT, c[8])
                .numberTaking(R_CRIT_OVER_GM_C2, c[9])
                .numberTaking(RHO_C_CRIT, c[10])
                .numberTaking(T_C_CRIT, c[11])
                .numberTaking(CRITICAL_POINT_WARNINGS, c[12])
                .build();
    }

    /** Writes row r into element i of the 13 columns of {@link #table(int, int)}. */
    private static void fill(double[][] c, int i, SequenceRow r, ValidityCheck validity) {
        double c2 = SPEED_OF_LIGHT * SPEED_OF_LIGHT;
        c[0][i] = r.mass() / SOLAR_MASS;
        c[1][i] = r.beta();
        c[2][i] = r.oneMinusBeta();
        c[3][i] = r.oneMinusBeta();
        c[4][i] = r.eddingtonLuminosity() / SOLAR_LUMINOSITY;
        c[5][i] = r.luminosity() / SOLAR_LUMINOSITY;
        c[6][i] = r.gamma1();
        c[7][i] = r.gamma1Excess();
        c[8][i] = r.criticalRadius() / SOLAR_RADIUS;
        c[9][i] = r.criticalRadius() * c2 / (GRAVITATION * r.mass());
        c[10][i] = r.criticalCentralDensity();
        c[11][i] = r.criticalCentralTemperature();
        c[12][i] = validity.mask(r.criticalCentralDensity(), r.criticalCentralTemperature(), r.beta());
    }

    /** @return the metadata of the whole sequence's table */
    public Metadata metadata() {
        return metadata(0, steps);
    }

    private Metadata metadata(int from, int to) {
        Inputs.Builder inputs = Inputs.builder()
                .number("M_low", twelveDigits(low / SOLAR_MASS), "Msun", "lowest mass of the range")
                .number("M_high", twelveDigits(high / SOLAR_MASS), "Msun", "highest mass; masses log-spaced in between")
                .integer("steps", steps, "number of masses");
        if (from != 0 || to != steps) {
            inputs.text("rows", from + ".." + (to - 1));
        }
        inputs.number(EosQuantities.MU, composition.mu()).number(EosQuantities.X, composition.X());
        List<String> notes = new ArrayList<>(EddingtonStandardModel.ASSUMPTIONS);
        notes.add(modelNote(model));
        notes.add("onset values assume the star stays a standard model while contracting homologously; "
                + "below ~1e4 Msun degeneracy, nuclear burning or pair creation (T > ~1e9 K) intervene first");
        return Metadata.of("Eddington standard models by mass", inputs.build(), notes);
    }

    /**
     * The table's note on the model's constants.
     *
     * @param model the standard model
     * @return "C = … (1 - beta = C mu^4 beta^4 (M/Msun)^2), K3 = …"
     */
    public static String modelNote(EddingtonStandardModel model) {
        // Locale.US, not ROOT: the same ASCII digits and '.', but the JDK's Formatter takes them
        // without setting up its locale data for US (~10 ms of a short run's CPU)
        return String.format(java.util.Locale.US, "C = %.10g (1 - beta = C mu^4 beta^4 (M/Msun)^2), K3 = %.8g",
                model.quarticCoefficient(), model.relativisticCoefficient());
    }

    /** Solar masses to 12 significant digits: "1e3" reads 1000.0, not 999.9999999999999. */
    private static double twelveDigits(double x) {
        return new java.math.BigDecimal(x).round(new java.math.MathContext(12)).doubleValue();
    }
}
