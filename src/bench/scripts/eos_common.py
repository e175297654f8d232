"""The classical gas + radiation equation of state of stellabar's GasRadiationEos, vectorized with
numpy: what a researcher's script computes for the same table. Used by the side-by-side benchmark
only (src/bench/side_by_side.py); the project's tests check the physics, not this file.

Constants: CODATA 2018 (k, h, m_e, m_u, c), a = 4 sigma / c."""
import numpy as np

K_B = 1.380649e-16
H = 6.62607015e-27
HBAR = H / (2 * np.pi)
M_E = 9.1093837015e-28
M_U = 1.66053906660e-24
C = 2.99792458e10
SIGMA = 5.670374419e-5
A_RAD = 4 * SIGMA / C
E_CHARGE = 4.803204712570263e-10
EV = 1.602176634e-12


class Mixture:
    def __init__(self, X=0.7, Y=0.28, Z=0.02):
        self.X, self.Y, self.Z = X, Y, Z
        self.ne_per_g = (X + Y / 2 + Z / 2) / M_U
        self.ni_per_g = (X + Y / 4) / M_U
        self.mu = 1.0 / (2 * X + 3 * Y / 4 + Z / 2)
        self.z2 = (X + Y) / (X + Y / 4) if X + Y > 0 else 1.0
        self.gas_constant = K_B / (self.mu * M_U)

        def term(per_g, weight, mass):
            if per_g <= 0:
                return 0.0
            return per_g * (2.5 + np.log(weight / per_g) + 1.5 * np.log(2 * np.pi * mass * K_B / H**2))

        self.s0 = K_B * (term(self.ne_per_g, 2.0, M_E) + term(X / M_U, 1.0, M_U) + term(Y / (4 * M_U), 1.0, 4 * M_U))


def evaluate(mix, rho, T):
    """Every column of stellabar's rho-T grid table for arrays rho and T (same shape)."""
    p_gas = mix.gas_constant * rho * T
    p_rad = A_RAD * T**4 / 3
    p = p_gas + p_rad
    beta = p_gas / p
    omb = p_rad / p
    u = 1.5 * p_gas / rho + 3 * p_rad / rho
    s = mix.s0 + mix.gas_constant * (1.5 * np.log(T) - np.log(rho)) + 4 * p_rad / (rho * T)
    g3m1 = (2 / 3) * (beta + 4 * omb) / (beta + 8 * omb)
    g1 = beta + (beta + 4 * omb) * g3m1
    nabla = g3m1 / g1
    cs = np.sqrt(g1 * p / rho)
    lam = H / np.sqrt(2 * np.pi * M_E * K_B * T)
    d = 0.5 * rho * mix.ne_per_g * lam**3
    x_f = HBAR * np.cbrt(3 * np.pi**2 * rho * mix.ne_per_g) / (M_E * C)
    theta = K_B * T / (M_E * C**2)
    a_i = np.cbrt(3 / (4 * np.pi * rho * mix.ni_per_g))
    gamma_c = mix.z2 * E_CHARGE**2 / (a_i * K_B * T)
    with np.errstate(over='ignore', divide='ignore'):
        ln2d = np.log(2 * d)
        kT = K_B * T
        neutral = np.maximum(1 / (1 + np.exp(-13.598434 * EV / kT - ln2d)),
                             1 / (1 + np.exp(-54.417765 * EV / kT - ln2d)))
    mask = ((d > 1) * 1 + ((theta > 0.1) | ((d > 1) & (x_f > 0.1))) * 2 + (T > 1e9) * 4
            + (gamma_c > 1) * 8 + ((T < 1e6) & (neutral > 0.01)) * 16 + (beta < 0.5) * 32)
    return [p, p_gas, p_rad, beta, omb, u, s, g1, g3m1 + 1, nabla, cs, mask]
