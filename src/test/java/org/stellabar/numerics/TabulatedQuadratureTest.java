package org.stellabar.numerics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

class TabulatedQuadratureTest {

    private static double[] randomGrid(Random random, int k, double a, double b) {
        double[] x = new double[k];
        for (int i = 0; i < k; i++) {
            x[i] = a + (b - a) * random.nextDouble();
        }
        x[0] = a;
        x[k - 1] = b;
        Arrays.sort(x);
        return x;
    }

    // Exact for quadratics on any grid (each interval is integrated under an interpolating
    // parabola): only rounding, 1e-13 relative.
    @Test
    void exactForQuadraticsOnRandomGrids() {
        Random random = new Random(20240601L);
        for (int trial = 0; trial < 50; trial++) {
            int k = 3 + random.nextInt(40);
            double[] x = randomGrid(random, k, -1.0 + random.nextDouble(), 2.0 + random.nextDouble());
            double c0 = random.nextGaussian();
            double c1 = random.nextGaussian();
            double c2 = random.nextGaussian();
            double[] f = Arrays.stream(x).map(v -> c0 + c1 * v + c2 * v * v).toArray();
            double[] cumulative = TabulatedQuadrature.cumulative(x, f);
            for (int i = 0; i < k; i++) {
                double exact = antiderivative(c0, c1, c2, x[i]) - antiderivative(c0, c1, c2, x[0]);
                assertEquals(exact, cumulative[i], 1e-12 * (1.0 + Math.abs(exact)), "node " + i + " of " + k);
            }
        }
    }

    private static double antiderivative(double c0, double c1, double c2, double x) {
        return c0 * x + c1 * x * x / 2.0 + c2 * x * x * x / 3.0;
    }

    // Exact for cubics on uniform grids (the averaged parabolas cancel the cubic term there).
    @Test
    void exactForCubicsOnUniformGrids() {
        int k = 17;
        double[] x = new double[k];
        double[] f = new double[k];
        for (int i = 0; i < k; i++) {
            x[i] = 0.5 + 0.25 * i;
            f[i] = x[i] * x[i] * x[i] - 2.0 * x[i];
        }
        double b = x[k - 1];
        double exact = (Math.pow(b, 4) - Math.pow(0.5, 4)) / 4.0 - (b * b - 0.25);
        assertEquals(exact, TabulatedQuadrature.integral(x, f), 1e-12 * exact);
    }

    // Order of convergence on a smooth function: halving h must cut the error by ~16 (fourth
    // order in the interior; the third-order end intervals contribute h⁴ in total as well).
    @Test
    void fourthOrderOnSmoothFunctions() {
        double e1 = errorOfSine(41);
        double e2 = errorOfSine(81);
        double ratio = e1 / e2;
        assertTrue(ratio > 12.0 && ratio < 20.0, "error ratio " + ratio);
        assertTrue(e2 < 5e-7, "error " + e2);
    }

    private static double errorOfSine(int k) {
        double[] x = new double[k];
        double[] f = new double[k];
        for (int i = 0; i < k; i++) {
            x[i] = Math.PI * i / (k - 1);
            f[i] = Math.sin(x[i]) * Math.exp(x[i] / 3.0);
        }
        // ∫₀^π sin x e^{x/3} dx = (e^{π/3} + 1) · 9/10
        double exact = 0.9 * (Math.exp(Math.PI / 3.0) + 1.0);
        return Math.abs(TabulatedQuadrature.integral(x, f) - exact);
    }

    @Test
    void twoNodesIsTheTrapezoid() {
        assertEquals(3.0, TabulatedQuadrature.integral(new double[] {1.0, 2.0}, new double[] {1.0, 5.0}), 0.0);
    }

    // The trapezoidal rule on a grid with a repeated node: exact for straight lines, and the
    // interval of zero width adds nothing (closed form, ∫₀³ (2x + 1) dx = 12).
    @Test
    void trapezoidsAcceptRepeatedNodes() {
        double[] x = {0.0, 1.0, 1.0, 2.5, 3.0};
        double[] f = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            f[i] = 2.0 * x[i] + 1.0;
        }
        assertEquals(12.0, TabulatedQuadrature.trapezoid(x, f), 1e-15);
        double[] running = TabulatedQuadrature.trapezoidCumulative(x, f);
        assertEquals(running[1], running[2], 0.0);
        assertEquals(12.0, running[4], 1e-15);
        assertTrue(TabulatedQuadrature.strictlyIncreasing(new double[] {0.0, 1.0, 2.0}));
        assertTrue(!TabulatedQuadrature.strictlyIncreasing(x));
    }

    @Test
    void refusesBadGrids() {
        assertThrows(IllegalArgumentException.class,
                () -> TabulatedQuadrature.integral(new double[] {0, 1, 1}, new double[] {0, 1, 2}));
        assertThrows(IllegalArgumentException.class,
                () -> TabulatedQuadrature.integral(new double[] {0}, new double[] {0}));
        assertThrows(IllegalArgumentException.class,
                () -> TabulatedQuadrature.integral(new double[] {0, 1}, new double[] {0}));
    }
}
