package org.stellabar.audit;

import java.util.List;
import org.stellabar.eos.EosQuantities;
import org.stellabar.structure.ProfileTable;
import org.stellabar.table.Quantity;

/**
 * The audit's own per-shell columns, declared once: the per-shell table, its charts and the
 * report name them through these constants. Where a column means what an equation-of-state or
 * profile column means, it is derived from that declaration ({@link EosQuantities},
 * {@link ProfileTable}).
 */
public final class AuditColumns {

    /** {@code row}: data-row number in the input file (1 after the header, comments not counted), dimensionless. */
    public static final Quantity ROW = Quantity.integer("row",
            "data-row number in the input file (1 after the header, comments not counted)");
    /** {@link ProfileTable#M_OVER_M}, described as: enclosed mass over the star's mass M. */
    public static final Quantity M_OVER_M =
            ProfileTable.M_OVER_M.withDescription("enclosed mass over the star's mass M");
    /** {@link ProfileTable#R_OVER_R}, described as: radius over the star's radius R. */
    public static final Quantity R_OVER_R =
            ProfileTable.R_OVER_R.withDescription("radius over the star's radius R");
    /**
     * {@code P_eos}: our total pressure P_gas + P_rad at the profile's rho, T, composition; unit as {@link
     * EosQuantities#P}.
     */
    public static final Quantity P_EOS = EosQuantities.P.withName("P_eos")
            .withDescription("our total pressure P_gas + P_rad at the profile's rho, T, composition");
    /** {@link EosQuantities#P_GAS}, described as: ion + electron pressure rho k T/(mu m_u). */
    public static final Quantity P_GAS = EosQuantities.P_GAS.withDescription("ion + electron pressure rho k T/(mu m_u)");
    /** The same column as {@link EosQuantities#P_RAD}. */
    public static final Quantity P_RAD = EosQuantities.P_RAD;
    /** {@link EosQuantities#BETA}, described as: gas pressure fraction P_gas/P_eos. */
    public static final Quantity BETA = EosQuantities.BETA.withDescription("gas pressure fraction P_gas/P_eos");
    /** {@link EosQuantities#ONE_MINUS_BETA}, described as: radiation pressure fraction P_rad/P_eos. */
    public static final Quantity ONE_MINUS_BETA =
            EosQuantities.ONE_MINUS_BETA.withDescription("radiation pressure fraction P_rad/P_eos");
    /** {@code Gamma1_eos}: our first adiabatic exponent; unit as {@link EosQuantities#GAMMA1}. */
    public static final Quantity GAMMA1_EOS =
            EosQuantities.GAMMA1.withName("Gamma1_eos").withDescription("our first adiabatic exponent");
    /** {@link EosQuantities#NABLA_AD}, described as: our adiabatic gradient (dlnT/dlnP)_s. */
    public static final Quantity NABLA_AD = EosQuantities.NABLA_AD.withDescription("our adiabatic gradient (dlnT/dlnP)_s");
    /** {@link EosQuantities#SOUND_SPEED}, described as: our adiabatic sound speed sqrt(Gamma1 P/rho). */
    public static final Quantity SOUND_SPEED =
            EosQuantities.SOUND_SPEED.withDescription("our adiabatic sound speed sqrt(Gamma1 P/rho)");
    /** {@code P_rel_diff}: P_profile/P_eos - 1, dimensionless. */
    public static final Quantity P_REL_DIFF = Quantity.dimensionless("P_rel_diff", "P_profile/P_eos - 1");
    /** {@code Gamma1_diff}: Gamma1_profile - Gamma1_eos, dimensionless. */
    public static final Quantity GAMMA1_DIFF = Quantity.dimensionless("Gamma1_diff", "Gamma1_profile - Gamma1_eos");
    /** {@code hydrostatic_residual}: (dP/dr + G m rho/r^2)/(G m rho/r^2), three-point differences, dimensionless. */
    public static final Quantity HYDROSTATIC_RESIDUAL = Quantity.dimensionless("hydrostatic_residual",
            "(dP/dr + G m rho/r^2)/(G m rho/r^2), three-point differences");
    /**
     * {@code mass_continuity_residual}: (dm/dr)/(4 pi r^2 rho) - 1, three-point differences in r^3,
     * dimensionless.
     */
    public static final Quantity MASS_CONTINUITY_RESIDUAL = Quantity.dimensionless("mass_continuity_residual",
            "(dm/dr)/(4 pi r^2 rho) - 1, three-point differences in r^3");
    /** A text column: the codes of {@link org.stellabar.eos.ValidityWarning.Regime}. */
    public static final Quantity WARNINGS =
            Quantity.dimensionless("warnings", "validity warning codes at this shell, ';'-separated");

    /** Every column of the audit's own, in table order; an input column of the same name gets "_profile". */
    static final List<Quantity> ALL = List.of(ROW, M_OVER_M, R_OVER_R, P_EOS, P_GAS, P_RAD, BETA, ONE_MINUS_BETA,
            GAMMA1_EOS, NABLA_AD, SOUND_SPEED, P_REL_DIFF, GAMMA1_DIFF, HYDROSTATIC_RESIDUAL, MASS_CONTINUITY_RESIDUAL,
            WARNINGS);

    private AuditColumns() {
    }
}
