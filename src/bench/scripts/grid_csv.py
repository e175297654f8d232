"""Same job as `stellabar grid --rho-range 1e-10:1e8 --temp-range 1e3:1e10 --points 1000 --out DIR`
(table part): the equation of state on a 1000 x 1000 log rho-T grid, written with np.savetxt."""
import sys
import numpy as np
from eos_common import Mixture, evaluate

out = sys.argv[1]
n = int(sys.argv[2]) if len(sys.argv) > 2 else 1000
rho_axis = np.logspace(-10, 8, n)
t_axis = np.logspace(3, 10, n)
rho, T = np.meshgrid(rho_axis, t_axis, indexing='ij')
rho, T = rho.ravel(), T.ravel()
cols = [rho, T] + evaluate(Mixture(), rho, T)
header = ("rho [g/cm3],T [K],P [dyn/cm2],P_gas [dyn/cm2],P_rad [dyn/cm2],beta,one_minus_beta,u [erg/g],"
          "s [erg/g/K],Gamma1,Gamma3,nabla_ad,sound_speed [cm/s],warning_mask")
np.savetxt(out, np.column_stack(cols), delimiter=',', fmt='%.17g', header=header, comments='')
