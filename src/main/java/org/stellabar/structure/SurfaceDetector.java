package org.stellabar.structure;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.AbstractODEDetector;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventHandler;

/**
 * Detects the surface θ = 0 of a Lane-Emden integration in t = ln ξ. θ decreases monotonically
 * from the centre, so there is exactly one sign change and the check interval can be long; the
 * root is located to {@code threshold} in t, i.e. to that relative accuracy in ξ₁. What happens
 * at the surface is the handler's business (the solver's stops the integration).
 */
final class SurfaceDetector extends AbstractODEDetector<SurfaceDetector> {

    SurfaceDetector(AdaptableInterval maxCheck, int maxIter, BracketedUnivariateSolver<UnivariateFunction> solver,
            ODEEventHandler handler) {
        super(maxCheck, maxIter, solver, handler);
    }

    @Override
    protected SurfaceDetector create(AdaptableInterval maxCheck, int maxIter,
            BracketedUnivariateSolver<UnivariateFunction> solver, ODEEventHandler handler) {
        return new SurfaceDetector(maxCheck, maxIter, solver, handler);
    }

    @Override
    public double g(ODEStateAndDerivative state) {
        return state.getPrimaryState()[0];
    }
}
