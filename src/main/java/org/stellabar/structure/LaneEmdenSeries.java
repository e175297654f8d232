package org.stellabar.structure;

/**
 * The power series of the Lane-Emden function about the centre,
 * θ = 1 − ξ²/6 + nξ⁴/120 − n(8n − 5)ξ⁶/15120 + O(ξ⁸) (Chandrasekhar 1939, <i>An Introduction to
 * the Study of Stellar Structure</i>, ch. IV, eq. 91; Horedt 2004, <i>Polytropes</i>, §2.3), used
 * where the equation's 2/ξ term is singular: inside ξ ≤ {@link #RADIUS} the neglected ξ⁸ term is
 * below 10⁻²⁰ for every n &lt; 5.
 */
final class LaneEmdenSeries {

    /** Radius out to which the series stands in for the integration. */
    static final double RADIUS = 1e-2;

    private LaneEmdenSeries() {
    }

    /** @return θ(ξ) from the series */
    static double theta(double n, double xi) {
        double x2 = xi * xi;
        return 1.0 + x2 * (-1.0 / 6.0 + x2 * (n / 120.0 - x2 * n * (8.0 * n - 5.0) / 15120.0));
    }

    /** @return ξ dθ/dξ from the series */
    static double xiDtheta(double n, double xi) {
        double x2 = xi * xi;
        return x2 * (-1.0 / 3.0 + x2 * (n / 30.0 - x2 * n * (8.0 * n - 5.0) / 2520.0));
    }
}
