#!/usr/bin/python3
"""The upper edge of the pair-instability region of pure oxygen, computed independently with mpmath.

Regenerates exactly (slow: a few minutes per temperature):
    validation/fermi-boundary-computed.csv

    /usr/bin/python3 validation/scripts/fermi_boundary_mpmath.py

Needs Python 3 and mpmath (Debian: python3-mpmath). At each temperature, the highest density where
Gamma1 = 4/3 for ions + electron-positron gas + radiation of pure oxygen-16 (mu_e = 2, mu_i = 16), with
Gamma1 from validation/scripts/pair_gas_mpmath.py (tanh-sinh quadrature of the Fermi-Dirac integrals,
findroot for neutrality, five-point differences for chi_rho, chi_T, c_V; Cox & Giuli 1968, ch. 24 and
eq. 9.88), here at 18 digits with difference step 1e-6 (truncation ~1e-24, root noise ~1e-12 in Gamma1),
and the edge by findroot (secant) in ln rho, started at two densities 10 % either side of the edge as a
coarse look at the region placed it (the root itself is mpmath's alone), to 1e-11 in ln rho.
"""

import sys

sys.dont_write_bytecode = True  # keep the scripts folder free of __pycache__

import os  # noqa: E402

from mpmath import mp, mpf, exp, log, findroot, nstr  # noqa: E402

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import pair_gas_mpmath as gas  # noqa: E402

mp.dps = 18

# temperature [K], two starting densities of the secant [g/cm3] either side of the upper edge
EDGES = [("1e9", "1.35e4", "1.65e4"), ("2e9", "3.5e5", "4.25e5")]


def gamma1(rho, T):
    h = mpf(10) ** -6

    def d(f):
        return (f(-2 * h) - 8 * f(-h) + 8 * f(h) - f(2 * h)) / (12 * h)

    p, u, _, _ = gas.totals(rho, T)
    chi_rho = d(lambda x: gas.totals(rho * exp(x), T)[0]) / p
    chi_t = d(lambda x: gas.totals(rho, T * exp(x))[0]) / p
    c_v = d(lambda x: gas.totals(rho, T * exp(x))[1]) / T
    return chi_rho + chi_t ** 2 * p / (rho * T * c_v)


def edge(t_text, low, high):
    T = mpf(t_text)
    excess = lambda ln_rho: gamma1(exp(ln_rho), T) - mpf(4) / 3  # noqa: E731
    ln_rho = findroot(excess, (log(mpf(low)), log(mpf(high))), solver="secant", tol=mpf(10) ** -12, maxsteps=30)
    return exp(ln_rho)


def main():
    lines = [
        "# Upper edge of the region where Gamma1 < 4/3 for pure oxygen-16 (X = Y = 0, Z = 1, A = 16) on the equation of",
        "# state of ions + electron-positron gas of any degeneracy + black-body radiation: at each T the highest density",
        "# with Gamma1 = 4/3. Computed at 18 digits by validation/scripts/fermi_boundary_mpmath.py (mpmath tanh-sinh",
        "# quadrature, findroot; Gamma1 by five-point differences, Cox & Giuli 1968 eq. 9.88); printed to 12 digits.",
        "# family: fermi",
        "# Tolerance: 1e-7 relative in rho (the script's Gamma1 carries ~1e-12, dGamma1/dln rho ~ 1e-2 there: ~1e-10 in",
        "# rho; stellabar bisects to 1e-12 in ln rho).",
        "quantity,parameters,value,unit,tolerance,tolerance_kind,provenance,source",
    ]
    for t_text, low, high in EDGES:
        rho = edge(t_text, low, high)
        lines.append("rho_gamma1_four_thirds_high,T=%s,%s,g/cm3,1e-7,rel,computed,fermi_boundary_mpmath.py"
                     % (t_text, nstr(rho, 12)))
        print(lines[-1], flush=True)
    path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "fermi-boundary-computed.csv")
    with open(path, "w") as out:
        out.write("\n".join(lines) + "\n")


if __name__ == "__main__":
    main()
