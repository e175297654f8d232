package org.stellabar.structure;

import static org.stellabar.physics.Constants.SOLAR_LUMINOSITY;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import org.stellabar.eos.EosState;
import org.stellabar.eos.EosStateSummary;
import org.stellabar.table.Metadata;
import org.stellabar.table.Summary;

/**
 * Presents a {@link StarModel} as a {@link Summary} for any writer: the headline numbers under
 * their JSON names (M, R, kind, rho_c, P_c, T_c, beta_c, Gamma1_mean, newtonian_margin, gr_margin,
 * R_crit, L_Edd, L_over_L_Edd, verdict, …) with units and meanings, the composition, the central
 * validity warnings, and optionally the profile table under {@code profile}.
 */
public final class StarModelSummary {

    private StarModelSummary() {
    }

    /**
     * @param model the star
     * @param withProfile true to include the profile table as the last field
     * @return the summary, with the profile table's metadata
     */
    public static Summary of(StarModel model, boolean withProfile) {
        StarSummary s = model.summary();
        Metadata metadata = model.profile().metadata();
        EosState c = s.centre();
        StabilityResult st = s.stability();
        Summary.Builder b = new Summary.Builder("model", metadata)
                .text("name", s.name(), "label of the star")
                .text("kind", s.kind().name(), "kind of model: standard, polytrope or isentropic");
        if (!Double.isNaN(s.index())) {
            b.number("n", s.index(), "", "polytropic index");
        }
        b.number("M", s.mass(), "g", "total mass")
                .number("M_Msun", s.mass() / SOLAR_MASS, "Msun", "total mass in nominal solar masses")
                .number("R", s.radius(), "cm", "radius, where P = 0")
                .number("R_Rsun", s.radius() / SOLAR_RADIUS, "Rsun", "radius in nominal solar radii")
                .nested("composition", EosStateSummary.composition(s.composition(), metadata), "the mixture")
                .number("rho_c", c.rho(), "g/cm3", "central density")
                .number("rho_mean", s.meanDensity(), "g/cm3", "mean density 3M/(4 pi R^3)")
                .number("rho_c_over_mean", s.centralToMeanDensity(), "", "central over mean density")
                .number("P_c", c.P(), "dyn/cm2", "central pressure")
                .number("T_c", c.T(), "K", "central temperature")
                .number("beta_c", c.beta(), "", "central gas pressure fraction P_gas/P")
                .number("one_minus_beta_c", c.oneMinusBeta(), "", "central radiation pressure fraction P_rad/P")
                .number("Gamma1_c", c.Gamma1(), "", "central first adiabatic exponent")
                .number("s_per_baryon_c", c.sPerBaryon(), "k_B",
                        s.kind() == StarKind.isentropic ? "entropy per baryon (the same everywhere)"
                                : "central entropy per baryon")
                .number("Gamma1_mean", st.meanGamma1(), "", "pressure-weighted mean int(Gamma1 P dV)/int(P dV)")
                .number("newtonian_margin", st.newtonianMargin(), "", "<Gamma1> - 4/3 (negative: unstable)")
                .number("K_gr", st.relativisticCoefficient(), "",
                        "structure constant K of the criterion <Gamma1> - 4/3 > K 2GM/(Rc^2)")
                .number("compactness", st.compactness(), "", "2GM/(Rc^2)")
                .number("gr_margin", st.relativisticMargin(), "",
                        "<Gamma1> - 4/3 - K 2GM/(Rc^2) (negative: unstable in general relativity)");
        if (st.criticalRadius().isPresent()) {
            double rCrit = st.criticalRadius().getAsDouble();
            b.number("R_crit", rCrit, "cm", "radius at the onset of instability, homologous contraction at fixed M")
                    .number("R_crit_Rsun", rCrit / SOLAR_RADIUS, "Rsun", "R_crit in nominal solar radii")
                    .number("R_over_R_crit", s.radius() / rCrit, "", "above 1: stable");
        } else {
            b.text("R_crit", "none", "<Gamma1> <= 4/3: unstable at any radius");
        }
        b.text("verdict", st.verdict().word(), "stable, marginal (within 5 % of R_crit) or unstable")
                .number("L_Edd", s.eddingtonLuminosity(), "erg/s", "Eddington luminosity 4 pi G M c/kappa_es")
                .number("L_Edd_Lsun", s.eddingtonLuminosity() / SOLAR_LUMINOSITY, "Lsun",
                        "Eddington luminosity in nominal solar luminosities")
                .number("L_over_L_Edd", s.luminosityRatio(), "", s.luminosityRatioMeaning())
                .number("virial_check", s.virialCheck(), "", "3 int(P dV)/(-Omega) - 1, zero in hydrostatic equilibrium")
                .summaries("warnings", EosStateSummary.warnings(c.warnings(), metadata),
                        "where the idealized physics is doubtful at the centre");
        if (withProfile) {
            b.table(ProfileTable.NAME, model.profile(), "radial profile");
        }
        return b.build();
    }
}
