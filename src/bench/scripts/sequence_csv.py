"""Same job as `stellabar sequence --steps 10000 --format csv`: Eddington standard models over
10^4 log-spaced masses, 1 to 1e6 Msun; beta from Eddington's quartic by brentq per mass, and the
other columns of the sequence table, written with np.savetxt to stdout."""
import sys
import numpy as np
from scipy.optimize import brentq

G = 6.67430e-8
C = 2.99792458e10
K_B = 1.380649e-16
M_U = 1.66053906660e-24
A_RAD = 4 * 5.670374419e-5 / C
MSUN = 1.98840987e33
RSUN = 6.957e10
LSUN = 3.828e33
X, MU = 0.7, 1 / (2 * 0.7 + 0.75 * 0.28 + 0.5 * 0.02)
KAPPA = 0.2 * (1 + X)
OMEGA3, XI1 = 2.01823595, 6.89684862   # n = 3 Lane-Emden constants (common practice)
K3 = 1.1244743
C_EDD = 0.002990253691

steps = int(sys.argv[1]) if len(sys.argv) > 1 else 10000
masses = np.logspace(0, 6, steps)
rows = []
for m in masses:
    beta = brentq(lambda b: 1 - b - C_EDD * MU**4 * b**4 * m**2, 1e-12, 1.0, xtol=1e-300, rtol=1e-15)
    omb = C_EDD * MU**4 * beta**4 * m**2
    g3m1 = (2 / 3) * (beta + 4 * omb) / (beta + 8 * omb)
    g1 = beta + (beta + 4 * omb) * g3m1
    l_edd = 4 * np.pi * G * m * MSUN * C / KAPPA / LSUN
    r_crit = K3 * 2 * G * m * MSUN / (C**2 * (g1 - 4 / 3))
    rho_c = 54.1825 * 3 * m * MSUN / (4 * np.pi * r_crit**3)
    t_c = beta * MU * M_U * (G * (4 * np.pi)**(1 / 3) * 0.36394 * (m * MSUN)**(2 / 3) * rho_c**(4 / 3)) / (K_B * rho_c)
    rows.append((m, beta, omb, omb, l_edd, omb * l_edd, g1, g1 - 4 / 3, r_crit / RSUN,
                 r_crit * C**2 / (G * m * MSUN), rho_c, t_c))
np.savetxt(sys.stdout, np.array(rows), delimiter=',', fmt='%.17g',
           header="M [Msun],beta,one_minus_beta,L_over_L_Edd,L_Edd [Lsun],L [Lsun],Gamma1,Gamma1_minus_4_3,"
                  "R_crit [Rsun],R_crit_over_GM_c2,rho_c_crit [g/cm3],T_c_crit [K]", comments='')
