package org.stellabar.structure;

import java.util.Objects;
import java.util.function.DoubleFunction;

/**
 * What every {@link StarModelBuilder} may share: the Lane-Emden solutions (solved once per index)
 * and the standard model (for L/L_Edd of kinds that do not fix L).
 *
 * @param polytropes the Lane-Emden solution of index n, 0 ≤ n &lt; 5, cached
 * @param standardModel Eddington's standard model
 */
public record StarBuildContext(DoubleFunction<LaneEmdenSolution> polytropes, EddingtonStandardModel standardModel) {

    /**
     * Fewest profile rows the stability integrals are computed on, whatever the table's rows: with
     * the fourth-order {@link org.stellabar.numerics.TabulatedQuadrature}, ⟨Γ1⟩ and K are then good to ~1e-9 (to ~1e-6 at
     * 200 rows, and off by per cent at a handful).
     */
    public static final int STABILITY_POINTS = 1001;

    /**
     * Canonical constructor: no component may be null.
     *
     * @param polytropes the Lane-Emden solution of index n, 0 ≤ n &lt; 5, cached
     * @param standardModel Eddington's standard model
     */
    public StarBuildContext {
        Objects.requireNonNull(polytropes, "polytropes");
        Objects.requireNonNull(standardModel, "standardModel");
    }

    /**
     * @param n polytropic index
     * @return the Lane-Emden solution
     */
    public LaneEmdenSolution polytrope(double n) {
        return polytropes.apply(n);
    }
}
