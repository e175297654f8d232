/**
 * Small numerical building blocks that Hipparchus does not offer in the form the inner loops
 * need (allocation-free, derivative-aware). Everything else numerical comes from Hipparchus.
 *
 * <ul>
 *   <li>{@link org.stellabar.numerics.BracketedNewton}: a root by Newton steps kept inside a
 *       bracket.</li>
 *   <li>{@link org.stellabar.numerics.ThreePointDerivative}: the first derivative of tabulated
 *       values on a non-uniform grid (three-point Lagrange, second order).</li>
 *   <li>{@link org.stellabar.numerics.TabulatedQuadrature}: integrals and running integrals of
 *       tabulated values on a non-uniform grid (piecewise parabolas, fourth order inside; the
 *       trapezoidal rule for grids with repeated nodes).</li>
 * </ul>
 *
 * <p>These are the project's only derivative and quadrature of tabulated data: {@code structure}
 * and {@code audit} both call them.
 *
 * <p><b>Internal.</b> Not part of the API (see {@link org.stellabar.api}): public for the other
 * packages of stellabar, and free to change between versions.
 */
package org.stellabar.numerics;
