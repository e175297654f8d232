package org.stellabar.structure;

import java.util.HashMap;
import java.util.Map;
import java.util.function.DoubleFunction;
import java.util.function.ToDoubleFunction;
import org.hipparchus.analysis.UnivariateFunction;

/**
 * The trial integrations of one shooting solve, each made once. The misfit of a trial value is a
 * pure function of it, so a value met again is answered with the number found the first time,
 * bit for bit, and the solve takes exactly the path it took before.
 *
 * <p>Why. A bracketed search evaluates both ends of its bracket, and Hipparchus'
 * {@link org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver} then evaluates them again
 * (it starts from f(min), f(mid) and, when needed, f(max)); the caller then integrates the star
 * at the root the solver returns, which is always one of the points it evaluated. For an
 * 80 M☉ oxygen core on the fermi equation of state 5 of its 23 integrations were such repeats.
 * The star of the smallest misfit so far is kept: the root the solver returns is the end of its
 * last bracket with the smaller |misfit|, or a point whose misfit is below its accuracy, in either
 * case that star; any other point is integrated afresh (the same star, only slower).
 *
 * <p>One solve at a time, on one thread; a new instance per solve.
 *
 * @param <S> what a trial integrates (a star)
 */
final class ShootingTrials<S> implements UnivariateFunction {

    private final DoubleFunction<S> integrate;
    private final ToDoubleFunction<S> misfitOf;
    private final Map<Long, Double> misfits = new HashMap<>();
    private S closest;
    private long closestBits;
    private double closestMisfit = Double.POSITIVE_INFINITY;

    /**
     * @param integrate the star of a trial value (may throw for a value without one; nothing is
     *     kept then, and the value met again throws again)
     * @param misfitOf what the solve drives to zero, from that star
     */
    ShootingTrials(DoubleFunction<S> integrate, ToDoubleFunction<S> misfitOf) {
        this.integrate = integrate;
        this.misfitOf = misfitOf;
    }

    @Override
    public double value(double trial) {
        long bits = Double.doubleToRawLongBits(trial);
        Double known = misfits.get(bits);
        if (known != null) {
            return known;
        }
        S star = integrate.apply(trial);
        double misfit = misfitOf.applyAsDouble(star);
        misfits.put(bits, misfit);
        if (Math.abs(misfit) < closestMisfit) {
            closestMisfit = Math.abs(misfit);
            closest = star;
            closestBits = bits;
        }
        return misfit;
    }

    /**
     * @param trial the trial value the solve settled on
     * @return its star: the one kept when it is the closest so far, otherwise integrated
     */
    S star(double trial) {
        if (closest != null && Double.doubleToRawLongBits(trial) == closestBits) {
            return closest;
        }
        return integrate.apply(trial);
    }

    /** @return how many distinct trial values were integrated (for tests) */
    int integrations() {
        return misfits.size();
    }
}
