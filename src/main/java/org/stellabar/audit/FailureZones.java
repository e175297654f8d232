package org.stellabar.audit;

import java.util.ArrayList;
import java.util.List;
import org.stellabar.eos.ValidityWarning;
import org.stellabar.eos.ValidityWarning.Regime;

/** Finds the runs of neighbouring shells where a validity check of the equation of state fails. */
final class FailureZones {

    /** The regimes listed as failures of the description (radiation dominance is not one). */
    static final List<Regime> FAILURES = List.of(Regime.ELECTRON_DEGENERACY, Regime.RELATIVISTIC_ELECTRONS,
            Regime.PAIR_CREATION, Regime.COULOMB_COUPLING, Regime.PARTIAL_IONIZATION);

    private FailureZones() {
    }

    /**
     * @param rows the data-row number of each shell
     * @param states our states, with their warnings
     * @param m enclosed mass [g] of each shell, or null to leave the zones without mass fractions
     * @param M the total mass [g] (ignored without m)
     * @return the zones, regime by regime in the order of {@link #FAILURES}, centre outwards
     */
    static List<FailureZone> find(int[] rows, ShellStates states, double[] m, double M) {
        List<FailureZone> zones = new ArrayList<>();
        int[] warnings = states.warnings();
        int n = rows.length;
        for (Regime regime : FAILURES) {
            int i = 0;
            while (i < n) {
                if ((warnings[i] & regime.bit()) == 0) {
                    i++;
                    continue;
                }
                int start = i;
                while (i < n && (warnings[i] & regime.bit()) != 0) {
                    i++;
                }
                zones.add(zone(regime, rows, start, i - 1, states.messages().get(start), m, M));
            }
        }
        return zones;
    }

    private static FailureZone zone(Regime regime, int[] rows, int start, int end, List<ValidityWarning> messages,
            double[] m, double M) {
        String message = messages.stream().filter(w -> w.code() == regime).findFirst()
                .map(ValidityWarning::message).orElse(regime.code());
        double inner = m == null ? Double.NaN : m[start] / M;
        double outer = m == null ? Double.NaN : m[end] / M;
        return new FailureZone(regime, Math.min(rows[start], rows[end]), Math.max(rows[start], rows[end]),
                end - start + 1, inner, outer, message);
    }
}
