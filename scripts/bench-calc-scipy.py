"""Reference run for scripts/bench-calc.ts: the same Cowell problem — two-body + zonal harmonics J2…J_N
(EGM-96, the values of lib/calc/constants.ts) — with DOP853 through scipy.integrate.solve_ivp, from the same
initial state (the osculating state of the mean elements, computed by the engine and passed in) and the same
tolerances. Prints one JSON line.
Usage: python3 bench-calc-scipy.py '{"y0": [x, y, z, vx, vy, vz], "zonalDegree": N, "days": ..., "rtol": ..., "atol": ...}'
Force: Φ = −μ/r + Σ μ J_n R^n / r^(n+1) P_n(z/r), a = −∇Φ (Montenbruck & Gill 2000 §3.2, zonal terms)."""
import json
import math
import sys
import time

import numpy as np
from scipy.integrate import solve_ivp

MU = 398600.4418
RE = 6378.137
# EGM-96 J_n = −√(2n+1)·C̄n0 (Lemoine et al. 1998), as in lib/calc/constants.ts
J = [0.0, 0.0, 1.08262668355e-3, -2.53265648533e-6, -1.61962159137e-6, -2.27296082869e-7, 5.40681239107e-7]


def make_model(degree):
    k = [MU * J[n] * RE ** n if n >= 2 else 0.0 for n in range(degree + 1)]

    def legendre(s):
        p = [1.0, s]
        dp = [0.0, 1.0]
        for m in range(1, degree):
            p.append(((2 * m + 1) * s * p[m] - m * p[m - 1]) / (m + 1))
            dp.append(dp[m - 1] + (2 * m + 1) * p[m])
        return p, dp

    def deriv(_t, y):
        x, yy, z = y[0], y[1], y[2]
        r2 = x * x + yy * yy + z * z
        r = math.sqrt(r2)
        inv_r = 1.0 / r
        s = z * inv_r
        p, dp = legendre(s)
        radial = -MU / r2
        along = 0.0
        inv_rn2 = inv_r ** 4
        for n in range(2, degree + 1):
            f = k[n] * inv_rn2
            radial += f * ((n + 1) * p[n] + s * dp[n])
            along -= f * dp[n]
            inv_rn2 *= inv_r
        return [y[3], y[4], y[5], radial * x * inv_r, radial * yy * inv_r, radial * z * inv_r + along]

    def energy(y):
        r = math.sqrt(y[0] ** 2 + y[1] ** 2 + y[2] ** 2)
        p, _ = legendre(y[2] / r)
        phi = -MU / r + sum(k[n] / r ** (n + 1) * p[n] for n in range(2, degree + 1))
        return 0.5 * (y[3] ** 2 + y[4] ** 2 + y[5] ** 2) + phi

    return deriv, energy


def main():
    p = json.loads(sys.argv[1])
    deriv, energy = make_model(int(p["zonalDegree"]))
    y0 = np.array(p["y0"], dtype=float)
    t0 = time.perf_counter()
    sol = solve_ivp(deriv, (0.0, p["days"] * 86400.0), y0, method="DOP853", rtol=p["rtol"], atol=p["atol"])
    wall = time.perf_counter() - t0
    e0 = energy(y0)
    err = max(abs((energy(sol.y[:, j]) - e0) / e0) for j in range(sol.y.shape[1]))
    print(json.dumps({"wallSeconds": wall, "steps": int(sol.t.size - 1), "evaluations": int(sol.nfev),
                      "energyRelError": float(err), "success": bool(sol.success)}))


if __name__ == "__main__":
    main()
