"""Same job as `stellabar polytrope --index 3 --format json`: the Lane-Emden solution with
solve_ivp (DOP853, rtol 1e-12) from the central series, xi1, theta'(xi1), omega_n, rho_c/mean,
W_n, N_n, and a 101-row profile, printed as JSON."""
import json
import sys
import numpy as np
from scipy.integrate import solve_ivp, quad

n = float(sys.argv[1]) if len(sys.argv) > 1 else 3.0
xi0 = 1e-3
theta0 = 1 - xi0**2 / 6 + n * xi0**4 / 120
dtheta0 = -xi0 / 3 + n * xi0**3 / 30


def rhs(xi, y):
    return [y[1], -np.maximum(y[0], 0.0)**n - 2 * y[1] / xi]


def surface(xi, y):
    return y[0]


surface.terminal = True
surface.direction = -1
sol = solve_ivp(rhs, [xi0, 100.0], [theta0, dtheta0], method='DOP853', rtol=1e-12, atol=1e-14,
                events=surface, dense_output=True)
xi1 = sol.t_events[0][0]
dtheta1 = sol.y_events[0][0][1]
omega = -xi1**2 * dtheta1
rho_ratio = -xi1 / (3 * dtheta1)
w_n = 1 / (4 * np.pi * (n + 1) * dtheta1**2)
n_n = (4 * np.pi)**(1 / n) / (n + 1) * omega**((1 - n) / n)
k_gr = quad(lambda x: sol.sol(x)[0]**(n + 1) * x**2, xi0, xi1, epsabs=0, epsrel=1e-12)[0]
xi = np.linspace(0, xi1, 101)
theta = np.where(xi < xi0, 1 - xi**2 / 6, sol.sol(np.maximum(xi, xi0))[0])
dtheta = np.where(xi < xi0, -xi / 3, sol.sol(np.maximum(xi, xi0))[1])
theta[-1] = 0.0
profile = {"xi": xi, "r_over_R": xi / xi1, "theta": theta, "dtheta_dxi": dtheta,
           "rho_over_rho_c": np.maximum(theta, 0)**n, "P_over_P_c": np.maximum(theta, 0)**(n + 1),
           "m_over_M": xi**2 * dtheta / (xi1**2 * dtheta1)}
print(json.dumps({"n": n, "xi1": xi1, "dtheta_xi1": dtheta1, "omega_n": omega, "rho_c_over_mean": rho_ratio,
                  "W_n": w_n, "N_n": n_n, "K_integral": k_gr,
                  "profile": {k: v.tolist() for k, v in profile.items()}}, indent=2))
