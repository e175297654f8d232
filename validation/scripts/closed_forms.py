#!/usr/bin/python3
"""Reference tables that follow from closed forms, evaluated exactly or at 40 digits.

Regenerates exactly:
    validation/lane-emden-closed-forms.csv   Lane-Emden n = 0, 1, 5
    validation/mixture-exponents.csv         Gamma1, Gamma2, Gamma3, nabla_ad of gas + radiation
    validation/photon-gas.csv                black-body photon gas numbers

    /usr/bin/python3 validation/scripts/closed_forms.py

Needs Python 3 and mpmath (Debian: python3-mpmath). The mixture exponents use exact rational
arithmetic (fractions.Fraction) for beta = 0, 0.1, ..., 1 before rounding to 17 digits.
"""

import sys

sys.dont_write_bytecode = True  # keep the scripts folder free of __pycache__

import os  # noqa: E402
from fractions import Fraction

from mpmath import mp, mpf

import reference_csv
from reference_csv import number, row

mp.dps = 40
SOURCE = "closed_forms.py"

# CODATA 2018 (exact in the 2019 SI), CGS; typed from memory, as in src/main/java/.../Constants.java
BOLTZMANN = mpf("1.380649e-16")      # erg/K
PLANCK = mpf("6.62607015e-27")       # erg s
LIGHT = mpf("2.99792458e10")         # cm/s


def lane_emden_rows():
    rows = []
    tol = "1e-9"
    s6 = mp.sqrt(6)
    # n = 0: theta = 1 - xi^2/6
    for q, v in (("xi1", s6), ("dtheta_xi1", -s6 / 3), ("omega_n", 2 * s6), ("rho_c_over_mean", mpf(1)),
                 ("W_n", 3 / (8 * mp.pi))):
        rows.append(row(q, "n=0", number(v), "", tol, "rel", "closed form", "theta = 1 - xi^2/6"))
    for xi in ("0.5", "1", "2"):
        x = mpf(xi)
        rows.append(row("theta", "n=0;xi=" + xi, number(1 - x * x / 6), "", tol, "rel", "closed form",
                        "theta = 1 - xi^2/6"))
    # n = 1: theta = sin(xi)/xi
    for q, v in (("xi1", mp.pi), ("dtheta_xi1", -1 / mp.pi), ("omega_n", mp.pi),
                 ("rho_c_over_mean", mp.pi ** 2 / 3), ("W_n", mp.pi / 8)):
        rows.append(row(q, "n=1", number(v), "", tol, "rel", "closed form", "theta = sin(xi)/xi"))
    for xi in ("0.5", "1", "2", "3"):
        x = mpf(xi)
        rows.append(row("theta", "n=1;xi=" + xi, number(mp.sin(x) / x), "", tol, "rel", "closed form",
                        "theta = sin(xi)/xi"))
    # n = 5: theta = (1 + xi^2/3)^(-1/2), no finite radius
    for xi in ("1", "2", "5", "10", "100"):
        x = mpf(xi)
        rows.append(row("theta", "n=5;xi=" + xi, number((1 + x * x / 3) ** mpf(-0.5)), "", tol, "rel",
                        "closed form", "theta = (1 + xi^2/3)^(-1/2)"))
        rows.append(row("dtheta", "n=5;xi=" + xi, number(-(x / 3) * (1 + x * x / 3) ** mpf(-1.5)), "", tol,
                        "rel", "closed form", "theta = (1 + xi^2/3)^(-1/2)"))
    return rows


LANE_EMDEN_HEADER = """\
Lane-Emden functions with closed forms (Chandrasekhar 1939, An Introduction to the Study of Stellar
Structure, ch. IV; Horedt 2004, Polytropes, ch. 2): n = 0, theta = 1 - xi^2/6; n = 1, theta = sin(xi)/xi;
n = 5, theta = (1 + xi^2/3)^(-1/2) (no finite radius, so only interior values).
family: lane-emden
Computed from the closed forms at 40 digits by validation/scripts/closed_forms.py; regenerate exactly with
/usr/bin/python3 validation/scripts/closed_forms.py
Quantities as in lane-emden-computed.csv; dtheta = dtheta/dxi at an interior point.
Tolerance: 1e-9 relative, what we require of stellabar's double-precision solver (the closed forms
themselves are exact; 17 digits printed).
"""


def mixture(beta):
    """Exact exponents of a gamma = 5/3 ideal gas mixed with black-body radiation."""
    b = beta
    num = 32 - 24 * b - 3 * b * b
    gamma1 = num / (24 - 21 * b)
    gamma3 = 1 + Fraction(2, 3) * (4 - 3 * b) / (8 - 7 * b)
    nabla = (8 - 6 * b) / num
    gamma2 = num / (24 - 18 * b - 3 * b * b)
    return {"Gamma1": gamma1, "Gamma2": gamma2, "Gamma3": gamma3, "nabla_ad": nabla}


MIXTURE_HEADER = """\
Adiabatic exponents of a fully ionized ideal gas (gamma = 5/3) mixed with black-body radiation, as
functions of beta = P_gas/P alone (Chandrasekhar 1939, An Introduction to the Study of Stellar Structure,
ch. II; Cox & Giuli 1968, Principles of Stellar Structure, ch. 9):
  Gamma3 - 1 = (2/3)(4 - 3 beta)/(8 - 7 beta)
  Gamma1 = beta + (4 - 3 beta)(Gamma3 - 1) = (32 - 24 beta - 3 beta^2)/(24 - 21 beta)
  nabla_ad = (Gamma3 - 1)/Gamma1 = (8 - 6 beta)/(32 - 24 beta - 3 beta^2)
  Gamma2 = 1/(1 - nabla_ad) = (32 - 24 beta - 3 beta^2)/(24 - 18 beta - 3 beta^2)
(the right-hand forms are the algebra of the left-hand ones; limits beta = 1: 5/3, 5/3, 5/3, 2/5;
beta = 0: 4/3, 4/3, 4/3, 1/4).
family: mixture-exponents
Computed in exact rational arithmetic by validation/scripts/closed_forms.py and rounded to 17 digits;
regenerate exactly with /usr/bin/python3 validation/scripts/closed_forms.py
Tolerance: 1e-13 relative. stellabar evaluates the left-hand forms in double precision on a state
obtained by inverting (beta, P) -> (rho, T): beta comes back to ~1e-16, each exponent depends on beta
with a logarithmic slope below 1 and takes ~10 roundings, so ~1e-14 is expected; 1e-13 leaves a
margin of 10.
"""


def mixture_rows():
    rows = []
    for k in range(0, 11):
        beta = Fraction(k, 10)
        values = mixture(beta)
        for q in ("Gamma1", "Gamma2", "Gamma3", "nabla_ad"):
            v = values[q]
            rows.append(row(q, "beta=%s" % format(k / 10, ".1f"), number(mpf(v.numerator) / v.denominator), "",
                            "1e-13", "rel", "closed form", "Chandrasekhar 1939 ch. II"))
    return rows


PHOTON_HEADER = """\
Black-body photon gas: dimensionless numbers from the Planck distribution, and the CGS coefficients
they give with the CODATA 2018 values of k, h, c (exact in the 2019 SI; Tiesinga et al. 2021, Rev. Mod.
Phys. 93, 025010).
family: photon-gas
  n_gamma = (2 zeta(3)/pi^2)(kT/(hbar c))^3      -> n_gamma pi^2 (hbar c/kT)^3 = 2 zeta(3)
  a = 8 pi^5 k^4/(15 h^3 c^3) = (pi^2/15) k^4/(hbar c)^3  -> a (hc)^3/(8 pi k^4) = pi^4/15
  mean photon energy u/n_gamma = pi^4/(30 zeta(3)) kT
  entropy per photon s/n_gamma = (4/3) u/(n_gamma T) = 2 pi^4/(45 zeta(3)) k
Computed at 40 digits by validation/scripts/closed_forms.py; regenerate exactly with
/usr/bin/python3 validation/scripts/closed_forms.py
Tolerance: 1e-13 relative for the dimensionless numbers and the CGS coefficients (stellabar derives
sigma, a and hbar from k, h, c with a few roundings and uses the double value of zeta(3)).
"""


def photon_rows():
    z3 = mp.zeta(3)
    hbar = PLANCK / (2 * mp.pi)
    rows = []
    src = "Planck distribution"
    rows.append(row("two_zeta3", "", number(2 * z3), "", "1e-13", "rel", "closed form", src))
    rows.append(row("pi4_over_15", "", number(mp.pi ** 4 / 15), "", "1e-13", "rel", "closed form", src))
    rows.append(row("mean_photon_energy_over_kT", "", number(mp.pi ** 4 / (30 * z3)), "", "1e-13", "rel",
                    "closed form", src))
    rows.append(row("entropy_per_photon_over_k", "", number(2 * mp.pi ** 4 / (45 * z3)), "", "1e-13", "rel",
                    "closed form", src))
    n_coefficient = 2 * z3 / mp.pi ** 2 * (BOLTZMANN / (hbar * LIGHT)) ** 3
    rows.append(row("n_photon_over_T3", "", number(n_coefficient), "1/cm3/K3", "1e-13", "rel", "computed",
                    "closed form with CODATA 2018 k h c"))
    a = 8 * mp.pi ** 5 * BOLTZMANN ** 4 / (15 * PLANCK ** 3 * LIGHT ** 3)
    rows.append(row("radiation_density_constant", "", number(a), "erg/cm3/K4", "1e-13", "rel", "computed",
                    "closed form with CODATA 2018 k h c"))
    return rows


def main():
    folder = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
    reference_csv.write(os.path.join(folder, "lane-emden-closed-forms.csv"), LANE_EMDEN_HEADER, lane_emden_rows())
    reference_csv.write(os.path.join(folder, "mixture-exponents.csv"), MIXTURE_HEADER, mixture_rows())
    reference_csv.write(os.path.join(folder, "photon-gas.csv"), PHOTON_HEADER, photon_rows())


if __name__ == "__main__":
    main()
