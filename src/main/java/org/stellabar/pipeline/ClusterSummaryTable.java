package org.stellabar.pipeline;

import java.util.ArrayList;
import java.util.List;
import org.stellabar.physics.Constants;
import org.stellabar.structure.StabilityResult;
import org.stellabar.structure.StarModel;
import org.stellabar.structure.StarSummary;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;

/** One row per star of a scenario: the headline numbers side by side. */
public final class ClusterSummaryTable {

    private ClusterSummaryTable() {
    }

    /**
     * @param scenarioName the scenario's name
     * @param source where the scenario came from (file name or "built-in demo")
     * @param models the stars, in scenario order
     * @param notes assumptions to carry into the metadata
     * @return the summary table
     */
    public static Table of(String scenarioName, String source, List<StarModel> models, List<String> notes) {
        int n = models.size();
        List<String> names = new ArrayList<>();
        List<String> kinds = new ArrayList<>();
        List<String> indices = new ArrayList<>();
        List<String> verdicts = new ArrayList<>();
        double[] mass = new double[n];
        double[] radius = new double[n];
        double[] mu = new double[n];
        double[] x = new double[n];
        double[] z = new double[n];
        double[] rhoC = new double[n];
        double[] pC = new double[n];
        double[] tC = new double[n];
        double[] betaC = new double[n];
        double[] oneMinusBetaC = new double[n];
        double[] gamma1 = new double[n];
        double[] newtonian = new double[n];
        double[] threshold = new double[n];
        double[] grMargin = new double[n];
        double[] rCrit = new double[n];
        double[] lEdd = new double[n];
        double[] lRatio = new double[n];
        for (int i = 0; i < n; i++) {
            StarSummary s = models.get(i).summary();
            StabilityResult st = s.stability();
            names.add(s.name());
            kinds.add(s.kind().name());
            indices.add(Double.isNaN(s.index()) ? "none" : Double.toString(s.index()));
            verdicts.add(st.verdict().word());
            mass[i] = s.mass() / Constants.SOLAR_MASS;
            radius[i] = s.radius() / Constants.SOLAR_RADIUS;
            mu[i] = s.composition().mu();
            x[i] = s.composition().X();
            z[i] = s.composition().Z();
            rhoC[i] = s.centre().rho();
            pC[i] = s.centre().P();
            tC[i] = s.centre().T();
            betaC[i] = s.centre().beta();
            oneMinusBetaC[i] = s.centre().oneMinusBeta();
            gamma1[i] = st.meanGamma1();
            newtonian[i] = st.newtonianMargin();
            threshold[i] = st.relativisticThreshold();
            grMargin[i] = st.relativisticMargin();
            rCrit[i] = st.criticalRadius().orElse(0.0) / Constants.SOLAR_RADIUS;
            lEdd[i] = s.eddingtonLuminosity();
            lRatio[i] = s.luminosityRatio();
        }
        Inputs inputs = Inputs.builder().text("scenario", scenarioName).text("source", source)
                .integer("stars", n, "number of stars").build();
        Metadata metadata = Metadata.of("summary of the stars of scenario " + scenarioName, inputs, notes);
        return new Table.Builder("summary", metadata)
                .text("name", "star name", names)
                .text("kind", "kind of model: standard, polytrope or isentropic", kinds)
                .text("index", "polytropic index n (none for an isentropic star)", indices)
                .number("M", "Msun", "total mass", mass)
                .number("R", "Rsun", "radius", radius)
                .number("mu", "", "mean molecular weight", mu)
                .number("X", "", "hydrogen mass fraction", x)
                .number("Z", "", "metal mass fraction", z)
                .number("rho_c", "g/cm3", "central density", rhoC)
                .number("P_c", "dyn/cm2", "central pressure", pC)
                .number("T_c", "K", "central temperature", tC)
                .number("beta_c", "", "central gas pressure fraction", betaC)
                .number("one_minus_beta_c", "", "central radiation pressure fraction", oneMinusBetaC)
                .number("Gamma1_mean", "", "pressure-weighted mean Gamma1", gamma1)
                .number("newtonian_margin", "", "Gamma1_mean - 4/3", newtonian)
                .number("gr_threshold", "", "K 2GM/(Rc^2): the post-Newtonian threshold for Gamma1_mean - 4/3",
                        threshold)
                .number("gr_margin", "", "Gamma1_mean - 4/3 - gr_threshold (positive: stable)", grMargin)
                .number("R_crit", "Rsun", "radius of onset of the relativistic instability; 0 when Gamma1_mean <= 4/3"
                        + " (no radius is stable)", rCrit)
                .number("L_Edd", "erg/s", "Eddington luminosity for electron scattering", lEdd)
                .number("L_over_L_Edd", "", "L/L_Edd of the standard model for this M and mu", lRatio)
                .text("verdict", "dynamical stability: stable, marginal or unstable", verdicts)
                .build();
    }
}
