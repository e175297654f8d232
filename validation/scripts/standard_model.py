#!/usr/bin/python3
"""Eddington standard model and the Sun as an n = 3 polytrope, from the constants at 40 digits.

Regenerates exactly:
    validation/standard-model-computed.csv

    /usr/bin/python3 validation/scripts/standard_model.py

Needs Python 3 and mpmath (Debian: python3-mpmath); takes omega_3, xi_1, rho_c/rho_mean and W_3 from
its own high-precision Lane-Emden integration (lane_emden_mpmath.py beside it).

Eddington's quartic (Eddington 1926, The Internal Constitution of the Stars, ch. VI; Chandrasekhar
1939, ch. VI): an n = 3 polytrope with P = K rho^(4/3), K = [(3/a)(k/(mu m_u))^4 (1-beta)/beta^4]^(1/3)
and M = 4 pi omega_3 (K/(pi G))^(3/2) gives
    1 - beta = C mu^4 beta^4 (M/Msun)^2,   C = pi a G^3 Msun^2 m_u^4 / (48 omega_3^2 k^4).
Hence M/Msun = C^(-1/2) (1-beta)^(1/2)/(mu^2 beta^2) (the "18.3 Msun" coefficient is C^(-1/2)) and,
for beta -> 0, beta mu (M/Msun)^(1/2) -> C^(-1/4) (the "4.28" of the supermassive limit).
"""

import sys

sys.dont_write_bytecode = True  # keep the scripts folder free of __pycache__

import os  # noqa: E402

from mpmath import mp, mpf

import lane_emden_mpmath
import reference_csv
from reference_csv import number, row

mp.dps = 40
SOURCE = "standard_model.py"

# CODATA 2018 (Tiesinga et al. 2021) and IAU 2015 Resolution B3, CGS, as in Constants.java
BOLTZMANN = mpf("1.380649e-16")          # erg/K, exact
PLANCK = mpf("6.62607015e-27")           # erg s, exact
LIGHT = mpf("2.99792458e10")             # cm/s, exact
GRAVITATION = mpf("6.67430e-8")          # cm3/g/s2
ATOMIC_MASS = mpf("1.66053906660e-24")   # g
SOLAR_GM = mpf("1.3271244e26")           # cm3/s2, IAU 2015 B3 nominal
SOLAR_RADIUS = mpf("6.957e10")           # cm, IAU 2015 B3 nominal
SOLAR_MASS = SOLAR_GM / GRAVITATION

MASSES = ["0.1", "1", "10", "100", "1000", "1e4", "1e6", "1e8"]   # Msun
MUS = ["0.5", "0.62", "1.0"]


def radiation_constant():
    return 8 * mp.pi ** 5 * BOLTZMANN ** 4 / (15 * PLANCK ** 3 * LIGHT ** 3)


def beta_of(c, mu, m):
    """The root in (0, 1) of c mu^4 m^2 beta^4 + beta - 1 = 0 (increasing in beta: unique)."""
    a = c * mu ** 4 * m ** 2
    lo, hi = mpf(0), mpf(1)
    for _ in range(400):           # bisection to the working precision; 400 halvings > 120 bits
        mid = (lo + hi) / 2
        if a * mid ** 4 + mid - 1 > 0:
            hi = mid
        else:
            lo = mid
    beta = (lo + hi) / 2
    return beta, a * beta ** 4     # 1 - beta from the quartic itself, no cancellation


HEADER = """\
Eddington standard model (n = 3, beta constant) and the Sun as an n = 3 polytrope, computed at 40 digits
from the constants (CODATA 2018: k, h, c exact, G = 6.67430e-8, m_u = 1.66053906660e-24 g; IAU 2015
Resolution B3: GM_sun = 1.3271244e26 cm3/s2, R_sun = 6.957e10 cm, M_sun = GM_sun/G) and the Lane-Emden
n = 3 constants of lane_emden_mpmath.py.
family: standard-model
  C = pi a G^3 Msun^2 m_u^4/(48 omega_3^2 k^4), 1 - beta = C mu^4 beta^4 (M/Msun)^2
  (Eddington 1926, The Internal Constitution of the Stars, ch. VI; Chandrasekhar 1939, ch. VI)
  mass_coefficient = C^(-1/2): M/Msun = C^(-1/2) (1 - beta)^(1/2)/(mu^2 beta^2)
  supermassive_beta_coefficient = beta mu (M/Msun)^(1/2), which tends to C^(-1/4) as beta -> 0
  (Shapiro & Teukolsky 1983, Black Holes, White Dwarfs and Neutron Stars, ch. 17)
  sun_central_density = (rho_c/rho_mean)_3 3 Msun/(4 pi Rsun^3); sun_central_pressure = W_3 G Msun^2/Rsun^4
Computed by validation/scripts/standard_model.py; regenerate exactly with
/usr/bin/python3 validation/scripts/standard_model.py
Tolerance: 1e-11 relative. stellabar uses the same constants in double precision and its own omega_3
(good to ~1e-13), which enters C squared, so C is good to ~3e-13; beta and 1 - beta each carry at most
C's relative error, and the quartic is solved for whichever of them is small, to ~1e-15 of itself.
The margin of ~30 covers the powers of the constants (G^3, m_u^4, k^4) rounded in double precision.
"""


def main():
    folder = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
    n3 = lane_emden_mpmath.constants("3")
    omega3 = n3["omega_n"]
    a = radiation_constant()
    c = mp.pi * a * GRAVITATION ** 3 * SOLAR_MASS ** 2 * ATOMIC_MASS ** 4 / (48 * omega3 ** 2 * BOLTZMANN ** 4)
    rows = [
        row("quartic_coefficient", "", number(c), "", "1e-11", "rel", "computed", SOURCE),
        row("mass_coefficient", "", number(c ** mpf(-0.5)), "Msun", "1e-11", "rel", "computed", SOURCE),
        row("supermassive_limit_coefficient", "", number(c ** mpf(-0.25)), "", "1e-11", "rel", "computed", SOURCE),
    ]
    for mu_text in MUS:
        mu = mpf(mu_text)
        for m_text in MASSES:
            beta, one_minus = beta_of(c, mu, mpf(m_text))
            params = "M=%s Msun;mu=%s" % (m_text, mu_text)
            rows.append(row("beta", params, number(beta), "", "1e-11", "rel", "computed", SOURCE))
            rows.append(row("one_minus_beta", params, number(one_minus), "", "1e-11", "rel", "computed", SOURCE))
    rho_mean = 3 * SOLAR_MASS / (4 * mp.pi * SOLAR_RADIUS ** 3)
    rows.append(row("sun_central_density", "M=1 Msun;R=1 Rsun", number(n3["rho_c_over_mean"] * rho_mean), "g/cm3",
                    "1e-11", "rel", "computed", SOURCE))
    rows.append(row("sun_central_pressure", "M=1 Msun;R=1 Rsun",
                    number(n3["W_n"] * GRAVITATION * SOLAR_MASS ** 2 / SOLAR_RADIUS ** 4), "dyn/cm2", "1e-11", "rel",
                    "computed", SOURCE))
    reference_csv.write(os.path.join(folder, "standard-model-computed.csv"), HEADER, rows)


if __name__ == "__main__":
    main()
