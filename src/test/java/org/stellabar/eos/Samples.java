package org.stellabar.eos;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/** Seeded log-uniform samples of the (ρ, T) plane and small assertion helpers for the EOS tests. */
final class Samples {

    /** The plane the consistency checks cover: ρ ∈ [1e-12, 1e9] g/cm3, T ∈ [1e3, 1e10] K. */
    static final double LOG_RHO_MIN = -12;
    static final double LOG_RHO_MAX = 9;
    static final double LOG_T_MIN = 3;
    static final double LOG_T_MAX = 10;

    /** The compositions sampled: solar-like, pure H, pure He, metal-rich with metal ions counted. */
    static final List<Composition> COMPOSITIONS = List.of(Composition.of(0.70, 0.28, 0.02), Composition.of(1, 0, 0),
            Composition.of(0, 1, 0), Composition.of(0.2, 0.5, 0.3).withMetalMassNumber(16));

    private Samples() {
    }

    /** @return n points {ρ, T}, log-uniform over the plane, reproducible from the seed */
    static List<double[]> plane(long seed, int n) {
        Random random = new Random(seed);
        List<double[]> points = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            double logRho = LOG_RHO_MIN + (LOG_RHO_MAX - LOG_RHO_MIN) * random.nextDouble();
            double logT = LOG_T_MIN + (LOG_T_MAX - LOG_T_MIN) * random.nextDouble();
            points.add(new double[] {Math.pow(10, logRho), Math.pow(10, logT)});
        }
        return points;
    }

    /** |actual − expected| ≤ tolerance · scale, with a message that shows the relative error. */
    static void near(double expected, double actual, double tolerance, double scale, String what) {
        double error = Math.abs(actual - expected);
        if (!(error <= tolerance * scale)) {
            throw new AssertionError(String.format("%s: expected %.17g, got %.17g; error %.3g of scale %.3g"
                    + " exceeds %.1g", what, expected, actual, error / scale, scale, tolerance));
        }
    }

    /** Relative closeness. */
    static void relative(double expected, double actual, double tolerance, String what) {
        near(expected, actual, tolerance, Math.abs(expected), what);
    }
}
