#!/usr/bin/python3
"""Entropy density of the electron-positron gas at non-degenerate (eta < 0) states, 30 digits.

Regenerates exactly:
    validation/fermi/pair-entropy-mpmath.csv

    /usr/bin/python3 validation/scripts/pair_entropy_mpmath.py

Needs Python 3 and mpmath. Independent of the Java code in method: eta from charge neutrality as in
pair_gas_mpmath.py (tanh-sinh quadrature, findroot), then the entropy of each species as the integral over
the states of the entropy per state, sigma = -[f ln f + (1 - f) ln(1 - f)] (Landau & Lifshitz, Statistical
Physics, par. 55), with the density of states of the relativistic gas:
    s / k = A theta^(3/2) int_0^inf x^(1/2) (1 + theta x) (1 + theta x / 2)^(1/2) sigma(x - eta) dx,
A = 8 pi sqrt(2) (m_e c / h)^3 (Cox & Giuli 1968, ch. 24), summed over electrons (eta) and positrons
(eta+ = -eta - 2/theta). The Java code forms this, for eta < 0, from the identity T s = E + P - mu n per
species instead: this is the check that the identity and the positrons' convention are right.
Composition: pure oxygen-16 (mu_e = 2).
"""

import sys

sys.dont_write_bytecode = True

import os  # noqa: E402

from mpmath import mp, mpf, quad, sqrt, exp, log, pi, nstr, inf  # noqa: E402

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import pair_gas_mpmath as pg  # noqa: E402

mp.dps = 30

POINTS = [  # rho g/cm3, T K, regime
    ("1e4", "2e9", "pair-rich, eta about -2.9"),
    ("1e-2", "5e9", "pair-dominated"),
    ("1e2", "1e7", "classical, eta about -1.6"),
    ("1e-13", "1e8", "Boltzmann limit, eta below -37"),
]


def entropy_integral(eta, theta):
    """int_0^inf x^(1/2)(1 + theta x)(1 + theta x/2)^(1/2) sigma dx, sigma the entropy per state."""
    def integrand(x):
        y = x - eta
        # sigma = ln(1 + e^-|y|) + |y| e^-|y| / (1 + e^-|y|), even in y, without cancellation
        e = exp(-abs(y))
        sigma = log(1 + e) + abs(y) * e / (1 + e)
        return sqrt(x) * (1 + theta * x) * sqrt(1 + theta * x / 2) * sigma
    top = max(eta, mpf(0))
    return quad(integrand, [0, top / 2 + mpf("0.5"), top, top + 10, top + 60, inf])


def row(rho_text, t_text, regime):
    rho = mpf(rho_text)
    T = mpf(t_text)
    theta = pg.K * T / pg.MC2
    eta = pg.pair_gas(rho, T)[0]
    a = 8 * pi * sqrt(2) * (pg.MC / pg.H) ** 3
    eta_plus = -eta - 2 / theta
    s = entropy_integral(eta, theta)
    if eta_plus > -3000:
        s += entropy_integral(eta_plus, theta)
    s *= a * theta ** mpf(1.5)
    return ",".join([rho_text, t_text, nstr(eta, 17), nstr(s, 17), regime])


def main():
    lines = [
        "# Entropy density over k [cm^-3] of electrons + positrons, pure oxygen-16, computed at 30 digits by",
        "# validation/scripts/pair_entropy_mpmath.py (integral of the entropy per state, mpmath tanh-sinh quadrature;",
        "# eta by findroot on neutrality); printed to 17 digits.",
        "rho,T,eta,pair_entropy_over_k,regime",
    ]
    for rho, t, regime in POINTS:
        lines.append(row(rho, t, regime))
    path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "fermi", "pair-entropy-mpmath.csv")
    with open(path, "w") as out:
        out.write("\n".join(lines) + "\n")


if __name__ == "__main__":
    main()
