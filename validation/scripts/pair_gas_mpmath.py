#!/usr/bin/python3
"""Reference states of ions + electron-positron gas + radiation, computed independently at 30 digits.

Regenerates exactly:
    validation/fermi/fermi-eos-mpmath.csv

    /usr/bin/python3 validation/scripts/pair_gas_mpmath.py

Needs Python 3 and mpmath (Debian: python3-mpmath). Independent of the Java code in method:
the Fermi-Dirac integrals F_k(eta, theta) by mpmath tanh-sinh quadrature (not Gauss-Legendre) at 30 digits,
n, P, E from them (Cox & Giuli 1968, ch. 24), charge neutrality n- - n+ = rho / (mu_e m_u) by mpmath.findroot
(Illinois), and Gamma1 = chi_rho + chi_T^2 P / (rho T c_V) (Cox & Giuli 1968, eq. 9.88) with chi_rho, chi_T,
c_V by five-point differences at 30 digits, not by implicit differentiation. Ions classical, radiation
black-body, as in the Java model.
Composition: pure oxygen-16 (X = Y = 0, Z = 1, A = 16: mu_e = 2, mu_i = 16).
"""

import sys

sys.dont_write_bytecode = True  # keep the scripts folder free of __pycache__

import os  # noqa: E402

from mpmath import mp, mpf, quad, sqrt, exp, pi, log, findroot, nstr, inf  # noqa: E402

mp.dps = 30

# CODATA 2018 (exact in the 2019 SI) and CODATA 2018 recommended values, CGS; as in physics/Constants.java
K = mpf("1.380649e-16")
H = mpf("6.62607015e-27")
C = mpf("2.99792458e10")
ME = mpf("9.1093837015e-28")
MU = mpf("1.66053906660e-24")
A_RAD = 8 * pi ** 5 * K ** 4 / (15 * H ** 3 * C ** 3)
MUE = mpf(2)
MUI = mpf(16)
MC = ME * C
MC2 = ME * C * C

POINTS = [  # rho g/cm3, T K, regime
    ("1e4", "2e9", "pair-rich, radiation-dominated (the command-line example)"),
    ("1e6", "3e9", "pair-rich, mildly degenerate"),
    ("1e8", "1e8", "degenerate, relativistic"),
    ("1e2", "1e7", "classical"),
    ("1e-2", "5e9", "pair-dominated"),
]


def fd_integral(k, eta, theta):
    """F_k(eta, theta) = int_0^inf x^k sqrt(1 + theta x/2) / (exp(x - eta) + 1) dx by tanh-sinh quadrature."""
    def integrand(x):
        y = x - eta
        f = exp(-y) / (1 + exp(-y)) if y > 0 else 1 / (exp(y) + 1)
        return x ** k * sqrt(1 + theta * x / 2) * f
    top = max(eta, mpf(0))
    return quad(integrand, [0, top / 2 + mpf("0.5"), top, top + 10, top + 60, inf])


def species(eta, theta):
    """n, P, E_kin of one species (Cox & Giuli 1968, ch. 24, in the kinetic-energy variable)."""
    a = 8 * pi * sqrt(2) * (MC / H) ** 3
    f12, f32, f52 = (fd_integral(k, eta, theta) for k in (mpf(1) / 2, mpf(3) / 2, mpf(5) / 2))
    n = a * theta ** mpf(1.5) * (f12 + theta * f32)
    p = mpf(2) / 3 * a * MC2 * theta ** mpf(2.5) * (f32 + theta / 2 * f52)
    e = a * MC2 * theta ** mpf(2.5) * (f32 + theta * f52)
    return n, p, e


def pair_gas(rho, T):
    n0 = rho / (MUE * MU)
    theta = K * T / MC2

    def parts(eta):
        minus = species(eta, theta)
        eta_plus = -eta - 2 / theta
        plus = species(eta_plus, theta) if eta_plus > -3000 else (mpf(0), mpf(0), mpf(0))
        return minus, plus

    def net(eta):
        minus, plus = parts(eta)
        return (minus[0] - plus[0]) / n0 - 1

    # net rises with eta; bracket from the Boltzmann and the completely degenerate estimates
    x = (3 * n0 / (8 * pi)) ** (mpf(1) / 3) * H / MC
    degenerate = (sqrt(1 + x * x) - 1) / theta
    boltzmann = log(n0 * H ** 3 / (2 * (2 * pi * ME * K * T) ** (mpf(3) / 2)))
    low = min(boltzmann, -1 / theta) - 10
    high = max(degenerate, boltzmann, mpf(0)) + 10
    eta = findroot(net, (low, high), solver="anderson" if False else "illinois", tol=mpf(10) ** -26, maxsteps=500)
    minus, plus = parts(eta)
    return eta, plus[0], minus[1] + plus[1], minus[2] + plus[2] + 2 * MC2 * plus[0]


def totals(rho, T):
    eta, n_plus, pe, ee = pair_gas(rho, T)
    p = pe + rho * K * T / (MUI * MU) + A_RAD * T ** 4 / 3
    u = ee / rho + mpf(3) / 2 * K * T / (MUI * MU) + A_RAD * T ** 4 / rho
    return p, u, eta, n_plus


def derivative(f):
    """Five-point central difference at 0 with step 1e-7 (truncation ~1e-28, root noise ~1e-26/1e-7)."""
    h = mpf(10) ** -7
    return (f(-2 * h) - 8 * f(-h) + 8 * f(h) - f(2 * h)) / (12 * h)


def row(rho_text, t_text, regime):
    rho = mpf(rho_text)
    T = mpf(t_text)
    p, u, eta, n_plus = totals(rho, T)
    dp_dlnrho = derivative(lambda x: totals(rho * exp(x), T)[0])
    dp_dlnt = derivative(lambda x: totals(rho, T * exp(x))[0])
    du_dlnt = derivative(lambda x: totals(rho, T * exp(x))[1])
    chi_rho = dp_dlnrho / p
    chi_t = dp_dlnt / p
    c_v = du_dlnt / T
    gamma1 = chi_rho + chi_t ** 2 * p / (rho * T * c_v)
    return ",".join([rho_text, t_text, nstr(p, 17), nstr(gamma1, 17), nstr(eta, 17), nstr(n_plus, 17), regime])


def main():
    lines = [
        "# Ions + electron-positron gas of any degeneracy + black-body radiation, pure oxygen-16 (X = Y = 0, Z = 1, A = 16).",
        "# Computed at 30 digits by validation/scripts/pair_gas_mpmath.py (mpmath tanh-sinh quadrature, findroot for",
        "# neutrality, five-point differences for the derivatives in Gamma1 = chi_rho + chi_T^2 P/(rho T c_V), Cox & Giuli 1968 ch. 24",
        "# and eq. 9.88); printed to 17 digits. Tolerance used by the tests: 1e-8 relative (P, Gamma1, n_positron),",
        "# 1e-8 absolute in eta.",
        "rho,T,P,Gamma1,eta,n_positron,regime",
    ]
    for rho, t, regime in POINTS:
        lines.append(row(rho, t, regime))
    path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "fermi", "fermi-eos-mpmath.csv")
    with open(path, "w") as out:
        out.write("\n".join(lines) + "\n")


if __name__ == "__main__":
    main()
