"""Reference run for scripts/bench-calc.ts: the same Cowell two-body + J2 problem, DOP853, same tolerances
and initial state, through scipy.integrate.solve_ivp. Prints one JSON line.
Usage: python3 bench-calc-scipy.py '{"aKm":..., "incRad":..., "days":..., "rtol":..., "atol":...}'
Constants: WGS-84 / EGM-96 values as in lib/calc/constants.ts."""
import json
import math
import sys
import time

import numpy as np
from scipy.integrate import solve_ivp

MU = 398600.4418
RE = 6378.137
J2 = 1.08262668355e-3
K = 1.5 * J2 * MU * RE * RE


def deriv(_t, y):
    x, yy, z = y[0], y[1], y[2]
    r2 = x * x + yy * yy + z * z
    r = math.sqrt(r2)
    inv_r3 = 1.0 / (r2 * r)
    inv_r5 = inv_r3 / r2
    zz = 5.0 * z * z / r2
    kep = -MU * inv_r3
    j = -K * inv_r5
    return [y[3], y[4], y[5], kep * x + j * x * (1 - zz), kep * yy + j * yy * (1 - zz), kep * z + j * z * (3 - zz)]


def energy(y):
    r2 = y[0] ** 2 + y[1] ** 2 + y[2] ** 2
    r = np.sqrt(r2)
    v2 = y[3] ** 2 + y[4] ** 2 + y[5] ** 2
    return 0.5 * v2 - MU / r + (K / 3) / (r2 * r) * (3 * y[2] ** 2 / r2 - 1)


def main():
    p = json.loads(sys.argv[1])
    a, inc = p["aKm"], p["incRad"]
    v = math.sqrt(MU / a)
    y0 = np.array([a, 0.0, 0.0, 0.0, v * math.cos(inc), v * math.sin(inc)])
    t0 = time.perf_counter()
    sol = solve_ivp(deriv, (0.0, p["days"] * 86400.0), y0, method="DOP853", rtol=p["rtol"], atol=p["atol"])
    wall = time.perf_counter() - t0
    e = energy(sol.y)
    e0 = energy(y0)
    print(json.dumps({"wallSeconds": wall, "steps": int(sol.t.size - 1), "evaluations": int(sol.nfev),
                      "energyRelError": float(np.max(np.abs((e - e0) / e0))), "success": bool(sol.success)}))


if __name__ == "__main__":
    main()
