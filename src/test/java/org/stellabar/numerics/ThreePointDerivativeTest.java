package org.stellabar.numerics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

class ThreePointDerivativeTest {

    @Test
    void exactForQuadraticsOnARandomGrid() {
        Random random = new Random(7);
        double[] x = new double[12];
        for (int i = 1; i < x.length; i++) {
            x[i] = x[i - 1] + 0.05 + random.nextDouble();
        }
        double[] f = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            f[i] = 3.0 - 2.0 * x[i] + 0.7 * x[i] * x[i];
        }
        double[] d = ThreePointDerivative.of(x, f);
        for (int i = 0; i < x.length; i++) {
            // a quadratic is reproduced exactly; only rounding of O(10) values remains
            assertEquals(-2.0 + 1.4 * x[i], d[i], 1e-11, "node " + i);
        }
    }

    @Test
    void errorOfACubicMatchesTheTruncationTerm() {
        // f = x³, f''' = 6: interior error +f'''h₁h₂/6 = h₁h₂, end error −f'''h(h₁+h₂)/6 with h the
        // step next to the end node (Taylor expansion of the Lagrange weights; for equal steps the
        // familiar +h²f'''/6 and −h²f'''/3)
        double[] x = {0.0, 0.1, 0.3, 0.6};
        double[] f = new double[4];
        for (int i = 0; i < 4; i++) {
            f[i] = x[i] * x[i] * x[i];
        }
        double[] d = ThreePointDerivative.of(x, f);
        assertEquals(3 * 0.01 + 0.1 * 0.2, d[1], 1e-14);
        assertEquals(3 * 0.09 + 0.2 * 0.3, d[2], 1e-14);
        assertEquals(0.0 - 0.1 * 0.3, d[0], 1e-14);
        // last node: steps 0.2 then 0.3, the one next to the end 0.3
        assertEquals(3 * 0.36 - 0.3 * 0.5, d[3], 1e-13);
    }
}
