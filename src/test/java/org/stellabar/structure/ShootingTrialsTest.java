package org.stellabar.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.junit.jupiter.api.Test;

/**
 * The memo of a shooting solve's trials: the solve takes the same path and finds the same root,
 * bit for bit, while each trial value is integrated once, and the root's trial is handed back
 * without integrating it again.
 */
class ShootingTrialsTest {

    /** A trial's "star": the value it was made for and the order it was made in. */
    private record Trial(double x, int made) {
    }

    /** A misfit with its root at 2^(1/3), pure in x; curved, so that Brent takes several steps. */
    private static double misfit(double x) {
        return x * x * x - 2.0;
    }

    @Test
    void aBrentSolveTakesTheSamePathWhileEachTrialIsIntegratedOnce() {
        List<Double> plainPath = new ArrayList<>();
        UnivariateFunction plain = x -> {
            plainPath.add(x);
            return misfit(x);
        };
        List<Double> memoPath = new ArrayList<>();
        List<Double> integrated = new ArrayList<>();
        ShootingTrials<Trial> trials = new ShootingTrials<>(x -> {
            integrated.add(x);
            return new Trial(x, integrated.size());
        }, t -> misfit(t.x()));
        UnivariateFunction memo = x -> {
            memoPath.add(x);
            return trials.value(x);
        };
        // the callers' pattern: both ends evaluated first, then Brent on the bracket
        double lo = 0.5;
        double hi = 3.0;
        plain.value(lo);
        plain.value(hi);
        memo.value(lo);
        memo.value(hi);
        double plainRoot = new BracketingNthOrderBrentSolver(1e-14, 1e-12, 1e-15, 5).solve(80, plain, lo, hi,
                AllowedSolution.ANY_SIDE);
        double memoRoot = new BracketingNthOrderBrentSolver(1e-14, 1e-12, 1e-15, 5).solve(80, memo, lo, hi,
                AllowedSolution.ANY_SIDE);

        assertEquals(plainPath, memoPath, "the solve asks for the same trials in the same order");
        assertEquals(Double.doubleToRawLongBits(plainRoot), Double.doubleToRawLongBits(memoRoot));
        assertEquals(Math.cbrt(2.0), memoRoot, 1e-12);
        // Brent evaluates the lower end again: at least one repeat, each answered from the memo
        assertEquals(new HashSet<>(memoPath).size(), integrated.size(), "each distinct trial integrated once");
        assertTrue(integrated.size() < memoPath.size(), integrated.size() + " of " + memoPath.size());
        assertEquals(integrated.size(), trials.integrations());

        int before = integrated.size();
        Trial root = trials.star(memoRoot);
        assertEquals(before, integrated.size(), "the root's trial is kept, not integrated again");
        assertEquals(Double.doubleToRawLongBits(memoRoot), Double.doubleToRawLongBits(root.x()));
        Trial other = trials.star(lo);
        assertEquals(before + 1, integrated.size(), "any other trial is integrated afresh");
        assertEquals(lo, other.x());
    }

    @Test
    void aTrialThatFailsIsNotKeptAndFailsAgain() {
        int[] attempts = {0};
        ShootingTrials<Trial> trials = new ShootingTrials<>(x -> {
            attempts[0]++;
            if (x < 0) {
                throw new IllegalStateException("no star at " + x);
            }
            return new Trial(x, attempts[0]);
        }, t -> misfit(t.x()));
        assertThrows(IllegalStateException.class, () -> trials.value(-1.0));
        assertThrows(IllegalStateException.class, () -> trials.value(-1.0));
        assertEquals(2, attempts[0]);
        assertEquals(0, trials.integrations());
        assertEquals(misfit(1.0), trials.value(1.0));
        assertEquals(misfit(1.0), trials.value(1.0));
        assertEquals(3, attempts[0]);
    }
}
