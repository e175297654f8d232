#!/usr/bin/python3
"""Reference values for the strongly degenerate Fermi-Dirac integrals (eta >= 100), at 30 digits.

Regenerates exactly:
    validation/fermi/degenerate-series-mpmath.csv

    /usr/bin/python3 validation/scripts/degenerate_series_mpmath.py

Needs Python 3 and mpmath (Debian: python3-mpmath).
Each value is mpmath tanh-sinh quadrature of its definition with the range split at x = 0, eta - 40,
eta - 10, eta, eta + 10, eta + 40 and infinity (our own; independent of the Gauss-Legendre sums and
the Sommerfeld series in DegenerateSeries.java):
    F_k      = int x^k sqrt(1 + theta x/2) f dx,              f = 1/(exp(x - eta) + 1), k = 1/2, 3/2, 5/2
    dF_k/deta = int x^k sqrt(1 + theta x/2) f (1 - f) dx
    dF_k/dtheta = int x^(k+1) / (4 sqrt(1 + theta x/2)) f dx
    entropy  = int x^(1/2) (1 + theta x) sqrt(1 + theta x/2) sigma dx, sigma = -[f ln f + (1-f) ln(1-f)]
    S''      = int x^(1/2) (1 + theta x) sqrt(1 + theta x/2) f (1 - f) (1 - 2 f) dx
(definitions as in Cox & Giuli 1968, Principles of Stellar Structure, ch. 24; sigma is the entropy per
state, Landau & Lifshitz, Statistical Physics, section 55).
"""

import sys

sys.dont_write_bytecode = True  # keep the scripts folder free of __pycache__

import os  # noqa: E402

from mpmath import mp, mpf, quad, sqrt, exp, log1p, nstr, inf  # noqa: E402

mp.dps = 30

ETAS = ["100", "150", "168.91545838558946", "300", "1000", "30000", "1000000"]
THETAS = ["0", "1e-6", "0.016863700526605515", "0.3", "10", "10000"]


def breakpoints(eta):
    points = [mpf(0)]
    for p in (eta - 40, eta - 10, eta, eta + 10, eta + 40):
        if p > points[-1]:
            points.append(p)
    return points + [inf]


def fermi(x, eta):
    return 1 / (exp(x - eta) + 1)


def sigma(x, eta):
    t = abs(x - eta)
    e = exp(-t)
    return log1p(e) + t * e / (1 + e)


def integral(g, eta):
    return quad(g, breakpoints(eta))


def row(eta_text, theta_text):
    eta = mpf(eta_text)
    theta = mpf(theta_text)
    values = []
    for k in (mpf(1) / 2, mpf(3) / 2, mpf(5) / 2):
        values.append(integral(lambda x: x ** k * sqrt(1 + theta * x / 2) * fermi(x, eta), eta))
    for k in (mpf(1) / 2, mpf(3) / 2, mpf(5) / 2):
        values.append(integral(lambda x: x ** k * sqrt(1 + theta * x / 2)
                               * fermi(x, eta) * (1 - fermi(x, eta)), eta))
    for k in (mpf(1) / 2, mpf(3) / 2, mpf(5) / 2):
        values.append(integral(lambda x: x ** (k + 1) / (4 * sqrt(1 + theta * x / 2)) * fermi(x, eta), eta))

    def density(x):
        return sqrt(x) * (1 + theta * x) * sqrt(1 + theta * x / 2)

    values.append(integral(lambda x: density(x) * sigma(x, eta), eta))
    values.append(integral(lambda x: density(x) * fermi(x, eta) * (1 - fermi(x, eta))
                           * (1 - 2 * fermi(x, eta)), eta))
    return ",".join([eta_text, theta_text] + [nstr(v, 20) for v in values])


def main():
    lines = [
        "# Strongly degenerate Fermi-Dirac integrals, unscaled (eta > 0). Computed at 30 digits by",
        "# validation/scripts/degenerate_series_mpmath.py (mpmath tanh-sinh quadrature of the definitions;",
        "# Cox & Giuli 1968, Principles of Stellar Structure, ch. 24). Printed to 20 digits.",
        "eta,theta,F12,F32,F52,dEta12,dEta32,dEta52,dTheta12,dTheta32,dTheta52,entropy,densityCurvature",
    ]
    for eta in ETAS:
        for theta in THETAS:
            lines.append(row(eta, theta))
    here = os.path.dirname(os.path.abspath(__file__))
    out = os.path.join(here, "..", "fermi", "degenerate-series-mpmath.csv")
    with open(out, "w", encoding="utf-8") as handle:
        handle.write("\n".join(lines) + "\n")


if __name__ == "__main__":
    main()
