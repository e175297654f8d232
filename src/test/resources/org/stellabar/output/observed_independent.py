"""Independent estimate of Gamma_e, R and the standard-model beta for a catalogue with columns
name, logL (log10 L/Lsun), logTeff (log10 Teff/K), Mass (Msun), X.

Written for stellabar's tests without its code: constants typed from CODATA 2018 and IAU 2015
Resolution B3, the n = 3 Lane-Emden constant omega_3 integrated here with mpmath's Taylor-series
ODE solver at 30 digits, Eddington's quartic 1 - beta = C mu^4 beta^4 (M/Msun)^2 with
C = pi a G^3 Msun^2 m_u^4 / (48 omega_3^2 k^4) solved by mpmath.findroot, numpy for the columns.

Usage: python3 observed_independent.py CATALOGUE.csv  -> JSON list of {name, Gamma_e, R, beta}
"""
import json
import sys

import mpmath as mp
import numpy as np

mp.mp.dps = 30

# CODATA 2018 (exact in the 2019 SI except G and m_u), CGS
k = mp.mpf("1.380649e-16")
h = mp.mpf("6.62607015e-27")
c = mp.mpf("2.99792458e10")
G = mp.mpf("6.67430e-8")
m_u = mp.mpf("1.66053906660e-24")
# IAU 2015 Resolution B3 nominal solar values
L_sun = mp.mpf("3.828e33")
R_sun = mp.mpf("6.957e10")
GM_sun = mp.mpf("1.3271244e26")
M_sun = GM_sun / G

sigma = 2 * mp.pi ** 5 * k ** 4 / (15 * h ** 3 * c ** 2)
a_rad = 4 * sigma / c


def omega3():
    """-xi1^2 theta'(xi1) of the n = 3 Lane-Emden equation, from a series start at xi0."""
    n = 3
    xi0 = mp.mpf("1e-2")
    # theta = 1 - x^2/6 + n x^4/120 - n(8n-5) x^6/15120 (Chandrasekhar 1939, ch. IV, eq. 10)
    th = 1 - xi0 ** 2 / 6 + n * xi0 ** 4 / 120 - n * (8 * n - 5) * xi0 ** 6 / 15120
    dth = -xi0 / 3 + n * xi0 ** 3 / 30 - n * (8 * n - 5) * xi0 ** 5 / 2520
    f = mp.odefun(lambda x, y: [y[1], -y[0] ** n - 2 * y[1] / x], xi0, [th, dth])
    xi1 = mp.findroot(lambda x: f(x)[0], mp.mpf("6.8968486"))
    return -xi1 ** 2 * f(xi1)[1]


def main(path):
    with open(path, encoding="utf-8") as f:
        lines = [line.strip() for line in f if line.strip() and not line.startswith("#")]
    header = lines[0].split(",")
    cells = np.array([line.split(",") for line in lines[1:]], dtype=object)
    data = [dict(zip(header, r)) for r in cells]
    w3 = omega3()
    C = mp.pi * a_rad * G ** 3 * M_sun ** 2 * m_u ** 4 / (48 * w3 ** 2 * k ** 4)
    out = []
    for row in data:
        L = mp.mpf(10) ** mp.mpf(repr(float(row["logL"]))) * L_sun
        T = mp.mpf(10) ** mp.mpf(repr(float(row["logTeff"])))
        M = mp.mpf(repr(float(row["Mass"]))) * M_sun
        X = mp.mpf(repr(float(row["X"])))
        Z = mp.mpf("0.02")
        Y = 1 - X - Z
        mu = 1 / (2 * X + 3 * Y / 4 + Z / 2)
        R = mp.sqrt(L / (4 * mp.pi * sigma)) / T ** 2
        kappa = mp.mpf("0.2") * (1 + X)
        gamma_e = kappa * L / (4 * mp.pi * G * M * c)
        A = C * mu ** 4 * (M / M_sun) ** 2
        beta = mp.findroot(lambda b: A * b ** 4 + b - 1, (mp.mpf(0), mp.mpf(1)), solver="bisect" if False else "anderson")
        out.append({"name": str(row["name"]), "Gamma_e": float(gamma_e), "R": float(R / R_sun),
                    "beta": float(beta), "omega3": float(w3)})
    json.dump(out, sys.stdout)


if __name__ == "__main__":
    main(sys.argv[1])
