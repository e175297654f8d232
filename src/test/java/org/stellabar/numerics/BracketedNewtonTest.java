package org.stellabar.numerics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;
import org.stellabar.physics.ConvergenceException;

class BracketedNewtonTest {

    /** A function from two lambdas that counts its evaluations. */
    private static final class Counted implements BracketedNewton.Function {
        private final DoubleUnaryOperator value;
        private final DoubleUnaryOperator derivative;
        int calls;

        Counted(DoubleUnaryOperator value, DoubleUnaryOperator derivative) {
            this.value = value;
            this.derivative = derivative;
        }

        @Override
        public double value(double x) {
            calls++;
            return value.applyAsDouble(x);
        }

        @Override
        public double derivative(double x) {
            return derivative.applyAsDouble(x);
        }
    }

    @Test
    void cubeRootOfTwo() {
        // closed form: the root of x^3 - 2 is 2^(1/3); Newton ends within an ulp or two
        Counted f = new Counted(x -> x * x * x - 2.0, x -> 3.0 * x * x);
        double root = BracketedNewton.solve("cube root", f, 0.0, 2.0, 1e-15);
        assertEquals(Math.cbrt(2.0), root, 4e-16 * Math.cbrt(2.0));
        assertTrue(f.calls < 20, "quadratic convergence near a simple root: " + f.calls + " calls");
    }

    @Test
    void decreasingFunctionAndReversedBracket() {
        Counted f = new Counted(x -> 2.0 - x * x * x, x -> -3.0 * x * x);
        assertEquals(Math.cbrt(2.0), BracketedNewton.solve("cube root", f, 2.0, 0.0, 1e-15), 1e-15);
    }

    @Test
    void fixedPointOfCosine() {
        // identity check rather than a tabulated value: the root r of cos x - x satisfies cos r = r
        Counted f = new Counted(x -> Math.cos(x) - x, x -> -Math.sin(x) - 1.0);
        double r = BracketedNewton.solve("cos x = x", f, 0.0, 1.0, 1e-15);
        assertEquals(r, Math.cos(r), 2e-16);
        // 0.739085133215160641655... (Dottie number, from memory)
        assertEquals(0.7390851332151607, r, 2e-16);
    }

    /**
     * Regression: from the midpoint 0 the Newton step of tanh(x − 7) (f' = sech² ≈ 3e-6) leaves
     * the bracket, so the first step is a bisection; an earlier version returned the midpoint
     * itself as the root at that point.
     */
    @Test
    void firstStepABisectionStillConverges() {
        Counted f = new Counted(x -> Math.tanh(x - 7.0), x -> {
            double c = Math.cosh(x - 7.0);
            return 1.0 / (c * c);
        });
        assertEquals(7.0, BracketedNewton.solve("tanh", f, -10.0, 10.0, 1e-15), 1e-14);
    }

    @Test
    void newtonThatWouldDivergeIsKeptInsideTheBracket() {
        // plain Newton on atan from x0 far from the root overshoots and diverges; the bracket stops it
        Counted f = new Counted(x -> Math.atan(x - 1e3), x -> 1.0 / (1.0 + (x - 1e3) * (x - 1e3)));
        assertEquals(1e3, BracketedNewton.solve("atan", f, -1e4, 1e4, 1e-15), 1e-12);
    }

    @Test
    void jumpWithZeroDerivativeEndsByBisectionWithinTheBound() {
        // a sign change with f' = 0 everywhere: pure bisection onto the jump at x = 1
        Counted f = new Counted(x -> x < 1.0 ? -1.0 : 1.0, x -> 0.0);
        double root = BracketedNewton.solve("step", f, 0.0, 3.0, 0.0);
        assertEquals(1.0, root, 4e-16);
        assertTrue(f.calls <= BracketedNewton.MAX_ITERATIONS + 3, f.calls + " calls");
    }

    @Test
    void rootAtAnEndOfTheBracket() {
        Counted f = new Counted(x -> x - 1.0, x -> 1.0);
        assertEquals(1.0, BracketedNewton.solve("end", f, 1.0, 5.0, 1e-15));
        assertEquals(5.0, BracketedNewton.solve("end", new Counted(x -> x - 5.0, x -> 1.0), 1.0, 5.0, 1e-15));
    }

    @Test
    void noSignChangeIsAFailure() {
        Counted f = new Counted(x -> x * x + 1.0, x -> 2.0 * x);
        assertThrows(ConvergenceException.class, () -> BracketedNewton.solve("no root", f, -1.0, 1.0, 1e-15));
    }

    @Test
    void notANumberIsAFailure() {
        Counted atEnd = new Counted(x -> x > 0.5 ? Double.NaN : -1.0, x -> 1.0);
        assertThrows(ConvergenceException.class, () -> BracketedNewton.solve("nan", atEnd, 0.0, 1.0, 1e-15));
        Counted inside = new Counted(x -> x == 0.0 || x == 4.0 ? x - 1.0 : Double.NaN, x -> 1.0);
        assertThrows(ConvergenceException.class, () -> BracketedNewton.solve("nan", inside, 0.0, 4.0, 1e-15));
    }
}
