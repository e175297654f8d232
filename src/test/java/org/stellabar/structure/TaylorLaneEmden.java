package org.stellabar.structure;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * An independent reference for the tests: the Lane-Emden equation for an integer index solved by
 * Taylor series in 50-digit decimal arithmetic. θⁿ is formed by repeated Cauchy products (exact
 * for integer n, and well defined through the surface, so the last series can be solved for its
 * root directly). Shares no code and no method with {@link LaneEmdenSolver}.
 *
 * <p>Centre: θ = Σ a_k ξ^(2k) with a_(k+1) = −b_k/((2k+2)(2k+3)), b = θⁿ, used out to ξ = 1/2.
 * Elsewhere, about ξ_c: θ = Σ a_j h^j with
 * a_(j+2) = −[(j+1)(j+2)a_(j+1) + ξ_c p_j + p_(j−1)]/(ξ_c (j+1)(j+2)), p = θⁿ (from
 * ξθ'' + 2θ' + ξθⁿ = 0). Each step's length is halved until the last series term is below 10⁻⁴⁰.
 */
final class TaylorLaneEmden {

    private static final MathContext MC = new MathContext(50, RoundingMode.HALF_EVEN);
    private static final int TERMS = 60;
    private static final BigDecimal SMALL = new BigDecimal("1e-40");

    /** ξ₁ and θ'(ξ₁). */
    record Surface(BigDecimal xi1, BigDecimal dtheta) {
        double omega() {
            return xi1.multiply(xi1, MC).multiply(dtheta, MC).negate().doubleValue();
        }
    }

    private TaylorLaneEmden() {
    }

    /** θ and dθ/dξ at ξ, for ξ below the surface. */
    static BigDecimal[] at(int n, double xiTarget) {
        return march(n, new BigDecimal(xiTarget, MC));
    }

    /** The surface. */
    static Surface surface(int n) {
        BigDecimal[] s = march(n, null);
        return new Surface(s[0], s[1]);
    }

    /** Marches out to target (returns θ, θ') or, with target null, to the surface (returns ξ₁, θ'). */
    private static BigDecimal[] march(int n, BigDecimal target) {
        BigDecimal xi = new BigDecimal("0.5");
        BigDecimal[] centre = central(n, xi);
        BigDecimal theta = centre[0];
        BigDecimal dtheta = centre[1];
        if (target != null && target.compareTo(xi) <= 0) {
            return central(n, target);
        }
        BigDecimal h = new BigDecimal("0.25");
        for (int step = 0; step < 100_000; step++) {
            BigDecimal[] a = coefficients(n, xi, theta, dtheta);
            BigDecimal hh = h;
            if (target != null && xi.add(hh).compareTo(target) > 0) {
                hh = target.subtract(xi);
            }
            while (a[TERMS - 1].abs().multiply(hh.abs().pow(TERMS - 1), MC).compareTo(SMALL) > 0) {
                hh = hh.divide(BigDecimal.valueOf(2), MC);
            }
            if (hh.signum() <= 0 || hh.abs().compareTo(new BigDecimal("1e-30")) < 0) {
                throw new IllegalStateException("Taylor step collapsed at xi = " + xi);
            }
            BigDecimal thetaNext = value(a, hh);
            if (target == null && thetaNext.signum() < 0) {
                BigDecimal root = root(a, hh);
                return new BigDecimal[] {xi.add(root), derivative(a, root)};
            }
            BigDecimal dthetaNext = derivative(a, hh);
            xi = xi.add(hh, MC);
            theta = thetaNext;
            dtheta = dthetaNext;
            if (target != null && xi.compareTo(target) >= 0) {
                return new BigDecimal[] {theta, dtheta};
            }
        }
        throw new IllegalStateException("Taylor march did not finish");
    }

    private static BigDecimal[] central(int n, BigDecimal xi) {
        int k = TERMS;
        BigDecimal[] a = new BigDecimal[k];
        BigDecimal[][] q = powers(n, k);
        a[0] = BigDecimal.ONE;
        extend(q, a, 0);
        for (int i = 0; i + 1 < k; i++) {
            a[i + 1] = q[n][i].negate().divide(BigDecimal.valueOf((2L * i + 2) * (2L * i + 3)), MC);
            extend(q, a, i + 1);
        }
        BigDecimal s = xi.multiply(xi, MC);
        BigDecimal theta = BigDecimal.ZERO;
        BigDecimal dtheta = BigDecimal.ZERO;
        BigDecimal sp = BigDecimal.ONE;
        for (int i = 0; i < k; i++) {
            theta = theta.add(a[i].multiply(sp, MC), MC);
            if (i > 0) {
                // d/dξ of a_i ξ^(2i) = 2i a_i ξ^(2i−1) = 2i a_i s^i / ξ
                dtheta = dtheta.add(a[i].multiply(sp, MC).multiply(BigDecimal.valueOf(2L * i), MC).divide(xi, MC), MC);
            }
            sp = sp.multiply(s, MC);
        }
        return new BigDecimal[] {theta, dtheta};
    }

    private static BigDecimal[] coefficients(int n, BigDecimal xc, BigDecimal theta, BigDecimal dtheta) {
        BigDecimal[] a = new BigDecimal[TERMS];
        BigDecimal[][] q = powers(n, TERMS);
        a[0] = theta;
        extend(q, a, 0);
        a[1] = dtheta;
        extend(q, a, 1);
        for (int j = 0; j + 2 < TERMS; j++) {
            BigDecimal pj = q[n][j];
            BigDecimal pjm1 = j > 0 ? q[n][j - 1] : BigDecimal.ZERO;
            BigDecimal f = BigDecimal.valueOf((long) (j + 1) * (j + 2));
            BigDecimal num = f.multiply(a[j + 1], MC).add(xc.multiply(pj, MC), MC).add(pjm1, MC);
            a[j + 2] = num.negate().divide(xc.multiply(f, MC), MC);
            extend(q, a, j + 2);
        }
        return a;
    }

    /** Tables q[e][j] for the coefficients of θ^e, e = 0..n; q[0] is the series 1. */
    private static BigDecimal[][] powers(int n, int count) {
        BigDecimal[][] q = new BigDecimal[n + 1][count];
        for (BigDecimal[] row : q) {
            java.util.Arrays.fill(row, BigDecimal.ZERO);
        }
        q[0][0] = BigDecimal.ONE;
        return q;
    }

    /** Once a[m] is known, fills q[e][m] = Σ_i a_i q[e−1][m−i] for every power e ≥ 1 (Cauchy products). */
    private static void extend(BigDecimal[][] q, BigDecimal[] a, int m) {
        for (int e = 1; e < q.length; e++) {
            BigDecimal s = BigDecimal.ZERO;
            for (int i = 0; i <= m; i++) {
                s = s.add(a[i].multiply(q[e - 1][m - i], MC), MC);
            }
            q[e][m] = s;
        }
    }

    private static BigDecimal value(BigDecimal[] a, BigDecimal h) {
        BigDecimal s = BigDecimal.ZERO;
        for (int j = a.length - 1; j >= 0; j--) {
            s = s.multiply(h, MC).add(a[j], MC);
        }
        return s;
    }

    private static BigDecimal derivative(BigDecimal[] a, BigDecimal h) {
        BigDecimal s = BigDecimal.ZERO;
        for (int j = a.length - 1; j >= 1; j--) {
            s = s.multiply(h, MC).add(a[j].multiply(BigDecimal.valueOf(j), MC), MC);
        }
        return s;
    }

    /** Newton on the step's polynomial for its root in (0, hMax). */
    private static BigDecimal root(BigDecimal[] a, BigDecimal hMax) {
        BigDecimal h = hMax.divide(BigDecimal.valueOf(2), MC);
        for (int i = 0; i < 200; i++) {
            BigDecimal step = value(a, h).divide(derivative(a, h), MC);
            h = h.subtract(step, MC);
            if (step.abs().compareTo(new BigDecimal("1e-45")) < 0) {
                return h;
            }
        }
        throw new IllegalStateException("Taylor root did not converge");
    }
}
