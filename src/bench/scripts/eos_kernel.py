"""Same job as the JMH benchmark EosBenchmark.millionGridPoints: every grid column of the
classical equation of state for 10^6 (rho, T) states held in memory (vectorized numpy). Prints the
median of 7 timed runs in milliseconds."""
import time
import numpy as np
from eos_common import Mixture, evaluate

rho, T = np.meshgrid(np.logspace(-10, 8, 1000), np.logspace(3, 10, 1000), indexing='ij')
rho, T = rho.ravel().copy(), T.ravel().copy()
mix = Mixture()
evaluate(mix, rho, T)
times = []
for _ in range(7):
    t0 = time.perf_counter()
    evaluate(mix, rho, T)
    times.append(time.perf_counter() - t0)
print(f"{1000 * float(np.median(times)):.2f}")
