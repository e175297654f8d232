package org.stellabar.structure;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.AbstractODEDetector;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventHandler;

/**
 * Fires where the scaled pressure p = P/P_c (state component 0) falls to a given small fraction:
 * the point where an outward structure integration stops short of its surface, where P → 0 and
 * the density with it. What happens there is the handler's business.
 */
final class PressureFractionDetector extends AbstractODEDetector<PressureFractionDetector> {

    private final double fraction;

    /**
     * @param fraction the value of P/P_c at which to fire, in (0, 1)
     * @param maxCheck largest interval between checks of the sign of g
     * @param maxIter bound on the root search's iterations
     * @param solver root solver locating the crossing
     * @param handler what to do when it fires
     */
    PressureFractionDetector(double fraction, AdaptableInterval maxCheck, int maxIter,
            BracketedUnivariateSolver<UnivariateFunction> solver, ODEEventHandler handler) {
        super(maxCheck, maxIter, solver, handler);
        this.fraction = fraction;
    }

    @Override
    public double g(ODEStateAndDerivative state) {
        return state.getPrimaryState()[IsentropicEquations.PRESSURE] - fraction;
    }

    @Override
    protected PressureFractionDetector create(AdaptableInterval newMaxCheck, int newMaxIter,
            BracketedUnivariateSolver<UnivariateFunction> newSolver, ODEEventHandler newHandler) {
        return new PressureFractionDetector(fraction, newMaxCheck, newMaxIter, newSolver, newHandler);
    }
}
