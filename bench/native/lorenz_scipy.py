"""Reference: scipy's solve_ivp with its DOP853 on the Lorenz model (pure-Python right-hand side).
Usage: python3 lorenz_scipy.py [END] [RTOL] [ATOL] [REPEATS]"""
import sys
import time

import numpy as np
from scipy.integrate import solve_ivp

end = float(sys.argv[1]) if len(sys.argv) > 1 else 1000.0
rtol = float(sys.argv[2]) if len(sys.argv) > 2 else 1e-10
atol = float(sys.argv[3]) if len(sys.argv) > 3 else 1e-10
repeats = int(sys.argv[4]) if len(sys.argv) > 4 else 3


def lorenz(t, u):
    return np.array([10.0 * (u[1] - u[0]), u[0] * (28.0 - u[2]) - u[1], u[0] * u[1] - 8.0 / 3.0 * u[2]])


seconds = []
for _ in range(repeats):
    start = time.perf_counter()
    sol = solve_ivp(lorenz, (0.0, end), [1.0, 1.0, 1.0], method="DOP853", rtol=rtol, atol=atol)
    seconds.append(time.perf_counter() - start)
seconds.sort()
steps = len(sol.t) - 1
print("scipy solve_ivp DOP853 (Python)  evaluations %d  steps %d  best %.4f s  median %.4f s  x(%g) = %.10f"
      % (sol.nfev, steps, seconds[0], seconds[len(seconds) // 2], end, sol.y[0, -1]))
