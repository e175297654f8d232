package org.stellabar.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.stellabar.physics.Constants.GRAVITATION;
import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.Arrays;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stellabar.structure.LaneEmdenProfile;
import org.stellabar.structure.LaneEmdenSolution;
import org.stellabar.structure.LaneEmdenSolver;

class ProfileIntegralsTest {

    static final LaneEmdenSolver SOLVER = new LaneEmdenSolver();
    static final double M = 50.0 * SOLAR_MASS;
    static final double R = 12.0 * SOLAR_RADIUS;

    /** A Lane-Emden solution scaled to M and R, sampled at k points: r, m, ρ, P by rows 0..3. */
    static double[][] scaled(LaneEmdenSolution s, int k) {
        LaneEmdenProfile p = s.sample(k);
        double alpha = R / s.xi1();
        double rhoC = s.centralToMeanDensity() * 3.0 * M / (4.0 * Math.PI * Math.pow(R, 3));
        double pC = s.centralPressureCoefficient() * GRAVITATION * M * M / Math.pow(R, 4);
        return new double[][] {
            Arrays.stream(p.xi()).map(xi -> alpha * xi).toArray(),
            Arrays.stream(p.massFraction()).map(x -> M * x).toArray(),
            Arrays.stream(p.densityRatio()).map(x -> rhoC * x).toArray(),
            Arrays.stream(p.pressureRatio()).map(x -> pC * x).toArray()};
    }

    // m(R) = M from ∫4πr²ρ dr on a scaled n = 1 and n = 3 profile of 4001 shells (the dense-output
    // version to 1e-10 is in LaneEmdenSolverTest): fourth-order quadrature, 1e-9. Moved here from
    // StabilityAnalysisTest with the integration (formerly also in RadialProfile.fromDensity).
    @ParameterizedTest
    @ValueSource(doubles = {1.0, 3.0})
    void massFromRadiusOfAScaledPolytrope(double n) {
        double[][] p = scaled(SOLVER.solve(n), 4001);
        double[] m = ProfileIntegrals.massFromRadius(p[0], p[2]);
        assertEquals(M, m[m.length - 1], 1e-9 * M);
    }
}
