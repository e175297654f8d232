#!/usr/bin/python3
"""Reference values of the generalized Fermi-Dirac integrals, at 30 digits.

    F_k(eta, theta) = int_0^inf x^k sqrt(1 + theta x / 2) / (exp(x - eta) + 1) dx

Regenerates exactly:
    validation/fermi/fermi-dirac-integrals.csv

    /usr/bin/python3 validation/scripts/fermi_dirac_mpmath.py

Needs Python 3 and mpmath (Debian: python3-mpmath).
At theta = 0 the values come from the closed form F_k(eta, 0) = -Gamma(k+1) Li_{k+1}(-e^eta)
(the complete Fermi-Dirac integral as a polylogarithm; Cox & Giuli 1968, ch. 24) and
dF_k/deta = -Gamma(k+1) Li_k(-e^eta); at theta > 0 by mpmath tanh-sinh quadrature of the
definition with the range split at x = 0, eta, eta +/- 10 and infinity (our own, independent of
the Gauss-Legendre layout in FermiDiracIntegrals.java). Values are scaled by exp(-min(eta, 0)),
as FermiDiracIntegrals returns them.
"""

import sys

sys.dont_write_bytecode = True  # keep the scripts folder free of __pycache__

import os  # noqa: E402

from mpmath import mp, mpf, quad, sqrt, exp, gamma, polylog, nstr, inf, re  # noqa: E402

mp.dps = 30

KS = [mpf(1) / 2, mpf(3) / 2, mpf(5) / 2]
ETAS = ["-700", "-50", "-5", "-1", "0", "0.5", "3", "10", "35", "40", "100", "1000", "30000"]
THETAS = ["0", "1e-6", "0.01", "0.3", "1", "10"]


def breakpoints(eta):
    points = [mpf(0)]
    for p in (eta - 10, eta, eta + 10, eta + 40):
        if p > points[-1]:
            points.append(p)
    return points + [inf]


def integral(k, eta, theta, power_extra, derivative):
    """int x^(k+power_extra) g(x) w(x) dx, w the Fermi factor (or f(1-f)), scaled by e^-min(eta,0)."""
    scale = exp(-min(eta, 0))

    def integrand(x):
        e = exp(x - eta)
        f = 1 / (e + 1)
        w = f * (1 - f) if derivative else f
        root = sqrt(1 + theta * x / 2)
        g = x / (4 * root) if power_extra else root
        return x ** k * g * w * scale

    return quad(integrand, breakpoints(eta))


def row(k, eta_text, theta_text):
    eta = mpf(eta_text)
    theta = mpf(theta_text)
    if theta == 0:
        # closed form; mpmath polylog of non-integer order needs |z| handled by its own methods
        z = -exp(eta)
        f = -gamma(k + 1) * re(polylog(k + 1, z)) * exp(-min(eta, 0))
        d_eta = -gamma(k + 1) * re(polylog(k, z)) * exp(-min(eta, 0))
        d_theta = integral(k, eta, theta, 1, False)
        how = "polylog"
    else:
        f = integral(k, eta, theta, 0, False)
        d_eta = integral(k, eta, theta, 0, True)
        d_theta = integral(k, eta, theta, 1, False)
        how = "quad"
    return ",".join([nstr(k, 3), eta_text, theta_text, nstr(f, 20), nstr(d_eta, 20), nstr(d_theta, 20), how])


def main():
    lines = [
        "# Generalized Fermi-Dirac integrals F_k(eta, theta), k = 1/2, 3/2, 5/2, and their eta and theta derivatives,",
        "# each scaled by exp(-min(eta, 0)). Computed at 30 digits by validation/scripts/fermi_dirac_mpmath.py (mpmath):",
        "# theta = 0 rows (how = polylog) from F_k(eta, 0) = -Gamma(k+1) Li_{k+1}(-e^eta) and dF_k/deta = -Gamma(k+1) Li_k(-e^eta)",
        "# (closed form; Cox & Giuli 1968, Principles of Stellar Structure, ch. 24), other rows (how = quad) by tanh-sinh",
        "# quadrature of the definition (polylog's imaginary rounding residue, below 1e-30, dropped). Printed to 20 digits. Tolerance used by the tests: 1e-13 relative.",
        "k,eta,theta,F,dF_deta,dF_dtheta,how",
    ]
    for eta in ETAS:
        for theta in THETAS:
            if mpf(eta) > 50 and mpf(theta) >= 1:
                continue  # far outside the density range (eta * theta <~ 20 for rho <= 1e10 g/cm3)
            for k in KS:
                lines.append(row(k, eta, theta))
    path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "fermi", "fermi-dirac-integrals.csv")
    with open(path, "w") as out:
        out.write("\n".join(lines) + "\n")


if __name__ == "__main__":
    main()
