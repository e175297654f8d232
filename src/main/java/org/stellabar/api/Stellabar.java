package org.stellabar.api;

import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.List;
import org.stellabar.audit.ColumnMapping;
import org.stellabar.audit.ColumnarProfileSource;
import org.stellabar.audit.CompositionPolicy;
import org.stellabar.audit.LogValuedColumnGuard;
import org.stellabar.audit.ProfileAudit;
import org.stellabar.audit.ProfileAuditor;
import org.stellabar.audit.ProfileLoader;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosInversion;
import org.stellabar.eos.EosState;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.BetaSolution;
import org.stellabar.structure.IsentropicRequest;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.structure.LaneEmdenSolution;
import org.stellabar.structure.LaneEmdenSolver;
import org.stellabar.structure.PolytropeRequest;
import org.stellabar.structure.StandardModelRequest;
import org.stellabar.structure.StarBuilder;
import org.stellabar.structure.StarModel;
import org.stellabar.structure.StarRequest;
import org.stellabar.survey.MassSequence;
import org.stellabar.survey.SequenceRow;
import org.stellabar.table.ColumnHeading;
import org.stellabar.table.Column;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Table;

/**
 * One entry point per job for scripts and other codes, returning the records the command line
 * uses. Quantities carry their unit in the parameter name: CGS for the equation of state
 * ({@code densityGramsPerCm3}, {@code temperatureKelvin}), nominal solar units (IAU 2015 B3) for
 * stars ({@code massMsun}, {@code radiusRsun}). Every method refuses a request it cannot answer
 * with {@link org.stellabar.physics.BadInputException} (one line: the input, its value, what is
 * allowed). Stateless and thread-safe.
 *
 * <pre>{@code
 * Composition mix = Stellabar.composition(0.70, 0.28, 0.02);
 * double gamma1 = Stellabar.state(1.0, 1e7, mix).Gamma1();
 * double beta = Stellabar.standardModelBeta(40, mix).beta();
 * }</pre>
 */
public final class Stellabar {

    private static final StarBuilder STARS = new StarBuilder();
    private static final EddingtonStandardModel STANDARD_MODEL = EddingtonStandardModel.create();

    private Stellabar() {
    }

    /**
     * @param hydrogen X, mass fraction
     * @param helium Y, mass fraction
     * @param metals Z, mass fraction; X + Y + Z = 1
     * @return the fully ionized mixture (metal ions neglected, as the command line's default)
     */
    public static Composition composition(double hydrogen, double helium, double metals) {
        return Composition.of(hydrogen, helium, metals);
    }

    /**
     * One state of the gas + radiation mixture.
     *
     * @param densityGramsPerCm3 ρ [g/cm3]
     * @param temperatureKelvin T [K]
     * @param composition the mixture
     * @return P, β, u, s, Γ1, Γ2, Γ3, ∇_ad, sound speed … and the validity warnings
     */
    public static EosState state(double densityGramsPerCm3, double temperatureKelvin, Composition composition) {
        return new GasRadiationEos(composition).state(densityGramsPerCm3, temperatureKelvin);
    }

    /**
     * The state at a total pressure and temperature: the density by inversion.
     *
     * @param pressureDynPerCm2 P [dyn/cm2]
     * @param temperatureKelvin T [K]
     * @param composition the mixture
     * @return the state
     */
    public static EosState stateAtPressure(double pressureDynPerCm2, double temperatureKelvin, Composition composition) {
        return new EosInversion(new GasRadiationEos(composition)).atPressureTemperature(pressureDynPerCm2,
                temperatureKelvin);
    }

    /**
     * @param index n, 0 ≤ n &lt; 5
     * @return the Lane-Emden solution: ξ₁, ω_n, ρ_c/ρ̄, W_n, K_n and the dense curve θ(ξ)
     */
    public static LaneEmdenSolution polytrope(double index) {
        return new LaneEmdenSolver().solve(index);
    }

    /**
     * β of Eddington's standard model from the quartic 1 − β = C μ⁴β⁴(M/M☉)².
     *
     * @param massMsun M [M☉]
     * @param composition the mixture (its μ)
     * @return β and 1 − β, each computed without cancellation
     */
    public static BetaSolution standardModelBeta(double massMsun, Composition composition) {
        return STANDARD_MODEL.beta(massMsun * SOLAR_MASS, composition.mu());
    }

    /**
     * Eddington's standard model scaled to M and R: profile, centre, ⟨Γ1⟩, stability margins.
     *
     * @param massMsun M [M☉]
     * @param radiusRsun R [R☉]
     * @param composition the mixture
     * @return the star
     */
    public static StarModel standardModel(double massMsun, double radiusRsun, Composition composition) {
        return star(StandardModelRequest.of(massMsun * SOLAR_MASS, radiusRsun * SOLAR_RADIUS, composition));
    }

    /**
     * A polytrope of index n scaled to M and R, T and β from the equation of state.
     *
     * @param massMsun M [M☉]
     * @param radiusRsun R [R☉]
     * @param index n, 0 ≤ n &lt; 5
     * @param composition the mixture
     * @return the star
     */
    public static StarModel polytropeStar(double massMsun, double radiusRsun, double index, Composition composition) {
        return star(PolytropeRequest.of(massMsun * SOLAR_MASS, radiusRsun * SOLAR_RADIUS, composition, index));
    }

    /**
     * A star on one adiabat of the gas + radiation mixture (isentropic, found by shooting), fixed
     * by its mass and central temperature.
     *
     * @param massMsun M [M☉]
     * @param centralTemperatureKelvin T_c [K]
     * @param composition the mixture
     * @return the star
     */
    public static StarModel isentropicStar(double massMsun, double centralTemperatureKelvin, Composition composition) {
        return star(IsentropicRequest.withCentralTemperature(massMsun * SOLAR_MASS, centralTemperatureKelvin,
                composition));
    }

    /**
     * Any star the command line can build, from its request (see {@link StarRequest}'s records).
     *
     * @param request the request, in CGS
     * @return the star
     */
    public static StarModel star(StarRequest request) {
        return STARS.build(request);
    }

    /**
     * Eddington standard models over a range of masses, spaced evenly in log M: β, Γ1, L/L_Edd and
     * where each turns unstable to the post-Newtonian criterion.
     *
     * @param lowestMassMsun lowest M [M☉]
     * @param highestMassMsun highest M [M☉], above the lowest
     * @param masses number of masses, 2 or more
     * @param composition the mixture, the same for every mass
     * @return one row per mass, lowest first, in CGS (as {@link SequenceRow} states)
     */
    public static List<SequenceRow> standardModelSequence(double lowestMassMsun, double highestMassMsun, int masses,
            Composition composition) {
        MassSequence sequence = new MassSequence(STANDARD_MODEL, composition, lowestMassMsun * SOLAR_MASS,
                highestMassMsun * SOLAR_MASS, masses);
        return sequence.rows(0, sequence.size());
    }

    /**
     * Audits a profile held in memory, as the command line audits a file: our P, β, Γ1 and ∇_ad at
     * each shell's (ρ, T), the mismatch with the profile's own P and Γ1, hydrostatic equilibrium,
     * the virial ratio, ⟨Γ1⟩ and the stability margins. Columns are found by our names (r, m, rho,
     * T, P, Gamma1; rho and T required) and read in the unit each numeric column states ("" or a
     * column without unit: CGS). A profile whose temperature, density or pressure column looks like
     * log10 values is refused ({@link LogValuedColumnGuard}), as the command line's
     * {@code --strict} does.
     *
     * @param profile the shells, one row each, centre or surface first (text columns are ignored);
     *     e.g. the {@link StarModel#profile()} of a model built here
     * @param composition the mixture of every shell
     * @return the audit: per shell ({@link ProfileAudit#shells()}) and of the whole star
     *     ({@link ProfileAudit#star()})
     * @throws BadInputException for a missing column, an unknown unit, a bad row, too few rows, or
     *     columns that look like log10 values
     */
    public static ProfileAudit audit(Table profile, Composition composition) {
        ColumnarProfileSource.Builder source = new ColumnarProfileSource.Builder(profile.name(), profile.rowCount());
        for (Column column : profile.columns()) {
            if (column instanceof NumberColumn numbers) {
                String unit = numbers.unit().isEmpty() ? null : numbers.unit();
                source.numbers(new ColumnHeading(numbers.name(), unit), numbers.values());
            }
        }
        ColumnarProfileSource table = source.build();
        ProfileLoader loader = new ProfileLoader(ColumnMapping.ourNames(), CompositionPolicy.wholeStar(composition),
                false);
        List<LogValuedColumnGuard.Finding> suspicious = LogValuedColumnGuard.inspect(table, loader.mappedColumns(table));
        if (!suspicious.isEmpty()) {
            throw new BadInputException(profile.name() + ": " + LogValuedColumnGuard.oneLine(suspicious));
        }
        return new ProfileAuditor().audit(loader.load(table));
    }
}
