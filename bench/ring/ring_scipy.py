"""Reference: scipy's solve_ivp RK45 (Dormand-Prince 5(4)) on the Lorenz (1996) ring of N cells with a vectorised
numpy right-hand side (np.roll), F = 8, x_i(0) = F + 0.01 sin(i) for i = 1..N.
Usage: python3 ring_scipy.py N END RTOL ATOL REPEATS [OTHER_FINAL_STATE.f64]
Prints steps, evaluations and wall times; with a second final state (raw little-endian doubles) also the largest
difference between the two final states."""
import sys
import time

import numpy as np
from scipy.integrate import solve_ivp

n = int(sys.argv[1])
end = float(sys.argv[2])
rtol = float(sys.argv[3])
atol = float(sys.argv[4])
repeats = int(sys.argv[5])
other = sys.argv[6] if len(sys.argv) > 6 else None
F = 8.0


def ring(t, x):
    return (np.roll(x, -1) - np.roll(x, 2)) * np.roll(x, 1) - x + F


x0 = F + 0.01 * np.sin(np.arange(1, n + 1, dtype=float))
seconds = []
for _ in range(repeats):
    start = time.perf_counter()
    sol = solve_ivp(ring, (0.0, end), x0, method="RK45", rtol=rtol, atol=atol)
    seconds.append(time.perf_counter() - start)
seconds.sort()
print("scipy %s solve_ivp RK45 (numpy rhs, N = %d): %s; evaluations %d, steps %d; best %.4f s, median %.4f s"
      % (__import__("scipy").__version__, n, "COMPLETED" if sol.success else sol.message, sol.nfev,
         len(sol.t) - 1, seconds[0], seconds[len(seconds) // 2]))
print("scipy-median %.6f" % seconds[len(seconds) // 2])
if other:
    theirs = np.fromfile(other, dtype="<f8")
    ours = sol.y[:, -1]
    print("max |difference of final states| = %.3e (max |x| = %.3f)" % (np.max(np.abs(theirs - ours)),
                                                                          np.max(np.abs(ours))))
