package org.stellabar.audit;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosState;
import org.stellabar.eos.Electrons;
import org.stellabar.eos.EquationOfState;
import org.stellabar.eos.ValidityWarning;
import org.stellabar.physics.BadInputException;

/**
 * Our equation of state at every shell of a profile: the fully ionized ideal gas + black-body
 * radiation at the profile's (ρ, T, composition), with its validity warnings. Internal to the
 * audit: the arrays are shared, not copied, and never changed after {@link #evaluate}.
 *
 * @param P total pressure [dyn/cm2]
 * @param Pgas gas pressure [dyn/cm2]
 * @param Prad radiation pressure [dyn/cm2]
 * @param beta P_gas/P
 * @param oneMinusBeta P_rad/P
 * @param gamma1 Γ1
 * @param nablaAd ∇_ad
 * @param soundSpeed c_s [cm/s]
 * @param inverseMu 1/μ of each shell's composition
 * @param warnings the bits of the validity warnings of each shell
 * @param messages the validity warnings of each shell
 */
record ShellStates(double[] P, double[] Pgas, double[] Prad, double[] beta, double[] oneMinusBeta,
        double[] gamma1, double[] nablaAd, double[] soundSpeed, double[] inverseMu, int[] warnings,
        List<List<ValidityWarning>> messages) {

    /**
     * @param p the profile
     * @param electrons which equation of state
     * @return the states of its shells
     * @throws BadInputException naming the row when a shell has no state (e.g. beyond doubles)
     */
    static ShellStates evaluate(Profile p, Electrons electrons) {
        int n = p.size();
        double[] rho = p.rho();
        double[] T = p.T();
        ShellStates out = new ShellStates(new double[n], new double[n], new double[n], new double[n], new double[n],
                new double[n], new double[n], new double[n], new double[n], new int[n], new ArrayList<>(n));
        Map<Composition, EquationOfState> eosByComposition = new HashMap<>();
        for (int i = 0; i < n; i++) {
            Composition c = p.compositions().get(i);
            EquationOfState eos = eosByComposition.computeIfAbsent(c, electrons::equationOfState);
            EosState s;
            try {
                s = eos.state(rho[i], T[i]);
            } catch (BadInputException e) {
                // e.g. a state beyond the range of doubles: name the row it came from
                throw new BadInputException(p.source() + ": row " + p.rows()[i] + ": " + e.getMessage());
            }
            out.set(i, s, c);
        }
        return out;
    }

    private void set(int i, EosState s, Composition c) {
        P[i] = s.P();
        Pgas[i] = s.Pgas();
        Prad[i] = s.Prad();
        beta[i] = s.beta();
        oneMinusBeta[i] = s.oneMinusBeta();
        gamma1[i] = s.Gamma1();
        nablaAd[i] = s.nablaAd();
        soundSpeed[i] = s.soundSpeed();
        inverseMu[i] = 1.0 / c.mu();
        for (ValidityWarning w : s.warnings()) {
            warnings[i] |= w.code().bit();
        }
        messages.add(s.warnings());
    }
}
