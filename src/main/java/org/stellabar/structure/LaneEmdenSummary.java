package org.stellabar.structure;

import java.util.List;
import java.util.OptionalDouble;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;

/**
 * A Lane-Emden solution as a {@link Summary} for writers: the constants under their JSON names
 * ({@code n}, {@code xi1}, {@code dtheta_xi1}, {@code omega_n}, {@code rho_c_over_mean},
 * {@code W_n}, and more) and the dimensionless profile as the table field {@code profile}.
 */
public final class LaneEmdenSummary {

    // The constants of a solution under their JSON names (DESIGN §4), all without a unit.
    /** {@code n}: polytropic index, dimensionless. */
    public static final Quantity N = Quantity.dimensionless("n", "polytropic index");
    /** {@code xi1}: first zero of theta: the surface radius in units of alpha, dimensionless. */
    public static final Quantity XI1 =
            Quantity.dimensionless("xi1", "first zero of theta: the surface radius in units of alpha");
    /** {@code dtheta_xi1}: dtheta/dxi at the surface, dimensionless. */
    public static final Quantity DTHETA_XI1 = Quantity.dimensionless("dtheta_xi1", "dtheta/dxi at the surface");
    /** {@code omega_n}: -xi1^2 theta'(xi1): M = 4 pi alpha^3 rho_c omega_n, dimensionless. */
    public static final Quantity OMEGA_N =
            Quantity.dimensionless("omega_n", "-xi1^2 theta'(xi1): M = 4 pi alpha^3 rho_c omega_n");
    /** {@code rho_c_over_mean}: central over mean density, xi1^3/(3 omega_n), dimensionless. */
    public static final Quantity RHO_C_OVER_MEAN =
            Quantity.dimensionless("rho_c_over_mean", "central over mean density, xi1^3/(3 omega_n)");
    /** {@code W_n}: P_c = W_n G M^2/R^4, dimensionless. */
    public static final Quantity W_N = Quantity.dimensionless("W_n", "P_c = W_n G M^2/R^4");
    /** {@code N_n}: K = N_n G M^((n-1)/n) R^((3-n)/n), dimensionless. */
    public static final Quantity N_N = Quantity.dimensionless("N_n", "K = N_n G M^((n-1)/n) R^((3-n)/n)");
    /** {@code binding_coefficient}: 3/(5-n): Omega = -(3/(5-n)) G M^2/R, dimensionless. */
    public static final Quantity BINDING_COEFFICIENT =
            Quantity.dimensionless("binding_coefficient", "3/(5-n): Omega = -(3/(5-n)) G M^2/R");
    /**
     * {@code K_GR}: structure constant of the post-Newtonian stability criterion (Chandrasekhar 1964),
     * dimensionless.
     */
    public static final Quantity K_GR = Quantity.dimensionless("K_GR",
            "structure constant of the post-Newtonian stability criterion (Chandrasekhar 1964)");

    private LaneEmdenSummary() {
    }

    /**
     * @param s the solution
     * @param points number of profile radii, evenly spaced in ξ, ≥ 2
     * @return the summary named "polytrope"
     */
    public static Summary of(LaneEmdenSolution s, int points) {
        Inputs inputs = Inputs.builder().number(N, s.n())
                .integer("points", points, "profile radii, evenly spaced in xi")
                .number("tolerance", s.tolerance(), "", "relative tolerance of the integration").build();
        List<String> notes = new java.util.ArrayList<>(List.of(
                "P = K rho^(1+1/n); r = alpha xi, rho = rho_c theta^n, P = P_c theta^(n+1), R = alpha xi1",
                "P_c = W_n G M^2/R^4; K = N_n G M^((n-1)/n) R^((3-n)/n); Omega = -(3/(5-n)) G M^2/R",
                "relativistic stability: <Gamma1> - 4/3 > K_n 2GM/(Rc^2) (Chandrasekhar 1964)"));
        notes.addAll(s.accuracyNotes());
        Metadata metadata = Metadata.of("Lane-Emden polytrope n = " + s.n(), inputs, notes);
        Summary.Builder b = new Summary.Builder("polytrope", metadata)
                .number(N, s.n())
                .number(XI1, s.xi1())
                .number(DTHETA_XI1, s.dthetaXi1())
                .number(OMEGA_N, s.omega())
                .number(RHO_C_OVER_MEAN, s.centralToMeanDensity())
                .number(W_N, s.centralPressureCoefficient());
        OptionalDouble nn = s.massRadiusConstant();
        if (nn.isPresent()) {
            b.number(N_N, nn.getAsDouble());
        }
        b.number(BINDING_COEFFICIENT, s.bindingEnergyCoefficient())
                .number(K_GR, s.relativisticCoefficient())
                .integer("steps", s.curve().stepCount(), "integration steps taken");
        Table profile = s.profileTable(points);
        b.table("profile", profile, "dimensionless profile");
        return b.build();
    }

    /**
     * The profile table with the constants added to its notes, for a CSV file whose {@code #}
     * header should say everything.
     *
     * @param s the solution
     * @param points number of radii, ≥ 2
     * @return the table
     */
    public static Table profileWithConstants(LaneEmdenSolution s, int points) {
        Table t = s.profileTable(points);
        Metadata m = t.metadata().withNote(String.format(java.util.Locale.US,
                "xi1 = %.15g, dtheta_xi1 = %.15g, omega_n = %.15g, rho_c_over_mean = %.15g, W_n = %.15g",
                s.xi1(), s.dthetaXi1(), s.omega(), s.centralToMeanDensity(), s.centralPressureCoefficient()));
        return new Table(t.name(), m, t.columns());
    }
}
