"""Writes a 10^6-row stellar profile (an n = 3 polytrope of 40 Msun and 12 Rsun, the classical gas +
radiation equation of state) as CSV with units, for the memory benchmark of `stellabar audit`
(src/bench/memory.sh). The star is scaled from stellabar's own dimensionless Lane-Emden profile
(first argument: polytrope-n3-profile.csv of `stellabar polytrope --index 3 --points 1000000
--out DIR`); T solves aT^4/3 + (k/mu m_u) rho T = P by Newton's method, vectorized.
Usage: python3 million_row_profile.py PROFILE.csv OUT.csv"""
import sys
import numpy as np

G, K_B, M_U, C = 6.67430e-8, 1.380649e-16, 1.66053906660e-24, 2.99792458e10
A_RAD = 4 * 5.670374419e-5 / C
MSUN, RSUN = 1.98840987e33, 6.957e10
MU = 1 / (2 * 0.7 + 0.75 * 0.28 + 0.5 * 0.02)

with open(sys.argv[1]) as f:
    lines = [line for line in f if not line.startswith('#')]
names = [cell.split(' [')[0] for cell in lines[0].strip().split(',')]
data = np.loadtxt(lines[1:], delimiter=',')
xi, theta, m_frac = (data[:, names.index(k)] for k in ('xi', 'theta', 'm_over_M'))
theta = np.clip(theta, 0, None)
xi1 = xi[-1]
omega = 2.01823595  # -xi1^2 theta'(xi1) for n = 3 (common practice, Chandrasekhar 1939)
M, R = 40 * MSUN, 12 * RSUN
alpha = R / xi1
rho_c = M / (4 * np.pi * alpha**3 * omega)
p_c = 11.05068 * G * M**2 / R**4   # W_3 (common practice)
rho, p = rho_c * theta**3, p_c * theta**4
t = np.where(p > 0, (3 * p / A_RAD) ** 0.25, 0.0)
gas = K_B / (MU * M_U)
for _ in range(60):
    f = A_RAD * t**4 / 3 + gas * rho * t - p
    t = np.where(p > 0, t - f / (4 * A_RAD * t**3 / 3 + gas * rho + 1e-300), 0.0)
np.savetxt(sys.argv[2], np.column_stack([alpha * xi, m_frac * M, rho, t, p]), delimiter=',', fmt='%.17g',
           header='r [cm],m [g],rho [g/cm3],T [K],P [dyn/cm2]', comments='')
